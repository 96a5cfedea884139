#pragma once
// A read-only list of rows for QML, each row a map of named values (the role names). The job
// session fills one per view (findings, options, plans, works lines, urgent items, circuits,
// observations, chart series) with rows it has worked out; QML only shows them.
//
// Replacing rows of the same count updates them in place (dataChanged), so that an edit in a
// delegate does not tear the list down under the user's cursor.

#include <QAbstractListModel>
#include <QStringList>
#include <QVariantMap>
#include <QtQml/qqmlregistration.h>

namespace mendwright::desktop {

class RecordListModel : public QAbstractListModel {
    Q_OBJECT
    QML_ANONYMOUS
    Q_PROPERTY(int count READ count NOTIFY countChanged)

public:
    explicit RecordListModel(QStringList roles, QObject* parent = nullptr);

    [[nodiscard]] int rowCount(const QModelIndex& parent = {}) const override;
    [[nodiscard]] QVariant data(const QModelIndex& index, int role) const override;
    [[nodiscard]] QHash<int, QByteArray> roleNames() const override;

    [[nodiscard]] int count() const { return static_cast<int>(rows_.size()); }
    // The row as a map (empty for a row that does not exist).
    Q_INVOKABLE QVariantMap get(int row) const;
    // The first row whose `role` equals `value`, or -1.
    Q_INVOKABLE int indexOf(const QString& role, const QVariant& value) const;

    void setRows(QList<QVariantMap> rows);
    [[nodiscard]] const QList<QVariantMap>& rows() const { return rows_; }

Q_SIGNALS:
    void countChanged();

private:
    QStringList roles_;
    QList<QVariantMap> rows_;
};

}  // namespace mendwright::desktop
