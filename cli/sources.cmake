set(AIRWRIGHT_CLI_SOURCES
    src/CliApplication.cpp
    src/ArgumentList.cpp
    src/StateCommand.cpp
)
