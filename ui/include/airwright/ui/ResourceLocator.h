#pragma once
// Finds the program's resource files (the demo project and climate): in the source tree the
// build was configured from, else next to the executable.

#include <QString>

namespace Airwright::Ui {

class ResourceLocator {
public:
    // Path of resources/demo/demo-library.awproj; empty when it cannot be found.
    static QString demoProject();
    // Path of resources/demo/demo-climate.epw (the invented demo weather year);
    // empty when it cannot be found.
    static QString demoClimate();
    static QString resourcesDirectory(); // empty when not found
};

} // namespace Airwright::Ui
