set(AIRWRIGHT_UI_SOURCES
    include/airwright/ui/MainWindow.h
    src/MainWindow.cpp
    include/airwright/ui/GuiApplication.h
    src/GuiApplication.cpp
)
