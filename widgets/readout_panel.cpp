#include "widgets/readout_panel.h"

#include <QFormLayout>
#include <QLabel>
#include <QVBoxLayout>

#include "core/classify.h"
#include "core/errors.h"
#include "widgets/format.h"

namespace pw::ui {
namespace {

QString listPressures(const PhaseDiagram &d, double T_K, PressureUnit unit) {
    QStringList lines;
    for (const auto &bv : d.pressuresAt(T_K))
        lines << QStringLiteral("%1: %2%3")
                     .arg(QString::fromStdString(bv.boundary->label()),
                          pressureWithUnit(bv.value, unit),
                          bv.extrapolated ? QObject::tr(" (extrapolated)") : QString());
    return lines.isEmpty() ? QObject::tr("none at this temperature") : lines.join('\n');
}

QString listTemperatures(const PhaseDiagram &d, double P_Pa, TemperatureUnit unit) {
    QStringList lines;
    for (const auto &bv : d.temperaturesAt(P_Pa))
        lines << QStringLiteral("%1: %2%3")
                     .arg(QString::fromStdString(bv.boundary->label()),
                          temperatureWithUnit(bv.value, unit),
                          bv.extrapolated ? QObject::tr(" (extrapolated)") : QString());
    return lines.isEmpty() ? QObject::tr("none at this pressure") : lines.join('\n');
}

}  // namespace

ReadoutPanel::ReadoutPanel(QWidget *parent) : QWidget(parent) {
    auto *outer = new QVBoxLayout(this);
    auto *form = new QFormLayout;
    form->setLabelAlignment(Qt::AlignRight);
    form->setFieldGrowthPolicy(QFormLayout::AllNonFixedFieldsGrow);
    outer->addLayout(form);
    outer->addStretch(1);
    auto add = [&](const QString &name, const QString &tip) {
        auto *value = new QLabel(QStringLiteral("—"));
        value->setTextInteractionFlags(Qt::TextSelectableByMouse);
        value->setWordWrap(true);
        auto *label = new QLabel(name);
        label->setToolTip(tip);
        value->setToolTip(tip);
        form->addRow(label, value);
        return value;
    };
    temperature_ = add(tr("Temperature"), tr("Temperature under the cursor"));
    pressure_ = add(tr("Pressure"), tr("Absolute pressure under the cursor"));
    phase_ = add(tr("Phase"), tr("Phase at the cursor (solid form where known)"));
    QFont bold = phase_->font();
    bold.setBold(true);
    phase_->setFont(bold);
    nearest_ = add(tr("Nearest boundary"), tr("The boundary that bounds this region"));
    deltaT_ = add(tr("ΔT"), tr("T minus the nearest boundary's temperature at this pressure"));
    deltaP_ = add(tr("ΔP"), tr("P minus the nearest boundary's pressure at this temperature"));
    pressuresAtT_ = add(tr("Boundaries at T"), tr("Each boundary's pressure at this temperature"));
    temperaturesAtP_ =
        add(tr("Boundaries at P"), tr("Each boundary's temperature at this pressure"));
    setMinimumWidth(260);
}

void ReadoutPanel::showState(const PhaseDiagram &d, double T_K, double P_Pa, DisplayUnits u) {
    temperature_->setText(temperatureWithUnit(T_K, u.temperature));
    pressure_->setText(pressureWithUnit(P_Pa, u.pressure));
    try {
        const Classification c = classify(d, T_K, P_Pa);
        QString phase = phaseText(c);
        const QString flags = QString::fromStdString(flagsText(c));
        if (!flags.isEmpty()) phase += QStringLiteral("  [%1]").arg(flags);
        phase_->setText(phase);
        nearest_->setText(c.nearestLabel.empty() ? QStringLiteral("—")
                                                 : QString::fromStdString(c.nearestLabel));
        deltaT_->setText(deltaTemperatureText(c.dT_K, u.temperature));
        deltaP_->setText(deltaPressureText(c.dP_Pa, u.pressure));
        pressuresAtT_->setText(listPressures(d, T_K, u.pressure));
        temperaturesAtP_->setText(listTemperatures(d, P_Pa, u.temperature));
    } catch (const pw::Error &e) {
        phase_->setText(tr("unknown (%1)").arg(QString::fromUtf8(e.what())));
        for (QLabel *l : {nearest_, deltaT_, deltaP_, pressuresAtT_, temperaturesAtP_})
            l->setText(QStringLiteral("—"));
    }
}

void ReadoutPanel::clear() {
    for (QLabel *l : {temperature_, pressure_, phase_, nearest_, deltaT_, deltaP_, pressuresAtT_,
                      temperaturesAtP_})
        l->setText(QStringLiteral("—"));
}

QString ReadoutPanel::phaseShown() const { return phase_->text(); }

}  // namespace pw::ui
