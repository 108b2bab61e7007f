#include "airwright/cli/PointsCommand.h"

#include "airwright/cli/ArgumentList.h"
#include "airwright/cli/CsvWriter.h"
#include "airwright/cli/ExitCode.h"
#include "airwright/core/InputError.h"
#include "airwright/core/NumberFormat.h"
#include "airwright/core/chain/ChainSolver.h"
#include "airwright/core/checks/MeasurementPoints.h"
#include "airwright/core/project/ProjectFile.h"

#include <nlohmann/json.hpp>

#include <cmath>
#include <ostream>
#include <sstream>
#include <stdexcept>

namespace Airwright::Cli {

using namespace Airwright::Core;
using Checks::MeasurementPoint;
using nlohmann::json;

namespace {

double finite(const Checks::PointValue& value)
{
    const double v = Checks::toPointUnit(value);
    if (!std::isfinite(v))
        throw std::runtime_error("computed a non-finite value for a measuring point");
    return v;
}

json optionalText(const std::string& text) { return text.empty() ? json(nullptr) : json(text); }

json pointJson(const MeasurementPoint& p)
{
    json j;
    j["tag"] = p.tag;
    j["purpose"] = Checks::pointPurposeKey(p.purpose);
    j["label"] = Checks::pointPurposeLabel(p.purpose);
    j["quantity"] = Checks::pointQuantityKey(p.quantity);
    j["unit"] = Checks::pointUnit(p.quantity);
    j["path"] = Chain::pathKey(p.path);
    j["placement"] = Checks::pointPlacementKey(p.placement);
    j["section"] = optionalText(p.sectionId);
    j["upstream"] = optionalText(p.upstreamId);
    j["downstream"] = optionalText(p.downstreamId);
    j["position"] = Checks::pointPosition(p);
    j["expected"] = {{"low", finite(p.expectedLow)}, {"high", finite(p.expectedHigh)}};
    json setpoints = json::array();
    for (const auto& s : p.setpoints)
        setpoints.push_back({{"key", s.key}, {"label", s.label}, {"value", finite(s.value)}, {"basis", s.basis}});
    j["setpoints"] = setpoints;
    j["transmitter"] = p.transmitter ? json{{"low", finite(p.transmitter->low)}, {"high", finite(p.transmitter->high)}}
                                     : json(nullptr);
    if (p.kFactor)
        j["k_factor"] = *p.kFactor;
    j["note"] = p.note;
    return j;
}

std::string setpointsText(const MeasurementPoint& p, bool exact)
{
    std::string text;
    for (const auto& s : p.setpoints) {
        if (!text.empty())
            text += "; ";
        const double v = finite(s.value);
        text += s.label + " = " + (exact ? formatNumber(v) : formatFixed(v, 1)) + " " + Checks::pointUnit(p.quantity);
    }
    return text;
}

std::string csvText(const std::vector<MeasurementPoint>& points)
{
    CsvWriter csv;
    for (const char* name : {"tag", "purpose", "quantity", "unit", "path", "placement", "section", "upstream",
                             "downstream", "position", "expected_low", "expected_high", "setpoints",
                             "transmitter_low", "transmitter_high", "k_factor", "note"})
        csv.text(name);
    csv.endRow();
    for (const auto& p : points) {
        csv.text(p.tag)
            .text(Checks::pointPurposeKey(p.purpose))
            .text(Checks::pointQuantityKey(p.quantity))
            .text(Checks::pointUnit(p.quantity))
            .text(Chain::pathKey(p.path))
            .text(Checks::pointPlacementKey(p.placement))
            .text(p.sectionId)
            .text(p.upstreamId)
            .text(p.downstreamId)
            .text(Checks::pointPosition(p))
            .number(finite(p.expectedLow))
            .number(finite(p.expectedHigh))
            .text(setpointsText(p, true));
        if (p.transmitter)
            csv.number(finite(p.transmitter->low)).number(finite(p.transmitter->high));
        else
            csv.empty().empty();
        if (p.kFactor)
            csv.number(*p.kFactor);
        else
            csv.empty();
        csv.text(p.note);
        csv.endRow();
    }
    return csv.str();
}

// Temperatures and pressures to 0.1, humidities to 1 %, flows to 1 m3/h.
int decimalsFor(Checks::PointQuantity q)
{
    switch (q) {
    case Checks::PointQuantity::Temperature:
    case Checks::PointQuantity::DifferentialPressure:
        return 1;
    case Checks::PointQuantity::RelativeHumidity:
    case Checks::PointQuantity::AirVolumeFlow:
        return 0;
    }
    return 1;
}

std::string plainText(const Project::Project& project, const std::vector<MeasurementPoint>& points)
{
    std::ostringstream out;
    out << (project.info.name.empty() ? "(unnamed project)" : project.info.name) << ": measuring and control points\n";
    for (const auto& p : points) {
        const int d = decimalsFor(p.quantity);
        const std::string unit = Checks::pointUnit(p.quantity);
        out << "\n" << p.tag << "  " << Checks::pointPurposeLabel(p.purpose) << "\n";
        out << "  where        " << Checks::pointPosition(p) << "\n";
        out << "  expected     " << formatFixed(finite(p.expectedLow), d) << " .. " << formatFixed(finite(p.expectedHigh), d)
            << " " << unit << " over the design cases\n";
        for (const auto& s : p.setpoints)
            out << "  setpoint     " << s.label << ": " << formatFixed(finite(s.value), d) << " " << unit << " ("
                << s.basis << ")\n";
        if (p.transmitter)
            out << "  transmitter  " << formatNumber(finite(p.transmitter->low)) << " .. "
                << formatNumber(finite(p.transmitter->high)) << " " << unit << "\n";
        else if (p.quantity != Checks::PointQuantity::AirVolumeFlow)
            out << "  transmitter  beyond the standard spans: choose one to suit\n";
        if (!p.note.empty())
            out << "  note         " << p.note << "\n";
    }
    out << "\nTransmitter spans are the next standard range above the highest value the point must show "
           "(common practice); confirm against the controls supplier's ranges.\n";
    return out.str();
}

} // namespace

std::string PointsCommand::summary() const
{
    return "list the measuring and control points a design implies";
}

std::string PointsCommand::help() const
{
    return "usage: airwright-cli points FILE [--format json|csv|text]\n"
           "\n"
           "Loads the project FILE, computes every design case and lists the measuring\n"
           "and control points the design implies: temperatures at the outdoor intake,\n"
           "supply and extract; differential pressure over each filter and over the heat\n"
           "exchanger (frost); fan airflow by inlet ring; frost thermostats after water\n"
           "heating coils; humidity where humidification or dehumidification needs it.\n"
           "Each with its position, expected range over the cases, setpoints and a\n"
           "suggested transmitter range. Numbers are in C, %, Pa or m3/h.\n"
           "\n"
           "  --format FORMAT  text (default), json or csv (RFC 4180)\n"
           "\n"
           "Exit codes: 0 done, 2 invalid input, 3 internal error.\n";
}

int PointsCommand::run(const std::vector<std::string>& args, std::ostream& out, std::ostream& err)
{
    ArgumentList list;
    list.addOption("format").allowPositionals(1);
    list.parse(args);
    if (list.positionals().size() != 1)
        throw InputError("points needs one project FILE (see 'airwright-cli points --help')");
    const std::string format = list.value("format").value_or("text");
    if (format != "json" && format != "csv" && format != "text")
        throw InputError("--format must be json, csv or text, not '" + format + "'");

    Project::LoadReport report;
    const auto project = Project::ProjectFile::load(list.positionals().front(), report);
    for (const auto& warning : report.warnings)
        err << "warning: " << warning.path << ": " << warning.message << "\n";

    const auto result = Chain::ChainSolver::solve(project.unit);
    const auto points = Checks::measurementPoints(project.unit, result);
    if (format == "json") {
        json root;
        root["project"] = {{"name", project.info.name}, {"reference", project.info.reference}};
        json list_ = json::array();
        for (const auto& p : points)
            list_.push_back(pointJson(p));
        root["points"] = list_;
        out << root.dump(2) << "\n";
    } else if (format == "csv") {
        out << csvText(points);
    } else {
        out << plainText(project, points);
    }
    return Done;
}

} // namespace Airwright::Cli
