list(APPEND AIRWRIGHT_CORE_TEST_SOURCES
    core/annual/EpwReaderTest.cpp
    core/annual/EpwWriterTest.cpp
    core/annual/BinTableReaderTest.cpp
    core/annual/WeatherYearTest.cpp
    core/annual/RandomStreamTest.cpp
    core/annual/SyntheticClimateTest.cpp
    core/annual/DemoClimateTest.cpp
    core/annual/OperatingScheduleTest.cpp
    core/annual/SeasonalConditionsTest.cpp
    core/annual/UnitHourModelTest.cpp
    core/annual/UnitHourModelMixingTest.cpp
    core/annual/AnnualSimulationTest.cpp
    core/annual/OptionRankingTest.cpp
    core/annual/HeatRecoveryComparisonTest.cpp
)
