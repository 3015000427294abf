#pragma once
// The open session's content: the substances on the diagram, the user's state points, and the
// view. Widgets read it and listen to its fine-grained signals; user edits go through the
// commands in widgets/commands.h, which call the raw mutators below and live on undoStack().
// The modified mark is undoStack().isClean(); the view is not part of the undo history.
#include <QObject>
#include <QString>
#include <QUndoStack>
#include <memory>
#include <vector>

#include "core/phase_diagram.h"

namespace pw::ui {

struct StatePoint {
    QString label;
    double T_K = 0.0;
    double P_Pa = 0.0;
    bool operator==(const StatePoint &) const = default;
};

// What is visible: ranges in K and Pa, the pressure axis scale and the 1 atm line.
struct ViewState {
    double T_min_K = 0.0;
    double T_max_K = 0.0;
    double P_min_Pa = 0.0;
    double P_max_Pa = 0.0;
    bool logPressure = true;
    bool valid() const {
        return T_max_K > T_min_K && P_max_Pa > P_min_Pa && (!logPressure || P_min_Pa > 0);
    }
    bool operator==(const ViewState &) const = default;
};

using DiagramPtr = std::shared_ptr<const PhaseDiagram>;

class Document : public QObject {
    Q_OBJECT
public:
    explicit Document(QObject *parent = nullptr);

    const std::vector<DiagramPtr> &substances() const { return substances_; }
    DiagramPtr primary() const { return substances_.empty() ? nullptr : substances_.front(); }
    const std::vector<StatePoint> &points() const { return points_; }
    int pointCount() const { return static_cast<int>(points_.size()); }
    const StatePoint &point(int row) const { return points_.at(static_cast<std::size_t>(row)); }
    const ViewState &view() const { return view_; }
    QUndoStack &undoStack() { return undo_; }

    // Raw mutators, for the commands (and for loading a session). Each emits its signal.
    void setSubstances(std::vector<DiagramPtr> substances);
    void insertPoints(int row, const std::vector<StatePoint> &points);
    std::vector<StatePoint> removePoints(int row, int count);
    void setPoint(int row, const StatePoint &point);
    void movePoint(int from, int to);
    void resetPoints(std::vector<StatePoint> points);
    // The view is not undoable and does not mark the session modified.
    void setView(const ViewState &view);

    // A fresh label not used yet: "P1", "P2"...
    QString nextLabel() const;

signals:
    void substancesChanged();
    void pointsInserted(int row, int count);
    void pointsRemoved(int row, int count);
    void pointChanged(int row);
    void pointMoved(int from, int to);
    void pointsReset();
    void viewChanged(const pw::ui::ViewState &view);

private:
    std::vector<DiagramPtr> substances_;
    std::vector<StatePoint> points_;
    ViewState view_;
    QUndoStack undo_;
};

}  // namespace pw::ui
