#pragma once
// How a caller follows and stops a long computation: a progress callback with
// the fraction done (0 .. 1) and a stop token. The GUI runs the computation on a
// worker thread (std::jthread passes its token) and requests a stop when the
// inputs change, so a stale run ends within a few milliseconds.

#include <functional>
#include <stop_token>

namespace Airwright::Core::Annual {

struct RunControl {
    std::function<void(double fractionDone)> progress; // may be empty; called from the computing thread
    std::stop_token stop;                              // default: never stops

    bool stopRequested() const { return stop.stop_requested(); }
    void report(double fractionDone) const
    {
        if (progress)
            progress(fractionDone);
    }
};

} // namespace Airwright::Core::Annual
