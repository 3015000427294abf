#include "widgets/commands.h"

#include <algorithm>

namespace pw::ui {

InsertPointsCommand::InsertPointsCommand(Document &doc, int row, std::vector<StatePoint> points,
                                         QString text)
    : doc_(doc), row_(row), points_(std::move(points)) {
    setText(std::move(text));
}
void InsertPointsCommand::redo() { doc_.insertPoints(row_, points_); }
void InsertPointsCommand::undo() { doc_.removePoints(row_, static_cast<int>(points_.size())); }

RemovePointsCommand::RemovePointsCommand(Document &doc, std::vector<int> rows)
    : doc_(doc), rows_(std::move(rows)) {
    std::sort(rows_.begin(), rows_.end());
    rows_.erase(std::unique(rows_.begin(), rows_.end()), rows_.end());
    setText(rows_.size() == 1 ? QObject::tr("Delete point") : QObject::tr("Delete points"));
}
void RemovePointsCommand::redo() {
    removed_.clear();
    for (auto it = rows_.rbegin(); it != rows_.rend(); ++it)
        removed_.push_back(doc_.removePoints(*it, 1).front());
    std::reverse(removed_.begin(), removed_.end());
}
void RemovePointsCommand::undo() {
    for (std::size_t i = 0; i < rows_.size(); ++i) doc_.insertPoints(rows_[i], {removed_[i]});
}

EditPointCommand::EditPointCommand(Document &doc, int row, StatePoint after)
    : doc_(doc), row_(row), before_(doc.point(row)), after_(std::move(after)) {
    setText(QObject::tr("Edit point %1").arg(after_.label));
}
void EditPointCommand::redo() { doc_.setPoint(row_, after_); }
void EditPointCommand::undo() { doc_.setPoint(row_, before_); }

MovePointCommand::MovePointCommand(Document &doc, int from, int to)
    : doc_(doc), from_(from), to_(to) {
    setText(QObject::tr("Move point"));
}
void MovePointCommand::redo() { doc_.movePoint(from_, to_); }
void MovePointCommand::undo() { doc_.movePoint(to_, from_); }

SetSubstancesCommand::SetSubstancesCommand(Document &doc, std::vector<DiagramPtr> substances)
    : doc_(doc), before_(doc.substances()), after_(std::move(substances)) {
    QStringList names;
    for (const auto &d : after_) names << QString::fromStdString(d->substance().name);
    setText(QObject::tr("Choose %1").arg(names.join(QStringLiteral(", "))));
}
void SetSubstancesCommand::redo() { doc_.setSubstances(after_); }
void SetSubstancesCommand::undo() { doc_.setSubstances(before_); }

namespace edit {

void addPoint(Document &doc, StatePoint point) {
    if (point.label.trimmed().isEmpty()) point.label = doc.nextLabel();
    const QString text = QObject::tr("Add point %1").arg(point.label);
    doc.undoStack().push(new InsertPointsCommand(doc, doc.pointCount(), {std::move(point)}, text));
}

void addPoints(Document &doc, std::vector<StatePoint> points, const QString &what) {
    if (points.empty()) return;
    doc.undoStack().push(new InsertPointsCommand(doc, doc.pointCount(), std::move(points), what));
}

void removePoints(Document &doc, std::vector<int> rows) {
    rows.erase(std::remove_if(rows.begin(), rows.end(),
                              [&](int r) { return r < 0 || r >= doc.pointCount(); }),
               rows.end());
    if (rows.empty()) return;
    doc.undoStack().push(new RemovePointsCommand(doc, std::move(rows)));
}

void editPoint(Document &doc, int row, StatePoint after) {
    if (row < 0 || row >= doc.pointCount() || doc.point(row) == after) return;
    doc.undoStack().push(new EditPointCommand(doc, row, std::move(after)));
}

void movePoint(Document &doc, int from, int to) {
    const int n = doc.pointCount();
    if (from == to || from < 0 || to < 0 || from >= n || to >= n) return;
    doc.undoStack().push(new MovePointCommand(doc, from, to));
}

void setSubstances(Document &doc, std::vector<DiagramPtr> substances) {
    if (substances.empty() || substances == doc.substances()) return;
    doc.undoStack().push(new SetSubstancesCommand(doc, std::move(substances)));
}

}  // namespace edit
}  // namespace pw::ui
