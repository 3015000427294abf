#include "widgets/figure/figure_actions.h"

#include <QAction>
#include <QMessageBox>
#include <QWidget>

#include "core/errors.h"
#include "widgets/actions.h"
#include "widgets/figure/export_dialog.h"
#include "widgets/settings.h"

namespace pw::ui {

void connectFigureActions(QWidget &window, const Actions &actions,
                          std::function<DiagramScene()> currentScene, Settings &settings) {
    QObject::connect(actions.exportFigure, &QAction::triggered, &window,
                     [&window, currentScene, &settings] {
                         const DiagramScene scene = currentScene();
                         if (scene.substances.empty()) return;
                         ExportDialog dialog(scene, settings, &window);
                         dialog.exec();
                     });
    QObject::connect(actions.copyFigure, &QAction::triggered, &window,
                     [&window, currentScene, &settings] {
                         const DiagramScene scene = currentScene();
                         if (scene.substances.empty()) return;
                         try {
                             ExportDialog::copyFigure(scene, settings.figureSpec());
                         } catch (const Error &e) {
                             QMessageBox::warning(&window, QObject::tr("Copy Figure"),
                                                  QString::fromUtf8(e.what()));
                         }
                     });
}

}  // namespace pw::ui
