#include "airwright/cli/CliApplication.h"

// The schedule command writes PDF with Qt, so it lives in ui. It is registered
// when airwright-cli is linked to Airwright::Ui (app/CMakeLists.txt); a build
// without the GUI goes without it.
#ifdef AIRWRIGHT_CLI_HAS_SCHEDULE
#include "airwright/ui/export/ScheduleCommand.h"
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
