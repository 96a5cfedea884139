#include "app/desktop/record_list_model.hpp"

namespace mendwright::desktop {

RecordListModel::RecordListModel(QStringList roles, QObject* parent)
    : QAbstractListModel(parent), roles_(std::move(roles)) {}

int RecordListModel::rowCount(const QModelIndex& parent) const {
    return parent.isValid() ? 0 : static_cast<int>(rows_.size());
}

QVariant RecordListModel::data(const QModelIndex& index, int role) const {
    if (!checkIndex(index, CheckIndexOption::IndexIsValid | CheckIndexOption::ParentIsInvalid)) return {};
    const int key = role - Qt::UserRole - 1;
    if (role == Qt::DisplayRole) return rows_.at(index.row()).value(roles_.value(0));
    if (key < 0 || key >= roles_.size()) return {};
    return rows_.at(index.row()).value(roles_.at(key));
}

QHash<int, QByteArray> RecordListModel::roleNames() const {
    QHash<int, QByteArray> names;
    for (int i = 0; i < roles_.size(); ++i) names.insert(Qt::UserRole + 1 + i, roles_.at(i).toUtf8());
    return names;
}

QVariantMap RecordListModel::get(int row) const {
    if (row < 0 || row >= rows_.size()) return {};
    return rows_.at(row);
}

int RecordListModel::indexOf(const QString& role, const QVariant& value) const {
    for (int i = 0; i < rows_.size(); ++i)
        if (rows_.at(i).value(role) == value) return i;
    return -1;
}

void RecordListModel::setRows(QList<QVariantMap> rows) {
    if (rows.size() == rows_.size() && !rows_.isEmpty()) {
        for (int i = 0; i < rows.size(); ++i) {
            if (rows.at(i) == rows_.at(i)) continue;
            rows_[i] = std::move(rows[i]);
            Q_EMIT dataChanged(index(i), index(i));
        }
        return;
    }
    beginResetModel();
    rows_ = std::move(rows);
    endResetModel();
    Q_EMIT countChanged();
}

}  // namespace mendwright::desktop
