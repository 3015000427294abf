#pragma once
// The runs panel: a list of runs (imported logs, planned paths, the demo), the crossing
// events of the selected run, its rule verdicts (load a rule file, export the events and
// verdicts CSV) and a plan editor (type steps or pick a bundled plan). It owns the overlay on
// the diagram and the time chart (placed by the main window) and links their cursors.
#include <QPointer>
#include <QWidget>
#include <functional>

#include "core/library.h"
#include "core/run/demo.h"
#include "widgets/document.h"
#include "widgets/runs/run_data.h"
#include "widgets/settings.h"

class QComboBox;
class QLabel;
class QPlainTextEdit;
class QTableWidget;
class QTabWidget;

namespace pw::ui {

class DiagramWidget;
class RunOverlay;
class TimeChart;

class RunsPanel : public QWidget {
    Q_OBJECT
public:
    RunsPanel(DiagramWidget &diagram, Document &doc, Settings &settings,
              const SubstanceLibrary &library, QWidget *parent = nullptr);
    ~RunsPanel() override;  // deletes the chart when no dock took it

    // How the panel puts a substance on the diagram (the main window's undoable command);
    // default: Document::setSubstances.
    void setSubstanceChooser(std::function<void(const DiagramPtr &)> choose);

    TimeChart *chart() const;
    RunOverlay *overlay() const { return overlay_; }
    QTableWidget *eventsTable() const { return events_; }
    QTableWidget *verdictsTable() const { return verdicts_; }
    QComboBox *runList() const { return runs_; }
    RunPtr currentRun() const;

    // Adds a run and shows it.
    void addRun(RunPtr run);
    // Loads a bundled demo scenario (substance, run, rules; its plan goes into the editor).
    void loadDemo(const std::string &scenarioId);
    // Plan text -> a planned run on the current substance; false with `error` set on bad text.
    bool showPlan(const QString &text, QString *error);

public slots:
    void importRunLog();  // the import dialog
    void loadRules();     // a rule file for the current run
    void exportCsv();     // events + verdicts

private:
    QWidget *buildEventsTab();
    QWidget *buildRulesTab();
    QWidget *buildPlanTab();
    void selectRun(int index);
    void fillEvents();
    void fillVerdicts();
    DiagramPtr diagramFor(const std::string &substance);
    void applyRules(const run::RuleSet &rules);

    DiagramWidget &diagram_;
    Document &doc_;
    Settings &settings_;
    const SubstanceLibrary &library_;
    std::function<void(const DiagramPtr &)> choose_;
    RunOverlay *overlay_;
    QPointer<TimeChart> chart_;
    QComboBox *runs_;
    QTabWidget *tabs_;
    QTableWidget *events_;
    QTableWidget *verdicts_;
    QLabel *summary_;
    QComboBox *plans_;
    QPlainTextEdit *planText_;
    QLabel *planError_;
    std::vector<RunPtr> list_;
};

}  // namespace pw::ui
