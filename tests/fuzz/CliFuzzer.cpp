// libFuzzer harness: the whole command line, CliApplication::run with in-memory
// streams, on an argument vector split from the input at NUL bytes. run() maps
// every exception to an exit code, so the only accepted answers are 0 and 2 (and
// 3, which is ours to fix, so it aborts). The commands only read files and write
// to the streams; an argument with a '/' is not run through the application, so
// only files in the working folder (scripts/fuzz makes it a scratch copy of the
// demo project and climate) can be named, never a device or another folder.

#include "airwright/cli/ArgumentList.h"
#include "airwright/cli/CliApplication.h"
#include "airwright/cli/ExitCode.h"
#include "airwright/core/InputError.h"

#include <cstddef>
#include <cstdint>
#include <cstdlib>
#include <sstream>
#include <string>
#include <vector>

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size)
{
    std::vector<std::string> args(1); // at most 24 arguments
    for (std::size_t i = 0; i < size && args.size() <= 24; ++i) {
        if (data[i] == 0)
            args.emplace_back();
        else
            args.back().push_back(static_cast<char>(data[i]));
    }
    // The annual comparison runs a year of hours: far too slow per input, and its
    // arguments are covered by the ArgumentList part below.
    bool skipApplication = args.front() == "compare-hr";
    for (const auto& arg : args)
        skipApplication = skipApplication || arg.find('/') != std::string::npos;

    // The parser alone, on every input, with the options of the commands.
    try {
        Airwright::Cli::ArgumentList list;
        list.addOption("tdb").addOption("rh").addOption("format").addFlag("no-sensitivity").allowPositionals(1);
        list.parse(args);
        for (const char* name : {"tdb", "rh"})
            (void)list.number(name);
    } catch (const Airwright::Core::InputError&) {
    }

    if (skipApplication)
        return 0;
    Airwright::Cli::CliApplication app;
    std::ostringstream out, err;
    const int code = app.run(args, out, err);
    if (code != Airwright::Cli::Done && code != Airwright::Cli::InvalidInput)
        std::abort(); // exit 3 is an internal error: a fault of ours
    return 0;
}
