#pragma once
// Checks an edit before it is committed: the candidate project must not have a
// problem the current one has not (a project already carrying a problem, say a
// unit without cases, can still be edited elsewhere). Problems are those the
// solver's structural check and the project file's reader would report.

#include "airwright/core/project/Project.h"

#include <QString>
#include <QStringList>

namespace Airwright::Ui {

class EditValidator {
public:
    static QStringList problems(const Core::Project::Project& project);

    // The first problem of `candidate` that `current` does not have, in plain
    // words; empty when the edit is acceptable.
    static QString newProblem(const Core::Project::Project& current, const Core::Project::Project& candidate);
};

} // namespace Airwright::Ui
