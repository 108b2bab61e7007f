set(AIRWRIGHT_BENCH_SOURCES
    PsychroBench.cpp
    RecoveryBench.cpp
    ChainBench.cpp
    AnnualBench.cpp
)
# Benchmarks of the desktop program's views; only with the GUI library.
set(AIRWRIGHT_BENCH_UI_SOURCES
    UiBench.cpp
)
