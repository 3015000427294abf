#include "widgets/actions.h"

#include <QIcon>
#include <QUndoStack>

namespace pw::ui {
namespace {

QAction *make(QObject *owner, const QString &text, const QKeySequence &key, const QString &tip,
              const QString &themeIcon = {}) {
    auto *a = new QAction(text, owner);
    if (!key.isEmpty()) a->setShortcut(key);
    if (!themeIcon.isEmpty()) a->setIcon(QIcon::fromTheme(themeIcon));
    const QString keyText = key.toString(QKeySequence::NativeText);
    a->setToolTip(keyText.isEmpty() ? tip : QStringLiteral("%1 (%2)").arg(tip, keyText));
    a->setStatusTip(tip);
    return a;
}

}  // namespace

Actions createActions(QObject *owner, QUndoStack &stack) {
    Actions a;
    a.newSession = make(owner, QObject::tr("&New Session"), QKeySequence::New,
                        QObject::tr("Start an empty session"), QStringLiteral("document-new"));
    a.open =
        make(owner, QObject::tr("&Open Session…"), QKeySequence::Open,
             QObject::tr("Open a saved session (.pwsession)"), QStringLiteral("document-open"));
    a.save = make(owner, QObject::tr("&Save"), QKeySequence::Save, QObject::tr("Save the session"),
                  QStringLiteral("document-save"));
    a.saveAs = make(owner, QObject::tr("Save &As…"), QKeySequence::SaveAs,
                    QObject::tr("Save the session under a new name"));
    a.importPoints =
        make(owner, QObject::tr("&Import Points (CSV)…"), QKeySequence(Qt::CTRL | Qt::Key_I),
             QObject::tr("Add points from a CSV file"));
    a.exportPoints =
        make(owner, QObject::tr("&Export Points (CSV)…"), QKeySequence(Qt::CTRL | Qt::Key_E),
             QObject::tr("Save the points with their classification as CSV"));
    a.exportFigure =
        make(owner, QObject::tr("Export &Figure…"), QKeySequence(Qt::CTRL | Qt::SHIFT | Qt::Key_E),
             QObject::tr("Save the diagram as an annotated PNG, SVG or PDF figure"));
    a.copyFigure = make(owner, QObject::tr("Copy F&igure"), QKeySequence(),
                        QObject::tr("Copy the annotated figure (image and SVG) to the clipboard"));
    a.openSubstance = make(owner, QObject::tr("Open Substance &File…"),
                           QKeySequence(Qt::CTRL | Qt::SHIFT | Qt::Key_O),
                           QObject::tr("Load a substance file (.json) and show its diagram"));
    a.quit = make(owner, QObject::tr("&Quit"), QKeySequence::Quit, QObject::tr("Quit Phasewright"));
    a.undo = stack.createUndoAction(owner, QObject::tr("&Undo"));
    a.undo->setShortcut(QKeySequence::Undo);
    a.undo->setIcon(QIcon::fromTheme(QStringLiteral("edit-undo")));
    a.redo = stack.createRedoAction(owner, QObject::tr("&Redo"));
    a.redo->setShortcut(QKeySequence::Redo);
    a.redo->setIcon(QIcon::fromTheme(QStringLiteral("edit-redo")));
    a.deletePoints = make(owner, QObject::tr("&Delete Points"), QKeySequence::Delete,
                          QObject::tr("Delete the selected points"));
    a.moveUp = make(owner, QObject::tr("Move Point &Up"), QKeySequence(Qt::ALT | Qt::Key_Up),
                    QObject::tr("Move the selected point up"));
    a.moveDown = make(owner, QObject::tr("Move Point Do&wn"), QKeySequence(Qt::ALT | Qt::Key_Down),
                      QObject::tr("Move the selected point down"));
    a.copyDiagram =
        make(owner, QObject::tr("&Copy Diagram"), QKeySequence(Qt::CTRL | Qt::SHIFT | Qt::Key_C),
             QObject::tr("Copy the diagram to the clipboard as an image"));
    a.findSubstance = make(owner, QObject::tr("&Find Substance"), QKeySequence::Find,
                           QObject::tr("Search the substance list"));
    a.resetView =
        make(owner, QObject::tr("&Reset View"), QKeySequence(Qt::CTRL | Qt::Key_0),
             QObject::tr("Back to the substance's default view"), QStringLiteral("zoom-original"));
    a.logPressure =
        make(owner, QObject::tr("&Logarithmic Pressure Axis"), QKeySequence(Qt::CTRL | Qt::Key_L),
             QObject::tr("Switch the pressure axis between log and linear"));
    a.logPressure->setCheckable(true);
    a.showAtmosphere =
        make(owner, QObject::tr("Show &1 atm Line"), QKeySequence(Qt::CTRL | Qt::Key_M),
             QObject::tr("Show the 1 atm isobar with the normal points"));
    a.showAtmosphere->setCheckable(true);
    a.caution =
        make(owner, QObject::tr("&Safety Caution"), {}, QObject::tr("Read the safety caution"));
    a.about =
        make(owner, QObject::tr("&About Phasewright"), {}, QObject::tr("Version and caution"));
    return a;
}

}  // namespace pw::ui
