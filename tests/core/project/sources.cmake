list(APPEND AIRWRIGHT_CORE_TEST_SOURCES
    core/project/ProjectFileTest.cpp
    core/project/ProjectFileValidationTest.cpp
    core/project/ProjectFileIoTest.cpp
    core/project/ProjectMigrationTest.cpp
    core/project/ProjectSchemaTest.cpp
)
