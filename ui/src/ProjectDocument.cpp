#include "airwright/ui/ProjectDocument.h"

#include "airwright/core/InputError.h"
#include "airwright/core/chain/ChainSolver.h"
#include "airwright/core/project/ProjectFile.h"

#include <QFile>

#include <algorithm>
#include <filesystem>

namespace Airwright::Ui {

namespace {

std::filesystem::path toPath(const QString& path)
{
    return std::filesystem::path(QFile::encodeName(path).toStdString());
}

bool hasSection(const Core::Chain::AirHandlingUnit& unit, const std::string& id)
{
    auto same = [&](const Core::Chain::Section& s) { return s.id == id; };
    return std::any_of(unit.supply.begin(), unit.supply.end(), same)
           || std::any_of(unit.extract.begin(), unit.extract.end(), same);
}

} // namespace

ProjectDocument::ProjectDocument(QObject* parent) : QObject(parent)
{
    recompute();
}

void ProjectDocument::load(const QString& path)
{
    Core::Project::LoadReport report;
    // Throws ProjectFileError (a Core::Error) listing every problem; the document
    // stays as it was.
    Core::Project::Project project = Core::Project::ProjectFile::load(toPath(path), report);
    m_loadReport = std::move(report);
    reset(project, path);
}

void ProjectDocument::save(const QString& path)
{
    Core::Project::ProjectFile::save(m_project, toPath(path));
    const bool pathChanged = path != m_filePath;
    m_filePath = path;
    m_undo.setClean();
    if (pathChanged)
        emit filePathChanged(m_filePath);
}

void ProjectDocument::reset(const Core::Project::Project& project, const QString& path)
{
    m_project = project;
    m_filePath = path;
    m_undo.clear();
    m_undo.setClean();
    if (!m_selected.isEmpty() && !hasSection(m_project.unit, m_selected.toStdString())) {
        m_selected.clear();
        emit selectionChanged(m_selected);
    }
    recompute();
    emit changed(Change::Everything);
    emit filePathChanged(m_filePath);
}

void ProjectDocument::markModified()
{
    m_undo.resetClean();
}

void ProjectDocument::setInfo(const Core::Project::ProjectInfo& info)
{
    m_project.info = info;
    // The project facts do not enter the computation.
    emit changed(Change::Info);
}

void ProjectDocument::setSite(const Core::Chain::Site& site)
{
    m_project.unit.site = site;
    recompute();
    emit changed(Change::Site);
}

void ProjectDocument::setAirflows(const Core::Chain::Airflows& airflows)
{
    m_project.unit.airflows = airflows;
    recompute();
    emit changed(Change::Airflows);
}

void ProjectDocument::setCasing(const Core::Chain::Casing& casing)
{
    m_project.unit.casing = casing;
    recompute();
    emit changed(Change::Casing);
}

void ProjectDocument::setPaths(const std::vector<Core::Chain::Section>& supply,
                               const std::vector<Core::Chain::Section>& extract)
{
    m_project.unit.supply = supply;
    m_project.unit.extract = extract;
    recompute();
    emit changed(Change::Sections);
    if (!m_selected.isEmpty() && !hasSection(m_project.unit, m_selected.toStdString())) {
        m_selected.clear();
        emit selectionChanged(m_selected);
    }
}

void ProjectDocument::setCases(const std::vector<Core::Chain::DesignCase>& cases)
{
    m_project.unit.cases = cases;
    recompute();
    emit changed(Change::Cases);
}

void ProjectDocument::selectSection(const QString& id)
{
    if (id == m_selected)
        return;
    m_selected = id;
    emit selectionChanged(m_selected);
}

void ProjectDocument::recompute()
{
    try {
        m_result = Core::Chain::ChainSolver::solve(m_project.unit);
        m_computeError.clear();
    } catch (const Core::Error& e) {
        // The project stays editable; the views show why there are no results.
        m_result.reset();
        m_computeError = QString::fromStdString(e.what());
    }
    emit resultsChanged();
}

} // namespace Airwright::Ui
