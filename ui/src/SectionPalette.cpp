#include "airwright/ui/SectionPalette.h"

#include "airwright/ui/SectionSymbol.h"
#include "airwright/ui/UnitDrawing.h"

#include <QApplication>
#include <QDrag>
#include <QEvent>
#include <QHBoxLayout>
#include <QLabel>
#include <QListWidget>
#include <QMimeData>
#include <QMouseEvent>
#include <QPushButton>
#include <QStyle>
#include <QVBoxLayout>

#include <algorithm>

namespace Airwright::Ui {

using PathKind = Core::Chain::PathKind;

SectionPalette::SectionPalette(QWidget* parent) : QWidget(parent)
{
    auto* layout = new QVBoxLayout(this);
    layout->setContentsMargins(4, 4, 4, 4);
    layout->setSpacing(4);

    m_list = new QListWidget(this);
    m_list->setIconSize(QSize(32, 32));
    m_list->setSelectionMode(QAbstractItemView::SingleSelection);
    m_list->setUniformItemSizes(true);
    m_list->viewport()->installEventFilter(this);
    const auto& entries = SectionCatalog::entries();
    for (std::size_t i = 0; i < entries.size(); ++i) {
        auto* item = new QListWidgetItem(SectionCatalog::label(entries[i]), m_list);
        item->setToolTip(SectionCatalog::description(entries[i]));
        item->setData(Qt::UserRole, static_cast<int>(i));
    }
    m_list->setCurrentRow(0);
    // Wide enough for the longest name beside its symbol: a cut name ("Cooling
    // coil (chilled wa...") hides what the entry is.
    int widest = 0;
    for (int row = 0; row < m_list->count(); ++row)
        widest = std::max(widest, m_list->fontMetrics().horizontalAdvance(m_list->item(row)->text()));
    m_list->setMinimumWidth(widest + m_list->iconSize().width() + 3 * m_list->spacing() + 2 * m_list->frameWidth()
                            + m_list->style()->pixelMetric(QStyle::PM_ScrollBarExtent) + 24);
    layout->addWidget(m_list, 1);

    auto* hint = new QLabel(tr("Drag a type onto the drawing, or add it after the selected section:"), this);
    hint->setWordWrap(true);
    layout->addWidget(hint);

    auto* buttons = new QHBoxLayout;
    m_addSupply = new QPushButton(tr("Add to supply"), this);
    m_addSupply->setToolTip(tr("Add the chosen type to the supply path (outdoor air to rooms)."));
    m_addExtract = new QPushButton(tr("Add to extract"), this);
    m_addExtract->setToolTip(tr("Add the chosen type to the extract path (rooms to exhaust)."));
    buttons->addWidget(m_addSupply);
    buttons->addWidget(m_addExtract);
    layout->addLayout(buttons);

    connect(m_addSupply, &QPushButton::clicked, this, [this] {
        if (const auto entry = currentEntry())
            emit addRequested(*entry, PathKind::Supply);
    });
    connect(m_addExtract, &QPushButton::clicked, this, [this] {
        if (const auto entry = currentEntry())
            emit addRequested(*entry, PathKind::Extract);
    });
    updateIcons();
}

std::optional<SectionCatalog::Entry> SectionPalette::currentEntry() const
{
    const QListWidgetItem* item = m_list->currentItem();
    if (!item)
        return std::nullopt;
    return SectionCatalog::entries()[static_cast<std::size_t>(item->data(Qt::UserRole).toInt())];
}

void SectionPalette::setCurrentEntry(SectionCatalog::Entry entry)
{
    const auto& entries = SectionCatalog::entries();
    for (std::size_t i = 0; i < entries.size(); ++i)
        if (entries[i] == entry)
            m_list->setCurrentRow(static_cast<int>(i));
}

void SectionPalette::updateIcons()
{
    const QColor line = palette().color(QPalette::Text);
    const QColor background = palette().color(QPalette::Base);
    const auto& entries = SectionCatalog::entries();
    for (int row = 0; row < m_list->count(); ++row)
        m_list->item(row)->setIcon(
            SectionSymbol::icon(SectionCatalog::symbol(entries[static_cast<std::size_t>(row)]), line, background));
}

void SectionPalette::changeEvent(QEvent* event)
{
    if (event->type() == QEvent::PaletteChange)
        updateIcons();
    QWidget::changeEvent(event);
}

bool SectionPalette::eventFilter(QObject* watched, QEvent* event)
{
    if (watched != m_list->viewport())
        return QWidget::eventFilter(watched, event);
    if (event->type() == QEvent::MouseButtonPress) {
        auto* mouse = static_cast<QMouseEvent*>(event);
        m_pressPoint = mouse->position().toPoint();
        m_pressed = mouse->button() == Qt::LeftButton ? m_list->itemAt(m_pressPoint) : nullptr;
    } else if (event->type() == QEvent::MouseMove && m_pressed) {
        auto* mouse = static_cast<QMouseEvent*>(event);
        if ((mouse->position().toPoint() - m_pressPoint).manhattanLength() >= QApplication::startDragDistance()) {
            auto* mime = new QMimeData;
            mime->setData(QString::fromLatin1(UnitDrawing::sectionMimeType()),
                          QByteArray::number(m_pressed->data(Qt::UserRole).toInt()));
            auto* drag = new QDrag(this);
            drag->setMimeData(mime);
            drag->setPixmap(m_pressed->icon().pixmap(32, 32));
            m_pressed = nullptr;
            drag->exec(Qt::CopyAction);
            return true;
        }
    } else if (event->type() == QEvent::MouseButtonRelease) {
        m_pressed = nullptr;
    }
    return QWidget::eventFilter(watched, event);
}

} // namespace Airwright::Ui
