list(APPEND AIRWRIGHT_CORE_SOURCES
    src/recovery/EffectivenessNtu.cpp
    src/recovery/ExchangerKind.cpp
    src/recovery/FrostOnset.cpp
    src/recovery/AirToAirExchanger.cpp
    src/recovery/HeatRecovery.cpp
    src/recovery/HeatRecoveryEvaluator.cpp
)
