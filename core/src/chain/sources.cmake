list(APPEND AIRWRIGHT_CORE_SOURCES
    src/chain/Section.cpp
    src/chain/DesignCase.cpp
    src/chain/AirHandlingUnit.cpp
    src/chain/CaseResult.cpp
    src/chain/ChainSolver.cpp
    src/chain/CaseSolver.cpp
    src/chain/SectionFigures.cpp
)
