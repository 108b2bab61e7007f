list(APPEND AIRWRIGHT_CORE_TEST_SOURCES
    core/checks/SfpCategoryTest.cpp
    core/checks/VelocityClassTest.cpp
    core/checks/Regulation1253Test.cpp
    core/checks/InternalSfpTest.cpp
    core/checks/RecoveryReferenceDropTest.cpp
    core/checks/UnitAssessmentTest.cpp
    core/checks/MeasurementPointsTest.cpp
)
