#pragma once
// The list of section types to add: pick one and press "Add to supply" or "Add to
// extract" (it goes after the selected section of that path, or at its end), or
// drag it onto the unit drawing where it should go.

#include "airwright/core/chain/SectionResult.h"
#include "airwright/ui/SectionCatalog.h"

#include <QPoint>
#include <QWidget>

#include <optional>

class QListWidget;
class QListWidgetItem;
class QPushButton;

namespace Airwright::Ui {

class SectionPalette : public QWidget {
    Q_OBJECT
public:
    explicit SectionPalette(QWidget* parent = nullptr);

    std::optional<SectionCatalog::Entry> currentEntry() const;
    void setCurrentEntry(SectionCatalog::Entry entry);
    QListWidget* list() const { return m_list; }

signals:
    void addRequested(Airwright::Ui::SectionCatalog::Entry entry, Airwright::Core::Chain::PathKind path);

protected:
    bool eventFilter(QObject* watched, QEvent* event) override;
    void changeEvent(QEvent* event) override;

private:
    void updateIcons();

    QListWidget* m_list;
    QPushButton* m_addSupply;
    QPushButton* m_addExtract;
    QPoint m_pressPoint;
    QListWidgetItem* m_pressed = nullptr;
};

} // namespace Airwright::Ui
