set(AIRWRIGHT_CLI_SOURCES
    src/CliApplication.cpp
    src/ArgumentList.cpp
    src/StateCommand.cpp
    src/ValidateCommand.cpp
    src/ComputeCommand.cpp
    src/ComputeReport.cpp
)
