#include "airwright/ui/EditValidator.h"

#include "airwright/core/InputError.h"
#include "airwright/core/chain/ChainSolver.h"
#include "airwright/core/project/ProjectFile.h"

namespace Airwright::Ui {

using namespace Airwright::Core;

QStringList EditValidator::problems(const Project::Project& project)
{
    QStringList list;
    try {
        Chain::ChainSolver::validate(project.unit);
    } catch (const Error& e) {
        list << QString::fromStdString(e.what());
    }
    try {
        for (const auto& issue : Project::ProjectFile::check(project))
            list << QString::fromStdString(issue.text());
    } catch (const Error& e) {
        list << QString::fromStdString(e.what());
    }
    return list;
}

QString EditValidator::newProblem(const Project::Project& current, const Project::Project& candidate)
{
    const QStringList before = problems(current);
    for (const QString& problem : problems(candidate))
        if (!before.contains(problem))
            return problem;
    return {};
}

} // namespace Airwright::Ui
