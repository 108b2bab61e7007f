#pragma once

namespace Airwright::Cli {

// Exit codes of airwright-cli, the same for every command.
enum ExitCode : int {
    Done = 0,          // finished; findings may include warnings
    InvalidInput = 2,  // bad arguments or an invalid file: every problem on stderr
    InternalError = 3, // a fault of ours: reported, never a crash
};

} // namespace Airwright::Cli
