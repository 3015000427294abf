#include "widgets/points_model.h"

#include <QBrush>
#include <QFont>

#include "core/errors.h"
#include "widgets/commands.h"
#include "widgets/format.h"

namespace pw::ui {

PointsModel::PointsModel(Document &doc, Settings &settings, QObject *parent)
    : QAbstractTableModel(parent), doc_(doc), settings_(settings) {
    reclassifyAll();
    connect(&doc_, &Document::pointsInserted, this, [this](int row, int count) {
        beginInsertRows({}, row, row + count - 1);
        for (int i = 0; i < count; ++i)
            cache_.insert(cache_.begin() + row + i, classifyPoint(doc_.point(row + i)));
        endInsertRows();
    });
    connect(&doc_, &Document::pointsRemoved, this, [this](int row, int count) {
        beginRemoveRows({}, row, row + count - 1);
        cache_.erase(cache_.begin() + row, cache_.begin() + row + count);
        endRemoveRows();
    });
    connect(&doc_, &Document::pointChanged, this, [this](int row) {
        cache_[static_cast<std::size_t>(row)] = classifyPoint(doc_.point(row));
        emit dataChanged(index(row, 0), index(row, Count - 1));
    });
    connect(&doc_, &Document::pointMoved, this, [this](int from, int to) {
        beginMoveRows({}, from, from, {}, to > from ? to + 1 : to);
        Classification c = cache_[static_cast<std::size_t>(from)];
        cache_.erase(cache_.begin() + from);
        cache_.insert(cache_.begin() + to, std::move(c));
        endMoveRows();
    });
    connect(&doc_, &Document::pointsReset, this, [this] {
        beginResetModel();
        reclassifyAll();
        endResetModel();
    });
    connect(&doc_, &Document::substancesChanged, this, [this] {
        reclassifyAll();
        if (rowCount() > 0) emit dataChanged(index(0, 0), index(rowCount() - 1, Count - 1));
    });
    connect(&settings_, &Settings::unitsChanged, this, [this] {
        emit headerDataChanged(Qt::Horizontal, 0, Count - 1);
        if (rowCount() > 0) emit dataChanged(index(0, 0), index(rowCount() - 1, Count - 1));
    });
}

void PointsModel::reclassifyAll() {
    cache_.clear();
    for (const auto &p : doc_.points()) cache_.push_back(classifyPoint(p));
}

Classification PointsModel::classifyPoint(const StatePoint &p) const {
    Classification c;
    const DiagramPtr d = doc_.primary();
    if (!d) {
        c.reason = "no substance chosen";
        return c;
    }
    try {
        return classify(*d, p.T_K, p.P_Pa);
    } catch (const pw::Error &e) {
        c.reason = e.what();
        return c;
    }
}

const Classification &PointsModel::classification(int row) const {
    return cache_.at(static_cast<std::size_t>(row));
}

int PointsModel::rowCount(const QModelIndex &parent) const {
    // The model's own rows (the classification cache), not the document's: the document has
    // already changed when it signals, and the rows may change only inside begin/end*Rows.
    return parent.isValid() ? 0 : static_cast<int>(cache_.size());
}
int PointsModel::columnCount(const QModelIndex &parent) const {
    return parent.isValid() ? 0 : Count;
}

QVariant PointsModel::display(int row, int column) const {
    const StatePoint &p = doc_.point(row);
    const Classification &c = classification(row);
    const DisplayUnits u = settings_.units();
    switch (column) {
        case Label:
            return p.label;
        case Temperature:
            return temperatureText(p.T_K, u.temperature);
        case Pressure:
            return pressureText(p.P_Pa, u.pressure);
        case PhaseCol:
            return phaseText(c);
        case Nearest:
            return QString::fromStdString(c.nearestLabel);
        case DeltaT:
            return deltaTemperatureText(c.dT_K, u.temperature);
        case DeltaP:
            return deltaPressureText(c.dP_Pa, u.pressure);
        case Flags:
            return QString::fromStdString(flagsText(c));
        default:
            return {};
    }
}

QString PointsModel::tooltip(int row) const {
    const Classification &c = classification(row);
    QString tip = tr("%1: %2").arg(doc_.point(row).label, phaseText(c));
    if (!c.nearestLabel.empty())
        tip += tr("\nNearest boundary: %1").arg(QString::fromStdString(c.nearestLabel));
    if (c.extrapolated) tip += tr("\nA boundary was evaluated outside its validity range.");
    if (c.withinUncertainty) tip += tr("\nWithin the boundary's stated uncertainty.");
    return tip;
}

QVariant PointsModel::data(const QModelIndex &index, int role) const {
    // A view may ask while the document and the cache are between a change and its signal
    // (e.g. during beginRemoveRows): answer only rows both still hold.
    if (!index.isValid() || index.row() >= rowCount() || index.row() >= doc_.pointCount())
        return {};
    const int row = index.row(), col = index.column();
    switch (role) {
        case Qt::DisplayRole:
            return display(row, col);
        case Qt::EditRole:
            return col <= Pressure ? display(row, col) : QVariant();
        case Qt::ToolTipRole:
            return tooltip(row);
        case Qt::TextAlignmentRole:
            return col == Temperature || col == Pressure || col == DeltaT || col == DeltaP
                       ? QVariant(Qt::AlignRight | Qt::AlignVCenter)
                       : QVariant(Qt::AlignLeft | Qt::AlignVCenter);
        case Qt::FontRole:
            if (col == Flags && classification(row).onBoundary) {
                QFont f;
                f.setBold(true);
                return f;
            }
            return {};
        default:
            return {};
    }
}

QVariant PointsModel::headerData(int section, Qt::Orientation o, int role) const {
    if (o == Qt::Vertical) return role == Qt::DisplayRole ? QVariant(section + 1) : QVariant();
    const DisplayUnits u = settings_.units();
    if (role == Qt::ToolTipRole) {
        switch (section) {
            case DeltaT:
                return tr("T minus the nearest boundary's temperature at the same pressure");
            case DeltaP:
                return tr("P minus the nearest boundary's pressure at the same temperature");
            case Flags:
                return tr("on_boundary, within_uncertainty, extrapolated");
            default:
                return {};
        }
    }
    if (role != Qt::DisplayRole) return {};
    const QString dtUnit =
        u.temperature == TemperatureUnit::Celsius ? QStringLiteral("K") : unitLabel(u.temperature);
    switch (section) {
        case Label:
            return tr("Label");
        case Temperature:
            return tr("T [%1]").arg(unitLabel(u.temperature));
        case Pressure:
            return tr("P [%1]").arg(unitLabel(u.pressure));
        case PhaseCol:
            return tr("Phase");
        case Nearest:
            return tr("Nearest boundary");
        case DeltaT:
            return tr("ΔT [%1]").arg(dtUnit);
        case DeltaP:
            return tr("ΔP [%1]").arg(unitLabel(u.pressure));
        case Flags:
            return tr("Flags");
        default:
            return {};
    }
}

Qt::ItemFlags PointsModel::flags(const QModelIndex &index) const {
    Qt::ItemFlags f = QAbstractTableModel::flags(index);
    if (index.isValid() && index.column() <= Pressure) f |= Qt::ItemIsEditable;
    return f;
}

bool PointsModel::setData(const QModelIndex &index, const QVariant &value, int role) {
    if (role != Qt::EditRole || !index.isValid() || index.column() > Pressure) return false;
    StatePoint p = doc_.point(index.row());
    const DisplayUnits u = settings_.units();
    double v = 0.0;
    if (index.column() == Label) {
        const QString label = value.toString().trimmed();
        if (label.isEmpty()) return false;
        p.label = label;
    } else if (!parseNumber(value.toString(), v)) {
        return false;
    } else if (index.column() == Temperature) {
        if (!(toKelvin(v, u.temperature) > 0)) return false;
        p.T_K = toKelvin(v, u.temperature);
    } else {
        if (!(v > 0)) return false;
        p.P_Pa = toPascal(v, u.pressure);
    }
    edit::editPoint(doc_, index.row(), p);
    return true;
}

}  // namespace pw::ui
