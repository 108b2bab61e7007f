#pragma once
// The numbers with units inside a finding's message, rewritten in the chosen
// unit system. Core writes its messages in SI with plain-text units ("1.9 C",
// "120 Pa", "9000 m3/h"); the views show them as every other number in the
// program: "1.9 °C" in SI, "35.4 °F" in IP. A range "a .. b unit" converts both
// ends. Words, bare numbers, kPa (the site pressure, read as kPa in both systems
// here) and compound units (W/(m3/s), the SFP of Regulation (EU) 1253/2014) are
// left as written.

#include <QString>

namespace Airwright::Ui {

class UnitSystem;

class MessageUnits {
public:
    static QString toDisplay(const QString& siMessage, const UnitSystem& units);
};

} // namespace Airwright::Ui
