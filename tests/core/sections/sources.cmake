list(APPEND AIRWRIGHT_CORE_TEST_SOURCES
    core/sections/CoolantTest.cpp
    core/sections/SectionsTest.cpp
)
