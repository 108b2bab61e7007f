list(APPEND AIRWRIGHT_CORE_TEST_SOURCES
    core/recovery/EffectivenessNtuTest.cpp
    core/recovery/AirToAirExchangerTest.cpp
    core/recovery/FrostOnsetTest.cpp
    core/recovery/BracketedRootTest.cpp
    core/recovery/HeatRecoveryEvaluatorTest.cpp
    core/recovery/AirToAirExchangerControlTest.cpp
    core/recovery/WheelLeakageBalanceTest.cpp
)
