// The JSON Schema and the writer must not drift apart: every key the writer puts
// in a file must be described by the schema at the same place, and the schema's
// lists of names must be the ones the model uses.

#include "ProjectTestSupport.h"

#include "airwright/core/InputError.h"
#include "airwright/core/chain/Section.h"
#include "airwright/core/project/ProjectFile.h"

#include <gtest/gtest.h>
#include <nlohmann/json.hpp>

#include <algorithm>
#include <set>
#include <string>
#include <variant>
#include <vector>

namespace Airwright::Core::Project {
using namespace TestSupport;

using Json = nlohmann::ordered_json;

namespace {

class SchemaWalker {
public:
    explicit SchemaWalker(Json schema) : m_schema(std::move(schema)) {}

    // Keys of `instance` (recursively) that no candidate schema describes.
    std::vector<std::string> undescribed(const Json& instance) const
    {
        std::vector<std::string> missing;
        walk(instance, expand({&m_schema}, instance), "", missing);
        return missing;
    }

    // The subschemas that may apply to `instance`: $ref followed, allOf/anyOf/
    // oneOf/if-then-else opened; oneOf branches whose "type" const differs from
    // the instance's "type" are dropped (the section variants).
    std::vector<const Json*> expand(std::vector<const Json*> start, const Json& instance) const
    {
        std::vector<const Json*> out;
        std::vector<const Json*> todo = std::move(start);
        while (!todo.empty()) {
            const Json* s = todo.back();
            todo.pop_back();
            if (!s->is_object())
                continue;
            if (s->contains("$ref")) {
                todo.push_back(&resolve((*s)["$ref"].get<std::string>()));
                continue;
            }
            out.push_back(s);
            for (const char* key : {"allOf", "anyOf"})
                if (s->contains(key))
                    for (const auto& sub : (*s)[key])
                        todo.push_back(&sub);
            for (const char* key : {"then", "else"})
                if (s->contains(key))
                    todo.push_back(&(*s)[key]);
            if (s->contains("oneOf")) {
                for (const auto& sub : (*s)["oneOf"]) {
                    const Json& branch = sub.contains("$ref") ? resolve(sub["$ref"].get<std::string>()) : sub;
                    if (instance.is_object() && instance.contains("type") && branch.contains("properties") &&
                        branch["properties"].contains("type") && branch["properties"]["type"].contains("const") &&
                        branch["properties"]["type"]["const"] != instance["type"])
                        continue;
                    todo.push_back(&branch);
                }
            }
        }
        return out;
    }

    const Json& resolve(const std::string& ref) const
    {
        const std::string prefix = "#/$defs/";
        EXPECT_EQ(ref.rfind(prefix, 0), 0u) << ref;
        return m_schema.at("$defs").at(ref.substr(prefix.size()));
    }

    const Json& root() const { return m_schema; }

private:
    void walk(const Json& instance, const std::vector<const Json*>& schemas, const std::string& path,
              std::vector<std::string>& missing) const
    {
        if (instance.is_object()) {
            for (const auto& item : instance.items()) {
                std::vector<const Json*> child;
                for (const Json* s : schemas)
                    if (s->contains("properties") && (*s)["properties"].contains(item.key()))
                        child.push_back(&(*s)["properties"][item.key()]);
                const std::string childPath = path.empty() ? item.key() : path + "." + item.key();
                if (child.empty()) {
                    missing.push_back(childPath);
                    continue;
                }
                walk(item.value(), expand(child, item.value()), childPath, missing);
            }
        } else if (instance.is_array()) {
            std::vector<const Json*> items;
            for (const Json* s : schemas)
                if (s->contains("items"))
                    items.push_back(&(*s)["items"]);
            for (std::size_t i = 0; i < instance.size(); ++i)
                walk(instance[i], expand(items, instance[i]), path + "[" + std::to_string(i) + "]", missing);
        }
    }

    Json m_schema;
};

SchemaWalker walker()
{
    return SchemaWalker(Json::parse(readText(schemaPath())));
}

Project demo()
{
    LoadReport report;
    return ProjectFile::load(demoPath(), report);
}

// Every section type and every optional value, so that every key is written.
Project everything()
{
    Project p = demo();
    p.unit.site.barometricPressure = pascals(98000.0);
    p.unit.casing.width = millimetres(1900.0);
    p.unit.casing.height = millimetres(1300.0);
    p.unit.cases[0].minimumSupplyHumidity = percent(30.0);
    p.unit.cases[0].maximumSupplyHumidity = percent(60.0);
    auto& filter = std::get<Sections::Filter>(p.unit.supply[1].spec);
    filter.finalPressureDrop = pascals(200.0);
    filter.nominalFlow = cubicMetresPerHour(9000.0);
    auto& hr = std::get<Recovery::HeatRecovery>(p.unit.supply[2].spec);
    hr.kind = Recovery::ExchangerKind::RotarySorption;
    hr.ratedFlow = cubicMetresPerHour(9000.0);
    hr.ratedHumidityEfficiency = percent(60.0);
    hr.loopFluid = Sections::Coolant(Sections::CoolantKind::EthyleneGlycol, percent(30.0));
    hr.pumpPower = watts(300.0);
    hr.frostStrategy = Recovery::FrostStrategy::SectionalDefrost;
    hr.defrostSections = 6;
    auto& heating = std::get<Sections::WaterHeatingCoil>(p.unit.supply[3].spec);
    heating.capacity = kilowatts(60.0);
    heating.fixedOutletTemperature = celsius(5.0);
    auto& cooling = std::get<Sections::CoolingCoil>(p.unit.supply[4].spec);
    cooling.bypassFactor = fraction(0.1);
    cooling.capacity = kilowatts(50.0);

    Sections::ElectricHeater heater;
    heater.ratedPower = kilowatts(10.0);
    heater.fixedOutletTemperature = celsius(-5.0);
    Sections::Humidifier steam;
    steam.capacity = kilogramsPerSecond(0.01);
    Sections::Humidifier adiabatic;
    adiabatic.kind = Sections::HumidifierKind::Adiabatic;
    Sections::MixingBox mixing;
    mixing.minimumOutdoorFlow = cubicMetresPerHour(3000.0);
    p.unit.supply.insert(p.unit.supply.begin(), Chain::Section{"mixing", mixing});
    p.unit.supply.push_back(Chain::Section{"electric", heater});
    p.unit.supply.push_back(Chain::Section{"steam", steam});
    p.unit.supply.push_back(Chain::Section{"adiabatic", adiabatic});
    p.unit.extract.push_back(Chain::Section{"mixing", Chain::CoupledSide{}});
    return p;
}

template <std::size_t I = 0> void collectTypeKeys(std::set<std::string>& keys)
{
    if constexpr (I < std::variant_size_v<Chain::SectionSpec>) {
        keys.insert(Chain::sectionTypeKey(Chain::SectionSpec{std::in_place_index<I>}));
        collectTypeKeys<I + 1>(keys);
    }
}

std::set<std::string> enumIn(const Json& property)
{
    std::set<std::string> values;
    for (const auto& v : property.at("enum"))
        values.insert(v.get<std::string>());
    return values;
}

} // namespace

TEST(ProjectSchema, DescribesEveryKeyTheWriterPutsInTheDemo)
{
    const auto missing = walker().undescribed(Json::parse(ProjectFile::serialize(demo())));
    EXPECT_TRUE(missing.empty()) << "not in the schema: " << ::testing::PrintToString(missing);
}

TEST(ProjectSchema, DescribesEveryKeyOfEverySectionType)
{
    const Project p = everything();
    ASSERT_TRUE(ProjectFile::check(p).empty()) << ProjectFile::check(p).front().text();
    const Json written = Json::parse(ProjectFile::serialize(p));
    const auto missing = walker().undescribed(written);
    EXPECT_TRUE(missing.empty()) << "not in the schema: " << ::testing::PrintToString(missing);
    // The walk can fail: a key the schema does not know is found.
    Json extra = written;
    extra["supply"][1]["wobble_Pa"] = 1;
    EXPECT_EQ(walker().undescribed(extra), std::vector<std::string>{"supply[1].wobble_Pa"});
}

TEST(ProjectSchema, SectionTypesAreTheModelsTypes)
{
    std::set<std::string> model;
    collectTypeKeys(model);
    std::set<std::string> schema;
    const SchemaWalker w = walker();
    for (const char* list : {"supply_section", "extract_section"})
        for (const auto& branch : w.root()["$defs"][list]["oneOf"])
            schema.insert(
                w.resolve(branch["$ref"].get<std::string>())["properties"]["type"]["const"].get<std::string>());
    EXPECT_EQ(schema, model);
}

TEST(ProjectSchema, NameListsAreTheModelsKeys)
{
    const SchemaWalker w = walker();
    const Json& defs = w.root()["$defs"];
    using namespace Sections;
    std::set<std::string> groups;
    for (auto g : {FilterGroup::IsoCoarse, FilterGroup::IsoEpm10, FilterGroup::IsoEpm2_5, FilterGroup::IsoEpm1})
        groups.insert(filterGroupKey(g));
    EXPECT_EQ(enumIn(defs["filter"]["properties"]["group"]), groups);
    std::set<std::string> kinds;
    for (auto k : {Recovery::ExchangerKind::PlateCrossFlow, Recovery::ExchangerKind::PlateCounterFlow,
                   Recovery::ExchangerKind::PlateCrossCounterFlow, Recovery::ExchangerKind::RotaryNonHygroscopic,
                   Recovery::ExchangerKind::RotaryHygroscopic, Recovery::ExchangerKind::RotarySorption,
                   Recovery::ExchangerKind::RunAroundCoil})
        kinds.insert(Recovery::exchangerKindKey(k));
    EXPECT_EQ(enumIn(defs["heat_recovery"]["properties"]["kind"]), kinds);
    std::set<std::string> coolants;
    for (auto c : {CoolantKind::Water, CoolantKind::EthyleneGlycol, CoolantKind::PropyleneGlycol})
        coolants.insert(coolantKindKey(c));
    EXPECT_EQ(enumIn(defs["coolant"]["properties"]["kind"]), coolants);
    std::set<std::string> roles;
    for (auto r : {DamperRole::OutdoorAir, DamperRole::Exhaust, DamperRole::Recirculation, DamperRole::ShutOff})
        roles.insert(damperRoleKey(r));
    EXPECT_EQ(enumIn(defs["damper"]["properties"]["role"]), roles);
}

TEST(ProjectSchema, RequiredTopLevelKeysMatchTheLoader)
{
    // Each key the schema requires is one whose absence the loader reports.
    const Json schema = Json::parse(readText(schemaPath()));
    for (const auto& key : schema["required"]) {
        Json json = demoJson();
        json.erase(key.get<std::string>());
        LoadReport report;
        EXPECT_THROW(ProjectFile::parse(json.dump(), report), InputError) << key;
    }
    for (const auto& item : schema["properties"].items()) {
        if (std::find(schema["required"].begin(), schema["required"].end(), item.key()) != schema["required"].end())
            continue;
        Json json = demoJson();
        json.erase(item.key());
        LoadReport report;
        EXPECT_NO_THROW(ProjectFile::parse(json.dump(), report)) << item.key();
    }
}

} // namespace Airwright::Core::Project
