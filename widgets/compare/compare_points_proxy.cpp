#include "widgets/compare/compare_points_proxy.h"

#include "core/classify.h"
#include "core/errors.h"
#include "widgets/format.h"

namespace pw::ui {

ComparePointsProxy::ComparePointsProxy(Document &doc, int phaseColumn, QObject *parent)
    : QIdentityProxyModel(parent), doc_(doc), phaseColumn_(phaseColumn) {
    // The number of appended columns follows the substances: rebuild the proxy's view.
    connect(&doc_, &Document::substancesChanged, this, [this] {
        beginResetModel();
        endResetModel();
    });
    auto refreshRow = [this](int row) {
        if (extraColumns() > 0)
            emit dataChanged(index(row, sourceColumns()), index(row, columnCount() - 1));
    };
    connect(&doc_, &Document::pointChanged, this, refreshRow);
}

int ComparePointsProxy::sourceColumns() const {
    return sourceModel() ? sourceModel()->columnCount() : 0;
}

int ComparePointsProxy::extraColumns() const {
    return std::max(0, static_cast<int>(doc_.substances().size()) - 1);
}

int ComparePointsProxy::columnCount(const QModelIndex &parent) const {
    if (parent.isValid()) return 0;
    return sourceColumns() + extraColumns();
}

QModelIndex ComparePointsProxy::index(int row, int column, const QModelIndex &parent) const {
    if (parent.isValid() || row < 0 || column < 0 || row >= rowCount() || column >= columnCount())
        return {};
    if (column < sourceColumns()) return QIdentityProxyModel::index(row, column, parent);
    return createIndex(row, column);
}

QModelIndex ComparePointsProxy::parent(const QModelIndex &) const { return {}; }

QModelIndex ComparePointsProxy::sibling(int row, int column, const QModelIndex &) const {
    return index(row, column);
}

QModelIndex ComparePointsProxy::mapToSource(const QModelIndex &proxyIndex) const {
    if (!proxyIndex.isValid() || proxyIndex.column() >= sourceColumns()) return {};
    return QIdentityProxyModel::mapToSource(proxyIndex);
}

QVariant ComparePointsProxy::extraData(int row, int substance, int role) const {
    if (role != Qt::DisplayRole && role != Qt::ToolTipRole) return {};
    const auto &d = doc_.substances().at(static_cast<std::size_t>(substance));
    if (!d || row < 0 || row >= doc_.pointCount()) return {};
    const StatePoint &p = doc_.point(row);
    try {
        const Classification c = classify(*d, p.T_K, p.P_Pa);
        if (role == Qt::DisplayRole) return phaseText(c);
        return tr("%1 at this point: %2 (nearest boundary: %3)")
            .arg(QString::fromStdString(d->substance().name), phaseText(c),
                 QString::fromStdString(c.nearestLabel));
    } catch (const pw::Error &e) {
        return role == Qt::DisplayRole ? tr("unknown") : QString::fromUtf8(e.what());
    }
}

QVariant ComparePointsProxy::data(const QModelIndex &idx, int role) const {
    if (!idx.isValid()) return {};
    if (idx.column() < sourceColumns()) return QIdentityProxyModel::data(idx, role);
    return extraData(idx.row(), idx.column() - sourceColumns() + 1, role);
}

QVariant ComparePointsProxy::headerData(int section, Qt::Orientation o, int role) const {
    const bool named = o == Qt::Horizontal && role == Qt::DisplayRole && extraColumns() > 0;
    if (named && (section == phaseColumn_ || section >= sourceColumns())) {
        const int s = section == phaseColumn_ ? 0 : section - sourceColumns() + 1;
        const auto &d = doc_.substances().at(static_cast<std::size_t>(s));
        return tr("Phase: %1").arg(d ? QString::fromStdString(d->substance().name) : QString());
    }
    if (o == Qt::Horizontal && section >= sourceColumns()) return {};
    return QIdentityProxyModel::headerData(section, o, role);
}

Qt::ItemFlags ComparePointsProxy::flags(const QModelIndex &idx) const {
    if (idx.isValid() && idx.column() >= sourceColumns())
        return Qt::ItemIsEnabled | Qt::ItemIsSelectable;
    return QIdentityProxyModel::flags(idx);
}

}  // namespace pw::ui
