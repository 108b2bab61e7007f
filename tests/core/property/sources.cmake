list(APPEND AIRWRIGHT_CORE_TEST_SOURCES
    core/property/RandomProjectGenerator.cpp
    core/property/ResultChecks.cpp
    core/property/ChainPropertyTest.cpp
    core/property/ExtremeInputsPropertyTest.cpp
)
