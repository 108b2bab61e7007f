list(APPEND AIRWRIGHT_CORE_SOURCES
    src/project/ProjectIssue.cpp
    src/project/ProjectFileError.cpp
    src/project/ProjectMigration.cpp
    src/project/ProjectFile.cpp
    src/project/FileNumber.cpp
    src/project/JsonObjectReader.cpp
    src/project/JsonDocumentParser.cpp
    src/project/SectionReader.cpp
    src/project/ProjectReader.cpp
    src/project/ProjectWriter.cpp
    src/project/AtomicFileWriter.cpp
)
