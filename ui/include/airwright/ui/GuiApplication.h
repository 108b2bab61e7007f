#pragma once

namespace Airwright::Ui {

// Entry point of the desktop program: parses the command line
// (--screenshot DIR [PROJECT], or PROJECT), then runs the window or renders
// screenshots offscreen and exits.
int runGuiApplication(int argc, char** argv);

} // namespace Airwright::Ui
