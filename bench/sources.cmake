set(AIRWRIGHT_BENCH_SOURCES
    PsychroBench.cpp
)
