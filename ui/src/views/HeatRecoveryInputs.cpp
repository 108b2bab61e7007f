#include "airwright/ui/views/HeatRecoveryInputs.h"

#include "airwright/core/InputError.h"

#include <QSettings>
#include <QString>

#include <exception>
#include <functional>

namespace Airwright::Ui {

namespace {

using namespace Airwright::Core;
using namespace Airwright::Core::Annual;

// Any flow will do to learn the keys and to check loaded figures: none of the
// checked fields depends on it.
const VolumeFlow kNominalFlow = cubicMetresPerHour(10000.0);

const HeatRecoveryOption* findOption(const std::vector<HeatRecoveryOption>& options, const std::string& key)
{
    for (const auto& o : options)
        if (o.key == key)
            return &o;
    return nullptr;
}

QString optionPath(const std::string& key, const char* field)
{
    return QStringLiteral("options/%1/%2").arg(QString::fromStdString(key), QLatin1String(field));
}

std::optional<double> readNumber(QSettings& store, const QString& path)
{
    if (!store.contains(path))
        return std::nullopt;
    bool ok = false;
    const double v = store.value(path).toDouble(&ok);
    return ok ? std::optional<double>(v) : std::nullopt;
}

std::optional<int> readInt(QSettings& store, const QString& path)
{
    if (!store.contains(path))
        return std::nullopt;
    bool ok = false;
    const int v = store.value(path).toInt(&ok);
    return ok ? std::optional<int>(v) : std::nullopt;
}

// Puts one loaded field into `settings` when the result still validates.
void tryField(ComparisonSettings& settings, const std::function<void(ComparisonSettings&)>& set)
{
    ComparisonSettings trial = settings;
    set(trial);
    try {
        trial.validate();
        settings = trial;
    } catch (const Core::Error&) {
        // Out of range in the file: keep the default.
    }
}

} // namespace

bool HeatRecoveryInputs::OptionEdits::empty() const
{
    return *this == OptionEdits{};
}

void HeatRecoveryInputs::apply(HeatRecoveryOption& option, const OptionEdits& edits)
{
    if (edits.extraCost)
        option.extraCost = *edits.extraCost;
    if (!option.spec)
        return;
    auto& spec = *option.spec;
    if (edits.efficiency)
        spec.ratedEfficiency = *edits.efficiency;
    if (edits.humidityEfficiency)
        spec.ratedHumidityEfficiency = *edits.humidityEfficiency;
    if (edits.dropSupply)
        spec.ratedPressureDropSupply = *edits.dropSupply;
    if (edits.dropExtract)
        spec.ratedPressureDropExtract = *edits.dropExtract;
    if (edits.frost)
        spec.frostStrategy = *edits.frost;
}

std::vector<HeatRecoveryOption> HeatRecoveryInputs::options(VolumeFlow supplyFlow) const
{
    auto options = defaultHeatRecoveryOptions(supplyFlow);
    for (auto& o : options)
        apply(o, edits(o.key));
    return options;
}

const HeatRecoveryInputs::OptionEdits& HeatRecoveryInputs::edits(const std::string& key) const
{
    static const OptionEdits none;
    const auto it = m_edits.find(key);
    return it == m_edits.end() ? none : it->second;
}

void HeatRecoveryInputs::setEdits(const std::string& key, OptionEdits edits, VolumeFlow supplyFlow)
{
    const auto defaults = defaultHeatRecoveryOptions(supplyFlow);
    const HeatRecoveryOption* d = findOption(defaults, key);
    if (!d)
        return;
    if (edits.extraCost && *edits.extraCost == d->extraCost)
        edits.extraCost.reset();
    if (d->spec) {
        const auto& s = *d->spec;
        if (edits.efficiency && *edits.efficiency == s.ratedEfficiency)
            edits.efficiency.reset();
        if (edits.humidityEfficiency && *edits.humidityEfficiency == s.ratedHumidityEfficiency)
            edits.humidityEfficiency.reset();
        if (edits.dropSupply && *edits.dropSupply == s.ratedPressureDropSupply)
            edits.dropSupply.reset();
        if (edits.dropExtract && *edits.dropExtract == s.ratedPressureDropExtract)
            edits.dropExtract.reset();
        if (edits.frost && *edits.frost == s.frostStrategy)
            edits.frost.reset();
    } else {
        const auto cost = edits.extraCost;
        edits = OptionEdits{};
        edits.extraCost = cost; // the option without recovery has nothing else
    }
    if (edits.empty())
        m_edits.erase(key);
    else
        m_edits[key] = edits;
}

bool HeatRecoveryInputs::settingsAreDefault() const
{
    return m_settings == ComparisonSettings{};
}

void HeatRecoveryInputs::save(QSettings& store) const
{
    store.beginGroup(QLatin1String(kSettingsGroup));
    store.remove(QString()); // what was edited before and is default now
    for (const auto& [key, e] : m_edits) {
        if (e.efficiency)
            store.setValue(optionPath(key, "efficiencyPercent"), toPercent(*e.efficiency));
        if (e.humidityEfficiency)
            store.setValue(optionPath(key, "humidityEfficiencyPercent"), toPercent(*e.humidityEfficiency));
        if (e.dropSupply)
            store.setValue(optionPath(key, "pressureDropSupplyPa"), toPascals(*e.dropSupply));
        if (e.dropExtract)
            store.setValue(optionPath(key, "pressureDropExtractPa"), toPascals(*e.dropExtract));
        if (e.frost)
            store.setValue(optionPath(key, "frostProtection"),
                           QString::fromLatin1(Recovery::frostStrategyKey(*e.frost)));
        if (e.extraCost)
            store.setValue(optionPath(key, "extraCost"), *e.extraCost);
    }
    const auto& p = m_settings.prices;
    store.setValue(QStringLiteral("prices/heatPerKWh"), p.heatPricePerKilowattHour);
    store.setValue(QStringLiteral("prices/electricityPerKWh"), p.electricityPricePerKilowattHour);
    store.setValue(QStringLiteral("prices/heatCo2KgPerKWh"), p.heatCo2KilogramsPerKilowattHour);
    store.setValue(QStringLiteral("prices/electricityCo2KgPerKWh"), p.electricityCo2KilogramsPerKilowattHour);
    store.setValue(QStringLiteral("prices/coolingEer"), p.coolingEer);
    store.setValue(QStringLiteral("evaluationYears"), m_settings.evaluationYears);
    const auto& s = m_settings.annual.schedule;
    store.setValue(QStringLiteral("schedule/hoursPerDay"), s.hoursPerDay);
    store.setValue(QStringLiteral("schedule/firstHour"), s.firstHour);
    store.setValue(QStringLiteral("schedule/daysPerWeek"), s.daysPerWeek);
    store.setValue(QStringLiteral("schedule/holidayWeeks"), s.holidayWeeks);
    store.setValue(QStringLiteral("schedule/offHours"), QString::fromLatin1(offHoursModeKey(s.offHours)));
    store.endGroup();
}

HeatRecoveryInputs HeatRecoveryInputs::load(QSettings& store)
{
    HeatRecoveryInputs inputs;
    store.beginGroup(QLatin1String(kSettingsGroup));
    for (const auto& option : defaultHeatRecoveryOptions(kNominalFlow)) {
        const std::string& key = option.key;
        OptionEdits e;
        // Each field alone, checked on the default option, so one bad field
        // does not cost the others.
        auto keepIf = [&option](const std::function<void(OptionEdits&)>& set) -> OptionEdits {
            OptionEdits one;
            set(one);
            HeatRecoveryOption trial = option;
            apply(trial, one);
            try {
                if (trial.spec)
                    trial.spec->validate();
                if (!(trial.extraCost >= 0.0))
                    return {};
                return one;
            } catch (const Core::Error&) {
                return {};
            }
        };
        if (const auto v = readNumber(store, optionPath(key, "efficiencyPercent")); v && option.spec)
            e.efficiency = keepIf([&](OptionEdits& o) { o.efficiency = percent(*v); }).efficiency;
        if (const auto v = readNumber(store, optionPath(key, "humidityEfficiencyPercent")); v && option.spec)
            e.humidityEfficiency =
                keepIf([&](OptionEdits& o) { o.humidityEfficiency = percent(*v); }).humidityEfficiency;
        if (const auto v = readNumber(store, optionPath(key, "pressureDropSupplyPa")); v && option.spec)
            e.dropSupply = keepIf([&](OptionEdits& o) { o.dropSupply = pascals(*v); }).dropSupply;
        if (const auto v = readNumber(store, optionPath(key, "pressureDropExtractPa")); v && option.spec)
            e.dropExtract = keepIf([&](OptionEdits& o) { o.dropExtract = pascals(*v); }).dropExtract;
        if (option.spec) {
            const auto frost = Recovery::frostStrategyFromKey(
                store.value(optionPath(key, "frostProtection")).toString().toStdString());
            if (frost)
                e.frost = keepIf([&](OptionEdits& o) { o.frost = *frost; }).frost;
        }
        if (const auto v = readNumber(store, optionPath(key, "extraCost")))
            e.extraCost = keepIf([&](OptionEdits& o) { o.extraCost = *v; }).extraCost;
        if (!e.empty())
            inputs.m_edits[key] = e;
    }

    ComparisonSettings& s = inputs.m_settings;
    auto number = [&store, &s](const char* path, double EnergyPrices::*field) {
        if (const auto v = readNumber(store, QLatin1String(path)))
            tryField(s, [&](ComparisonSettings& t) { t.prices.*field = *v; });
    };
    number("prices/heatPerKWh", &EnergyPrices::heatPricePerKilowattHour);
    number("prices/electricityPerKWh", &EnergyPrices::electricityPricePerKilowattHour);
    number("prices/heatCo2KgPerKWh", &EnergyPrices::heatCo2KilogramsPerKilowattHour);
    number("prices/electricityCo2KgPerKWh", &EnergyPrices::electricityCo2KilogramsPerKilowattHour);
    number("prices/coolingEer", &EnergyPrices::coolingEer);
    if (const auto v = readNumber(store, QStringLiteral("evaluationYears")))
        tryField(s, [&](ComparisonSettings& t) { t.evaluationYears = *v; });
    auto integer = [&store, &s](const char* path, int OperatingSchedule::*field) {
        if (const auto v = readInt(store, QLatin1String(path)))
            tryField(s, [&](ComparisonSettings& t) { t.annual.schedule.*field = *v; });
    };
    integer("schedule/hoursPerDay", &OperatingSchedule::hoursPerDay);
    integer("schedule/firstHour", &OperatingSchedule::firstHour);
    integer("schedule/daysPerWeek", &OperatingSchedule::daysPerWeek);
    integer("schedule/holidayWeeks", &OperatingSchedule::holidayWeeks);
    if (const auto mode =
            offHoursModeFromKey(store.value(QStringLiteral("schedule/offHours")).toString().toStdString()))
        tryField(s, [&](ComparisonSettings& t) { t.annual.schedule.offHours = *mode; });
    store.endGroup();
    return inputs;
}

} // namespace Airwright::Ui
