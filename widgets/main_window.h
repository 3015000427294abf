#pragma once
// The main window only composes: the diagram in the centre, docks for the substance chooser,
// the cursor readout and the points table, the actions, and the session controller. State
// lives in the Document (content), the Settings (preferences) and the SessionController
// (files); the window wires them together and asks the user questions.
#include <QLabel>
#include <QMainWindow>

#include "core/library.h"
#include "widgets/actions.h"
#include "widgets/document.h"
#include "widgets/settings.h"

class QComboBox;

namespace pw::ui {

class CompareController;
class DiagramWidget;
class RunsPanel;
class PointsTable;
class ReadoutPanel;
class SessionController;
class SubstanceChooser;

class MainWindow : public QMainWindow {
    Q_OBJECT
public:
    MainWindow(Settings &settings, SubstanceLibrary &library, const QString &recoveryPath,
               QWidget *parent = nullptr);
    ~MainWindow() override;

    Document &document() { return doc_; }
    DiagramWidget *diagram() const { return diagram_; }
    PointsTable *pointsTable() const { return points_; }
    ReadoutPanel *readout() const { return readout_; }
    SubstanceChooser *chooser() const { return chooser_; }
    SessionController &session() const { return *session_; }
    const Actions &actions() const { return actions_; }
    // Logged runs, planned paths and rules (Runs dock, time chart dock, Runs menu).
    RunsPanel *runsPanel() const { return runs_; }
    // The comparison mode (View > Compare): second substance, overlay/panels/reduced views.
    CompareController *comparison() const { return compare_; }

    // Put a substance on the diagram (one undoable step).
    void chooseSubstance(const DiagramPtr &diagram);
    // Open any supported file by its extension: .pwsession, .csv (points), .json (substance).
    bool openPath(const QString &path, QString *error);
    // Ask whether to restore a leftover recovery file; returns true when one was restored.
    bool offerRecovery();
    void showCautionIfFirstRun();
    // Water with a few freeze-drying points (the demo scenario helper builds on this).
    void loadDemo();
    // Show the readout (and the status bar) for a state, as when the cursor is there.
    void showCursorState(double T_K, double P_Pa);

protected:
    void closeEvent(QCloseEvent *event) override;
    void dragEnterEvent(QDragEnterEvent *event) override;
    void dropEvent(QDropEvent *event) override;

private:
    void buildDocks();
    void buildMenus();
    void buildToolBar();
    void connectActions();
    void connectModel();
    void updateTitle();
    void updateRecentMenu();
    void syncUnitCombos();
    bool saveSession(bool askName);
    bool maybeSave();
    void importPoints();
    void exportPoints();
    void openSubstanceDialog();
    DiagramPtr loadSubstanceFile(const QString &path, QString *error);
    void reportError(const QString &title, const QString &text);
    QString askOpenPath(const QString &title, const QString &filter);

    Settings &settings_;
    SubstanceLibrary &library_;
    Document doc_;
    DiagramWidget *diagram_;
    PointsTable *points_;
    ReadoutPanel *readout_;
    SubstanceChooser *chooser_;
    SessionController *session_;
    Actions actions_;
    QComboBox *tUnit_ = nullptr;
    QComboBox *pUnit_ = nullptr;
    QLabel *cursorStatus_ = nullptr;
    RunsPanel *runs_ = nullptr;
    void buildRunsUi();
    CompareController *compare_ = nullptr;
};

}  // namespace pw::ui
