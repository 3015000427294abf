#pragma once
// Wires File > Export Figure… (Ctrl+Shift+E) and Edit > Copy Figure to the figure code, so the
// main window only adds the actions to its menus and calls this once.
#include <functional>

#include "widgets/diagram_scene.h"

class QWidget;

namespace pw::ui {

struct Actions;
class Settings;

// `currentScene` returns what the diagram shows now (DiagramWidget::scene()). Export opens the
// export dialog; Copy Figure copies with the remembered options (PNG image and SVG).
void connectFigureActions(QWidget &window, const Actions &actions,
                          std::function<DiagramScene()> currentScene, Settings &settings);

}  // namespace pw::ui
