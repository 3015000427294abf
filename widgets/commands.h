#pragma once
// Every user edit of a Document is one of these QUndoCommands, pushed on the document's undo
// stack by the functions at the bottom. Ownership: a command holds copies of the points and
// shared pointers to the diagrams it needs to redo and undo itself; it holds a plain reference
// to the Document, which owns the undo stack and so outlives every command on it.
#include <QUndoCommand>

#include "widgets/document.h"

namespace pw::ui {

class InsertPointsCommand : public QUndoCommand {
public:
    InsertPointsCommand(Document &doc, int row, std::vector<StatePoint> points, QString text);
    void redo() override;
    void undo() override;

private:
    Document &doc_;
    int row_;
    std::vector<StatePoint> points_;
};

// Removes a set of rows (any order, any gaps); undo puts each back where it was.
class RemovePointsCommand : public QUndoCommand {
public:
    RemovePointsCommand(Document &doc, std::vector<int> rows);
    void redo() override;
    void undo() override;

private:
    Document &doc_;
    std::vector<int> rows_;  // ascending
    std::vector<StatePoint> removed_;
};

class EditPointCommand : public QUndoCommand {
public:
    EditPointCommand(Document &doc, int row, StatePoint after);
    void redo() override;
    void undo() override;

private:
    Document &doc_;
    int row_;
    StatePoint before_;
    StatePoint after_;
};

class MovePointCommand : public QUndoCommand {
public:
    MovePointCommand(Document &doc, int from, int to);
    void redo() override;
    void undo() override;

private:
    Document &doc_;
    int from_;
    int to_;
};

class SetSubstancesCommand : public QUndoCommand {
public:
    SetSubstancesCommand(Document &doc, std::vector<DiagramPtr> substances);
    void redo() override;
    void undo() override;

private:
    Document &doc_;
    std::vector<DiagramPtr> before_;
    std::vector<DiagramPtr> after_;
};

namespace edit {
void addPoint(Document &doc, StatePoint point);
void addPoints(Document &doc, std::vector<StatePoint> points, const QString &what);
void removePoints(Document &doc, std::vector<int> rows);
void editPoint(Document &doc, int row, StatePoint after);  // no-op when unchanged
void movePoint(Document &doc, int from, int to);
void setSubstances(Document &doc, std::vector<DiagramPtr> substances);
}  // namespace edit

}  // namespace pw::ui
