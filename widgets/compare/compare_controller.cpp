#include "widgets/compare/compare_controller.h"

#include <QActionGroup>
#include <QDialog>
#include <QDialogButtonBox>
#include <QMainWindow>
#include <QMenu>
#include <QSplitter>
#include <QStackedWidget>
#include <QTableView>
#include <QVBoxLayout>

#include "widgets/commands.h"
#include "widgets/compare/compare_points_proxy.h"
#include "widgets/compare/compare_table.h"
#include "widgets/substance_chooser.h"

namespace pw::ui {

CompareController::CompareController(QMainWindow &window, Document &doc, Settings &settings,
                                     SubstanceLibrary &library, QTableView *pointsView,
                                     int phaseColumn)
    : QObject(&window),
      doc_(doc),
      settings_(settings),
      library_(library),
      stack_(new QStackedWidget(&window)),
      view_(new CompareView),
      table_(new CompareTable) {
    QWidget *diagram = window.takeCentralWidget();
    auto *page = new QSplitter(Qt::Vertical);
    page->setObjectName(QStringLiteral("comparePage"));
    page->addWidget(view_);
    page->addWidget(table_);
    page->setStretchFactor(0, 3);
    page->setStretchFactor(1, 2);
    if (diagram) stack_->addWidget(diagram);
    stack_->addWidget(page);
    window.setCentralWidget(stack_);
    if (pointsView && pointsView->model()) {
        proxy_ = new ComparePointsProxy(doc_, phaseColumn, this);
        proxy_->setSourceModel(pointsView->model());
        pointsView->setModel(proxy_);
    }
    buildMenu(window);
    connect(&doc_, &Document::substancesChanged, this, &CompareController::refresh);
    connect(&settings_, &Settings::unitsChanged, this, &CompareController::refresh);
    connect(&settings_, &Settings::logPressureChanged, this, &CompareController::refresh);
    refresh();
}

void CompareController::buildMenu(QMainWindow &window) {
    menu_ = new QMenu(tr("&Compare"), &window);
    auto *group = new QActionGroup(this);
    single_ = menu_->addAction(tr("&Single Diagram"));
    const QString names[] = {tr("&Overlay"), tr("Side by Side (&Linked Axes)"),
                             tr("&Reduced Coordinates T/Tc, p/pc")};
    for (int i = 0; i < 3; ++i) modes_[i] = menu_->addAction(names[i]);
    for (QAction *a : {single_, modes_[0], modes_[1], modes_[2]}) {
        a->setCheckable(true);
        group->addAction(a);
    }
    single_->setChecked(true);
    connect(single_, &QAction::triggered, this, [this] { showMode(std::nullopt); });
    for (int i = 0; i < 3; ++i)
        connect(modes_[i], &QAction::triggered, this,
                [this, i] { showMode(static_cast<CompareMode>(i)); });
    menu_->addSeparator();
    QAction *choose = menu_->addAction(tr("Compare &With…"));
    connect(choose, &QAction::triggered, this, [this, &window] { chooseSecond(&window); });
    stop_ = menu_->addAction(tr("S&top Comparing"));
    connect(stop_, &QAction::triggered, this, [this] {
        if (const DiagramPtr a = doc_.primary()) edit::setSubstances(doc_, {a});
    });
}

bool CompareController::comparing() const {
    return doc_.substances().size() >= 2 && doc_.substances()[0] && doc_.substances()[1];
}

void CompareController::showMode(std::optional<CompareMode> mode) {
    if (!mode || !comparing()) {
        stack_->setCurrentIndex(0);
        single_->setChecked(true);
        return;
    }
    modes_[static_cast<int>(*mode)]->setChecked(true);
    stack_->setCurrentIndex(stack_->count() - 1);
    view_->setMode(*mode);
}

void CompareController::setSecondSubstance(const DiagramPtr &diagram) {
    const DiagramPtr a = doc_.primary();
    if (!a || !diagram) return;
    edit::setSubstances(doc_, {a, diagram});
    if (stack_->currentIndex() == 0) showMode(CompareMode::Overlay);
}

void CompareController::chooseSecond(QWidget *parent) {
    QDialog dialog(parent);
    dialog.setWindowTitle(tr("Compare with"));
    auto *chooser = new SubstanceChooser(library_, &dialog);
    auto *buttons = new QDialogButtonBox(QDialogButtonBox::Cancel, &dialog);
    auto *layout = new QVBoxLayout(&dialog);
    layout->addWidget(chooser);
    layout->addWidget(buttons);
    DiagramPtr chosen;
    connect(chooser, &SubstanceChooser::substanceChosen, &dialog, [&](const DiagramPtr &d) {
        chosen = d;
        dialog.accept();
    });
    connect(buttons, &QDialogButtonBox::rejected, &dialog, &QDialog::reject);
    if (dialog.exec() == QDialog::Accepted && chosen) setSecondSubstance(chosen);
}

void CompareController::refresh() {
    const bool on = comparing();
    for (QAction *a : modes_) a->setEnabled(on);
    stop_->setEnabled(on);
    if (!on) {
        showMode(std::nullopt);
        table_->setSubstances(nullptr, nullptr);
        return;
    }
    const auto &s = doc_.substances();
    view_->setUnits(settings_.units(), settings_.logPressure());
    table_->setUnits(settings_.units());
    view_->setSubstances(s[0], s[1]);
    table_->setSubstances(s[0], s[1]);
}

}  // namespace pw::ui
