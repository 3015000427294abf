#include "widgets/runs/runs_ui.h"

#include <QDockWidget>
#include <QMainWindow>
#include <QMenu>
#include <QMenuBar>
#include <QMessageBox>

#include "core/library.h"
#include "core/run/demo.h"
#include "core/substance_io.h"
#include "widgets/fit/fit_dialog.h"
#include "widgets/runs/runs_panel.h"
#include "widgets/runs/time_chart.h"
#include "widgets/substance_chooser.h"

namespace pw::ui {

namespace {

QDockWidget *addDock(QMainWindow &window, const QString &title, const QString &name, QWidget *w,
                     Qt::DockWidgetArea area) {
    auto *d = new QDockWidget(title, &window);
    d->setObjectName(name);
    d->setWidget(w);
    d->setFeatures(QDockWidget::DockWidgetMovable | QDockWidget::DockWidgetFloatable |
                   QDockWidget::DockWidgetClosable);
    window.addDockWidget(area, d);
    return d;
}

void openFitDialog(QMainWindow &window, SubstanceLibrary &library) {
    FitDialog dialog(QString::fromStdString(SubstanceLibrary::defaultUserFolder()), &window);
    QObject::connect(&dialog, &FitDialog::substanceSaved, &window,
                     [&window, &library](const QString &path) {
                         const SubstanceReadResult r = readSubstanceFile(path.toStdString());
                         if (!r.substance || !library.add(*r.substance)) {
                             QMessageBox::information(
                                 &window, QObject::tr("Fit boundary"),
                                 QObject::tr("Saved %1; it will be in the substance list after "
                                             "a restart (an entry with this id is already "
                                             "loaded).")
                                     .arg(path));
                             return;
                         }
                         if (auto *chooser = window.findChild<SubstanceChooser *>())
                             chooser->refresh();
                     });
    dialog.exec();
}

}  // namespace

RunsPanel *addRunsDocks(QMainWindow &window, DiagramWidget &diagram, Document &doc,
                        Settings &settings, const SubstanceLibrary &library) {
    auto *panel = new RunsPanel(diagram, doc, settings, library, &window);
    addDock(window, QObject::tr("Runs"), QStringLiteral("runsDock"), panel,
            Qt::RightDockWidgetArea);
    QDockWidget *chart = addDock(window, QObject::tr("Time chart"), QStringLiteral("timeChartDock"),
                                 panel->chart(), Qt::BottomDockWidgetArea);
    // Full width under the diagram: shares the bottom area with the points table as a tab.
    if (auto *points = window.findChild<QDockWidget *>(QStringLiteral("pointsDock"))) {
        window.tabifyDockWidget(points, chart);
        points->raise();  // the chart comes to the front when a run is added
    }
    return panel;
}

void addRunsMenus(QMainWindow &window, RunsPanel &panel, SubstanceLibrary &library) {
    QMenu *runs = window.menuBar()->addMenu(QObject::tr("&Runs"));
    QAction *import = runs->addAction(QObject::tr("&Import Run Log…"));
    QObject::connect(import, &QAction::triggered, &panel, &RunsPanel::importRunLog);
    QAction *rules = runs->addAction(QObject::tr("Load &Rules…"));
    QObject::connect(rules, &QAction::triggered, &panel, &RunsPanel::loadRules);
    QAction *csv = runs->addAction(QObject::tr("&Export Events and Verdicts…"));
    QObject::connect(csv, &QAction::triggered, &panel, &RunsPanel::exportCsv);
    QMenu *demo = runs->addMenu(QObject::tr("&Demo"));
    for (const run::DemoScenario &s : run::demoScenarios()) {
        QAction *a = demo->addAction(QString::fromStdString(s.title));
        QObject::connect(a, &QAction::triggered, &panel, [&panel, &window, id = s.id] {
            try {
                panel.loadDemo(id);
            } catch (const std::exception &e) {
                QMessageBox::warning(&window, QObject::tr("Demo"), QString::fromUtf8(e.what()));
            }
        });
    }
    QMenu *tools = window.menuBar()->addMenu(QObject::tr("&Tools"));
    QAction *fit = tools->addAction(QObject::tr("&Fit Boundary…"));
    QObject::connect(fit, &QAction::triggered, &window,
                     [&window, &library] { openFitDialog(window, library); });
}

}  // namespace pw::ui
