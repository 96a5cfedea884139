#include "bench/store/synthetic_store.hpp"

#include <QSqlError>
#include <QSqlQuery>
#include <cstdio>
#include <cstring>
#include <random>

namespace mendwright::store {

namespace {

constexpr int findings_per_job = 10;

bool run(QSqlQuery& query) {
    if (query.exec()) return true;
    std::fprintf(stderr, "synthetic store: %s\n", query.lastError().text().toUtf8().constData());
    return false;
}

}  // namespace

bool fill_synthetic_store(JobStore& store, int job_count, const Date& today) {
    QSqlDatabase db = store.connection().database();
    QSqlQuery(db).exec(QStringLiteral("PRAGMA synchronous = OFF"));
    if (!db.transaction()) return false;
    QSqlQuery job(db), change(db), revision(db), finding(db), item(db);
    job.prepare(QStringLiteral(
        "INSERT INTO jobs (id, reference, client, site, occupancy, inspection_date, inspector, status, created_on,"
        " latest_revision) VALUES (?, ?, ?, ?, 'owner_occupied_dwelling', ?, 'Invented Inspector', ?, ?, 1)"));
    change.prepare(QStringLiteral("INSERT INTO job_status_changes (job_id, status, changed_on, note) VALUES (?, ?, ?, '')"));
    revision.prepare(QStringLiteral(
        "INSERT INTO survey_revisions (job_id, revision, based_on, saved_on, document) VALUES (?, 1, NULL, ?, ?)"));
    finding.prepare(QStringLiteral(
        "INSERT INTO findings (job_id, finding_id, revision, rule, code, title, location, clause, explanation, urgent,"
        " due, due_text) VALUES (?, ?, 1, ?, ?, 'Invented finding', 'Consumer unit (invented)', 'invented', '', ?, ?, ?)"));
    item.prepare(QStringLiteral(
        "INSERT INTO urgent_items (job_id, finding_id, code, title, location, due, due_text, state, first_revision,"
        " absent_since_revision, remedied_on, remedied_note, retested_on, retested_note)"
        " VALUES (?, ?, ?, 'Invented finding', 'Consumer unit (invented)', ?, ?, ?, 1, NULL, ?, '', ?, '')"));
    std::mt19937 random(42);
    const char* pipeline[] = {"surveyed", "quoted", "accepted", "in_progress"};
    const QString document = QStringLiteral("{\"format\": \"mendwright-survey\", \"version\": 1, \"invented\": true}");
    for (int id = 1; id <= job_count; ++id) {
        // Jobs in id order over about six years up to today.
        const Date surveyed = today.plus_days(-long(job_count - id) * 2190 / job_count - 1);
        const int roll = int(random() % 100);
        const char* status = roll < 85 ? "closed" : roll < 90 ? "completed" : roll < 95 ? "declined" : pipeline[random() % 4];
        const bool open = std::strcmp(status, "declined") == 0 || roll >= 95;
        const QString surveyed_text = QString::fromStdString(surveyed.to_iso());
        job.addBindValue(id);
        job.addBindValue(QStringLiteral("INV-%1").arg(id));
        job.addBindValue(QStringLiteral("Invented Client %1").arg(id));
        job.addBindValue(QStringLiteral("%1 Example Row (invented)").arg(id % 500));
        job.addBindValue(surveyed_text);
        job.addBindValue(QString::fromLatin1(status));
        job.addBindValue(surveyed_text);
        if (!run(job)) return false;
        change.addBindValue(id);
        change.addBindValue(QString::fromLatin1(status));
        change.addBindValue(surveyed_text);
        if (!run(change)) return false;
        revision.addBindValue(id);
        revision.addBindValue(surveyed_text);
        revision.addBindValue(document);
        if (!run(revision)) return false;
        for (int f = 0; f < findings_per_job; ++f) {
            const char* code = f == 0 ? (random() % 20 == 0 ? "C1" : "C3") : f <= 2 ? "C2" : f == 3 ? (random() % 2 ? "FI" : "note") : "C3";
            const bool urgent = std::strcmp(code, "C1") == 0 || std::strcmp(code, "C2") == 0 || std::strcmp(code, "FI") == 0;
            const QString finding_id = QStringLiteral("rule.%1@circuit:c%2").arg(f).arg(f + 1);
            // C1 within 28 days of the survey, C2 within 28 days too, FI as agreed (no date).
            QVariant due(QMetaType::fromType<QString>());
            if (urgent && std::strcmp(code, "FI") != 0) due = QString::fromStdString(surveyed.plus_days(28 - f).to_iso());
            finding.addBindValue(id);
            finding.addBindValue(finding_id);
            finding.addBindValue(QStringLiteral("rule.%1").arg(f));
            finding.addBindValue(QString::fromLatin1(code));
            finding.addBindValue(urgent ? 1 : 0);
            finding.addBindValue(due);
            finding.addBindValue(due.isNull() ? QStringLiteral("as agreed") : due.toString());
            if (!run(finding)) return false;
            if (!urgent) continue;
            const bool remedied = !open;
            const bool retested = std::strcmp(status, "closed") == 0;
            item.addBindValue(id);
            item.addBindValue(finding_id);
            item.addBindValue(QString::fromLatin1(code));
            item.addBindValue(due);
            item.addBindValue(due.isNull() ? QStringLiteral("as agreed") : due.toString());
            item.addBindValue(QString::fromLatin1(retested ? "retested" : remedied ? "remedied" : "open"));
            item.addBindValue(remedied ? QVariant(QString::fromStdString(surveyed.plus_days(20).to_iso()))
                                       : QVariant(QMetaType::fromType<QString>()));
            item.addBindValue(retested ? QVariant(QString::fromStdString(surveyed.plus_days(21).to_iso()))
                                       : QVariant(QMetaType::fromType<QString>()));
            if (!run(item)) return false;
        }
    }
    // Each job's summary of open items, worked out as migration 3 does for an older store.
    QSqlQuery summary(db);
    summary.prepare(QStringLiteral(
        "UPDATE jobs SET"
        " urgent_open = (SELECT COUNT(*) FROM urgent_items u WHERE u.job_id = jobs.id"
        " AND u.state = 'open' AND u.absent_since_revision IS NULL),"
        " next_due = (SELECT MIN(u.due) FROM urgent_items u WHERE u.job_id = jobs.id"
        " AND u.state = 'open' AND u.absent_since_revision IS NULL)"));
    if (!run(summary)) return false;
    QSqlQuery counts(db);
    counts.prepare(QStringLiteral(
        "UPDATE job_status_counts SET jobs = (SELECT COUNT(*) FROM jobs WHERE jobs.status = job_status_counts.status)"));
    if (!run(counts)) return false;
    if (!db.commit()) return false;
    QSqlQuery(db).exec(QStringLiteral("ANALYZE"));
    QSqlQuery(db).exec(QStringLiteral("PRAGMA synchronous = FULL"));
    return true;
}

}  // namespace mendwright::store
