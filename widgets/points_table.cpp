#include "widgets/points_table.h"

#include <QHBoxLayout>
#include <QHeaderView>
#include <QItemSelectionModel>
#include <QLabel>
#include <QLineEdit>
#include <QPushButton>
#include <QTableView>
#include <QToolButton>
#include <QVBoxLayout>

#include "widgets/commands.h"
#include "widgets/format.h"

namespace pw::ui {
namespace {

QToolButton *toolButton(const QString &text, const QString &tip, QWidget *parent) {
    auto *b = new QToolButton(parent);
    b->setText(text);
    b->setToolTip(tip);
    b->setAutoRaise(true);
    return b;
}

}  // namespace

PointsTable::PointsTable(Document &doc, Settings &settings, QWidget *parent)
    : QWidget(parent),
      doc_(doc),
      settings_(settings),
      model_(new PointsModel(doc, settings, this)),
      view_(new QTableView),
      label_(new QLineEdit),
      temperature_(new QLineEdit),
      pressure_(new QLineEdit) {
    view_->setModel(model_);
    view_->setSelectionBehavior(QAbstractItemView::SelectRows);
    view_->setAlternatingRowColors(true);
    view_->setEditTriggers(QAbstractItemView::DoubleClicked | QAbstractItemView::EditKeyPressed |
                           QAbstractItemView::AnyKeyPressed);
    view_->horizontalHeader()->setStretchLastSection(true);
    view_->horizontalHeader()->setSectionResizeMode(QHeaderView::ResizeToContents);
    view_->horizontalHeader()->setSectionResizeMode(PointsModel::Flags, QHeaderView::Stretch);
    view_->horizontalHeader()->setMinimumSectionSize(70);
    view_->verticalHeader()->setDefaultSectionSize(view_->fontMetrics().height() + 8);
    view_->setToolTip(tr("Double-click a label, T or P to edit it; Delete removes the selection"));

    label_->setPlaceholderText(tr("label"));
    label_->setMaximumWidth(120);
    auto *add = new QPushButton(tr("Add point"));
    add->setToolTip(tr("Add the typed point (Enter); or Ctrl+click on the diagram"));
    add->setDefault(true);
    auto *del = toolButton(tr("Delete"), tr("Delete the selected points (Del)"), this);
    auto *up = toolButton(tr("▲"), tr("Move the selected point up (Alt+Up)"), this);
    auto *down = toolButton(tr("▼"), tr("Move the selected point down (Alt+Down)"), this);
    auto *import = toolButton(tr("Import CSV…"), tr("Add points from a CSV file"), this);
    auto *exportButton =
        toolButton(tr("Export CSV…"), tr("Save the classified points as CSV"), this);

    auto *entry = new QHBoxLayout;
    entry->addWidget(label_);
    entry->addWidget(temperature_);
    entry->addWidget(pressure_);
    entry->addWidget(add);
    entry->addSpacing(12);
    for (QWidget *w : std::initializer_list<QWidget *>{del, up, down}) entry->addWidget(w);
    entry->addStretch(1);
    entry->addWidget(import);
    entry->addWidget(exportButton);
    auto *layout = new QVBoxLayout(this);
    layout->setContentsMargins(4, 4, 4, 4);
    layout->addLayout(entry);
    layout->addWidget(view_, 1);

    for (QLineEdit *e : {label_, temperature_, pressure_})
        connect(e, &QLineEdit::returnPressed, this, [this] { addTypedPoint(); });
    connect(add, &QPushButton::clicked, this, [this] { addTypedPoint(); });
    connect(del, &QToolButton::clicked, this, &PointsTable::deleteSelected);
    connect(up, &QToolButton::clicked, this, [this] { moveSelected(-1); });
    connect(down, &QToolButton::clicked, this, [this] { moveSelected(+1); });
    connect(import, &QToolButton::clicked, this, &PointsTable::importRequested);
    connect(exportButton, &QToolButton::clicked, this, &PointsTable::exportRequested);
    connect(&settings_, &Settings::unitsChanged, this, [this] { updatePlaceholders(); });
    updatePlaceholders();
}

void PointsTable::updatePlaceholders() {
    const DisplayUnits u = settings_.units();
    temperature_->setPlaceholderText(tr("T [%1]").arg(unitLabel(u.temperature)));
    pressure_->setPlaceholderText(tr("P [%1]").arg(unitLabel(u.pressure)));
    temperature_->setToolTip(tr("Temperature in %1").arg(unitLabel(u.temperature)));
    pressure_->setToolTip(tr("Absolute pressure in %1").arg(unitLabel(u.pressure)));
}

bool PointsTable::addTypedPoint() {
    const DisplayUnits u = settings_.units();
    double t = 0.0, p = 0.0;
    if (!parseNumber(temperature_->text(), t) || !(toKelvin(t, u.temperature) > 0)) {
        emit message(
            tr("Type a temperature above absolute zero, in %1").arg(unitLabel(u.temperature)));
        temperature_->setFocus();
        return false;
    }
    if (!parseNumber(pressure_->text(), p) || !(p > 0)) {
        emit message(tr("Type an absolute pressure above zero, in %1").arg(unitLabel(u.pressure)));
        pressure_->setFocus();
        return false;
    }
    edit::addPoint(doc_,
                   {label_->text().trimmed(), toKelvin(t, u.temperature), toPascal(p, u.pressure)});
    label_->clear();
    temperature_->clear();
    pressure_->clear();
    label_->setFocus();
    return true;
}

std::vector<int> PointsTable::selectedRows() const {
    std::vector<int> rows;
    for (const QModelIndex &i : view_->selectionModel()->selectedRows()) rows.push_back(i.row());
    std::sort(rows.begin(), rows.end());
    return rows;
}

void PointsTable::deleteSelected() { edit::removePoints(doc_, selectedRows()); }

void PointsTable::moveSelected(int delta) {
    const std::vector<int> rows = selectedRows();
    if (rows.size() != 1) return;
    const int to = rows.front() + delta;
    if (to < 0 || to >= doc_.pointCount()) return;
    edit::movePoint(doc_, rows.front(), to);
    view_->selectRow(to);
}

}  // namespace pw::ui
