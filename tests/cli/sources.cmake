set(AIRWRIGHT_CLI_TEST_SOURCES
    cli/CliApplicationTest.cpp
    cli/ArgumentListTest.cpp
    cli/StateCommandTest.cpp
    cli/ValidateCommandTest.cpp
    cli/ComputeCommandTest.cpp
)
