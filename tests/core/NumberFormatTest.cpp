#include "airwright/core/NumberFormat.h"

#include <gtest/gtest.h>

#include <clocale>
#include <limits>

using Airwright::Core::formatFixed;
using Airwright::Core::formatNumber;

TEST(NumberFormat, ShortestRoundTrip)
{
    EXPECT_EQ(formatNumber(20.0), "20");
    EXPECT_EQ(formatNumber(0.5), "0.5");
    EXPECT_EQ(formatNumber(-1.25), "-1.25");
}

TEST(NumberFormat, NonFiniteSpelledOut)
{
    EXPECT_EQ(formatNumber(std::numeric_limits<double>::quiet_NaN()), "nan");
    EXPECT_EQ(formatNumber(-std::numeric_limits<double>::infinity()), "-inf");
}

TEST(NumberFormat, FixedDecimalsAndNoNegativeZero)
{
    EXPECT_EQ(formatFixed(12.345, 1), "12.3");
    EXPECT_EQ(formatFixed(-0.001, 2), "0.00");
    EXPECT_EQ(formatFixed(-0.5, 1), "-0.5");
}

TEST(NumberFormat, IgnoresCommaDecimalLocale)
{
    // A German desktop must not write "20,5" into a project file.
    if (std::setlocale(LC_ALL, "de_DE.UTF-8") == nullptr)
        GTEST_SKIP() << "de_DE.UTF-8 locale not installed";
    EXPECT_EQ(formatNumber(20.5), "20.5");
    EXPECT_EQ(formatFixed(20.5, 2), "20.50");
    std::setlocale(LC_ALL, "C");
}
