set(AIRWRIGHT_BENCH_SOURCES
    PsychroBench.cpp
    RecoveryBench.cpp
    ChainBench.cpp
    AnnualBench.cpp
)
