#include "airwright/cli/CliApplication.h"

#include <iostream>
#include <string>
#include <vector>

int main(int argc, char** argv)
{
    std::vector<std::string> args(argv + 1, argv + argc);
    Airwright::Cli::CliApplication app;
    return app.run(args, std::cout, std::cerr);
}
