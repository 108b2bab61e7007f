#pragma once

#include "airwright/cli/Command.h"

namespace Airwright::Ui {

// "airwright-cli schedule FILE -o OUT.pdf|OUT.csv [--paper A4|Letter] [--units SI|IP]":
// computes the project and writes its section schedule, as a PDF (SchedulePdf)
// or as CSV (Cli::ScheduleCsv, SI only), chosen by the output's extension. Lives
// in ui because the PDF needs Qt; a QGuiApplication on the offscreen platform is
// created for the run when the process has none.
class ScheduleCommand : public Cli::Command {
public:
    std::string name() const override { return "schedule"; }
    std::string summary() const override;
    std::string help() const override;
    int run(const std::vector<std::string>& args, std::ostream& out, std::ostream& err) override;
};

} // namespace Airwright::Ui
