#pragma once
// What is under the cursor: T and P in the user's units, the phase (and solid form), the
// nearest boundary with the ΔT and ΔP margins, every boundary's pressure at the cursor's
// temperature and every boundary's temperature at its pressure.
#include <QWidget>

#include "core/phase_diagram.h"
#include "widgets/settings.h"

class QLabel;

namespace pw::ui {

class ReadoutPanel : public QWidget {
    Q_OBJECT
public:
    explicit ReadoutPanel(QWidget *parent = nullptr);

    void showState(const PhaseDiagram &diagram, double T_K, double P_Pa, DisplayUnits units);
    void clear();
    // The phase text currently shown (for tests and the status bar).
    QString phaseShown() const;

private:
    QLabel *temperature_;
    QLabel *pressure_;
    QLabel *phase_;
    QLabel *nearest_;
    QLabel *deltaT_;
    QLabel *deltaP_;
    QLabel *pressuresAtT_;
    QLabel *temperaturesAtP_;
};

}  // namespace pw::ui
