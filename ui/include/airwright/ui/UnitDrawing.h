#pragma once
// The unit as a two-deck drawing: the supply deck (outdoor air to the rooms) above
// the extract deck (rooms to exhaust), each section a block with its symbol, its
// id and one key figure of the chosen design case. Coupled sections (heat
// recovery, mixing) span both decks when the two paths meet them in matching
// order. Click selects, dragging a block moves it within its path, and section
// types dragged from the section list are inserted where they are dropped.

#include "airwright/core/chain/SectionResult.h"

#include <QWidget>

#include <optional>
#include <string>
#include <vector>

namespace Airwright::Ui {

class ProjectDocument;
class UnitSystem;

class UnitDrawing : public QWidget {
    Q_OBJECT
public:
    // Mime type of a section type dragged from the section list: the catalogue
    // entry as a decimal number.
    static const char* sectionMimeType() { return "application/x-airwright-section-type"; }

    struct Place {
        Core::Chain::PathKind path = Core::Chain::PathKind::Supply;
        int index = 0;
    };

    UnitDrawing(ProjectDocument* document, UnitSystem* units, QWidget* parent = nullptr);

    void setCaseIndex(int index);
    int caseIndex() const { return m_caseIndex; }

    // The selected section's entry; for a coupled section, the entry in the deck
    // it was last picked in.
    std::optional<Place> selectedPlace() const;
    void selectPlace(const Place& place);

    // Where a block is drawn (empty when the entry does not exist); for tests and
    // the screenshots.
    QRectF blockRect(Core::Chain::PathKind path, int index) const;
    // The insertion index in `path` for a drop at x.
    int insertionIndexAt(Core::Chain::PathKind path, double x) const;
    std::optional<Place> placeAt(const QPointF& point) const;
    // What a drop of a catalogue entry at `point` does: adds it to the deck under
    // the point, where it lands. False when the point is on neither deck.
    bool dropSection(int catalogueEntry, const QPointF& point);

    QSize sizeHint() const override;
    QSize minimumSizeHint() const override;

signals:
    void sectionActivated(const QString& id); // double-click: edit it

protected:
    bool event(QEvent* event) override; // tooltips
    void paintEvent(QPaintEvent* event) override;
    void resizeEvent(QResizeEvent* event) override;
    void mousePressEvent(QMouseEvent* event) override;
    void mouseMoveEvent(QMouseEvent* event) override;
    void mouseReleaseEvent(QMouseEvent* event) override;
    void mouseDoubleClickEvent(QMouseEvent* event) override;
    void keyPressEvent(QKeyEvent* event) override;
    void dragEnterEvent(QDragEnterEvent* event) override;
    void dragMoveEvent(QDragMoveEvent* event) override;
    void dragLeaveEvent(QDragLeaveEvent* event) override;
    void dropEvent(QDropEvent* event) override;

private:
    struct Block {
        std::string id;
        bool spansBoth = false;        // a coupled section drawn across both decks
        std::optional<int> supplyIndex;
        std::optional<int> extractIndex;
        QRectF rect;                   // whole block
        QRectF supplyPart;             // parts inside each deck (spansBoth)
        QRectF extractPart;
    };
    struct Layout {
        QRectF supplyDeck;
        QRectF extractDeck;
        QRectF footer;
        double labelWidth = 0.0;
        bool aligned = true;
        std::vector<Block> blocks;
        std::vector<int> supplyBlock;  // block of each supply entry
        std::vector<int> extractBlock; // block of each extract entry
    };
    struct DropMarker {
        Core::Chain::PathKind path;
        int gap;
    };

    const Layout& layout() const;
    void invalidateLayout();
    Layout computeLayout() const;
    QRectF entryRect(const Layout& l, Core::Chain::PathKind path, int index) const;
    double markerX(Core::Chain::PathKind path, int gap) const;
    std::optional<Core::Chain::PathKind> deckAt(double y) const;

    void paintDeckEnds(QPainter& p, const Layout& l) const;
    void paintBlock(QPainter& p, const Block& b) const;
    QString keyFigure(Core::Chain::PathKind path, const std::string& id) const;

    ProjectDocument* m_document;
    UnitSystem* m_units;
    int m_caseIndex = 0;
    Core::Chain::PathKind m_selectedPath = Core::Chain::PathKind::Supply;

    mutable std::optional<Layout> m_layout;

    std::optional<Place> m_pressed;
    QPointF m_pressPoint;
    bool m_dragging = false;
    std::optional<DropMarker> m_marker;
};

} // namespace Airwright::Ui
