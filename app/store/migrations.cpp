#include "app/store/migrations.hpp"

#include <QFile>
#include <QString>

namespace mendwright::store {

namespace {

// Status and state words are checked by the database too, so that a script writing to the
// store cannot leave a job in a state the program does not know.
#define MW_STATUSES "('surveyed','quoted','accepted','in_progress','completed','closed','declined')"

const std::vector<Migration> all_migrations{
    {1,
     "jobs, status history, survey revisions, findings of the latest revision, urgent items",
     {
         "CREATE TABLE schema_version ("
         " version INTEGER PRIMARY KEY,"
         " applied_on TEXT NOT NULL,"
         " description TEXT NOT NULL)",

         "CREATE TABLE jobs ("
         " id {id},"
         " reference TEXT NOT NULL,"
         " client TEXT NOT NULL,"
         " site TEXT NOT NULL,"
         " occupancy TEXT NOT NULL,"
         " inspection_date TEXT NOT NULL,"
         " inspector TEXT NOT NULL,"
         " status TEXT NOT NULL CHECK (status IN " MW_STATUSES "),"
         " created_on TEXT NOT NULL,"
         " latest_revision INTEGER NOT NULL CHECK (latest_revision >= 1))",

         "CREATE TABLE job_status_changes ("
         " id {id},"
         " job_id {bigint} NOT NULL REFERENCES jobs(id) ON DELETE CASCADE,"
         " status TEXT NOT NULL CHECK (status IN " MW_STATUSES "),"
         " changed_on TEXT NOT NULL,"
         " note TEXT NOT NULL)",

         "CREATE INDEX job_status_changes_by_job ON job_status_changes (job_id, id)",

         "CREATE TABLE survey_revisions ("
         " job_id {bigint} NOT NULL REFERENCES jobs(id) ON DELETE CASCADE,"
         " revision INTEGER NOT NULL CHECK (revision >= 1),"
         " based_on INTEGER,"
         " saved_on TEXT NOT NULL,"
         " document TEXT NOT NULL,"
         " PRIMARY KEY (job_id, revision))",

         "CREATE TABLE findings ("
         " job_id {bigint} NOT NULL REFERENCES jobs(id) ON DELETE CASCADE,"
         " finding_id TEXT NOT NULL,"
         " revision INTEGER NOT NULL,"
         " rule TEXT NOT NULL,"
         " code TEXT NOT NULL CHECK (code IN ('C1','C2','C3','FI','note')),"
         " title TEXT NOT NULL,"
         " location TEXT NOT NULL,"
         " clause TEXT NOT NULL,"
         " explanation TEXT NOT NULL,"
         " urgent INTEGER NOT NULL CHECK (urgent IN (0, 1)),"
         " due TEXT,"
         " due_text TEXT NOT NULL,"
         " PRIMARY KEY (job_id, finding_id),"
         " FOREIGN KEY (job_id, revision) REFERENCES survey_revisions (job_id, revision))",

         "CREATE TABLE urgent_items ("
         " job_id {bigint} NOT NULL REFERENCES jobs(id) ON DELETE CASCADE,"
         " finding_id TEXT NOT NULL,"
         " code TEXT NOT NULL CHECK (code IN ('C1','C2','FI')),"
         " title TEXT NOT NULL,"
         " location TEXT NOT NULL,"
         " due TEXT,"
         " due_text TEXT NOT NULL,"
         " state TEXT NOT NULL CHECK (state IN ('open','remedied','retested')),"
         " first_revision INTEGER NOT NULL,"
         " absent_since_revision INTEGER,"
         " remedied_on TEXT,"
         " remedied_note TEXT NOT NULL,"
         " retested_on TEXT,"
         " retested_note TEXT NOT NULL,"
         " PRIMARY KEY (job_id, finding_id))",
     }},
    {2,
     "quotes issued",
     {
         "CREATE TABLE quotes ("
         " id {id},"
         " job_id {bigint} NOT NULL REFERENCES jobs(id) ON DELETE CASCADE,"
         " number TEXT NOT NULL UNIQUE,"
         " revision INTEGER NOT NULL,"
         " plan TEXT NOT NULL,"
         " net_pence {bigint} NOT NULL,"
         " tax_pence {bigint} NOT NULL,"
         " total_pence {bigint} NOT NULL,"
         " issued_on TEXT NOT NULL,"
         " file_path TEXT NOT NULL,"
         " FOREIGN KEY (job_id, revision) REFERENCES survey_revisions (job_id, revision))",

         "CREATE INDEX quotes_by_job ON quotes (job_id, id)",
     }},
    {3,
     "the dashboard: each job's count of open urgent items and earliest due date, jobs per status, and indexes",
     {
         "ALTER TABLE jobs ADD COLUMN urgent_open INTEGER NOT NULL DEFAULT 0",
         "ALTER TABLE jobs ADD COLUMN next_due TEXT",
         "UPDATE jobs SET"
         " urgent_open = (SELECT COUNT(*) FROM urgent_items u WHERE u.job_id = jobs.id"
         " AND u.state = 'open' AND u.absent_since_revision IS NULL),"
         " next_due = (SELECT MIN(u.due) FROM urgent_items u WHERE u.job_id = jobs.id"
         " AND u.state = 'open' AND u.absent_since_revision IS NULL)",
         // Partial indexes: only the items still open and reported by the latest assessment,
         // a few per cent of all items in a store of some years (docs/benchmarks.md).
         "CREATE INDEX urgent_items_open ON urgent_items (job_id, due)"
         " WHERE state = 'open' AND absent_since_revision IS NULL",
         "CREATE INDEX urgent_items_open_by_code ON urgent_items (code, due, state, absent_since_revision)"
         " WHERE state = 'open' AND absent_since_revision IS NULL",
         // The dashboard's order (undated last, earliest due first, then id), read straight
         // from the index, for the jobs with open urgent items only.
         "CREATE INDEX jobs_with_urgent_items ON jobs ((next_due IS NULL), next_due, id) WHERE urgent_open > 0",
         "CREATE INDEX jobs_by_status ON jobs (status)",
         // Jobs per status, kept by every write that adds a job or changes its status: counting
         // 100,000 jobs takes milliseconds, reading seven rows does not.
         "CREATE TABLE job_status_counts ("
         " status TEXT PRIMARY KEY CHECK (status IN " MW_STATUSES "),"
         " jobs {bigint} NOT NULL CHECK (jobs >= 0))",
         "INSERT INTO job_status_counts (status, jobs) VALUES ('surveyed', 0), ('quoted', 0), ('accepted', 0),"
         " ('in_progress', 0), ('completed', 0), ('closed', 0), ('declined', 0)",
         "UPDATE job_status_counts SET jobs = (SELECT COUNT(*) FROM jobs WHERE jobs.status = job_status_counts.status)",
     }},
    {4,
     "the job list in pages: indexes in list order, for all jobs and per status",
     {
         // The order of JobStore::job_page (open urgent items first, undated last, earliest due
         // first, then id): a page at any offset walks this index instead of sorting 100,000 jobs.
         "CREATE INDEX jobs_in_list_order ON jobs ((urgent_open = 0), (next_due IS NULL), next_due, id)",
         // The same within one status; it also serves what jobs_by_status (migration 3) did.
         "CREATE INDEX jobs_by_status_in_list_order ON jobs (status, (urgent_open = 0), (next_due IS NULL), next_due, id)",
         "DROP INDEX jobs_by_status",
     }},
};

#undef MW_STATUSES

QString dialect_sql(const std::string& statement, Dialect dialect) {
    QString sql = QString::fromStdString(statement);
    if (dialect == Dialect::sqlite) {
        sql.replace(QStringLiteral("{id}"), QStringLiteral("INTEGER PRIMARY KEY"));
        sql.replace(QStringLiteral("{bigint}"), QStringLiteral("INTEGER"));
    } else {
        sql.replace(QStringLiteral("{id}"), QStringLiteral("BIGINT GENERATED BY DEFAULT AS IDENTITY PRIMARY KEY"));
        sql.replace(QStringLiteral("{bigint}"), QStringLiteral("BIGINT"));
    }
    return sql;
}

// A free name beside the file for the copy taken before an upgrade.
QString backup_name(const std::string& path, int to_version) {
    const QString base = QString::fromStdString(path) + QStringLiteral(".before-schema-%1").arg(to_version);
    QString candidate = base + QStringLiteral(".bak");
    for (int n = 2; QFile::exists(candidate); ++n) candidate = base + QStringLiteral("-%1.bak").arg(n);
    return candidate;
}

Outcome<int> read_version(Connection& connection) {
    auto has_version = connection.table_exists(QStringLiteral("schema_version"));
    if (!has_version) return has_version.error();
    if (!*has_version) {
        for (const char* table : {"jobs", "urgent_items", "survey_revisions"}) {
            auto exists = connection.table_exists(QString::fromLatin1(table));
            if (!exists) return exists.error();
            if (*exists)
                return store_error(ErrorKind::not_a_job_store, connection.url().display(),
                                   std::string("has a table \"") + table +
                                       "\" but no schema_version table: not a Mendwright job store, left untouched");
        }
        return 0;
    }
    auto query = connection.run(QStringLiteral("SELECT MAX(version) FROM schema_version"), {}, "reading the schema version");
    if (!query) return query.error();
    if (!query->next()) return 0;
    return query->value(0).isNull() ? 0 : query->value(0).toInt();
}

}  // namespace

const std::vector<Migration>& migrations() { return all_migrations; }

int latest_schema_version() { return all_migrations.back().version; }

Outcome<int> schema_version(Connection& connection) { return read_version(connection); }

Outcome<MigrationReport> migrate(Connection& connection, int target_version, const Clock& clock) {
    auto found = read_version(connection);
    if (!found) return found.error();
    const int latest = latest_schema_version();
    if (*found > latest)
        return store_error(ErrorKind::schema_too_new, connection.url().display(),
                           "the job store has schema version " + std::to_string(*found) +
                               ", newer than this Mendwright understands (" + std::to_string(latest) +
                               "); open it with a newer Mendwright. Nothing was changed.");
    MigrationReport report{*found, *found, std::nullopt};
    if (*found >= target_version) return report;

    if (connection.dialect() == Dialect::sqlite && *found > 0) {
        // SQLite documentation, "VACUUM INTO" (sqlite.org/lang_vacuum.html): a consistent copy
        // of the database, WAL content included, into a new file.
        const QString backup = backup_name(connection.url().sqlite_path, target_version);
        auto copied = connection.run(QStringLiteral("VACUUM INTO ?"), {backup}, "copying the store before upgrading it");
        if (!copied) return copied.error();
        report.backup_path = backup.toStdString();
    }

    auto transaction = Transaction::begin(connection);
    if (!transaction) return transaction.error();
    if (connection.dialect() == Dialect::postgresql) {
        // One upgrader at a time; the key is an arbitrary constant of our own.
        auto locked = connection.run(QStringLiteral("SELECT pg_advisory_xact_lock(?)"), {QVariant(qlonglong(0x4d656e64))},
                                     "waiting for other upgraders");
        if (!locked) return locked.error();
    }
    auto current = read_version(connection);  // again: another process may have upgraded meanwhile
    if (!current) return current.error();
    report.from_version = *current;
    for (const Migration& migration : all_migrations) {
        if (migration.version <= *current || migration.version > target_version) continue;
        for (const std::string& statement : migration.statements) {
            if (auto done = connection.run_fixed(dialect_sql(statement, connection.dialect()),
                                                 "schema migration " + std::to_string(migration.version));
                !done)
                return done.error();
        }
        auto recorded = connection.run(
            QStringLiteral("INSERT INTO schema_version (version, applied_on, description) VALUES (?, ?, ?)"),
            {migration.version, sql_date(clock()), sql_text(migration.description)}, "recording the schema version");
        if (!recorded) return recorded.error();
        report.to_version = migration.version;
    }
    if (auto committed = (*transaction)->commit(); !committed) return committed.error();
    if (report.to_version < report.from_version) report.to_version = report.from_version;
    return report;
}

}  // namespace mendwright::store
