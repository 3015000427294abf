#pragma once
// The window's actions with their shortcuts, tooltips and status tips, created in one place.
#include <QAction>
#include <QActionGroup>

class QMenu;
class QUndoStack;

namespace pw::ui {

struct Actions {
    QAction *newSession = nullptr;
    QAction *open = nullptr;
    QAction *save = nullptr;
    QAction *saveAs = nullptr;
    QAction *importPoints = nullptr;
    QAction *exportPoints = nullptr;
    QAction *exportFigure = nullptr;  // widgets/figure/figure_actions.h
    QAction *copyFigure = nullptr;
    QAction *openSubstance = nullptr;
    QAction *quit = nullptr;
    QAction *undo = nullptr;
    QAction *redo = nullptr;
    QAction *deletePoints = nullptr;
    QAction *moveUp = nullptr;
    QAction *moveDown = nullptr;
    QAction *copyDiagram = nullptr;
    QAction *findSubstance = nullptr;
    QAction *resetView = nullptr;
    QAction *logPressure = nullptr;
    QAction *showAtmosphere = nullptr;
    QAction *caution = nullptr;
    QAction *about = nullptr;
    QMenu *recentMenu = nullptr;
};

// Actions parented to `owner`; undo/redo come from the stack (text follows the command).
Actions createActions(QObject *owner, QUndoStack &stack);

}  // namespace pw::ui
