#pragma once
// The text rows a figure carries under the plot: for each substance its boundary models and
// their published sources, the tool version and the date; and the optional caution line.
#include <QDate>
#include <QStringList>

#include "widgets/diagram_scene.h"

namespace pw::ui {

// "Water (H2O): sublimation, melting (ice Ih) [iapws-sublimation, ...] — Wagner et al.
// (2011), IAPWS R14-08; ..." — one entry per substance, boundaries grouped by source.
QStringList sourceCaption(const DiagramScene &scene);
// "Phasewright 0.1.0 · 2026-12-02 · boundaries dashed outside their published range"
QString versionLine(const QDate &date);
// The safety line for high-pressure, cryogenic and vacuum work.
QString cautionLine();
// "Wagner et al. (2011), IAPWS R14-08": first author (et al. for three or more), year, the
// publication (or title when there is none).
QString shortCitation(const Citation &c);

}  // namespace pw::ui
