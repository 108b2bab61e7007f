#include "airwright/core/PowerLaw.h"

#include <gtest/gtest.h>

#include <cmath>
#include <limits>
#include <string>

using Airwright::Core::powerLaw;

namespace {

struct PowerRow {
    std::string name;
    double ratio;
    double exponent;
};
void PrintTo(const PowerRow& row, std::ostream* os) { *os << row.name; }
class PowerLawRows : public ::testing::TestWithParam<PowerRow> {};

} // namespace

TEST_P(PowerLawRows, AgreesWithStdPow)
{
    // Reference: std::pow of the C++ standard library (glibc libm). The shortcuts
    // (exponents 1, 2, 0.5, 1.5, 1.75) may differ by rounding only: 2e-15 relative.
    const PowerRow& row = GetParam();
    const double expected = std::pow(row.ratio, row.exponent);
    const double got = powerLaw(row.ratio, row.exponent);
    if (std::isnan(expected))
        EXPECT_TRUE(std::isnan(got)) << got;
    else
        EXPECT_NEAR(got, expected, 2e-15 * std::abs(expected));
}

INSTANTIATE_TEST_SUITE_P(
    Rows, PowerLawRows,
    ::testing::Values(PowerRow{"PlateDropAtHalfFlow", 0.5, 1.5}, PowerRow{"PlateDropAtDoubleFlow", 2.0, 1.5},
                      PowerRow{"PlateDropAt0p9", 0.9, 1.5}, PowerRow{"CoilDropAt0p7", 0.7, 1.75},
                      PowerRow{"CoilDropAt3", 3.0, 1.75}, PowerRow{"CoilDropAtZeroFlow", 0.0, 1.75},
                      PowerRow{"FilterDropAt1p2", 1.2, 1.3}, PowerRow{"HeatTransferAt0p6", 0.6, 0.6},
                      PowerRow{"SquareRoot", 0.37, 0.5}, PowerRow{"Square", 1.7, 2.0},
                      PowerRow{"DesignFlow", 1.0, 1.5},
                      // Invalid: a negative flow ratio has no real power; both give NaN.
                      PowerRow{"NegativeRatioPlate", -1.0, 1.5}, PowerRow{"NegativeRatioCoil", -0.5, 1.75}),
    [](const ::testing::TestParamInfo<PowerRow>& rowInfo) { return rowInfo.param.name; });
