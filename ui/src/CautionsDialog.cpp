#include "airwright/ui/CautionsDialog.h"

#include <QDialogButtonBox>
#include <QTextBrowser>
#include <QVBoxLayout>

namespace Airwright::Ui {

CautionsDialog::CautionsDialog(QWidget* parent) : QDialog(parent)
{
    setWindowTitle(tr("Cautions"));
    auto* layout = new QVBoxLayout(this);
    auto* browser = new QTextBrowser(this);
    browser->setHtml(text());
    browser->setOpenExternalLinks(false);
    layout->addWidget(browser);
    auto* buttons = new QDialogButtonBox(QDialogButtonBox::Close, this);
    connect(buttons, &QDialogButtonBox::rejected, this, &QDialog::accept);
    connect(buttons, &QDialogButtonBox::accepted, this, &QDialog::accept);
    layout->addWidget(buttons);
    resize(620, 520);
}

QString CautionsDialog::text()
{
    return tr(
        "<h3>Before you rely on these results</h3>"
        "<p><b>A design aid.</b> Airwright computes states, duties, pressure drops and checks from the inputs you "
        "give and from the published methods named in its documentation. The results help you lay out and compare "
        "units; they do not replace the data of the equipment you buy. Confirm every selection with certified "
        "manufacturer data. Local codes, standards and licensed professional practice govern the design.</p>"
        "<p><b>Electric heaters.</b> An electric air heater must be interlocked with the airflow (it may run only "
        "while the fan proves flow) and needs an overheat cut-out with manual reset, independent of the "
        "controller. Let the fan run on after the heater switches off to carry away the stored heat.</p>"
        "<p><b>Frost and freezing.</b> Water coils can freeze and burst when outdoor air below 0 °C reaches them: "
        "provide frost protection (a frost thermostat after the coil, pump and valve strategy, glycol or preheat) "
        "as the climate asks. Heat recovery exchangers can ice up on the exhaust side in cold weather; the frost "
        "figures shown are estimates for the design cases and need a protection strategy that works at every "
        "outdoor temperature, not only the ones computed.</p>"
        "<p><b>Humidifier hygiene.</b> Humidifiers and anything wet downstream of them can breed micro-organisms. "
        "Design for full evaporation before filters and fans, drain and drying, water treatment and regular "
        "inspection and cleaning as the applicable hygiene rules require.</p>"
        "<p><b>Inputs.</b> A result is only as good as its inputs: check the units shown beside every field "
        "(SI or IP), the flow basis (standard air or actual) and the site pressure.</p>");
}

} // namespace Airwright::Ui
