#include "airwright/core/checks/SfpCategory.h"
#include "airwright/core/InputError.h"

#include <gtest/gtest.h>

#include <limits>
#include <optional>

using namespace Airwright::Core;
using namespace Airwright::Core::Checks;

namespace {

constexpr double kNaN = std::numeric_limits<double>::quiet_NaN();
constexpr double kInf = std::numeric_limits<double>::infinity();

struct SfpRow {
    double sfp;                  // W/(m3/s)
    std::optional<int> category; // empty: the input is invalid
};

class SfpCategoryTable : public ::testing::TestWithParam<SfpRow> {};

} // namespace

// EN 16798-3:2017, table of SFP categories (limits 300, 500, 750, 1250, 2000,
// 3000, 4500 W/(m3/s)): from memory; the same limits are listed for DIN EN
// 16798-3 in a secondary source (cci-dialog.de lexicon, "Spezifische
// Ventilatorleistung"). That a value on a limit is in the lower category ("at
// most") is from memory.
TEST_P(SfpCategoryTable, Classifies)
{
    const SfpRow& row = GetParam();
    if (!row.category) {
        EXPECT_THROW(sfpCategory(wattsPerCubicMetrePerSecond(row.sfp)), InputError) << row.sfp;
        return;
    }
    EXPECT_EQ(sfpCategory(wattsPerCubicMetrePerSecond(row.sfp)), *row.category) << row.sfp;
}

INSTANTIATE_TEST_SUITE_P(En16798_3, SfpCategoryTable,
                         ::testing::Values(SfpRow{0.0, 0}, SfpRow{299.999, 0}, SfpRow{300.0, 0}, SfpRow{300.001, 1},
                                           SfpRow{500.0, 1}, SfpRow{500.001, 2}, SfpRow{749.999, 2}, SfpRow{750.0, 2},
                                           SfpRow{750.001, 3}, SfpRow{1250.0, 3}, SfpRow{1250.001, 4},
                                           SfpRow{2000.0, 4}, SfpRow{2000.001, 5}, SfpRow{3000.0, 5},
                                           SfpRow{3000.001, 6}, SfpRow{4500.0, 6}, SfpRow{4500.001, 7},
                                           SfpRow{50000.0, 7},
                                           // invalid
                                           SfpRow{-1e-9, std::nullopt}, SfpRow{-300.0, std::nullopt},
                                           SfpRow{kNaN, std::nullopt}, SfpRow{kInf, std::nullopt}));

TEST(SfpCategory, LabelsAndLimitsAgreeWithTheClassification)
{
    // Each category's upper limit classifies into that category and just above it
    // into the next one: the label, limit and classifier read one table.
    for (int c = kLowestSfpCategory; c <= kHighestSfpCategory; ++c) {
        EXPECT_EQ(sfpCategoryLabel(c), "SFP " + std::to_string(c));
        const auto limit = sfpCategoryUpperLimit(c);
        if (c == kHighestSfpCategory) {
            EXPECT_FALSE(limit.has_value());
            continue;
        }
        ASSERT_TRUE(limit.has_value());
        EXPECT_EQ(sfpCategory(*limit), c);
        EXPECT_EQ(sfpCategory(*limit + wattsPerCubicMetrePerSecond(1e-6)), c + 1);
    }
    // EN 16798-3:2017 (from memory): SFP 3 ends at 1250 W/(m3/s).
    EXPECT_NEAR(toWattsPerCubicMetrePerSecond(*sfpCategoryUpperLimit(3)), 1250.0, 1e-9);
}

class InvalidSfpCategory : public ::testing::TestWithParam<int> {};

TEST_P(InvalidSfpCategory, Throws)
{
    EXPECT_THROW(sfpCategoryLabel(GetParam()), InputError);
    EXPECT_THROW(sfpCategoryUpperLimit(GetParam()), InputError);
}

INSTANTIATE_TEST_SUITE_P(SfpCategory, InvalidSfpCategory, ::testing::Values(-1, 8, 100));
