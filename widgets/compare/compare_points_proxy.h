#pragma once
// The points table with one phase column per compared substance: an identity proxy over
// PointsModel that names the model's own phase column after the primary substance and appends
// "Phase: <name>" for every further substance of the Document (each point classified against
// that substance's diagram). Rows are the model's rows, so selections and edits pass through.
#include <QIdentityProxyModel>

#include "widgets/document.h"

namespace pw::ui {

class ComparePointsProxy : public QIdentityProxyModel {
    Q_OBJECT
public:
    // `phaseColumn`: the source model's phase column (PointsModel::PhaseCol).
    ComparePointsProxy(Document &doc, int phaseColumn, QObject *parent = nullptr);

    int columnCount(const QModelIndex &parent = {}) const override;
    QModelIndex index(int row, int column, const QModelIndex &parent = {}) const override;
    QModelIndex parent(const QModelIndex &child) const override;
    QModelIndex sibling(int row, int column, const QModelIndex &idx) const override;
    QModelIndex mapToSource(const QModelIndex &proxyIndex) const override;
    QVariant data(const QModelIndex &index, int role) const override;
    QVariant headerData(int section, Qt::Orientation o, int role) const override;
    Qt::ItemFlags flags(const QModelIndex &index) const override;

    // Number of appended columns (substances after the primary one).
    int extraColumns() const;

private:
    int sourceColumns() const;
    QVariant extraData(int row, int substance, int role) const;

    Document &doc_;
    int phaseColumn_;
};

}  // namespace pw::ui
