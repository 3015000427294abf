#pragma once
// A run (logged or planned) as the desktop shows it: the full states (every computation uses
// all of them), the analysis (events, verdicts), and the reduced index set and margins used
// only for drawing the path and the time chart. Built off the GUI thread by RunImportJob.
#include <QObject>
#include <QString>
#include <QThread>
#include <atomic>
#include <memory>
#include <optional>
#include <vector>

#include "core/run/run_analysis.h"
#include "core/run/run_log.h"

namespace pw::ui {

struct LoadedRun {
    QString title;                          // shown in the run list
    QString source;                         // file path, "demo:<id>" or "plan"
    std::vector<State> states;              // every sample, K / Pa / s
    run::RunAnalysis analysis;              // on every state
    std::optional<run::RuleSet> rules;      // what the verdicts were checked against
    std::vector<std::size_t> drawIndices;   // downsampled, for drawing only
    std::vector<run::MarginPoint> margins;  // at drawIndices, for the time chart
};
using RunPtr = std::shared_ptr<const LoadedRun>;

// Points kept for drawing (path and chart); the computation never uses this.
inline constexpr std::size_t kDrawPoints = 4000;

// Analyse `states` on `diagram` (events and verdicts on every state), then pick the drawing
// indices and the margins at them. Throws run::Cancelled when `cancel` is raised between steps.
LoadedRun analyseRun(const PhaseDiagram &diagram, std::vector<State> states,
                     std::optional<run::RuleSet> rules, const std::atomic<bool> *cancel = nullptr);

// State at time t (linear interpolation; clamped to the run's span). Runs need >= 1 state.
State stateAtTime(const std::vector<State> &states, double time_s);

// Reads a run log and analyses it on a worker thread. Progress and the result come back on
// the GUI thread as signals; cancel() raises the flag the reader polls and then nothing is
// delivered (only cancelled()).
class RunImportJob : public QObject {
    Q_OBJECT
public:
    RunImportJob(std::shared_ptr<const PhaseDiagram> diagram, QString path,
                 run::RunLogOptions options, QObject *parent = nullptr);
    ~RunImportJob() override;

    void start();
    void cancel() { cancel_ = true; }
    bool running() const { return thread_ && thread_->isRunning(); }
    // Blocks until the worker has finished (tests, shutdown).
    void wait();

signals:
    void progress(int percent);  // 0..100, or -1 when the size is unknown
    void finished(pw::ui::RunPtr run);
    void failed(QString message);
    void cancelled();

private:
    void work();

    std::shared_ptr<const PhaseDiagram> diagram_;
    QString path_;
    run::RunLogOptions options_;
    std::atomic<bool> cancel_{false};
    QThread *thread_ = nullptr;
};

}  // namespace pw::ui

Q_DECLARE_METATYPE(pw::ui::RunPtr)
