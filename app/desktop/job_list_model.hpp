#pragma once
// The jobs list: every job with client, site, status, open urgent items and the next due date,
// overdue first; filtered (urgent only, overdue, status) and searched. Rows arrive a page at a
// time (canFetchMore/fetchMore), so a store of 100,000 jobs shows its first rows at once.

#include <QAbstractListModel>
#include <QtQml/qqmlregistration.h>
#include <vector>

#include "app/desktop/job_pages.hpp"

namespace mendwright::desktop {

class JobListModel : public QAbstractListModel {
    Q_OBJECT
    QML_ELEMENT
    Q_PROPERTY(bool urgentOnly READ urgentOnly WRITE setUrgentOnly NOTIFY filterChanged)
    Q_PROPERTY(bool overdueOnly READ overdueOnly WRITE setOverdueOnly NOTIFY filterChanged)
    Q_PROPERTY(QString status READ status WRITE setStatus NOTIFY filterChanged)  // "" = every status
    Q_PROPERTY(QString search READ search WRITE setSearch NOTIFY filterChanged)
    Q_PROPERTY(qint64 totalCount READ totalCount NOTIFY totalCountChanged)  // matching jobs, loaded or not
    Q_PROPERTY(int count READ count NOTIFY countChanged)                    // rows loaded
    Q_PROPERTY(int pageSize READ pageSize WRITE setPageSize NOTIFY pageSizeChanged)
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
    [[nodiscard]] bool canFetchMore(const QModelIndex& parent) const override;
    void fetchMore(const QModelIndex& parent) override;

    [[nodiscard]] bool urgentOnly() const { return query_.urgent_only; }
    void setUrgentOnly(bool on);
    [[nodiscard]] bool overdueOnly() const { return query_.overdue_only; }
    void setOverdueOnly(bool on);
    [[nodiscard]] QString status() const;
    void setStatus(const QString& status);
    [[nodiscard]] QString search() const { return QString::fromStdString(query_.search); }
    void setSearch(const QString& text);
    [[nodiscard]] qint64 totalCount() const { return total_; }
    [[nodiscard]] int count() const { return static_cast<int>(rows_.size()); }
    [[nodiscard]] int pageSize() const { return page_size_; }
    void setPageSize(int size);
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
    JobQuery query_;
    std::vector<store::JobSummary> rows_;
    qint64 total_ = 0;
    int page_size_ = 100;
    bool loaded_ = false;
    bool resetting_ = false;  // while the reset is announced: fetchMore waits for the view's next pass
};

}  // namespace mendwright::desktop
