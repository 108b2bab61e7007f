#include "airwright/cli/CliApplication.h"

// The schedule command writes PDF with Qt, so it lives in ui. It is registered
// when airwright-cli is linked to Airwright::Ui (app/CMakeLists.txt); a build
// without the GUI has no ui headers on its include path and goes without it.
#if __has_include("airwright/ui/export/ScheduleCommand.h")
#include "airwright/ui/export/ScheduleCommand.h"
#define AIRWRIGHT_CLI_HAS_SCHEDULE 1
#endif

#include <iostream>
#include <memory>
#include <string>
#include <vector>

int main(int argc, char** argv)
{
    std::vector<std::string> args(argv + 1, argv + argc);
    Airwright::Cli::CliApplication app;
#ifdef AIRWRIGHT_CLI_HAS_SCHEDULE
    app.addCommand(std::make_unique<Airwright::Ui::ScheduleCommand>());
#endif
    return app.run(args, std::cout, std::cerr);
}
