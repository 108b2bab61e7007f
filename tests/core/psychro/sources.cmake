list(APPEND AIRWRIGHT_CORE_TEST_SOURCES
    core/psychro/PsychrometricsTest.cpp
    core/psychro/MoistAirStateTest.cpp
    core/psychro/AirProcessesTest.cpp
    core/psychro/ReferenceGridTest.cpp
)
