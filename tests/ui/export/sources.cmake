# Tests of the printed schedule and the schedule command. Included from
# tests/ui/sources.cmake; paths relative to tests/.
list(APPEND AIRWRIGHT_UI_TEST_SOURCES
    ui/export/PdfText.h
    ui/export/PdfText.cpp
    ui/export/SchedulePdfTest.cpp
    ui/export/ScheduleCommandTest.cpp
    ui/export/ScheduleExportTest.cpp
)
