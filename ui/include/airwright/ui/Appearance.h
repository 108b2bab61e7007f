#pragma once
// Light or dark colours for the whole program (AppStyle, Fusion-based, with our palette).

class QPalette;

namespace Airwright::Ui {

class Appearance {
public:
    static void apply(bool dark);
    static QPalette darkPalette();
};

} // namespace Airwright::Ui
