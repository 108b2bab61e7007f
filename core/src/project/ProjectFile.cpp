#include "airwright/core/project/ProjectFile.h"

#include "AtomicFileWriter.h"
#include "IssueLog.h"
#include "JsonDocumentParser.h"
#include "ProjectReader.h"
#include "ProjectWriter.h"
#include "airwright/core/project/ProjectFileError.h"
#include "airwright/core/project/ProjectMigration.h"

#include "airwright/core/NumberFormat.h"

#include <algorithm>
#include <array>
#include <cerrno>
#include <fstream>
#include <system_error>

namespace Airwright::Core::Project {

namespace {

namespace fs = std::filesystem;

std::string tooLarge(std::uintmax_t bytes)
{
    return "file is " + std::to_string(bytes) + " bytes; project files are limited to " +
           std::to_string(ProjectFile::kMaxFileBytes / (1024u * 1024u)) + " MiB (" +
           std::to_string(ProjectFile::kMaxFileBytes) + " bytes)";
}

// Checks "format" and "format_version" and migrates an older document. False when
// the rest of the document must not be read (not our file, or too new).
bool prepare(Json& document, LoadReport& report, IssueLog& log)
{
    if (!document.is_object()) {
        log.error("", std::string("a project file holds one JSON object, got ") + jsonTypeName(document));
        return false;
    }
    const auto format = document.find("format");
    if (format == document.end()) {
        log.error("format", "required key missing (\"" + std::string(ProjectFile::kFormatName) +
                                "\" marks an Airwright project file)");
        return false;
    }
    if (!format->is_string() || format->get<std::string>() != ProjectFile::kFormatName) {
        log.error("format", (format->is_string() ? "'" + format->get<std::string>() + "'" : jsonTypeName(*format)) +
                                " is not an Airwright project file (expected '" +
                                std::string(ProjectFile::kFormatName) + "')");
        return false;
    }
    const auto version = document.find("format_version");
    if (version == document.end()) {
        log.error("format_version", "required key missing");
        return false;
    }
    if (!version->is_number_integer()) {
        log.error("format_version",
                  "must be a whole number, got " + (version->is_number() ? formatNumber(version->get<double>())
                                                                         : std::string(jsonTypeName(*version))));
        return false;
    }
    const bool tooNew = version->is_number_unsigned()
                            ? version->get<unsigned long long>() > static_cast<unsigned>(ProjectFile::kFormatVersion)
                            : version->get<long long>() > ProjectFile::kFormatVersion;
    if (tooNew) {
        log.error("format_version",
                  "the file is format version " + version->dump() + "; this Airwright reads versions up to " +
                      std::to_string(ProjectFile::kFormatVersion) + ": open it with a newer Airwright");
        return false;
    }
    const long long v = version->get<long long>();
    if (v < ProjectMigration::oldestVersion()) {
        log.error("format_version", std::to_string(v) + " is outside " +
                                        std::to_string(ProjectMigration::oldestVersion()) + " .. " +
                                        std::to_string(ProjectFile::kFormatVersion));
        return false;
    }
    if (v < ProjectFile::kFormatVersion) {
        ProjectMigration::migrate(document, static_cast<int>(v));
        report.migratedFromVersion = static_cast<int>(v);
        log.warning("format_version", "the file is format version " + std::to_string(v) + "; read as version " +
                                          std::to_string(ProjectFile::kFormatVersion) + ", and saving writes version " +
                                          std::to_string(ProjectFile::kFormatVersion));
    }
    return true;
}

Project parseInto(std::string_view text, LoadReport& report, const fs::path& file)
{
    report = LoadReport{};
    IssueLog log;
    Project project;
    if (text.size() > ProjectFile::kMaxFileBytes) {
        log.error("", tooLarge(text.size()));
    } else if (auto document = JsonDocumentParser::parse(text, log)) {
        if (prepare(*document, report, log))
            project = ProjectReader::read(*document, log);
    }
    if (log.errorCount() > 0)
        throw ProjectFileError(log.errors(), file);
    report.warnings.insert(report.warnings.end(), log.warnings().begin(), log.warnings().end());
    return project;
}

} // namespace

Project ProjectFile::parse(std::string_view text, LoadReport& report)
{
    return parseInto(text, report, {});
}

Project ProjectFile::load(const fs::path& file, LoadReport& report)
{
    const auto failure = [&](const std::string& message) { return ProjectFileError({{"", message}}, file); };
    std::error_code ec;
    const auto status = fs::status(file, ec);
    if (ec || !fs::exists(status))
        throw failure("cannot open: " + (ec ? ec.message() : std::generic_category().message(ENOENT)));
    if (fs::is_directory(status))
        throw failure("cannot open: is a folder, not a project file");
    const std::uintmax_t size = fs::file_size(file, ec);
    if (!ec && size > kMaxFileBytes)
        throw failure(tooLarge(size));

    std::ifstream in(file, std::ios::binary);
    if (!in)
        throw failure("cannot open: " + std::generic_category().message(errno));
    // Read in pieces and stop one byte over the limit: a file that grew since the
    // size check is still refused without reading all of it.
    std::string text;
    text.reserve(static_cast<std::size_t>(ec ? 0 : std::min(size, kMaxFileBytes)));
    std::array<char, 65536> chunk{};
    while (in && text.size() <= kMaxFileBytes) {
        in.read(chunk.data(), static_cast<std::streamsize>(chunk.size()));
        text.append(chunk.data(), static_cast<std::size_t>(in.gcount()));
    }
    if (in.bad())
        throw failure("cannot read: " + std::generic_category().message(errno));
    return parseInto(text, report, file);
}

std::string ProjectFile::serialize(const Project& project)
{
    return ProjectWriter::write(project).dump(2) + "\n";
}

std::vector<ProjectIssue> ProjectFile::check(const Project& project)
{
    LoadReport report;
    try {
        parse(serialize(project), report);
    } catch (const ProjectFileError& e) {
        return e.problems();
    }
    return {};
}

void ProjectFile::save(const Project& project, const fs::path& file)
{
    const std::string text = serialize(project);
    LoadReport report;
    try {
        parse(text, report);
    } catch (const ProjectFileError& e) {
        std::vector<ProjectIssue> problems{{"", "not saved: the project has problems that would stop it loading"}};
        problems.insert(problems.end(), e.problems().begin(), e.problems().end());
        throw ProjectFileError(std::move(problems), file);
    }
    AtomicFileWriter::write(file, text);
}

} // namespace Airwright::Core::Project
