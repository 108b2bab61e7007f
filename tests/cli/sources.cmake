set(AIRWRIGHT_CLI_TEST_SOURCES
    cli/CliApplicationTest.cpp
)
