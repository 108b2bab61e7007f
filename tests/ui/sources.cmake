set(AIRWRIGHT_UI_TEST_SOURCES
    ui/UiTestMain.cpp
)
include("${CMAKE_CURRENT_LIST_DIR}/views/sources.cmake")
