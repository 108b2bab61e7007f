list(APPEND AIRWRIGHT_CORE_TEST_SOURCES
    core/chain/ChainSolverTest.cpp
    core/chain/ChainBalanceTest.cpp
    core/chain/ChainExtremesTest.cpp
    core/chain/AshraeExamplesTest.cpp
)
