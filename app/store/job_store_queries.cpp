// Reading the store: one job, one revision, job lists and the dashboard.
#include <QString>
#include <QStringList>

#include "app/store/job_store.hpp"

namespace mendwright::store {

namespace {

std::string job_field(JobId job) { return "job " + std::to_string(job); }

JobSummary summary_of(const QSqlQuery& row, const Date& today) {
    JobSummary line;
    line.id = row.value(0).toLongLong();
    line.reference = text_of(row.value(1));
    line.client = text_of(row.value(2));
    line.site = text_of(row.value(3));
    line.status = parse_status(text_of(row.value(4))).value_or(JobStatus::surveyed);
    line.urgent_open = row.value(5).isNull() ? 0 : row.value(5).toInt();
    line.next_due = date_of(row.value(6));
    line.overdue = line.urgent_open > 0 && line.next_due && *line.next_due < today;
    return line;
}

// At most this many lines a page: a view shows a few dozen; more is a mistake of the caller.
constexpr int max_page_lines = 10000;

// The WHERE clause (with its values) and the ORDER BY of a job list.
struct ListSql {
    QString where;
    std::vector<QVariant> values;
    QString order;
};

// `text` as a LIKE pattern that finds it anywhere, its % _ and \ taken as plain characters.
QString contains_pattern(const std::string& text) {
    QString pattern = QString::fromStdString(text).toLower();
    pattern.replace(QLatin1Char('\\'), QStringLiteral("\\\\"));
    pattern.replace(QLatin1Char('%'), QStringLiteral("\\%"));
    pattern.replace(QLatin1Char('_'), QStringLiteral("\\_"));
    return QLatin1Char('%') + pattern + QLatin1Char('%');
}

ListSql list_sql(const JobQuery& query, const Date& today, Dialect dialect) {
    ListSql list;
    QStringList where;
    if (query.overdue_only) {
        where << QStringLiteral("urgent_open > 0 AND next_due < ?");
        list.values.push_back(sql_date(today));
    } else if (query.urgent_only) {
        where << QStringLiteral("urgent_open > 0");
    }
    if (query.status) {
        where << QStringLiteral("status = ?");
        list.values.push_back(sql_text(status_text(*query.status)));
    }
    if (!query.search.empty()) {
        // The pattern is in lower case. PostgreSQL's LIKE minds case: LOWER the columns too.
        // SQLite's LIKE ignores ASCII case already (sqlite.org/lang_expr.html, "The LIKE, GLOB,
        // REGEXP, MATCH, and extract operators"), and without LOWER a search of 100,000 jobs
        // takes half the time (docs/benchmarks.md, "Desktop").
        if (dialect == Dialect::postgresql)
            where << QStringLiteral("(LOWER(reference) LIKE ? ESCAPE '\\' OR LOWER(client) LIKE ? ESCAPE '\\'"
                                    " OR LOWER(site) LIKE ? ESCAPE '\\')");
        else
            where << QStringLiteral("(reference LIKE ? ESCAPE '\\' OR client LIKE ? ESCAPE '\\' OR site LIKE ? ESCAPE '\\')");
        const QString pattern = contains_pattern(query.search);
        for (int i = 0; i < 3; ++i) list.values.emplace_back(pattern);
    }
    if (!where.isEmpty()) list.where = QStringLiteral(" WHERE ") + where.join(QStringLiteral(" AND "));
    // Each job carries its count of open urgent items and their earliest due date (kept by
    // every write, migration 3). Overdue first is the same as earliest due first: an overdue
    // job's next due date is before today, every other job's is not. Each order is that of an
    // index (jobs_with_urgent_items for the urgent jobs, jobs_in_list_order for all, migration
    // 4), so a page reads only its own rows and those before it.
    list.order = query.urgent_only || query.overdue_only
                     ? QStringLiteral("(next_due IS NULL), next_due, id")
                     : QStringLiteral("(urgent_open = 0), (next_due IS NULL), next_due, id");
    return list;
}

}  // namespace

Outcome<JobDetail> JobStore::job(JobId id) {
    JobDetail detail;
    detail.id = id;
    // One read transaction, so that the parts agree with each other.
    auto transaction = Transaction::begin(*connection_, TransactionKind::read);
    if (!transaction) return transaction.error();
    {
        auto row = connection_->run(
            QStringLiteral("SELECT reference, client, site, occupancy, inspection_date, inspector, status, created_on,"
                           " latest_revision FROM jobs WHERE id = ?"),
            {QVariant(id)}, "reading " + job_field(id));
        if (!row) return row.error();
        if (!row->next()) return store_error(ErrorKind::not_found, job_field(id), "no such job in the store");
        detail.facts.reference = text_of(row->value(0));
        detail.facts.client = text_of(row->value(1));
        detail.facts.site = text_of(row->value(2));
        detail.facts.occupancy = text_of(row->value(3));
        detail.facts.inspection_date = date_of(row->value(4)).value_or(Date{});
        detail.facts.inspector = text_of(row->value(5));
        detail.status = parse_status(text_of(row->value(6))).value_or(JobStatus::surveyed);
        detail.created_on = date_of(row->value(7)).value_or(Date{});
        detail.latest_revision = row->value(8).toInt();
    }
    {
        auto rows = connection_->run(
            QStringLiteral("SELECT status, changed_on, note FROM job_status_changes WHERE job_id = ? ORDER BY id"),
            {QVariant(id)}, "reading the history of " + job_field(id));
        if (!rows) return rows.error();
        while (rows->next())
            detail.history.push_back({parse_status(text_of(rows->value(0))).value_or(JobStatus::surveyed),
                                      date_of(rows->value(1)).value_or(Date{}), text_of(rows->value(2))});
    }
    {
        auto rows = connection_->run(
            QStringLiteral("SELECT finding_id, code, title, location, due, due_text, state, remedied_on, remedied_note,"
                           " retested_on, retested_note, first_revision FROM urgent_items"
                           " WHERE job_id = ? AND absent_since_revision IS NULL"
                           " ORDER BY (due IS NULL), due, finding_id"),
            {QVariant(id)}, "reading the urgent items of " + job_field(id));
        if (!rows) return rows.error();
        while (rows->next()) {
            UrgentItem item;
            item.finding_id = text_of(rows->value(0));
            item.code = text_of(rows->value(1));
            item.title = text_of(rows->value(2));
            item.location = text_of(rows->value(3));
            item.due = date_of(rows->value(4));
            item.due_text = text_of(rows->value(5));
            item.state = parse_urgent_state(text_of(rows->value(6))).value_or(UrgentState::open);
            item.remedied_on = date_of(rows->value(7));
            item.remedied_note = text_of(rows->value(8));
            item.retested_on = date_of(rows->value(9));
            item.retested_note = text_of(rows->value(10));
            item.first_revision = rows->value(11).toInt();
            detail.urgent_items.push_back(std::move(item));
        }
    }
    {
        auto rows = connection_->run(
            QStringLiteral("SELECT finding_id, rule, code, title, location, clause, explanation, urgent, due, due_text"
                           " FROM findings WHERE job_id = ? ORDER BY finding_id"),
            {QVariant(id)}, "reading the findings of " + job_field(id));
        if (!rows) return rows.error();
        while (rows->next()) {
            FindingRecord finding;
            finding.id = text_of(rows->value(0));
            finding.rule = text_of(rows->value(1));
            finding.code = text_of(rows->value(2));
            finding.title = text_of(rows->value(3));
            finding.location = text_of(rows->value(4));
            finding.clause = text_of(rows->value(5));
            finding.explanation = text_of(rows->value(6));
            finding.urgent = rows->value(7).toInt() != 0;
            finding.due = date_of(rows->value(8));
            finding.due_text = text_of(rows->value(9));
            detail.findings.push_back(std::move(finding));
        }
    }
    {
        auto rows = connection_->run(
            QStringLiteral("SELECT revision, based_on, saved_on FROM survey_revisions WHERE job_id = ? ORDER BY revision"),
            {QVariant(id)}, "reading the revisions of " + job_field(id));
        if (!rows) return rows.error();
        while (rows->next()) {
            RevisionInfo info;
            info.number = rows->value(0).toInt();
            if (!rows->value(1).isNull()) info.based_on = rows->value(1).toInt();
            info.saved_on = date_of(rows->value(2)).value_or(Date{});
            detail.revisions.push_back(info);
        }
    }
    if (schema_version_ >= 2) {
        auto rows = connection_->run(
            QStringLiteral("SELECT number, revision, plan, net_pence, tax_pence, total_pence, issued_on, file_path"
                           " FROM quotes WHERE job_id = ? ORDER BY id"),
            {QVariant(id)}, "reading the quotes of " + job_field(id));
        if (!rows) return rows.error();
        while (rows->next()) {
            QuoteRecord quote;
            quote.number = text_of(rows->value(0));
            quote.revision = rows->value(1).toInt();
            quote.plan = text_of(rows->value(2));
            quote.net_pence = rows->value(3).toLongLong();
            quote.tax_pence = rows->value(4).toLongLong();
            quote.total_pence = rows->value(5).toLongLong();
            quote.issued_on = date_of(rows->value(6)).value_or(Date{});
            quote.file_path = text_of(rows->value(7));
            detail.quotes.push_back(std::move(quote));
        }
    }
    if (auto committed = (*transaction)->commit(); !committed) return committed.error();
    return detail;
}

Outcome<Revision> JobStore::revision(JobId job, int number) {
    auto row = connection_->run(
        QStringLiteral("SELECT based_on, saved_on, document FROM survey_revisions WHERE job_id = ? AND revision = ?"),
        {QVariant(job), number}, "reading revision " + std::to_string(number) + " of " + job_field(job));
    if (!row) return row.error();
    if (!row->next()) {
        row->finish();
        if (auto latest = latest_revision(job); !latest) return latest.error();
        return store_error(ErrorKind::not_found, job_field(job), "no revision " + std::to_string(number));
    }
    Revision revision;
    revision.info.number = number;
    if (!row->value(0).isNull()) revision.info.based_on = row->value(0).toInt();
    revision.info.saved_on = date_of(row->value(1)).value_or(Date{});
    revision.document = text_of(row->value(2));
    return revision;
}

Outcome<std::vector<JobSummary>> JobStore::list_jobs(const JobFilter& filter) {
    JobQuery query;
    query.urgent_only = filter.urgent_only;
    query.overdue_only = filter.overdue_only;
    return read_job_lines(query, 0, filter.limit, "listing jobs");
}

Outcome<std::vector<JobSummary>> JobStore::job_page(const JobQuery& query, long long offset, int limit) {
    if (offset < 0)
        return store_error(ErrorKind::invalid_input, "offset", "expected a line number of 0 or more, got " + std::to_string(offset));
    if (limit < 1 || limit > max_page_lines)
        return store_error(ErrorKind::invalid_input, "limit",
                           "expected 1 to " + std::to_string(max_page_lines) + " lines a page, got " + std::to_string(limit));
    return read_job_lines(query, offset, limit, "reading a page of the job list");
}

Outcome<long long> JobStore::job_count(const JobQuery& query) {
    if (schema_version_ < 3)
        return store_error(ErrorKind::invalid_input, url().display(), "job lists need schema version 3 or later");
    const ListSql list = list_sql(query, clock_(), connection_->dialect());
    auto rows = connection_->run(QStringLiteral("SELECT COUNT(*) FROM jobs") + list.where, list.values, "counting jobs");
    if (!rows) return rows.error();
    if (!rows->next()) return 0LL;
    return rows->value(0).toLongLong();
}

Outcome<std::vector<JobSummary>> JobStore::read_job_lines(const JobQuery& query, long long offset,
                                                          std::optional<int> limit, const std::string& what) {
    if (schema_version_ < 3)
        return store_error(ErrorKind::invalid_input, url().display(), "job lists need schema version 3 or later");
    const Date today = clock_();
    ListSql list = list_sql(query, today, connection_->dialect());
    QString sql = QStringLiteral("SELECT id, reference, client, site, status, urgent_open, next_due FROM jobs") + list.where +
                  QStringLiteral(" ORDER BY ") + list.order;
    if (limit) {
        sql += QStringLiteral(" LIMIT ?");
        list.values.emplace_back(*limit);
    }
    if (offset > 0) {
        // SQLite takes OFFSET only after a LIMIT; a limit is always given with an offset.
        sql += QStringLiteral(" OFFSET ?");
        list.values.emplace_back(static_cast<qlonglong>(offset));
    }
    auto rows = connection_->run(sql, list.values, what);
    if (!rows) return rows.error();
    std::vector<JobSummary> lines;
    if (limit) lines.reserve(static_cast<std::size_t>(*limit));
    while (rows->next()) lines.push_back(summary_of(*rows, today));
    return lines;
}

Outcome<Dashboard> JobStore::dashboard(std::optional<int> limit) {
    Dashboard board;
    auto transaction = Transaction::begin(*connection_, TransactionKind::read);
    if (!transaction) return transaction.error();
    auto urgent = list_jobs(JobFilter{true, false, limit});
    if (!urgent) return urgent.error();
    board.urgent_jobs = std::move(*urgent);
    for (JobStatus status : all_statuses()) board.jobs_by_status[status_text(status)] = 0;
    {
        auto rows = connection_->run(QStringLiteral("SELECT status, jobs FROM job_status_counts"), {},
                                     "reading the counts of jobs by status");
        if (!rows) return rows.error();
        while (rows->next()) board.jobs_by_status[text_of(rows->value(0))] = rows->value(1).toLongLong();
    }
    for (const char* code : {"C1", "C2", "FI"}) board.open_items_by_code[code] = 0;
    {
        auto rows = connection_->run(
            QStringLiteral("SELECT code, COUNT(*), SUM(CASE WHEN due < ? THEN 1 ELSE 0 END) FROM urgent_items"
                           " WHERE state = 'open' AND absent_since_revision IS NULL GROUP BY code"),
            {sql_date(clock_())}, "counting open urgent items by code");
        if (!rows) return rows.error();
        while (rows->next()) {
            board.open_items_by_code[text_of(rows->value(0))] = rows->value(1).toLongLong();
            board.overdue_items += rows->value(2).toLongLong();
        }
    }
    if (auto committed = (*transaction)->commit(); !committed) return committed.error();
    return board;
}

}  // namespace mendwright::store
