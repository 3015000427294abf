#include "widgets/main_window.h"

#include <qcustomplot.h>

#include <QApplication>
#include <QClipboard>
#include <QCloseEvent>
#include <QComboBox>
#include <QDockWidget>
#include <QFileDialog>
#include <QFileInfo>
#include <QMenuBar>
#include <QMessageBox>
#include <QMimeData>
#include <QStatusBar>
#include <QTableView>
#include <QToolBar>

#include "core/errors.h"
#include "core/substance_io.h"
#include "widgets/caution.h"
#include "widgets/commands.h"
#include "widgets/compare/compare_controller.h"
#include "widgets/diagram_widget.h"
#include "widgets/figure/figure_actions.h"
#include "widgets/format.h"
#include "widgets/points_csv.h"
#include "widgets/points_table.h"
#include "widgets/readout_panel.h"
#include "widgets/runs/runs_panel.h"
#include "widgets/runs/runs_ui.h"
#include "widgets/session_controller.h"
#include "widgets/substance_chooser.h"

namespace pw::ui {
namespace {

const TemperatureUnit kTUnits[] = {TemperatureUnit::Kelvin, TemperatureUnit::Celsius,
                                   TemperatureUnit::Fahrenheit, TemperatureUnit::Rankine};
const PressureUnit kPUnits[] = {PressureUnit::Pa,    PressureUnit::kPa,  PressureUnit::MPa,
                                PressureUnit::GPa,   PressureUnit::bar,  PressureUnit::mbar,
                                PressureUnit::ubar,  PressureUnit::atm,  PressureUnit::Torr,
                                PressureUnit::mTorr, PressureUnit::mmHg, PressureUnit::psi};

QString sessionFilter() {
    return QObject::tr("Phasewright sessions (*.%1)").arg(QLatin1String(kSessionSuffix));
}

}  // namespace

MainWindow::MainWindow(Settings &settings, SubstanceLibrary &library, const QString &recoveryPath,
                       QWidget *parent)
    : QMainWindow(parent),
      settings_(settings),
      library_(library),
      diagram_(new DiagramWidget(doc_, settings_, this)),
      points_(new PointsTable(doc_, settings_, this)),
      readout_(new ReadoutPanel(this)),
      chooser_(new SubstanceChooser(library_, this)),
      session_(new SessionController(doc_, settings_, library_, recoveryPath, this)),
      actions_(createActions(this, doc_.undoStack())) {
    setObjectName(QStringLiteral("MainWindow"));
    setCentralWidget(diagram_);
    setAcceptDrops(true);
    buildDocks();
    buildRunsUi();
    compare_ = new CompareController(*this, doc_, settings_, library_, points_->view(),
                                     PointsModel::PhaseCol);
    buildMenus();
    buildToolBar();
    connectActions();
    connectModel();
    cursorStatus_ = new QLabel(this);
    statusBar()->addPermanentWidget(cursorStatus_);
    resize(1280, 820);
    resizeDocks({findChild<QDockWidget *>(QStringLiteral("substanceDock")),
                 findChild<QDockWidget *>(QStringLiteral("readoutDock"))},
                {210, 330}, Qt::Horizontal);
    resizeDocks({findChild<QDockWidget *>(QStringLiteral("pointsDock"))}, {230}, Qt::Vertical);
    restoreGeometry(settings_.windowGeometry());
    restoreState(settings_.windowState());
    DiagramPtr initial;
    try {
        initial = library_.find("water");
    } catch (const pw::Error &) {
        if (!library_.all().empty()) initial = library_.all().front();
    }
    if (initial) doc_.setSubstances({initial});  // not an edit: the session stays clean
    updateTitle();
    statusBar()->showMessage(tr("Ctrl+click on the diagram to add a point; drop CSV, substance "
                                "or session files on the window"),
                             8000);
}

MainWindow::~MainWindow() {
    // Members (doc_) die before QWidget deletes the children, so the children that refer to
    // the document go first.
    delete session_;
    qDeleteAll(findChildren<QDockWidget *>(Qt::FindDirectChildrenOnly));
    delete diagram_;
}

void MainWindow::buildDocks() {
    auto dock = [this](const QString &title, const QString &name, QWidget *w,
                       Qt::DockWidgetArea area) {
        auto *d = new QDockWidget(title, this);
        d->setObjectName(name);
        d->setWidget(w);
        d->setFeatures(QDockWidget::DockWidgetMovable | QDockWidget::DockWidgetFloatable |
                       QDockWidget::DockWidgetClosable);
        addDockWidget(area, d);
        return d;
    };
    dock(tr("Substance"), QStringLiteral("substanceDock"), chooser_, Qt::LeftDockWidgetArea);
    dock(tr("Under the cursor"), QStringLiteral("readoutDock"), readout_, Qt::RightDockWidgetArea);
    dock(tr("Points"), QStringLiteral("pointsDock"), points_, Qt::BottomDockWidgetArea);
    setCorner(Qt::BottomLeftCorner, Qt::LeftDockWidgetArea);
    setCorner(Qt::BottomRightCorner, Qt::RightDockWidgetArea);
}

void MainWindow::buildMenus() {
    QMenu *file = menuBar()->addMenu(tr("&File"));
    file->addActions({actions_.newSession, actions_.open});
    actions_.recentMenu = file->addMenu(tr("Open &Recent"));
    file->addActions({actions_.save, actions_.saveAs});
    file->addSeparator();
    file->addActions({actions_.importPoints, actions_.exportPoints, actions_.openSubstance});
    file->addAction(actions_.exportFigure);
    file->addSeparator();
    file->addAction(actions_.quit);
    QMenu *edit = menuBar()->addMenu(tr("&Edit"));
    edit->addActions({actions_.undo, actions_.redo});
    edit->addSeparator();
    edit->addActions({actions_.deletePoints, actions_.moveUp, actions_.moveDown});
    edit->addSeparator();
    edit->addActions({actions_.copyDiagram, actions_.copyFigure, actions_.findSubstance});
    QMenu *view = menuBar()->addMenu(tr("&View"));
    view->addActions({actions_.resetView, actions_.logPressure, actions_.showAtmosphere});
    view->addMenu(compare_->menu());
    view->addSeparator();
    for (QDockWidget *d : findChildren<QDockWidget *>()) view->addAction(d->toggleViewAction());
    addRunsMenus(*this, *runs_, library_);
    QMenu *help = menuBar()->addMenu(tr("&Help"));
    help->addActions({actions_.caution, actions_.about});
    updateRecentMenu();
}

void MainWindow::buildToolBar() {
    QToolBar *bar = addToolBar(tr("Main"));
    bar->setObjectName(QStringLiteral("mainToolBar"));
    bar->setToolButtonStyle(Qt::ToolButtonTextBesideIcon);
    bar->addActions({actions_.open, actions_.save});
    bar->addSeparator();
    bar->addActions({actions_.undo, actions_.redo});
    bar->addSeparator();
    bar->addActions({actions_.resetView, actions_.logPressure, actions_.showAtmosphere});
    bar->addSeparator();
    tUnit_ = new QComboBox(bar);
    pUnit_ = new QComboBox(bar);
    for (TemperatureUnit u : kTUnits) tUnit_->addItem(unitLabel(u));
    for (PressureUnit u : kPUnits) pUnit_->addItem(unitLabel(u));
    tUnit_->setToolTip(tr("Temperature unit"));
    pUnit_->setToolTip(tr("Pressure unit (absolute)"));
    bar->addWidget(new QLabel(tr(" T ")));
    bar->addWidget(tUnit_);
    bar->addWidget(new QLabel(tr("  P ")));
    bar->addWidget(pUnit_);
    syncUnitCombos();
    auto unitsFromCombos = [this] {
        settings_.setUnits({kTUnits[std::max(0, tUnit_->currentIndex())],
                            kPUnits[std::max(0, pUnit_->currentIndex())]});
    };
    connect(tUnit_, &QComboBox::activated, this, unitsFromCombos);
    connect(pUnit_, &QComboBox::activated, this, unitsFromCombos);
}

void MainWindow::syncUnitCombos() {
    const DisplayUnits u = settings_.units();
    for (int i = 0; i < static_cast<int>(std::size(kTUnits)); ++i)
        if (kTUnits[i] == u.temperature) tUnit_->setCurrentIndex(i);
    for (int i = 0; i < static_cast<int>(std::size(kPUnits)); ++i)
        if (kPUnits[i] == u.pressure) pUnit_->setCurrentIndex(i);
}

void MainWindow::connectActions() {
    connect(actions_.newSession, &QAction::triggered, this, [this] {
        if (maybeSave()) session_->newSession(doc_.primary());
    });
    connect(actions_.open, &QAction::triggered, this, [this] {
        if (!maybeSave()) return;
        const QString path = askOpenPath(tr("Open session"), sessionFilter());
        QString error;
        if (!path.isEmpty() && !session_->open(path, &error))
            reportError(tr("Open session"), error);
    });
    connect(actions_.save, &QAction::triggered, this, [this] { saveSession(false); });
    connect(actions_.saveAs, &QAction::triggered, this, [this] { saveSession(true); });
    connect(actions_.importPoints, &QAction::triggered, this, &MainWindow::importPoints);
    connect(actions_.exportPoints, &QAction::triggered, this, &MainWindow::exportPoints);
    connect(actions_.openSubstance, &QAction::triggered, this, &MainWindow::openSubstanceDialog);
    connect(actions_.quit, &QAction::triggered, this, &QWidget::close);
    connect(actions_.deletePoints, &QAction::triggered, points_, &PointsTable::deleteSelected);
    connect(actions_.moveUp, &QAction::triggered, this, [this] { points_->moveSelected(-1); });
    connect(actions_.moveDown, &QAction::triggered, this, [this] { points_->moveSelected(+1); });
    connectFigureActions(
        *this, actions_, [this] { return diagram_->scene(); }, settings_);
    connect(actions_.copyDiagram, &QAction::triggered, this, [this] {
        QGuiApplication::clipboard()->setImage(diagram_->toImage());
        statusBar()->showMessage(tr("Diagram copied to the clipboard"), 4000);
    });
    connect(actions_.findSubstance, &QAction::triggered, this, [this] {
        chooser_->parentWidget()->show();
        chooser_->setFocus();
        chooser_->findChild<QLineEdit *>()->setFocus();
    });
    connect(actions_.resetView, &QAction::triggered, diagram_, &DiagramWidget::resetView);
    actions_.logPressure->setChecked(settings_.logPressure());
    actions_.showAtmosphere->setChecked(settings_.showAtmosphere());
    connect(actions_.logPressure, &QAction::toggled, &settings_, &Settings::setLogPressure);
    connect(actions_.showAtmosphere, &QAction::toggled, &settings_, &Settings::setShowAtmosphere);
    connect(actions_.caution, &QAction::triggered, this, [this] { showCaution(this); });
    connect(actions_.about, &QAction::triggered, this, [this] { showAbout(this); });
    // The table's Delete key acts on the table only while it has focus.
    actions_.deletePoints->setShortcutContext(Qt::WidgetWithChildrenShortcut);
    points_->addAction(actions_.deletePoints);
    connect(points_, &PointsTable::importRequested, this, &MainWindow::importPoints);
    connect(points_, &PointsTable::exportRequested, this, &MainWindow::exportPoints);
    connect(points_, &PointsTable::message, this,
            [this](const QString &m) { statusBar()->showMessage(m, 6000); });
}

void MainWindow::connectModel() {
    connect(&doc_.undoStack(), &QUndoStack::cleanChanged, this, &MainWindow::updateTitle);
    connect(&doc_, &Document::substancesChanged, this, [this] {
        chooser_->setCurrent(doc_.primary());
        updateTitle();
    });
    connect(session_, &SessionController::currentFileChanged, this, &MainWindow::updateTitle);
    connect(session_, &SessionController::message, this,
            [this](const QString &m) { statusBar()->showMessage(m, 5000); });
    connect(&settings_, &Settings::recentFilesChanged, this, &MainWindow::updateRecentMenu);
    connect(&settings_, &Settings::unitsChanged, this, &MainWindow::syncUnitCombos);
    connect(&settings_, &Settings::logPressureChanged, actions_.logPressure, &QAction::setChecked);
    connect(&settings_, &Settings::showAtmosphereChanged, actions_.showAtmosphere,
            &QAction::setChecked);
    connect(chooser_, &SubstanceChooser::substanceChosen, this, &MainWindow::chooseSubstance);
    connect(chooser_, &SubstanceChooser::openFileRequested, this, &MainWindow::openSubstanceDialog);
    connect(diagram_, &DiagramWidget::pointRequested, this, [this](double T, double P) {
        edit::addPoint(doc_, {QString(), T, P});
        statusBar()->showMessage(tr("Added %1").arg(doc_.points().back().label), 4000);
    });
    connect(diagram_, &DiagramWidget::cursorMoved, this, &MainWindow::showCursorState);
    connect(diagram_, &DiagramWidget::cursorLeft, this, [this] { cursorStatus_->clear(); });
}

void MainWindow::showCursorState(double T_K, double P_Pa) {
    const DisplayUnits u = settings_.units();
    if (const DiagramPtr d = doc_.primary()) readout_->showState(*d, T_K, P_Pa, u);
    cursorStatus_->setText(QStringLiteral("%1   %2   %3")
                               .arg(temperatureWithUnit(T_K, u.temperature),
                                    pressureWithUnit(P_Pa, u.pressure), readout_->phaseShown()));
}

void MainWindow::updateTitle() {
    const DiagramPtr d = doc_.primary();
    const QString file = session_->currentFile().isEmpty()
                             ? tr("Untitled")
                             : QFileInfo(session_->currentFile()).fileName();
    const QString substance = d ? QString::fromStdString(d->substance().name) : tr("no substance");
    setWindowTitle(QStringLiteral("%1[*] — %2 — Phasewright").arg(file, substance));
    setWindowModified(!doc_.undoStack().isClean());
}

void MainWindow::updateRecentMenu() {
    QMenu *menu = actions_.recentMenu;
    if (!menu) return;
    menu->clear();
    const QStringList files = settings_.recentFiles();
    for (int i = 0; i < files.size(); ++i) {
        QAction *a = menu->addAction(
            QStringLiteral("&%1  %2").arg(i + 1).arg(QFileInfo(files[i]).fileName()));
        a->setToolTip(files[i]);
        a->setStatusTip(files[i]);
        const QString path = files[i];
        connect(a, &QAction::triggered, this, [this, path] {
            QString error;
            if (maybeSave() && !session_->open(path, &error))
                reportError(tr("Open session"), error);
        });
    }
    if (!files.isEmpty()) {
        menu->addSeparator();
        menu->addAction(tr("Clear List"), &settings_, &Settings::clearRecentFiles);
    }
    menu->setEnabled(!files.isEmpty());
}

void MainWindow::chooseSubstance(const DiagramPtr &diagram) {
    if (!diagram) return;
    edit::setSubstances(doc_, {diagram});
    statusBar()->showMessage(
        tr("Showing %1").arg(QString::fromStdString(diagram->substance().name)), 4000);
}

QString MainWindow::askOpenPath(const QString &title, const QString &filter) {
    const QString path =
        QFileDialog::getOpenFileName(this, title, settings_.lastDirectory(), filter);
    if (!path.isEmpty()) settings_.setLastDirectory(QFileInfo(path).absolutePath());
    return path;
}

void MainWindow::reportError(const QString &title, const QString &text) {
    statusBar()->showMessage(text, 10000);
    QMessageBox::warning(this, title, text);
}

bool MainWindow::saveSession(bool askName) {
    QString path = session_->currentFile();
    if (askName || path.isEmpty()) {
        const QString start = path.isEmpty() ? settings_.lastDirectory() : path;
        path = QFileDialog::getSaveFileName(this, tr("Save session"), start, sessionFilter());
        if (path.isEmpty()) return false;
        if (QFileInfo(path).suffix().isEmpty())
            path += QLatin1Char('.') + QLatin1String(kSessionSuffix);
        settings_.setLastDirectory(QFileInfo(path).absolutePath());
    }
    QString error;
    if (!session_->save(path, &error)) {
        reportError(tr("Save session"), error);
        return false;
    }
    return true;
}

bool MainWindow::maybeSave() {
    if (doc_.undoStack().isClean()) return true;
    const auto answer = QMessageBox::question(
        this, tr("Unsaved changes"), tr("The session has unsaved changes. Save them first?"),
        QMessageBox::Save | QMessageBox::Discard | QMessageBox::Cancel, QMessageBox::Save);
    if (answer == QMessageBox::Save) return saveSession(false);
    return answer == QMessageBox::Discard;
}

void MainWindow::importPoints() {
    const QString path = askOpenPath(tr("Import points"), tr("CSV files (*.csv *.txt)"));
    QString error;
    if (!path.isEmpty() && !openPath(path, &error)) reportError(tr("Import points"), error);
}

void MainWindow::exportPoints() {
    QString path = QFileDialog::getSaveFileName(this, tr("Export points"),
                                                settings_.lastDirectory(), tr("CSV files (*.csv)"));
    if (path.isEmpty()) return;
    if (QFileInfo(path).suffix().isEmpty()) path += QStringLiteral(".csv");
    QString error;
    const DiagramPtr d = doc_.primary();
    if (!writePointsCsv(path, doc_.points(), d.get(), settings_.units(), &error))
        reportError(tr("Export points"), error);
    else
        statusBar()->showMessage(tr("Exported %1 points to %2").arg(doc_.pointCount()).arg(path),
                                 6000);
}

void MainWindow::openSubstanceDialog() {
    const QString path = askOpenPath(tr("Open substance file"), tr("Substance files (*.json)"));
    QString error;
    if (!path.isEmpty() && !openPath(path, &error)) reportError(tr("Open substance file"), error);
}

DiagramPtr MainWindow::loadSubstanceFile(const QString &path, QString *error) {
    const SubstanceReadResult r = readSubstanceFile(path.toStdString());
    if (!r.substance) {
        QStringList issues;
        for (const auto &i : r.issues)
            if (i.severity == Severity::Error) issues << QString::fromStdString(i.text());
        if (error) *error = issues.join('\n');
        return nullptr;
    }
    try {
        const std::string id = r.substance->id;
        if (library_.add(*r.substance)) {
            chooser_->refresh();
            return library_.find(id);
        }
        return std::make_shared<const PhaseDiagram>(*r.substance);  // id taken: use it as is
    } catch (const pw::Error &e) {
        if (error) *error = QStringLiteral("%1: %2").arg(path, QString::fromUtf8(e.what()));
        return nullptr;
    }
}

bool MainWindow::openPath(const QString &path, QString *error) {
    const QString suffix = QFileInfo(path).suffix().toLower();
    if (suffix == QLatin1String(kSessionSuffix)) return maybeSave() && session_->open(path, error);
    if (suffix == QLatin1String("json")) {
        const DiagramPtr d = loadSubstanceFile(path, error);
        if (d) chooseSubstance(d);
        return d != nullptr;
    }
    if (suffix == QLatin1String("csv") || suffix == QLatin1String("txt")) {
        try {
            std::vector<StatePoint> pts = readPointsCsv(path);
            const int n = static_cast<int>(pts.size());
            edit::addPoints(doc_, std::move(pts), tr("Import %1").arg(QFileInfo(path).fileName()));
            statusBar()->showMessage(tr("Imported %1 points from %2").arg(n).arg(path), 6000);
            return true;
        } catch (const pw::Error &e) {
            if (error) *error = QString::fromUtf8(e.what());
            return false;
        }
    }
    if (error)
        *error =
            tr("%1: not a session (.pwsession), points (.csv) or substance (.json) file").arg(path);
    return false;
}

bool MainWindow::offerRecovery() {
    if (!session_->hasRecovery()) return false;
    const auto answer = QMessageBox::question(
        this, tr("Recover unsaved work"),
        tr("Phasewright did not close normally last time. Restore the unsaved session from the "
           "recovery file?"),
        QMessageBox::Yes | QMessageBox::Discard, QMessageBox::Yes);
    if (answer != QMessageBox::Yes) {
        session_->discardRecovery();
        return false;
    }
    QString error;
    if (!session_->recover(&error)) {
        reportError(tr("Recover unsaved work"), error);
        return false;
    }
    return true;
}

void MainWindow::showCautionIfFirstRun() {
    if (settings_.cautionShown()) return;
    showCaution(this);
    settings_.setCautionShown(true);
}

void MainWindow::loadDemo() {
    DiagramPtr water;
    try {
        water = library_.find("water");
    } catch (const pw::Error &e) {
        statusBar()->showMessage(QString::fromUtf8(e.what()), 8000);
        return;
    }
    session_->newSession(water);
    settings_.setUnits({TemperatureUnit::Celsius, PressureUnit::Pa});
    // Freeze-drying: frozen at atmospheric pressure, primary drying near 10 Pa, a chamber
    // pressure above the ice vapor pressure (no sublimation), secondary drying (common practice).
    doc_.resetPoints({{tr("frozen"), 228.15, 101325.0},
                      {tr("primary drying"), 238.15, 10.0},
                      {tr("chamber too high"), 243.15, 60.0},
                      {tr("secondary drying"), 313.15, 3.0}});
    runs_->loadDemo("freeze-drying");
    doc_.undoStack().setClean();
}

void MainWindow::buildRunsUi() {
    runs_ = addRunsDocks(*this, *diagram_, doc_, settings_, library_);
    runs_->setSubstanceChooser([this](const DiagramPtr &d) { chooseSubstance(d); });
}

void MainWindow::closeEvent(QCloseEvent *event) {
    if (!maybeSave()) {
        event->ignore();
        return;
    }
    settings_.setWindowGeometry(saveGeometry());
    settings_.setWindowState(saveState());
    session_->closeCleanly();
    event->accept();
}

void MainWindow::dragEnterEvent(QDragEnterEvent *event) {
    if (event->mimeData()->hasUrls()) event->acceptProposedAction();
}

void MainWindow::dropEvent(QDropEvent *event) {
    for (const QUrl &url : event->mimeData()->urls()) {
        if (!url.isLocalFile()) continue;
        QString error;
        if (!openPath(url.toLocalFile(), &error)) reportError(tr("Open dropped file"), error);
    }
    event->acceptProposedAction();
}

}  // namespace pw::ui
