#include "widgets/compare/compare_table.h"

#include <QFormLayout>
#include <QHeaderView>
#include <QLabel>
#include <QLineEdit>
#include <QTableWidget>
#include <QVBoxLayout>

#include "core/errors.h"
#include "widgets/format.h"

namespace pw::ui {
namespace {

QString value(Quantity q, const std::optional<double> &v, const DisplayUnits &u) {
    if (!v) return QObject::tr("none");
    switch (q) {
        case Quantity::Temperature:
            return temperatureWithUnit(*v, u.temperature);
        case Quantity::Pressure:
            return pressureWithUnit(*v, u.pressure);
        case Quantity::Enthalpy:
            return QObject::tr("%1 kJ/mol").arg(*v / 1000.0, 0, 'f', 2);
        case Quantity::Sign:
            return *v > 0 ? QObject::tr("rises (+)") : QObject::tr("falls (−)");
        case Quantity::Reduced:
            return QString::number(*v, 'g', 4);
    }
    return {};
}

QString withNote(const QString &text, const std::string &note) {
    return note.empty() ? text : QStringLiteral("%1 (%2)").arg(text, QString::fromStdString(note));
}

}  // namespace

CompareCells compareCells(const CompareRow &r, const DisplayUnits &u) {
    CompareCells c{withNote(value(r.quantity, r.a, u), r.noteA),
                   withNote(value(r.quantity, r.b, u), r.noteB), QStringLiteral("—")};
    const auto d = r.difference();
    if (!d) return c;
    switch (r.quantity) {
        case Quantity::Temperature:
            c.difference = deltaTemperatureText(*d, u.temperature);
            break;
        case Quantity::Pressure:
            c.difference = QObject::tr("%1 (B/A = %2)")
                               .arg(deltaPressureText(*d, u.pressure))
                               .arg(r.ratio().value_or(kNaN), 0, 'g', 4);
            break;
        case Quantity::Enthalpy:
            c.difference = QObject::tr("%1%2 kJ/mol")
                               .arg(*d >= 0 ? "+" : "−")
                               .arg(std::abs(*d) / 1000.0, 0, 'f', 2);
            break;
        case Quantity::Sign:
            c.difference = *d == 0.0 ? QObject::tr("same") : QObject::tr("differ");
            break;
        case Quantity::Reduced:
            c.difference = QString::number(*d, 'g', 3);
            break;
    }
    return c;
}

CompareTable::CompareTable(QWidget *parent)
    : QWidget(parent),
      temperature_(new QLineEdit(this)),
      pressure_(new QLineEdit(this)),
      table_(new QTableWidget(this)),
      verdict_(new QLabel(this)) {
    auto *form = new QFormLayout;
    form->addRow(tr("Vapor pressure at T:"), temperature_);
    form->addRow(tr("Boiling temperature at P:"), pressure_);
    temperature_->setObjectName(QStringLiteral("compareTemperature"));
    pressure_->setObjectName(QStringLiteral("comparePressure"));
    auto *layout = new QVBoxLayout(this);
    layout->addLayout(form);
    layout->addWidget(table_, 1);
    layout->addWidget(verdict_);
    table_->setColumnCount(4);
    table_->setEditTriggers(QAbstractItemView::NoEditTriggers);
    table_->verticalHeader()->setVisible(false);
    table_->horizontalHeader()->setStretchLastSection(true);
    table_->setAlternatingRowColors(true);
    verdict_->setWordWrap(true);
    connect(temperature_, &QLineEdit::editingFinished, this, [this] {
        readFields();
        rebuild();
    });
    connect(pressure_, &QLineEdit::editingFinished, this, [this] {
        readFields();
        rebuild();
    });
    setConditions(std::nullopt, kStandardAtmosphere_Pa);
}

void CompareTable::setSubstances(DiagramPtr a, DiagramPtr b) {
    a_ = std::move(a);
    b_ = std::move(b);
    rebuild();
}

void CompareTable::setUnits(DisplayUnits units) {
    units_ = units;
    setConditions(conditions_.T_K, conditions_.P_Pa);
}

void CompareTable::setConditions(std::optional<double> T_K, std::optional<double> P_Pa) {
    conditions_ = {T_K, P_Pa};
    temperature_->setText(T_K ? temperatureText(*T_K, units_.temperature) : QString());
    pressure_->setText(P_Pa ? pressureText(*P_Pa, units_.pressure) : QString());
    temperature_->setPlaceholderText(unitLabel(units_.temperature));
    pressure_->setPlaceholderText(unitLabel(units_.pressure));
    rebuild();
}

void CompareTable::readFields() {
    double v = 0.0;
    const QString t = temperature_->text().trimmed(), p = pressure_->text().trimmed();
    if (t.isEmpty())
        conditions_.T_K.reset();
    else if (parseNumber(t, v))
        conditions_.T_K = toKelvin(v, units_.temperature);
    else
        emit message(tr("Temperature: “%1” is not a number").arg(t));
    if (p.isEmpty())
        conditions_.P_Pa.reset();
    else if (parseNumber(p, v))
        conditions_.P_Pa = toPascal(v, units_.pressure);
    else
        emit message(tr("Pressure: “%1” is not a number").arg(p));
}

void CompareTable::fillRow(int row, const CompareRow &r) {
    const CompareCells c = compareCells(r, units_);
    QString label = QString::fromStdString(r.label);
    if (r.key == "vapor_pressure_at_T_Pa" && conditions_.T_K)
        label = tr("Vapor pressure at %1")
                    .arg(temperatureWithUnit(*conditions_.T_K, units_.temperature));
    if (r.key == "saturation_temperature_at_P_K" && conditions_.P_Pa)
        label = tr("Boiling/sublimation T at %1")
                    .arg(pressureWithUnit(*conditions_.P_Pa, units_.pressure));
    const QString cells[] = {label, c.a, c.b, c.difference};
    for (int k = 0; k < 4; ++k) {
        auto *item = new QTableWidgetItem(cells[k]);
        item->setToolTip(cells[k]);
        table_->setItem(row, k, item);
    }
}

void CompareTable::rebuild() {
    comparison_.reset();
    table_->clearContents();
    table_->setRowCount(0);
    verdict_->clear();
    if (!a_ || !b_) return;
    try {
        comparison_ = compare(*a_, *b_, conditions_);
    } catch (const pw::Error &e) {
        verdict_->setText(QString::fromUtf8(e.what()));
        emit message(QString::fromUtf8(e.what()));
        return;
    }
    const Comparison &c = *comparison_;
    table_->setHorizontalHeaderLabels({tr("Quantity"), QString::fromStdString(c.a.name),
                                       QString::fromStdString(c.b.name), tr("B − A")});
    table_->setRowCount(static_cast<int>(c.rows.size()));
    for (std::size_t i = 0; i < c.rows.size(); ++i) fillRow(static_cast<int>(i), c.rows[i]);
    table_->resizeColumnsToContents();
    verdict_->setText(verdictText());
}

QString CompareTable::verdictText() const {
    if (!comparison_ || !conditions_.T_K) return {};
    const Comparison &c = *comparison_;
    const QString at = temperatureWithUnit(*conditions_.T_K, units_.temperature);
    if (!c.moreVolatileAtT)
        return tr("More volatile at %1: cannot tell (no vapor pressure).").arg(at);
    const auto &name = *c.moreVolatileAtT == 0 ? c.a.name : c.b.name;
    return tr("More volatile at %1: %2.").arg(at, QString::fromStdString(name));
}

}  // namespace pw::ui
