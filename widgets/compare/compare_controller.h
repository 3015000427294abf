#pragma once
// The desktop's comparison mode, installed into the main window with a few calls: a "Compare"
// menu (single diagram / overlay / side by side / reduced coordinates, choose the second
// substance, stop comparing), a page beside the normal diagram holding the CompareView and the
// CompareTable, and the extra phase columns of the points table (ComparePointsProxy). The
// second substance is Document::substances()[1], set through the undoable SetSubstances step.
#include <QObject>

#include "core/library.h"
#include "widgets/compare/compare_view.h"
#include "widgets/document.h"
#include "widgets/settings.h"

class QAction;
class QMainWindow;
class QMenu;
class QStackedWidget;
class QTableView;

namespace pw::ui {

class CompareTable;
class ComparePointsProxy;

class CompareController : public QObject {
    Q_OBJECT
public:
    // Wraps the window's central widget in a stack with the comparison page and puts the
    // proxy between `pointsView` and its current model (column `phaseColumn` is the phase).
    CompareController(QMainWindow &window, Document &doc, Settings &settings,
                      SubstanceLibrary &library, QTableView *pointsView, int phaseColumn);

    QMenu *menu() const { return menu_; }
    CompareView *view() const { return view_; }
    CompareTable *table() const { return table_; }
    bool comparing() const;
    // nullopt: the single diagram.
    void showMode(std::optional<CompareMode> mode);
    void setSecondSubstance(const DiagramPtr &diagram);

private:
    void buildMenu(QMainWindow &window);
    void chooseSecond(QWidget *parent);
    void refresh();

    Document &doc_;
    Settings &settings_;
    SubstanceLibrary &library_;
    QStackedWidget *stack_;
    CompareView *view_;
    CompareTable *table_;
    ComparePointsProxy *proxy_ = nullptr;
    QMenu *menu_ = nullptr;
    QAction *single_ = nullptr;
    QAction *modes_[3] = {};
    QAction *stop_ = nullptr;
};

}  // namespace pw::ui
