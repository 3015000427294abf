#include "widgets/caution.h"

#include <QApplication>
#include <QMessageBox>
#include <QPushButton>

namespace pw::ui {

QString cautionText() {
    return QObject::tr(
        "<p><b>Phasewright supports engineering judgement; it does not replace it.</b></p>"
        "<ul>"
        "<li><b>High pressure.</b> Supercritical work runs at 7–50 MPa. Equipment must be rated, "
        "inspected and protected against overpressure; gauge readings are not absolute "
        "pressures.</li>"
        "<li><b>Cryogenic liquids.</b> Cold burns and embrittlement; trapped liquid between "
        "closed valves builds pressure as it warms.</li>"
        "<li><b>Asphyxiation.</b> Nitrogen, argon, CO<sub>2</sub> and helium displace oxygen "
        "without warning; monitor oxygen in enclosed spaces.</li>"
        "<li><b>Vacuum.</b> Vacuum vessels can implode; use rated glassware and shields.</li>"
        "<li><b>Flammable solvents and oxygen enrichment.</b> Keep ignition sources away.</li>"
        "</ul>"
        "<p>Boundaries come from published correlations with stated ranges and uncertainties; "
        "outside those ranges they are extrapolated and marked so. The results are no "
        "substitute for the applicable pressure-equipment codes, site procedures and licensed "
        "professional practice.</p>");
}

void showCaution(QWidget *parent) {
    QMessageBox box(parent);
    box.setWindowTitle(QObject::tr("Before you use Phasewright"));
    box.setIcon(QMessageBox::Warning);
    box.setTextFormat(Qt::RichText);
    box.setText(cautionText());
    box.setStandardButtons(QMessageBox::Ok);
    box.button(QMessageBox::Ok)->setText(QObject::tr("I understand"));
    box.exec();
}

void showAbout(QWidget *parent) {
    const QString text =
        QObject::tr(
            "<h3>Phasewright %1</h3>"
            "<p>Phase-diagram explorer and state-point classifier for pure substances: "
            "the phase at a state point, the margin to the nearest boundary, and the "
            "boundaries a path crosses. Every boundary cites its published source "
            "(see each substance's details).</p>")
            .arg(QApplication::applicationVersion()) +
        cautionText();
    QMessageBox box(parent);
    box.setWindowTitle(QObject::tr("About Phasewright"));
    box.setIconPixmap(QApplication::windowIcon().pixmap(64, 64));
    box.setTextFormat(Qt::RichText);
    box.setText(text);
    box.exec();
}

}  // namespace pw::ui
