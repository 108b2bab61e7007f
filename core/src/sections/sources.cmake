list(APPEND AIRWRIGHT_CORE_SOURCES
    src/sections/SectionOutcome.cpp
    src/sections/Coolant.cpp
    src/sections/Damper.cpp
    src/sections/Filter.cpp
    src/sections/WaterHeatingCoil.cpp
    src/sections/ElectricHeater.cpp
    src/sections/CoolingCoil.cpp
    src/sections/Humidifier.cpp
    src/sections/Fan.cpp
    src/sections/PassiveSection.cpp
    src/sections/MixingBox.cpp
)
