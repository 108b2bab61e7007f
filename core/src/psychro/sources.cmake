list(APPEND AIRWRIGHT_CORE_SOURCES
    src/psychro/Psychrometrics.cpp
    src/psychro/MoistAirState.cpp
    src/psychro/AirProcesses.cpp
)
