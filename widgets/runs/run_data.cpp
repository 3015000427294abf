#include "widgets/runs/run_data.h"

#include <QFileInfo>
#include <algorithm>

#include "core/errors.h"
#include "core/run/downsample.h"

namespace pw::ui {

namespace {
void checkCancel(const std::atomic<bool> *cancel) {
    if (cancel && cancel->load()) throw run::Cancelled();
}
}  // namespace

LoadedRun analyseRun(const PhaseDiagram &diagram, std::vector<State> states,
                     std::optional<run::RuleSet> rules, const std::atomic<bool> *cancel) {
    LoadedRun out;
    out.states = std::move(states);
    out.rules = std::move(rules);
    checkCancel(cancel);
    out.analysis = run::analyseStates(diagram, out.states, out.rules ? &*out.rules : nullptr);
    checkCancel(cancel);
    out.drawIndices = run::downsampleIndices(out.states, kDrawPoints);
    out.margins = run::marginsOverTime(diagram, out.states, out.drawIndices);
    checkCancel(cancel);
    return out;
}

State stateAtTime(const std::vector<State> &states, double time_s) {
    if (states.empty()) return {};
    if (!(time_s > states.front().time_s)) return states.front();
    if (time_s >= states.back().time_s) return states.back();
    const auto it = std::lower_bound(states.begin(), states.end(), time_s,
                                     [](const State &s, double t) { return s.time_s < t; });
    if (it->time_s == time_s) return *it;  // a sample: exactly its values
    const State &b = *it;
    const State &a = *(it - 1);
    const double span = b.time_s - a.time_s;
    const double f = span > 0 ? (time_s - a.time_s) / span : 0.0;
    return {time_s, a.T_K + f * (b.T_K - a.T_K), a.P_Pa + f * (b.P_Pa - a.P_Pa)};
}

RunImportJob::RunImportJob(std::shared_ptr<const PhaseDiagram> diagram, QString path,
                           run::RunLogOptions options, QObject *parent)
    : QObject(parent),
      diagram_(std::move(diagram)),
      path_(std::move(path)),
      options_(std::move(options)) {
    qRegisterMetaType<pw::ui::RunPtr>();
}

RunImportJob::~RunImportJob() {
    cancel_ = true;
    wait();
    delete thread_;
}

void RunImportJob::start() {
    if (thread_) return;
    thread_ = QThread::create([this] { work(); });
    thread_->start();
}

void RunImportJob::wait() {
    if (thread_) thread_->wait();
}

void RunImportJob::work() {
    // Signals emitted here cross to the receivers' (GUI) thread as queued connections.
    try {
        const std::string path = path_.toStdString();
        int lastPercent = -2;
        auto onProgress = [this, &lastPercent](double fraction) {
            const int percent = fraction < 0 ? -1 : static_cast<int>(fraction * 90.0);
            if (percent == lastPercent) return;
            lastPercent = percent;
            emit progress(percent);
        };
        run::RunLog log = run::readRunLogFile(path, options_, onProgress, &cancel_);
        emit progress(90);
        LoadedRun result = analyseRun(*diagram_, std::move(log.states), std::nullopt, &cancel_);
        result.title = QFileInfo(path_).fileName();
        result.source = path_;
        emit progress(100);
        if (cancel_) throw run::Cancelled();
        emit finished(std::make_shared<const LoadedRun>(std::move(result)));
    } catch (const run::Cancelled &) {
        emit cancelled();
    } catch (const std::exception &e) {
        emit failed(QString::fromStdString(e.what()));
    }
}

}  // namespace pw::ui
