#pragma once
// The safety caution shown on first run and in the About box.
#include <QString>

class QWidget;

namespace pw::ui {

// Rich text: high pressure, cryogenic liquids, asphyxiation, vacuum and implosion, flammable
// solvents; results support judgement and replace no code or licensed practice.
QString cautionText();
void showCaution(QWidget *parent);
void showAbout(QWidget *parent);

}  // namespace pw::ui
