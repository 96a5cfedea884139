#include "app/desktop/job_pages.hpp"

#include <QString>

namespace mendwright::desktop {

namespace {

// Open urgent items reported by the latest assessment, per job (as JobStore::list_jobs counts them).
const char* const open_items_by_job =
    "SELECT job_id, COUNT(*) AS urgent_open, MIN(due) AS next_due FROM urgent_items"
    " WHERE state = 'open' AND absent_since_revision IS NULL GROUP BY job_id";

struct Sql {
    QString text;
    std::vector<QVariant> values;
};

Sql filtered(const QString& columns, const JobQuery& query, const Date& today) {
    const bool inner = query.urgent_only || query.overdue_only;
    Sql sql{QStringLiteral("SELECT %1 FROM jobs j %2 JOIN (%3) u ON u.job_id = j.id")
                .arg(columns, inner ? QStringLiteral("INNER") : QStringLiteral("LEFT"), QString::fromLatin1(open_items_by_job)),
            {}};
    QStringList where;
    if (query.overdue_only) {
        where << QStringLiteral("u.next_due < ?");
        sql.values.push_back(store::sql_date(today));
    }
    if (query.status) {
        where << QStringLiteral("j.status = ?");
        sql.values.push_back(store::sql_text(store::status_text(*query.status)));
    }
    if (!query.search.empty()) {
        where << QStringLiteral("(LOWER(j.reference) LIKE ? OR LOWER(j.client) LIKE ? OR LOWER(j.site) LIKE ?)");
        QString pattern = QString::fromStdString(query.search).toLower();
        pattern.replace(QLatin1Char('%'), QString()).replace(QLatin1Char('_'), QString());
        pattern = QLatin1Char('%') + pattern + QLatin1Char('%');
        for (int i = 0; i < 3; ++i) sql.values.emplace_back(pattern);
    }
    if (!where.isEmpty()) sql.text += QStringLiteral(" WHERE ") + where.join(QStringLiteral(" AND "));
    return sql;
}

}  // namespace

store::Outcome<long long> count_jobs(store::Connection& connection, const JobQuery& query, const Date& today) {
    Sql sql = filtered(QStringLiteral("COUNT(*)"), query, today);
    auto rows = connection.run(sql.text, sql.values, "counting jobs");
    if (!rows) return rows.error();
    if (!rows->next()) return 0LL;
    return rows->value(0).toLongLong();
}

store::Outcome<std::vector<store::JobSummary>> job_page(store::Connection& connection, const JobQuery& query,
                                                        const Date& today, long long offset, int limit) {
    Sql sql = filtered(QStringLiteral("j.id, j.reference, j.client, j.site, j.status, u.urgent_open, u.next_due"), query, today);
    // Overdue first is earliest due first: an overdue job's next due date is before today.
    sql.text += QStringLiteral(" ORDER BY (u.urgent_open IS NULL), (u.next_due IS NULL), u.next_due, j.id LIMIT ? OFFSET ?");
    sql.values.emplace_back(limit);
    sql.values.emplace_back(offset);
    auto rows = connection.run(sql.text, sql.values, "listing jobs");
    if (!rows) return rows.error();
    std::vector<store::JobSummary> page;
    while (rows->next()) {
        store::JobSummary line;
        line.id = rows->value(0).toLongLong();
        line.reference = store::text_of(rows->value(1));
        line.client = store::text_of(rows->value(2));
        line.site = store::text_of(rows->value(3));
        line.status = store::parse_status(store::text_of(rows->value(4))).value_or(store::JobStatus::surveyed);
        line.urgent_open = rows->value(5).isNull() ? 0 : rows->value(5).toInt();
        line.next_due = store::date_of(rows->value(6));
        line.overdue = line.next_due && *line.next_due < today;
        page.push_back(std::move(line));
    }
    return page;
}

}  // namespace mendwright::desktop
