#pragma once
// The session file (.pwsession): a JSON object of our own with the substances on the
// diagram, the points, the view and the display units:
//   {"format": "phasewright-session", "version": 1,
//    "substances": [{"id": "water", "origin": "bundled:water.json"}],
//    "units": {"T": "degC", "P": "Pa"},
//    "view": {"T_min_K": .., "T_max_K": .., "P_min_Pa": .., "P_max_Pa": .., "log_p": true,
//             "show_1atm": true},
//    "points": [{"label": "A", "T_K": 233.15, "P_Pa": 10.0}]}
// The view's ranges are left out while no view was set (the default view then applies).
// Recovery files add "recovered_from" (the session file being edited, or "").
#include <QByteArray>
#include <QString>
#include <vector>

#include "widgets/document.h"
#include "widgets/settings.h"

namespace pw::ui {

inline constexpr auto kSessionFormat = "phasewright-session";
inline constexpr int kSessionVersion = 1;
inline constexpr auto kSessionSuffix = "pwsession";

struct SessionData {
    struct SubstanceRef {
        QString id;
        QString origin;  // "bundled:water.json" or a file path
        bool operator==(const SubstanceRef &) const = default;
    };
    std::vector<SubstanceRef> substances;
    std::vector<StatePoint> points;
    ViewState view;
    bool showAtmosphere = true;
    DisplayUnits units;
    QString recoveredFrom;
    bool operator==(const SessionData &) const = default;
};

QByteArray sessionToJson(const SessionData &session);
// Throws pw::InputError naming the file and the offending field.
SessionData sessionFromJson(const QByteArray &json, const QString &fileName);

// Write through QSaveFile: the old file stays intact until the new one is complete.
bool writeFileAtomically(const QString &path, const QByteArray &data, QString *error);

}  // namespace pw::ui
