#pragma once
// The points table as a Qt item model over a Document: label, T and P in the user's units
// (editable; edits become undo commands), and the classification against the primary
// substance: phase, nearest boundary, ΔT, ΔP and flags. Classifications are cached per row
// and refreshed from the document's change signals.
#include <QAbstractTableModel>
#include <vector>

#include "core/classify.h"
#include "widgets/document.h"
#include "widgets/settings.h"

namespace pw::ui {

class PointsModel : public QAbstractTableModel {
    Q_OBJECT
public:
    enum Column { Label, Temperature, Pressure, PhaseCol, Nearest, DeltaT, DeltaP, Flags, Count };

    PointsModel(Document &doc, Settings &settings, QObject *parent = nullptr);

    int rowCount(const QModelIndex &parent = {}) const override;
    int columnCount(const QModelIndex &parent = {}) const override;
    QVariant data(const QModelIndex &index, int role) const override;
    QVariant headerData(int section, Qt::Orientation o, int role) const override;
    Qt::ItemFlags flags(const QModelIndex &index) const override;
    bool setData(const QModelIndex &index, const QVariant &value, int role) override;

    // The classification shown in row `row` (Unknown when no substance is chosen).
    const Classification &classification(int row) const;

private:
    void reclassifyAll();
    Classification classifyPoint(const StatePoint &p) const;
    QVariant display(int row, int column) const;
    QString tooltip(int row) const;

    Document &doc_;
    Settings &settings_;
    std::vector<Classification> cache_;
};

}  // namespace pw::ui
