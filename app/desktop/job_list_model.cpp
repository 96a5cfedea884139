#include "app/desktop/job_list_model.hpp"

#include <algorithm>
#include <limits>

#include "app/desktop/workspace.hpp"

namespace mendwright::desktop {

JobListModel::JobListModel(QObject* parent) : QAbstractListModel(parent) {
    if (Workspace* workspace = Workspace::instance())
        connect(workspace, &Workspace::jobsChanged, this, &JobListModel::reload);
    reload();
}

int JobListModel::count() const {
    return static_cast<int>(std::min<long long>(pages_.total(), std::numeric_limits<int>::max()));
}

int JobListModel::rowCount(const QModelIndex& parent) const { return parent.isValid() ? 0 : count(); }

const store::JobSummary* JobListModel::line(int row) const {
    Workspace* workspace = Workspace::instance();
    if (!workspace) return nullptr;
    const store::JobSummary* found = pages_.line(workspace->store(), row);
    if (!found && pages_.error()) workspace->setErrorText(QString::fromStdString(pages_.error()->to_string()));
    return found;
}

QVariant JobListModel::data(const QModelIndex& index, int role) const {
    if (!checkIndex(index, CheckIndexOption::IndexIsValid | CheckIndexOption::ParentIsInvalid)) return {};
    if (role != Qt::DisplayRole && (role < JobIdRole || role > OverdueRole)) return {};
    const store::JobSummary* found = line(index.row());
    if (!found) return {};
    const store::JobSummary& job = *found;
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

void JobListModel::reload() {
    Workspace* workspace = Workspace::instance();
    beginResetModel();
    if (workspace) {
        if (auto total = pages_.reset(workspace->store(), query_); !total)
            workspace->setErrorText(QString::fromStdString(total.error().to_string()));
    }
    endResetModel();
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
    if (size < 1 || size == pages_.page_lines()) return;
    beginResetModel();  // the rows stay, but views must ask for them again
    pages_.set_page_lines(size);
    endResetModel();
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
    const store::JobSummary* found = line(row);
    return found ? found->id : -1;
}

}  // namespace mendwright::desktop
