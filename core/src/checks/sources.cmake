list(APPEND AIRWRIGHT_CORE_SOURCES
    src/checks/SfpCategory.cpp
    src/checks/VelocityClass.cpp
    src/checks/Regulation1253.cpp
    src/checks/Compliance.cpp
    src/checks/PathInternalSfp.cpp
    src/checks/InternalSfp.cpp
    src/checks/RecoveryReferenceDrop.cpp
    src/checks/UnitAssessment.cpp
    src/checks/MeasurementPoints.cpp
)
