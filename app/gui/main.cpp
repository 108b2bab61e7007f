#include "airwright/ui/GuiApplication.h"

int main(int argc, char** argv)
{
    return Airwright::Ui::runGuiApplication(argc, argv);
}
