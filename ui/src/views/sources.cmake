list(APPEND AIRWRIGHT_UI_SOURCES
    include/airwright/ui/UnitSystem.h
    src/views/UnitSystem.cpp
)
