// UI tests run with a QApplication on the offscreen platform. CTest sets the
// platform for each test; test discovery at build time runs this program too,
// without that environment, so the offscreen default is set here as well.
#include <QApplication>

#include <gtest/gtest.h>

int main(int argc, char** argv)
{
    ::testing::InitGoogleTest(&argc, argv);
    if (qEnvironmentVariableIsEmpty("QT_QPA_PLATFORM"))
        qputenv("QT_QPA_PLATFORM", "offscreen");
    QApplication app(argc, argv);
    return RUN_ALL_TESTS();
}
