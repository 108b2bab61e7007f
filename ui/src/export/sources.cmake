# The printed section schedule (PDF) and the schedule command of airwright-cli.
# Included from ui/sources.cmake; paths relative to ui/.
list(APPEND AIRWRIGHT_UI_SOURCES
    include/airwright/ui/export/SchedulePdf.h
    src/export/SchedulePdf.cpp
    src/export/ScheduleComposer.h
    src/export/ScheduleComposer.cpp
    include/airwright/ui/export/ScheduleUnits.h
    src/export/ScheduleUnits.cpp
    include/airwright/ui/export/PdfStyle.h
    src/export/PdfStyle.cpp
    include/airwright/ui/export/PdfPager.h
    src/export/PdfPager.cpp
    include/airwright/ui/export/PdfTable.h
    src/export/PdfTable.cpp
    include/airwright/ui/export/PdfAxes.h
    src/export/PdfAxes.cpp
    include/airwright/ui/export/PsychroChartPainter.h
    src/export/PsychroChartPainter.cpp
    include/airwright/ui/export/PressureProfilePainter.h
    src/export/PressureProfilePainter.cpp
    include/airwright/ui/export/ScheduleExport.h
    src/export/ScheduleExport.cpp
    include/airwright/ui/export/ScheduleCommand.h
    src/export/ScheduleCommand.cpp
)
# ScheduleCommand implements a command of the command-line library.
target_link_libraries(airwright_ui PUBLIC Airwright::Cli)
