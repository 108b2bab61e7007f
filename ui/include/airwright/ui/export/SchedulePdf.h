#pragma once
// The printed section schedule of a solved project, as a PDF of vector pages:
// project and design conditions, the unit summary with its classes, the section
// schedule of each path (section by section, the design cases side by side),
// filters, fans, heat recovery and frost, the psychrometric chart and pressure
// profiles, the measuring and control points, findings, the cautions, and a heat
// recovery comparison over a year when one is given.
// Text is drawn as text (selectable, searchable); charts as vector paths.
//
// Needs a QGuiApplication (fonts); ScheduleCommand creates one when run from the
// command line.

#include "airwright/core/annual/ComparisonResult.h"
#include "airwright/core/chain/CaseResult.h"
#include "airwright/core/project/Project.h"
#include "airwright/ui/UnitSystem.h"

#include <QString>

#include <optional>
#include <string_view>

namespace Airwright::Ui {

class SchedulePdf {
public:
    enum class Paper { A4, Letter };

    struct Options {
        Paper paper = Paper::A4;
        UnitSystem::System units = UnitSystem::System::SI;
        bool airflowInLitresPerSecond = false; // SI only
        // A heat recovery comparison of this unit, printed as its own chapter.
        std::optional<Core::Annual::ComparisonResult> comparison;
    };

    struct Outcome {
        int pages = 0;
    };

    // Writes the schedule to file (replacing it). Throws Core::InputError when the
    // file cannot be written, Core::Error when no QGuiApplication exists.
    static Outcome write(const QString& file, const Core::Project::Project& project,
                         const Core::Chain::UnitResult& result, const Options& options);

    // "A4", "Letter" (case-insensitive) and back.
    static std::optional<Paper> paperFromName(std::string_view name);
    static const char* paperName(Paper paper);
};

} // namespace Airwright::Ui
