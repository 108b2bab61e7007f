list(APPEND AIRWRIGHT_UI_TEST_SOURCES
    ui/views/DemoProject.h
    ui/views/DemoProject.cpp
    ui/views/UnitSystemTest.cpp
    ui/views/PsychroChartModelTest.cpp
    ui/views/PressureProfileModelTest.cpp
    ui/views/ScheduleModelTest.cpp
    ui/views/MeasuringPointsModelTest.cpp
    ui/views/FindingsModelTest.cpp
    ui/views/MessageUnitsTest.cpp
    ui/views/HeatRecoveryComparisonTest.cpp
    ui/views/HeatRecoveryInputsTest.cpp
    ui/views/ViewsTest.cpp
)
