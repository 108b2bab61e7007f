#pragma once
// Finds the program's resource files (the demo project): in the source tree the
// build was configured from, else next to the executable.

#include <QString>

namespace Airwright::Ui {

class ResourceLocator {
public:
    // Path of resources/demo/demo-library.awproj; empty when it cannot be found.
    static QString demoProject();
    static QString resourcesDirectory(); // empty when not found
};

} // namespace Airwright::Ui
