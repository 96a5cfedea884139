#pragma once
// The jobs list: every job with client, site, status, open urgent items and the next due date,
// overdue first; filtered (urgent only, overdue, status) and searched. The model has a row for
// every matching job (one count), but reads a row's page only when a view asks for the row, and
// keeps a few pages (JobPages): a store of 100,000 jobs shows its first rows at once and scrolls
// to its last without reading the ones between.

#include <QAbstractListModel>
#include <QtQml/qqmlregistration.h>

#include "app/desktop/job_pages.hpp"

namespace mendwright::desktop {

class JobListModel : public QAbstractListModel {
    Q_OBJECT
    QML_ELEMENT
    Q_PROPERTY(bool urgentOnly READ urgentOnly WRITE setUrgentOnly NOTIFY filterChanged)
    Q_PROPERTY(bool overdueOnly READ overdueOnly WRITE setOverdueOnly NOTIFY filterChanged)
    Q_PROPERTY(QString status READ status WRITE setStatus NOTIFY filterChanged)  // "" = every status
    Q_PROPERTY(QString search READ search WRITE setSearch NOTIFY filterChanged)
    Q_PROPERTY(qint64 totalCount READ totalCount NOTIFY totalCountChanged)  // matching jobs
    Q_PROPERTY(int count READ count NOTIFY countChanged)                    // rows (totalCount, up to INT_MAX)
    Q_PROPERTY(int pageSize READ pageSize WRITE setPageSize NOTIFY pageSizeChanged)
    Q_PROPERTY(qint64 linesRead READ linesRead)                             // read from the store since the last reload
    Q_PROPERTY(QStringList statuses READ statuses CONSTANT)

public:
    enum Role {
        JobIdRole = Qt::UserRole + 1, ReferenceRole, ClientRole, SiteRole, StatusRole, StatusLabelRole,
        UrgentOpenRole, NextDueRole, OverdueRole
    };

    explicit JobListModel(QObject* parent = nullptr);

    [[nodiscard]] int rowCount(const QModelIndex& parent = {}) const override;
    [[nodiscard]] QVariant data(const QModelIndex& index, int role) const override;
    [[nodiscard]] QHash<int, QByteArray> roleNames() const override;

    [[nodiscard]] bool urgentOnly() const { return query_.urgent_only; }
    void setUrgentOnly(bool on);
    [[nodiscard]] bool overdueOnly() const { return query_.overdue_only; }
    void setOverdueOnly(bool on);
    [[nodiscard]] QString status() const;
    void setStatus(const QString& status);
    [[nodiscard]] QString search() const { return QString::fromStdString(query_.search); }
    void setSearch(const QString& text);
    [[nodiscard]] qint64 totalCount() const { return pages_.total(); }
    [[nodiscard]] int count() const;
    [[nodiscard]] int pageSize() const { return pages_.page_lines(); }
    void setPageSize(int size);
    [[nodiscard]] qint64 linesRead() const { return pages_.lines_read(); }
    [[nodiscard]] qint64 linesKept() const { return pages_.lines_kept(); }
    [[nodiscard]] static QStringList statuses();
    // Readable words of a status: "in_progress" -> "in progress".
    Q_INVOKABLE static QString statusLabel(const QString& status);

    Q_INVOKABLE void reload();
    Q_INVOKABLE qint64 jobIdAt(int row) const;

Q_SIGNALS:
    void filterChanged();
    void totalCountChanged();
    void countChanged();
    void pageSizeChanged();

private:
    // The line of `row`, read if need be; nullptr (and the workspace's error text) if it cannot be.
    const store::JobSummary* line(int row) const;

    store::JobQuery query_;
    mutable JobPages pages_;  // reading a row's page is not a change of the model
};

}  // namespace mendwright::desktop
