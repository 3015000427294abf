#include "widgets/runs/runs_panel.h"

#include <QComboBox>
#include <QDockWidget>
#include <QFileDialog>
#include <QHBoxLayout>
#include <QHeaderView>
#include <QLabel>
#include <QMessageBox>
#include <QPlainTextEdit>
#include <QPushButton>
#include <QTabWidget>
#include <QTableWidget>
#include <QVBoxLayout>
#include <cmath>

#include "core/errors.h"
#include "core/run/planned_path.h"
#include "core/run/report.h"
#include "resources/bundled.h"
#include "widgets/diagram_widget.h"
#include "widgets/format.h"
#include "widgets/runs/run_import_dialog.h"
#include "widgets/runs/run_overlay.h"
#include "widgets/runs/time_chart.h"

namespace pw::ui {

namespace {

QString timeText(double time_s) {
    if (!std::isfinite(time_s)) return QStringLiteral("—");
    const long s = std::lround(time_s);
    return QStringLiteral("%1:%2:%3")
        .arg(s / 3600)
        .arg((s / 60) % 60, 2, 10, QLatin1Char('0'))
        .arg(s % 60, 2, 10, QLatin1Char('0'));
}

QTableWidget *makeTable(const QStringList &headers) {
    auto *t = new QTableWidget(0, static_cast<int>(headers.size()));
    t->setHorizontalHeaderLabels(headers);
    t->verticalHeader()->setVisible(false);
    t->setEditTriggers(QAbstractItemView::NoEditTriggers);
    t->setSelectionBehavior(QAbstractItemView::SelectRows);
    t->horizontalHeader()->setStretchLastSection(true);
    return t;
}

void setRow(QTableWidget *t, int row, const QStringList &cells) {
    for (int c = 0; c < cells.size(); ++c) t->setItem(row, c, new QTableWidgetItem(cells[c]));
}

const char *kTextExample =
    "# One step per line (docs/runs.md): isobaric, isothermal, hold, ramp\n"
    "plan name=\"my cycle\" resolution=60s\n"
    "start T=20degC P=1atm\n"
    "isobaric T=-45degC rate=0.5K/min label=freezing\n"
    "hold duration=1h label=\"freezing hold\"\n"
    "isothermal P=10Pa duration=15min scale=log label=evacuation\n"
    "isobaric T=-30degC duration=20h label=\"primary drying\"\n"
    "ramp T=25degC P=5Pa duration=4h label=\"secondary drying\"\n";

}  // namespace

RunsPanel::RunsPanel(DiagramWidget &diagram, Document &doc, Settings &settings,
                     const SubstanceLibrary &library, QWidget *parent)
    : QWidget(parent),
      diagram_(diagram),
      doc_(doc),
      settings_(settings),
      library_(library),
      overlay_(new RunOverlay(diagram, settings, this)),
      chart_(new TimeChart),
      runs_(new QComboBox),
      tabs_(new QTabWidget),
      summary_(new QLabel) {
    choose_ = [this](const DiagramPtr &d) { doc_.setSubstances({d}); };
    auto *layout = new QVBoxLayout(this);
    auto *top = new QHBoxLayout;
    top->addWidget(new QLabel(tr("Run:")));
    top->addWidget(runs_, 1);
    auto *importButton = new QPushButton(tr("Import…"));
    importButton->setToolTip(tr("Import a logged run (CSV with time, T and P columns)"));
    top->addWidget(importButton);
    layout->addLayout(top);
    summary_->setWordWrap(true);
    layout->addWidget(summary_);
    tabs_->addTab(buildEventsTab(), tr("Events"));
    tabs_->addTab(buildRulesTab(), tr("Rules"));
    tabs_->addTab(buildPlanTab(), tr("Plan"));
    layout->addWidget(tabs_, 1);
    chart_->setUnits(settings_.units());

    connect(importButton, &QPushButton::clicked, this, &RunsPanel::importRunLog);
    connect(runs_, qOverload<int>(&QComboBox::currentIndexChanged), this, &RunsPanel::selectRun);
    connect(&settings_, &Settings::unitsChanged, this, [this] {
        chart_->setUnits(settings_.units());
        fillEvents();
    });
    // Cursor linking, both ways.
    connect(chart_, &TimeChart::timeHovered, overlay_, &RunOverlay::setCursorTime);
    connect(chart_, &TimeChart::hoverLeft, overlay_, &RunOverlay::clearCursor);
    connect(overlay_, &RunOverlay::pathTimeHovered, chart_, &TimeChart::setCursorTime);
    connect(overlay_, &RunOverlay::pathHoverLeft, chart_, &TimeChart::clearCursor);
}

TimeChart *RunsPanel::chart() const { return chart_; }

RunsPanel::~RunsPanel() {
    if (chart_ && !chart_->parent()) delete chart_;
}

void RunsPanel::setSubstanceChooser(std::function<void(const DiagramPtr &)> choose) {
    choose_ = std::move(choose);
}

QWidget *RunsPanel::buildEventsTab() {
    events_ = makeTable({tr("time"), tr("transition"), tr("T"), tr("P"), tr("detail")});
    connect(events_, &QTableWidget::cellClicked, this, [this](int row, int) {
        const RunPtr run = currentRun();
        if (!run || row >= static_cast<int>(run->analysis.path.events.size())) return;
        const double t = run->analysis.path.events[static_cast<std::size_t>(row)].time_s;
        overlay_->setCursorTime(t);
        chart_->setCursorTime(t);
    });
    return events_;
}

QWidget *RunsPanel::buildRulesTab() {
    auto *w = new QWidget;
    auto *layout = new QVBoxLayout(w);
    layout->setContentsMargins(0, 0, 0, 0);
    verdicts_ = makeTable({tr("rule"), tr("verdict"), tr("first violation"), tr("detail")});
    layout->addWidget(verdicts_, 1);
    auto *buttons = new QHBoxLayout;
    auto *load = new QPushButton(tr("Load rules…"));
    auto *exportButton = new QPushButton(tr("Export events + verdicts CSV…"));
    buttons->addWidget(load);
    buttons->addWidget(exportButton);
    buttons->addStretch(1);
    layout->addLayout(buttons);
    connect(load, &QPushButton::clicked, this, &RunsPanel::loadRules);
    connect(exportButton, &QPushButton::clicked, this, &RunsPanel::exportCsv);
    return w;
}

QWidget *RunsPanel::buildPlanTab() {
    auto *w = new QWidget;
    auto *layout = new QVBoxLayout(w);
    layout->setContentsMargins(0, 0, 0, 0);
    plans_ = new QComboBox;
    plans_->addItem(tr("Example (text steps)"), QString());
    for (const run::DemoScenario &s : run::demoScenarios())
        plans_->addItem(tr("Demo plan: %1").arg(QString::fromStdString(s.id)),
                        QString::fromStdString(s.planPath));
    planText_ = new QPlainTextEdit;
    planText_->setPlainText(QString::fromUtf8(kTextExample));
    planText_->setLineWrapMode(QPlainTextEdit::NoWrap);
    planError_ = new QLabel;
    planError_->setWordWrap(true);
    planError_->setStyleSheet(QStringLiteral("color: #b0203a"));
    auto *show = new QPushButton(tr("Show plan on the diagram"));
    layout->addWidget(plans_);
    layout->addWidget(planText_, 1);
    layout->addWidget(planError_);
    layout->addWidget(show);
    connect(plans_, qOverload<int>(&QComboBox::activated), this, [this](int i) {
        const QString path = plans_->itemData(i).toString();
        planText_->setPlainText(path.isEmpty()
                                    ? QString::fromUtf8(kTextExample)
                                    : QString::fromUtf8(bundled::file(path.toStdString())));
    });
    connect(show, &QPushButton::clicked, this, [this] {
        QString error;
        showPlan(planText_->toPlainText(), &error);
        planError_->setText(error);
    });
    return w;
}

RunPtr RunsPanel::currentRun() const {
    const int i = runs_->currentIndex();
    return i >= 0 && i < static_cast<int>(list_.size()) ? list_[static_cast<std::size_t>(i)]
                                                        : nullptr;
}

void RunsPanel::addRun(RunPtr run) {
    list_.push_back(std::move(run));
    runs_->addItem(list_.back()->title);
    runs_->setCurrentIndex(runs_->count() - 1);
    selectRun(runs_->currentIndex());
    if (auto *dock = qobject_cast<QDockWidget *>(chart_->parentWidget())) dock->raise();
}

void RunsPanel::selectRun(int index) {
    const RunPtr run = index >= 0 && index < static_cast<int>(list_.size())
                           ? list_[static_cast<std::size_t>(index)]
                           : nullptr;
    if (run == overlay_->run()) return;
    overlay_->setRun(run);
    chart_->setRun(run);
    fillEvents();
    fillVerdicts();
}

void RunsPanel::fillEvents() {
    const RunPtr run = currentRun();
    events_->setRowCount(0);
    if (!run) {
        summary_->clear();
        return;
    }
    const DisplayUnits u = settings_.units();
    const auto &events = run->analysis.path.events;
    events_->setRowCount(static_cast<int>(events.size()));
    for (std::size_t i = 0; i < events.size(); ++i) {
        const PathEvent &e = events[i];
        setRow(events_, static_cast<int>(i),
               {timeText(e.time_s), QString::fromStdString(std::string(toString(e.transition))),
                temperatureWithUnit(e.T_K, u.temperature), pressureWithUnit(e.P_Pa, u.pressure),
                QString::fromStdString(e.detail)});
    }
    events_->resizeColumnsToContents();
    summary_->setText(tr("%1 samples over %2, %3 crossing events%4")
                          .arg(run->states.size())
                          .arg(timeText(run->states.empty() ? 0 : run->states.back().time_s))
                          .arg(events.size())
                          .arg(run->analysis.path.summary.crossesLiquidVapor
                                   ? tr("; crosses the liquid–vapor boundary")
                                   : QString()));
}

void RunsPanel::fillVerdicts() {
    const RunPtr run = currentRun();
    verdicts_->setRowCount(0);
    if (!run) return;
    const auto &verdicts = run->analysis.verdicts;
    verdicts_->setRowCount(static_cast<int>(verdicts.size()));
    for (std::size_t i = 0; i < verdicts.size(); ++i) {
        const run::RuleVerdict &v = verdicts[i];
        const int row = static_cast<int>(i);
        setRow(verdicts_, row,
               {QString::fromStdString(v.ruleId),
                QString::fromStdString(std::string(toString(v.verdict))).toUpper(),
                v.verdict == run::Verdict::Fail ? timeText(v.firstViolation_s) : QString(),
                QString::fromStdString(v.detail)});
        const QColor c = v.verdict == run::Verdict::Pass   ? QColor(0x1b, 0x7a, 0x3a)
                         : v.verdict == run::Verdict::Fail ? QColor(0xb0, 0x20, 0x3a)
                                                           : QColor(0x80, 0x80, 0x80);
        verdicts_->item(row, 1)->setForeground(c);
        QFont f = verdicts_->font();
        f.setBold(true);
        verdicts_->item(row, 1)->setFont(f);
    }
    verdicts_->resizeColumnsToContents();
}

DiagramPtr RunsPanel::diagramFor(const std::string &substance) {
    if (!substance.empty()) {
        if (auto d = library_.find(substance)) {
            if (d != doc_.primary()) choose_(d);
            return d;
        }
        throw Error("substance '" + substance + "' is not in the library");
    }
    if (!doc_.primary()) throw Error("choose a substance first");
    return doc_.primary();
}

void RunsPanel::loadDemo(const std::string &scenarioId) {
    const run::DemoScenario s = run::demoScenario(scenarioId);
    const DiagramPtr d = diagramFor(s.substance);
    const run::RunLog log = run::readDemoRun(s);
    auto run =
        std::make_shared<LoadedRun>(analyseRun(*d, log.states, run::readDemoRules(s), nullptr));
    run->title = tr("demo: %1").arg(QString::fromStdString(s.id));
    run->source = QStringLiteral("demo:%1").arg(QString::fromStdString(s.id));
    for (int i = 0; i < plans_->count(); ++i) {
        if (plans_->itemData(i).toString().toStdString() != s.planPath) continue;
        plans_->setCurrentIndex(i);
        planText_->setPlainText(QString::fromUtf8(bundled::file(s.planPath)));
    }
    addRun(std::move(run));
}

bool RunsPanel::showPlan(const QString &text, QString *error) {
    try {
        const run::Plan plan = run::parsePlan(text.toStdString(), "plan");
        const DiagramPtr d = diagramFor(plan.substance);
        run::ExpandedPlan expanded = run::expandPlan(plan);
        const RunPtr current = currentRun();
        std::optional<run::RuleSet> rules = current ? current->rules : std::nullopt;
        auto r = std::make_shared<LoadedRun>(analyseRun(*d, std::move(expanded.states), rules));
        r->title = tr("plan: %1")
                       .arg(plan.name.empty() ? tr("untitled") : QString::fromStdString(plan.name));
        r->source = QStringLiteral("plan");
        addRun(std::move(r));
        if (error) error->clear();
        return true;
    } catch (const std::exception &e) {
        if (error) *error = QString::fromStdString(e.what());
        return false;
    }
}

void RunsPanel::importRunLog() {
    if (!doc_.primary()) {
        QMessageBox::warning(this, tr("Import run log"), tr("Choose a substance first."));
        return;
    }
    RunImportDialog dialog(doc_.primary(), this);
    connect(&dialog, &RunImportDialog::imported, this, &RunsPanel::addRun);
    dialog.exec();
}

void RunsPanel::applyRules(const run::RuleSet &rules) {
    const RunPtr run = currentRun();
    if (!run || !doc_.primary()) return;
    auto updated = std::make_shared<LoadedRun>(*run);
    updated->rules = rules;
    updated->analysis.verdicts =
        run::checkRules(rules, *doc_.primary(), updated->states, updated->analysis.path);
    list_[static_cast<std::size_t>(runs_->currentIndex())] = updated;
    overlay_->setRun(updated);
    chart_->setRun(updated);
    fillVerdicts();
}

void RunsPanel::loadRules() {
    const QString path = QFileDialog::getOpenFileName(this, tr("Load rules"), QString(),
                                                      tr("Rule files (*.json);;All files (*)"));
    if (path.isEmpty()) return;
    try {
        applyRules(run::readRulesFile(path.toStdString()));
    } catch (const std::exception &e) {
        QMessageBox::warning(this, tr("Load rules"), QString::fromStdString(e.what()));
    }
}

void RunsPanel::exportCsv() {
    const RunPtr run = currentRun();
    if (!run) return;
    const QString path = QFileDialog::getSaveFileName(
        this, tr("Export events and verdicts"), QStringLiteral("events.csv"), tr("CSV (*.csv)"));
    if (path.isEmpty()) return;
    try {
        run::writeEventsAndVerdictsCsv(path.toStdString(), run->analysis.path,
                                       run->analysis.verdicts);
    } catch (const std::exception &e) {
        QMessageBox::warning(this, tr("Export"), QString::fromStdString(e.what()));
    }
}

}  // namespace pw::ui
