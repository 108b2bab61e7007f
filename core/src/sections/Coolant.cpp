#include "airwright/core/sections/Coolant.h"

#include "airwright/core/InputError.h"
#include "airwright/core/NumberFormat.h"

#include <algorithm>
#include <array>
#include <cmath>
#include <cstddef>
#include <initializer_list>

namespace Airwright::Core::Sections {

namespace {

// ---------------------------------------------------------------------------
// Grid: rows are temperatures -35 .. 100 C in 5 K steps; columns are glycol
// volume percent 0 (pure water), 10, 20, ..., 60. A glycol column holds 0.0 below
// the first temperature the handbook lists for it; cell() never returns those.
// ---------------------------------------------------------------------------
constexpr double kFirstRowCelsius = -35.0;
constexpr double kRowStepKelvin = 5.0;
constexpr std::size_t kRowCount = 28;
constexpr double kHighestCelsius = 100.0;
constexpr double kColumnStepPercent = 10.0;
constexpr std::size_t kGlycolColumnCount = 6; // 10 .. 60 vol %
constexpr std::size_t kWaterFirstRow = 7;     // 0 C
constexpr std::size_t kWaterRowCount = kRowCount - kWaterFirstRow;

using WaterColumn = std::array<double, kWaterRowCount>;
using GlycolGrid = std::array<std::array<double, kRowCount>, kGlycolColumnCount>;

// Pure water, 0 .. 100 C in 5 K steps: IAPWS-95 (IAPWS R6-95(2018)) at 101.325 kPa,
// and on the saturation line at 100 C (where 101.325 kPa is just below saturation).
// Evaluated with the iapws Python package 1.5.2 (Debian python3-iapws), rounded to
// 0.1 J/(kg K) and 0.01 kg/m3.
constexpr WaterColumn kWaterSpecificHeat = {
    4219.4, 4205.0, 4195.2, 4188.5, 4184.1, 4181.3, 4179.8, 4179.3, 4179.4, 4180.1, 4181.3,
    4183.0, 4185.0, 4187.3, 4190.1, 4193.2, 4196.8, 4200.7, 4205.2, 4210.2, 4215.7,
}; // J/(kg K)
constexpr WaterColumn kWaterDensity = {
    999.84, 999.97, 999.70, 999.10, 998.21, 997.05, 995.65, 994.03, 992.22, 990.21, 988.04,
    985.69, 983.20, 980.55, 977.76, 974.84, 971.79, 968.61, 965.31, 961.89, 958.35,
}; // kg/m3
constexpr double kWaterDensityAt20C = 998.21;

// Aqueous solutions of inhibited ethylene and propylene glycol: ASHRAE Handbook -
// Fundamentals (SI), chapter 31 "Physical Properties of Secondary Coolants (Brines)",
// Table 6 (density, EG), Table 7 (specific heat, EG), Table 10 (density, PG) and
// Table 11 (specific heat, PG); concentrations in volume percent. Chapter number as in
// the 2009 and 2017 editions; table numbers from a list of the chapter's tables, not
// checked against the 2017 print. The handbook pages were not at hand: the values are
// the handbook grid as reproduced in the default glycol data of the EnergyPlus source
// (FluidProperties.cc), cut to -35 .. 100 C and 10 .. 60 vol %. Checked: every row is
// an exact quadratic in t (constant second differences); one cell broke that, EG
// 30 vol % at 50 C read 1031.36 kg/m3, and is set to 1031.81 kg/m3 from the quadratic
// through the rest of its row (a 0.05 % change; see docs/coolant-properties.md).
// clang-format off
// Each column lists 28 values: -35, -30, ..., 30 C on its first line, 35 .. 100 C on
// its second.
// J/(kg K)
constexpr GlycolGrid kEthyleneGlycolSpecificHeat = {{
    {{ // 10 vol %
        0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 3937.0, 3946.0, 3954.0, 3963.0, 3972.0, 3981.0, 3989.0,
        3998.0, 4007.0, 4015.0, 4024.0, 4033.0, 4042.0, 4050.0, 4059.0, 4068.0, 4077.0, 4085.0, 4094.0, 4103.0, 4112.0,
    }},
    {{ // 20 vol %
        0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 3757.0, 3769.0, 3780.0, 3792.0, 3803.0, 3815.0, 3826.0, 3838.0,
        3849.0, 3861.0, 3872.0, 3884.0, 3895.0, 3907.0, 3918.0, 3930.0, 3941.0, 3953.0, 3964.0, 3976.0, 3987.0, 3999.0,
    }},
    {{ // 30 vol %
        0.0, 0.0, 0.0, 0.0, 0.0, 3560.0, 3574.0, 3589.0, 3603.0, 3617.0, 3631.0, 3645.0, 3660.0, 3674.0,
        3688.0, 3702.0, 3716.0, 3730.0, 3745.0, 3759.0, 3773.0, 3787.0, 3801.0, 3816.0, 3830.0, 3844.0, 3858.0, 3872.0,
    }},
    {{ // 40 vol %
        0.0, 0.0, 0.0, 3334.0, 3351.0, 3367.0, 3384.0, 3401.0, 3418.0, 3435.0, 3451.0, 3468.0, 3485.0, 3502.0,
        3518.0, 3535.0, 3552.0, 3569.0, 3585.0, 3602.0, 3619.0, 3636.0, 3653.0, 3669.0, 3686.0, 3703.0, 3720.0, 3736.0,
    }},
    {{ // 50 vol %
        3068.0, 3088.0, 3107.0, 3126.0, 3145.0, 3165.0, 3184.0, 3203.0, 3223.0, 3242.0, 3261.0, 3281.0, 3300.0, 3319.0,
        3339.0, 3358.0, 3377.0, 3396.0, 3416.0, 3435.0, 3454.0, 3474.0, 3493.0, 3512.0, 3532.0, 3551.0, 3570.0, 3590.0,
    }},
    {{ // 60 vol %
        2844.0, 2866.0, 2888.0, 2909.0, 2931.0, 2953.0, 2975.0, 2997.0, 3018.0, 3040.0, 3062.0, 3084.0, 3106.0, 3127.0,
        3149.0, 3171.0, 3193.0, 3215.0, 3236.0, 3258.0, 3280.0, 3302.0, 3324.0, 3345.0, 3367.0, 3389.0, 3411.0, 3433.0,
    }},
}};
// kg/m3
constexpr GlycolGrid kEthyleneGlycolDensity = {{
    {{ // 10 vol %
        0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 1018.73, 1017.57, 1016.28, 1014.87, 1013.34, 1011.69, 1009.92,
        1008.02, 1006.01, 1003.87, 1001.61, 999.23, 996.72, 994.10, 991.35, 988.49, 985.50, 982.39, 979.15, 975.80, 972.32,
    }},
    {{ // 20 vol %
        0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 1036.85, 1035.67, 1034.36, 1032.94, 1031.39, 1029.72, 1027.93, 1026.02,
        1023.99, 1021.83, 1019.55, 1017.16, 1014.64, 1011.99, 1009.23, 1006.35, 1003.34, 1000.21, 996.96, 993.59, 990.10, 986.48,
    }},
    {{ // 30 vol %
        0.0, 0.0, 0.0, 0.0, 0.0, 1054.31, 1053.11, 1051.78, 1050.33, 1048.76, 1047.07, 1045.25, 1043.32, 1041.26,
        1039.08, 1036.78, 1034.36, 1031.81, 1029.15, 1026.36, 1023.45, 1020.42, 1017.27, 1014.00, 1010.60, 1007.09, 1003.45, 999.69,
    }},
    {{ // 40 vol %
        0.0, 0.0, 0.0, 1071.98, 1070.87, 1069.63, 1068.28, 1066.80, 1065.21, 1063.49, 1061.65, 1059.68, 1057.60, 1055.39,
        1053.07, 1050.62, 1048.05, 1045.35, 1042.54, 1039.61, 1036.55, 1033.37, 1030.07, 1026.65, 1023.10, 1019.44, 1015.65, 1011.74,
    }},
    {{ // 50 vol %
        1089.94, 1089.04, 1088.01, 1086.87, 1085.61, 1084.22, 1082.71, 1081.08, 1079.33, 1077.46, 1075.46, 1073.35, 1071.11, 1068.75,
        1066.27, 1063.66, 1060.94, 1058.09, 1055.13, 1052.04, 1048.83, 1045.49, 1042.04, 1038.46, 1034.77, 1030.95, 1027.01, 1022.95,
    }},
    {{ // 60 vol %
        1104.60, 1103.54, 1102.36, 1101.06, 1099.64, 1098.09, 1096.43, 1094.64, 1092.73, 1090.70, 1088.54, 1086.27, 1083.87, 1081.35,
        1078.71, 1075.95, 1073.07, 1070.06, 1066.94, 1063.69, 1060.32, 1056.83, 1053.22, 1049.48, 1045.63, 1041.65, 1037.55, 1033.33,
    }},
}};
// J/(kg K)
constexpr GlycolGrid kPropyleneGlycolSpecificHeat = {{
    {{ // 10 vol %
        0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 4042.0, 4050.0, 4058.0, 4067.0, 4075.0, 4083.0, 4091.0,
        4099.0, 4107.0, 4115.0, 4123.0, 4131.0, 4139.0, 4147.0, 4155.0, 4163.0, 4171.0, 4179.0, 4187.0, 4195.0, 4203.0,
    }},
    {{ // 20 vol %
        0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 3918.0, 3929.0, 3940.0, 3951.0, 3962.0, 3973.0, 3983.0, 3994.0,
        4005.0, 4016.0, 4027.0, 4038.0, 4049.0, 4060.0, 4071.0, 4082.0, 4093.0, 4104.0, 4115.0, 4126.0, 4136.0, 4147.0,
    }},
    {{ // 30 vol %
        0.0, 0.0, 0.0, 0.0, 0.0, 3765.0, 3779.0, 3793.0, 3807.0, 3820.0, 3834.0, 3848.0, 3862.0, 3875.0,
        3889.0, 3903.0, 3917.0, 3930.0, 3944.0, 3958.0, 3972.0, 3985.0, 3999.0, 4013.0, 4027.0, 4040.0, 4054.0, 4068.0,
    }},
    {{ // 40 vol %
        0.0, 0.0, 0.0, 0.0, 3586.0, 3603.0, 3619.0, 3636.0, 3652.0, 3669.0, 3685.0, 3702.0, 3718.0, 3735.0,
        3751.0, 3768.0, 3784.0, 3801.0, 3817.0, 3834.0, 3850.0, 3867.0, 3883.0, 3900.0, 3916.0, 3933.0, 3949.0, 3966.0,
    }},
    {{ // 50 vol %
        0.0, 0.0, 3358.0, 3378.0, 3397.0, 3416.0, 3435.0, 3455.0, 3474.0, 3493.0, 3513.0, 3532.0, 3551.0, 3570.0,
        3590.0, 3609.0, 3628.0, 3648.0, 3667.0, 3686.0, 3706.0, 3725.0, 3744.0, 3763.0, 3783.0, 3802.0, 3821.0, 3841.0,
    }},
    {{ // 60 vol %
        3096.0, 3118.0, 3140.0, 3162.0, 3184.0, 3206.0, 3228.0, 3250.0, 3272.0, 3295.0, 3317.0, 3339.0, 3361.0, 3383.0,
        3405.0, 3427.0, 3449.0, 3471.0, 3493.0, 3515.0, 3537.0, 3559.0, 3581.0, 3603.0, 3625.0, 3647.0, 3670.0, 3692.0,
    }},
}};
// kg/m3
constexpr GlycolGrid kPropyleneGlycolDensity = {{
    {{ // 10 vol %
        0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 1013.85, 1012.61, 1011.24, 1009.75, 1008.13, 1006.40, 1004.54,
        1002.56, 1000.46, 998.23, 995.88, 993.41, 990.82, 988.11, 985.27, 982.31, 979.23, 976.03, 972.70, 969.25, 965.68,
    }},
    {{ // 20 vol %
        0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 1027.24, 1025.84, 1024.32, 1022.68, 1020.91, 1019.01, 1016.99, 1014.84,
        1012.56, 1010.16, 1007.64, 1004.99, 1002.21, 999.31, 996.28, 993.12, 989.85, 986.44, 982.91, 979.25, 975.47, 971.56,
    }},
    {{ // 30 vol %
        0.0, 0.0, 0.0, 0.0, 0.0, 1039.42, 1037.89, 1036.24, 1034.46, 1032.55, 1030.51, 1028.35, 1026.06, 1023.64,
        1021.09, 1018.42, 1015.62, 1012.69, 1009.63, 1006.44, 1003.13, 999.69, 996.12, 992.42, 988.60, 984.65, 980.57, 976.36,
    }},
    {{ // 40 vol %
        0.0, 0.0, 0.0, 0.0, 1050.43, 1048.79, 1047.02, 1045.12, 1043.09, 1040.94, 1038.65, 1036.24, 1033.70, 1031.03,
        1028.23, 1025.30, 1022.24, 1019.06, 1015.75, 1012.30, 1008.73, 1005.03, 1001.21, 997.25, 993.17, 988.95, 984.61, 980.14,
    }},
    {{ // 50 vol %
        0.0, 0.0, 1062.11, 1060.49, 1058.73, 1056.85, 1054.84, 1052.71, 1050.44, 1048.04, 1045.52, 1042.87, 1040.09, 1037.18,
        1034.15, 1030.98, 1027.69, 1024.27, 1020.72, 1017.04, 1013.23, 1009.30, 1005.24, 1001.05, 996.73, 992.28, 987.70, 983.00,
    }},
    {{ // 60 vol %
        1072.92, 1071.31, 1069.58, 1067.72, 1065.73, 1063.61, 1061.37, 1059.00, 1056.50, 1053.88, 1051.13, 1048.25, 1045.24, 1042.11,
        1038.85, 1035.47, 1031.95, 1028.32, 1024.55, 1020.66, 1016.63, 1012.49, 1008.21, 1003.81, 999.28, 994.63, 989.85, 984.94,
    }},
}};
// clang-format on

// Freezing point: Melinder, "Properties of Secondary Working Fluids for Indirect
// Systems", IIR 2010, polynomial t_F = sum a_ij (100 (x - x_m))^i (t - t_m)^j with
// x the mass fraction. Coefficients as published with the Modelica Buildings library
// (Buildings.Media.Antifreeze, 2018). The handbook's own freezing-point tables
// (ch. 31 Tables 4 and 5, by mass) could not be read; this correlation is fitted to
// Melinder's tables for pure glycol-water.
struct MelinderFit {
    double referenceMassFraction;
    double referenceCelsius;
    std::array<double, 18> coefficients; // i = 0..5 with j < {4, 4, 4, 3, 2, 1}
};

constexpr MelinderFit kEthyleneGlycolFreezing = {
    0.308462,
    31.728,
    {-1.525e1, -1.566e-6, -2.278e-7, 2.169e-9, -8.080e-1, -1.339e-6, 2.047e-08, -2.717e-11, -1.334e-2, 6.332e-8,
     2.373e-10, -2.183e-12, -7.293e-5, -1.764e-9, -2.442e-11, 1.006e-6, -7.662e-11, 1.140e-9},
};
constexpr MelinderFit kPropyleneGlycolFreezing = {
    0.307031,
    32.7083,
    {-1.325e1, -3.820e-5, 7.865e-7, -1.733e-9, -6.631e-1, 6.774e-6, -6.242e-8, -7.819e-10, -1.094e-2, 5.332e-8,
     -4.169e-9, 3.288e-11, -2.283e-4, -1.131e-8, 1.918e-10, -3.409e-6, 8.035e-11, 1.465e-8},
};

double melinder(const MelinderFit& fit, double massFraction, double celsius)
{
    constexpr std::array<int, 6> termsInT = {4, 4, 4, 3, 2, 1};
    const double dx = 100.0 * (massFraction - fit.referenceMassFraction);
    const double dy = celsius - fit.referenceCelsius;
    double sum = 0.0;
    std::size_t n = 0;
    double xPower = 1.0;
    for (int i = 0; i < 6; ++i) {
        double yPower = 1.0;
        for (int j = 0; j < termsInT[static_cast<std::size_t>(i)]; ++j) {
            sum += fit.coefficients[n++] * xPower * yPower;
            yPower *= dy;
        }
        xPower *= dx;
    }
    return sum;
}

// The fit carries tiny temperature terms; evaluated at its own result they move t_F
// by under 0.01 K, and the fixed point converges in a few steps.
double freezingCelsius(const MelinderFit& fit, double massFraction)
{
    double t = 0.0;
    for (int step = 0; step < 8; ++step)
        t = melinder(fit, massFraction, t);
    return t;
}

// Density of the pure glycols at 20 C, kg/m3 (ASHRAE Fundamentals ch. 31 Table 3 and
// CRC Handbook; from memory). They only convert mass to volume fraction: a 0.5 %
// error moves the volume fraction by under 0.2 percentage points.
constexpr double kEthyleneGlycolDensityAt20C = 1113.0;
constexpr double kPropyleneGlycolDensityAt20C = 1036.0;

struct GlycolData {
    const char* name;
    const GlycolGrid* specificHeat;
    const GlycolGrid* density;
    double pureDensityAt20C;
    const MelinderFit* freezing;
};

GlycolData glycolData(CoolantKind kind)
{
    switch (kind) {
    case CoolantKind::EthyleneGlycol:
        return {"ethylene glycol", &kEthyleneGlycolSpecificHeat, &kEthyleneGlycolDensity, kEthyleneGlycolDensityAt20C,
                &kEthyleneGlycolFreezing};
    case CoolantKind::PropyleneGlycol:
        return {"propylene glycol", &kPropyleneGlycolSpecificHeat, &kPropyleneGlycolDensity,
                kPropyleneGlycolDensityAt20C, &kPropyleneGlycolFreezing};
    case CoolantKind::Water:
        break;
    }
    throw InputError("coolant kind is not a glycol");
}

constexpr double kLowestGlycolMassFraction = 0.10;
constexpr double kHighestGlycolMassFraction = 0.60;
// Kept small on purpose: how far above freezing a loop should run is a design rule
// for the coil and its frost protection, not a limit of the property data.
constexpr double kFreezingMarginKelvin = 1.0;

double rowCelsius(std::size_t row)
{
    return kFirstRowCelsius + kRowStepKelvin * static_cast<double>(row);
}

std::size_t firstRow(const GlycolGrid& grid, std::size_t column)
{
    if (column == 0)
        return kWaterFirstRow;
    const auto& values = grid[column - 1];
    const auto found = std::find_if(values.begin(), values.end(), [](double v) { return v != 0.0; });
    return static_cast<std::size_t>(found - values.begin());
}

double tabulated(const GlycolGrid& grid, const WaterColumn& water, std::size_t column, std::size_t row)
{
    return column == 0 ? water[row - kWaterFirstRow] : grid[column - 1][row];
}

// Column 0 is pure water; columns 1..6 are 10..60 vol % glycol. Below a column's
// first row (the weaker solution would already be frozen there) the column is
// continued by its own quadratic: every handbook row is an exact quadratic in t
// (constant second differences), so v(r) = 3 v(r+1) - 3 v(r+2) + v(r+3). This only
// serves as the weaker anchor when a stronger mixture is interpolated below the
// weaker column's start; lowestTemperature() keeps it within three rows.
double cell(const GlycolGrid& grid, const WaterColumn& water, std::size_t column, std::size_t row)
{
    const std::size_t first = firstRow(grid, column);
    if (row >= first)
        return tabulated(grid, water, column, row);
    double v1 = tabulated(grid, water, column, first);
    double v2 = tabulated(grid, water, column, first + 1);
    double v3 = tabulated(grid, water, column, first + 2);
    for (std::size_t r = first; r > row; --r) {
        const double v0 = 3.0 * v1 - 3.0 * v2 + v3;
        v3 = v2;
        v2 = v1;
        v1 = v0;
    }
    return v1;
}

struct Bracket {
    std::size_t lower;
    double weight; // of lower + 1
};

// A position within 1e-9 of a grid line is put on it, so that round trips through
// kelvin or through the mass/volume conversion still hit the table value exactly.
Bracket bracket(double position, std::size_t lastLower)
{
    const double nearest = std::round(position);
    if (std::abs(position - nearest) < 1e-9)
        position = nearest;
    const auto lower = std::min(static_cast<std::size_t>(position), lastLower);
    return {lower, position - static_cast<double>(lower)};
}

Bracket columnBracket(double volumePercent)
{
    return bracket(std::clamp(volumePercent / kColumnStepPercent, 0.0, static_cast<double>(kGlycolColumnCount)),
                   kGlycolColumnCount - 1);
}

Bracket rowBracket(double celsius)
{
    return bracket(std::clamp((celsius - kFirstRowCelsius) / kRowStepKelvin, 0.0, static_cast<double>(kRowCount - 1)),
                   kRowCount - 2);
}

// Bilinear in (volume percent, temperature). At a grid point the weights are
// exactly 0 or 1, so the table value comes back unchanged.
double interpolate(const GlycolGrid& grid, const WaterColumn& water, double volumePercent, double celsius)
{
    const Bracket c = columnBracket(volumePercent);
    const Bracket r = rowBracket(celsius);
    const auto along = [&](std::size_t column) {
        return cell(grid, water, column, r.lower) * (1.0 - r.weight) +
               cell(grid, water, column, r.lower + 1) * r.weight;
    };
    const double low = along(c.lower);
    if (c.weight == 0.0)
        return low;
    return low * (1.0 - c.weight) + along(c.lower + 1) * c.weight;
}

double interpolateWater(const WaterColumn& water, double celsius)
{
    const Bracket r = rowBracket(celsius);
    const auto at = [&](std::size_t row) { return water[row - kWaterFirstRow]; };
    if (r.lower < kWaterFirstRow) // only reached at exactly 0 C after validation
        return at(kWaterFirstRow);
    return at(r.lower) * (1.0 - r.weight) + at(r.lower + 1) * r.weight;
}

// Rounds away the binary noise of a unit round trip (-19.999999999999977 C) so a
// message shows the value as it was given; NaN stays NaN.
double tidy(double value)
{
    return std::round(value * 1e6) / 1e6;
}

std::string percentText(double fractionValue)
{
    return formatNumber(std::round(fractionValue * 1000.0) / 10.0);
}

double volumeFractionOf(double massFraction, double pureDensity)
{
    const double glycolVolume = massFraction / pureDensity;
    const double waterVolume = (1.0 - massFraction) / kWaterDensityAt20C;
    return glycolVolume / (glycolVolume + waterVolume);
}

} // namespace

Coolant::Coolant(CoolantKind kind, Ratio massConcentration) : m_kind(kind), m_massConcentration(massConcentration)
{
    const double x = toFraction(massConcentration);
    if (kind == CoolantKind::Water) {
        if (!(x == 0.0))
            throw InputError("glycol concentration of water", tidy(toPercent(massConcentration)), "%",
                             "0 % (choose ethylene or propylene glycol for a mixture)");
        return;
    }
    const GlycolData data = glycolData(kind); // throws for an out-of-range enum value
    if (!(x >= kLowestGlycolMassFraction - 1e-12 && x <= kHighestGlycolMassFraction + 1e-12))
        throw InputError(std::string(data.name) + " concentration", tidy(toPercent(massConcentration)), "%",
                         "10 .. 60 % by mass");
}

Coolant Coolant::fromVolumeConcentration(CoolantKind kind, Ratio volumeConcentration)
{
    const double v = toFraction(volumeConcentration);
    if (kind == CoolantKind::Water)
        return Coolant(kind, volumeConcentration); // only 0 passes
    const GlycolData data = glycolData(kind);
    if (!(v >= 0.0 && v <= 1.0))
        throw InputError(std::string(data.name) + " volume concentration", tidy(toPercent(volumeConcentration)), "%",
                         "0 .. 100 %");
    const double glycolMass = v * data.pureDensityAt20C;
    const double waterMass = (1.0 - v) * kWaterDensityAt20C;
    return Coolant(kind, fraction(glycolMass / (glycolMass + waterMass)));
}

Ratio Coolant::volumeConcentration() const
{
    if (m_kind == CoolantKind::Water)
        return fraction(0.0);
    return fraction(volumeFractionOf(toFraction(m_massConcentration), glycolData(m_kind).pureDensityAt20C));
}

AbsoluteTemperature Coolant::freezingPoint() const
{
    if (m_kind == CoolantKind::Water)
        return celsius(0.0);
    return celsius(freezingCelsius(*glycolData(m_kind).freezing, toFraction(m_massConcentration)));
}

AbsoluteTemperature Coolant::lowestTemperature() const
{
    if (m_kind == CoolantKind::Water)
        return celsius(rowCelsius(kWaterFirstRow));
    const GlycolData data = glycolData(m_kind);
    const Bracket c = columnBracket(100.0 * toFraction(volumeConcentration()));
    // Down to the freezing point plus a margin, but not below the first tabulated
    // row of the stronger bracketing column (or of the column itself when the
    // concentration sits on one). The weaker column may be continued below its
    // first row (see cell()); by construction of the tables that is at most 15 K.
    const std::size_t strongerColumn = c.weight > 0.0 ? c.lower + 1 : c.lower;
    std::size_t row = 0;
    for (const GlycolGrid* grid : {data.specificHeat, data.density})
        row = std::max(row, firstRow(*grid, strongerColumn));
    return celsius(std::max(rowCelsius(row), toCelsius(freezingPoint()) + kFreezingMarginKelvin));
}

AbsoluteTemperature Coolant::highestTemperature() const
{
    return celsius(kHighestCelsius);
}

namespace {
void checkTemperature(const Coolant& coolant, AbsoluteTemperature t)
{
    const double tc = toCelsius(t);
    const double low = toCelsius(coolant.lowestTemperature());
    const double high = toCelsius(coolant.highestTemperature());
    if (!(tc >= low - 1e-9 && tc <= high + 1e-9))
        throw InputError("coolant temperature", tidy(tc), "C",
                         formatNumber(std::round(low * 100.0) / 100.0) + " .. " + formatNumber(high) + " C for " +
                             coolant.description());
}
} // namespace

SpecificHeatCapacity Coolant::specificHeat(AbsoluteTemperature t) const
{
    checkTemperature(*this, t);
    const double tc = toCelsius(t);
    if (m_kind == CoolantKind::Water)
        return joulesPerKilogramKelvin(interpolateWater(kWaterSpecificHeat, tc));
    return joulesPerKilogramKelvin(interpolate(*glycolData(m_kind).specificHeat, kWaterSpecificHeat,
                                               100.0 * toFraction(volumeConcentration()), tc));
}

Density Coolant::density(AbsoluteTemperature t) const
{
    checkTemperature(*this, t);
    const double tc = toCelsius(t);
    if (m_kind == CoolantKind::Water)
        return kilogramsPerCubicMetre(interpolateWater(kWaterDensity, tc));
    return kilogramsPerCubicMetre(
        interpolate(*glycolData(m_kind).density, kWaterDensity, 100.0 * toFraction(volumeConcentration()), tc));
}

std::string Coolant::description() const
{
    if (m_kind == CoolantKind::Water)
        return "water";
    return std::string(glycolData(m_kind).name) + " " + percentText(toFraction(m_massConcentration)) + " %";
}

const char* coolantKindKey(CoolantKind kind)
{
    switch (kind) {
    case CoolantKind::Water:
        return "water";
    case CoolantKind::EthyleneGlycol:
        return "ethylene_glycol";
    case CoolantKind::PropyleneGlycol:
        return "propylene_glycol";
    }
    return "water";
}

std::optional<CoolantKind> coolantKindFromKey(std::string_view key)
{
    for (const CoolantKind kind : {CoolantKind::Water, CoolantKind::EthyleneGlycol, CoolantKind::PropyleneGlycol})
        if (key == coolantKindKey(kind))
            return kind;
    return std::nullopt;
}

} // namespace Airwright::Core::Sections
