list(APPEND AIRWRIGHT_CORE_SOURCES
    src/annual/TextFields.cpp
    src/annual/WeatherFileError.cpp
    src/annual/WeatherHour.cpp
    src/annual/WeatherYear.cpp
    src/annual/BinTable.cpp
    src/annual/EpwReader.cpp
    src/annual/EpwWriter.cpp
    src/annual/BinTableReader.cpp
    src/annual/BinTableWriter.cpp
    src/annual/RandomStream.cpp
    src/annual/SyntheticClimate.cpp
    src/annual/DemoClimate.cpp
)
