#include "widgets/document.h"

#include <QSet>
#include <algorithm>

namespace pw::ui {

Document::Document(QObject *parent) : QObject(parent) {}

void Document::setSubstances(std::vector<DiagramPtr> substances) {
    substances_ = std::move(substances);
    emit substancesChanged();
}

void Document::insertPoints(int row, const std::vector<StatePoint> &points) {
    row = std::clamp(row, 0, pointCount());
    points_.insert(points_.begin() + row, points.begin(), points.end());
    emit pointsInserted(row, static_cast<int>(points.size()));
}

std::vector<StatePoint> Document::removePoints(int row, int count) {
    const auto first = points_.begin() + row;
    std::vector<StatePoint> removed(first, first + count);
    points_.erase(first, first + count);
    emit pointsRemoved(row, count);
    return removed;
}

void Document::setPoint(int row, const StatePoint &point) {
    points_.at(static_cast<std::size_t>(row)) = point;
    emit pointChanged(row);
}

void Document::movePoint(int from, int to) {
    if (from == to) return;
    StatePoint p = points_.at(static_cast<std::size_t>(from));
    points_.erase(points_.begin() + from);
    points_.insert(points_.begin() + to, std::move(p));
    emit pointMoved(from, to);
}

void Document::resetPoints(std::vector<StatePoint> points) {
    points_ = std::move(points);
    emit pointsReset();
}

void Document::setView(const ViewState &view) {
    if (view == view_) return;
    view_ = view;
    emit viewChanged(view_);
}

QString Document::nextLabel() const {
    QSet<QString> used;
    for (const auto &p : points_) used.insert(p.label);
    for (int i = pointCount() + 1;; ++i) {
        const QString label = QStringLiteral("P%1").arg(i);
        if (!used.contains(label)) return label;
    }
}

}  // namespace pw::ui
