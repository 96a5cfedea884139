#include "app/desktop/job_list_model.hpp"

#include "app/desktop/workspace.hpp"

namespace mendwright::desktop {

JobListModel::JobListModel(QObject* parent) : QAbstractListModel(parent) {
    if (Workspace* workspace = Workspace::instance())
        connect(workspace, &Workspace::jobsChanged, this, &JobListModel::reload);
    reload();
}

int JobListModel::rowCount(const QModelIndex& parent) const { return parent.isValid() ? 0 : count(); }

QVariant JobListModel::data(const QModelIndex& index, int role) const {
    if (!checkIndex(index, CheckIndexOption::IndexIsValid | CheckIndexOption::ParentIsInvalid)) return {};
    const store::JobSummary& job = rows_.at(static_cast<std::size_t>(index.row()));
    switch (role) {
    case Qt::DisplayRole:
    case ReferenceRole: return QString::fromStdString(job.reference);
    case JobIdRole: return static_cast<qint64>(job.id);
    case ClientRole: return QString::fromStdString(job.client);
    case SiteRole: return QString::fromStdString(job.site);
    case StatusRole: return QString::fromStdString(store::status_text(job.status));
    case StatusLabelRole: return statusLabel(QString::fromStdString(store::status_text(job.status)));
    case UrgentOpenRole: return job.urgent_open;
    case NextDueRole: return job.next_due ? QString::fromStdString(job.next_due->to_iso()) : QString();
    case OverdueRole: return job.overdue;
    default: return {};
    }
}

QHash<int, QByteArray> JobListModel::roleNames() const {
    return {{JobIdRole, "jobId"},   {ReferenceRole, "reference"},     {ClientRole, "client"},
            {SiteRole, "site"},     {StatusRole, "status"},           {StatusLabelRole, "statusLabel"},
            {UrgentOpenRole, "urgentOpen"}, {NextDueRole, "nextDue"}, {OverdueRole, "overdue"}};
}

bool JobListModel::canFetchMore(const QModelIndex& parent) const {
    return !parent.isValid() && loaded_ && !resetting_ && static_cast<qint64>(rows_.size()) < total_;
}

void JobListModel::fetchMore(const QModelIndex& parent) {
    Workspace* workspace = Workspace::instance();
    if (parent.isValid() || !workspace || resetting_) return;
    auto page = job_page(workspace->store().connection(), query_, workspace->todayDate(),
                         static_cast<long long>(rows_.size()), page_size_);
    if (!page) {
        workspace->setErrorText(QString::fromStdString(page.error().to_string()));
        total_ = static_cast<qint64>(rows_.size());  // stop asking
        Q_EMIT totalCountChanged();
        return;
    }
    if (page->empty()) {
        total_ = static_cast<qint64>(rows_.size());
        Q_EMIT totalCountChanged();
        return;
    }
    const int first = count();
    beginInsertRows({}, first, first + static_cast<int>(page->size()) - 1);
    for (auto& row : *page) rows_.push_back(std::move(row));
    endInsertRows();
    Q_EMIT countChanged();
}

void JobListModel::reload() {
    Workspace* workspace = Workspace::instance();
    beginResetModel();
    rows_.clear();
    total_ = 0;
    loaded_ = false;
    if (workspace) {
        auto total = count_jobs(workspace->store().connection(), query_, workspace->todayDate());
        if (total) {
            total_ = *total;
            loaded_ = true;
        } else {
            workspace->setErrorText(QString::fromStdString(total.error().to_string()));
        }
    }
    resetting_ = true;
    endResetModel();
    resetting_ = false;
    Q_EMIT totalCountChanged();
    Q_EMIT countChanged();
}

void JobListModel::setUrgentOnly(bool on) {
    if (on == query_.urgent_only) return;
    query_.urgent_only = on;
    Q_EMIT filterChanged();
    reload();
}

void JobListModel::setOverdueOnly(bool on) {
    if (on == query_.overdue_only) return;
    query_.overdue_only = on;
    Q_EMIT filterChanged();
    reload();
}

QString JobListModel::status() const {
    return query_.status ? QString::fromStdString(store::status_text(*query_.status)) : QString();
}

void JobListModel::setStatus(const QString& status) {
    std::optional<store::JobStatus> parsed;
    if (!status.isEmpty()) parsed = store::parse_status(status.toStdString());
    if (parsed == query_.status) return;
    query_.status = parsed;
    Q_EMIT filterChanged();
    reload();
}

void JobListModel::setSearch(const QString& text) {
    const std::string search = text.trimmed().toStdString();
    if (search == query_.search) return;
    query_.search = search;
    Q_EMIT filterChanged();
    reload();
}

void JobListModel::setPageSize(int size) {
    if (size < 1 || size == page_size_) return;
    page_size_ = size;
    Q_EMIT pageSizeChanged();
}

QStringList JobListModel::statuses() {
    QStringList list;
    for (auto status : store::all_statuses()) list << QString::fromStdString(store::status_text(status));
    return list;
}

QString JobListModel::statusLabel(const QString& status) {
    QString label = status;
    return label.replace(QLatin1Char('_'), QLatin1Char(' '));
}

qint64 JobListModel::jobIdAt(int row) const {
    if (row < 0 || row >= count()) return -1;
    return rows_.at(static_cast<std::size_t>(row)).id;
}

}  // namespace mendwright::desktop
