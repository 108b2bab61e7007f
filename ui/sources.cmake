# The window, document, editors, undo commands and file handling. The views
# (charts, tables) list their files in src/views/sources.cmake.
set(AIRWRIGHT_UI_SOURCES
    include/airwright/ui/MainWindow.h
    src/MainWindow.cpp
    include/airwright/ui/GuiApplication.h
    src/GuiApplication.cpp
    include/airwright/ui/ProjectDocument.h
    src/ProjectDocument.cpp
)
include("${CMAKE_CURRENT_LIST_DIR}/src/views/sources.cmake")
