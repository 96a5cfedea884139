// What only the embedded SQLite file has: its settings, the default place, files that are not
// (or not yet) ours.
#include <QFile>
#include <QSqlDatabase>
#include <QSqlQuery>
#include <catch2/catch.hpp>

#include "app/store/migrations.hpp"
#include "tests/store/support/fixtures.hpp"

using namespace mendwright;
using namespace mendwright::store;
using namespace mendwright::store::testing;

namespace {

std::string pragma(JobStore& store, const char* name) {
    QSqlQuery query(store.connection().database());
    REQUIRE(query.exec(QStringLiteral("PRAGMA %1").arg(QLatin1String(name))));
    REQUIRE(query.next());
    return query.value(0).toString().toStdString();
}

DatabaseUrl sqlite_url(const std::string& path) {
    DatabaseUrl url;
    url.sqlite_path = path;
    return url;
}

// Runs SQL on the file through a connection of its own (not the store's).
void on_file(const std::string& path, const std::vector<QString>& statements) {
    {
        QSqlDatabase db = QSqlDatabase::addDatabase(QStringLiteral("QSQLITE"), QStringLiteral("raw"));
        db.setDatabaseName(QString::fromStdString(path));
        REQUIRE(db.open());
        QSqlQuery query(db);
        for (const auto& sql : statements) REQUIRE(query.exec(sql));
        db.close();
    }
    QSqlDatabase::removeDatabase(QStringLiteral("raw"));
}

}  // namespace

TEST_CASE("sqlite file: WAL journal, foreign keys on and full synchronous commits") {
    TempFolder folder;
    auto store = open_store(sqlite_url(folder.file("jobs.sqlite")));
    // SQLite documentation, "Pragma statements": journal_mode answers "wal", foreign_keys 1,
    // synchronous 2 for FULL.
    CHECK(pragma(*store, "journal_mode") == "wal");
    CHECK(pragma(*store, "foreign_keys") == "1");
    CHECK(pragma(*store, "synchronous") == "2");
    CHECK(store->schema_version() == latest_schema_version());
    // Foreign keys are enforced: an urgent item of a job that does not exist is refused.
    QSqlQuery insert(store->connection().database());
    CHECK_FALSE(insert.exec(QStringLiteral(
        "INSERT INTO urgent_items (job_id, finding_id, code, title, location, due, due_text, state, first_revision,"
        " remedied_note, retested_note) VALUES (999, 'x', 'C1', 't', 'l', NULL, '', 'open', 1, '', '')")));
}

TEST_CASE("sqlite file: the default store is created in the user's data folder") {
    auto url = resolve_database_url(std::nullopt);
    REQUIRE(url.ok());
    QFile::remove(QString::fromStdString(url->sqlite_path));
    auto store = open_store(*url);
    CHECK(QFile::exists(QString::fromStdString(url->sqlite_path)));
    CHECK(store->url().sqlite_path.find("/mendwright/jobs.sqlite") != std::string::npos);
}

TEST_CASE("sqlite file: a store written by a newer Mendwright is refused and left as it was") {
    TempFolder folder;
    const std::string path = folder.file("jobs.sqlite");
    REQUIRE(open_store(sqlite_url(path))->add_job(sample_snapshot(1)).ok());
    on_file(path, {QStringLiteral("INSERT INTO schema_version VALUES (99, '2030-01-01', 'from the future')")});
    auto refused = JobStore::open(sqlite_url(path));
    REQUIRE_FALSE(refused.ok());
    CHECK(refused.error().kind == ErrorKind::schema_too_new);
    CHECK(refused.error().to_string() == "sqlite:" + path +
                                             ": the job store has schema version 99, newer than this Mendwright "
                                             "understands (" + std::to_string(latest_schema_version()) +
                                             "); open it with a newer Mendwright. Nothing was changed.");
    CHECK_FALSE(QFile::exists(QString::fromStdString(path + ".before-schema-" + std::to_string(latest_schema_version()) +
                                                     ".bak")));
}

TEST_CASE("sqlite file: a database of something else, or not a database, is refused untouched") {
    TempFolder folder;
    const std::string other = folder.file("other.sqlite");
    on_file(other, {QStringLiteral("CREATE TABLE jobs (name TEXT)")});
    auto refused = JobStore::open(sqlite_url(other));
    REQUIRE_FALSE(refused.ok());
    CHECK(refused.error().kind == ErrorKind::not_a_job_store);
    CHECK(refused.error().message ==
          "has a table \"jobs\" but no schema_version table: not a Mendwright job store, left untouched");

    const std::string text = folder.file("notes.sqlite");
    {
        QFile file(QString::fromStdString(text));
        REQUIRE(file.open(QIODevice::WriteOnly));
        file.write(QByteArray(4096, 'x'));
    }
    auto garbage = JobStore::open(sqlite_url(text));
    REQUIRE_FALSE(garbage.ok());
    CHECK(garbage.error().kind == ErrorKind::database);
    CHECK(garbage.error().field == "sqlite:" + text);
    QFile file(QString::fromStdString(text));
    REQUIRE(file.open(QIODevice::ReadOnly));
    CHECK(file.readAll() == QByteArray(4096, 'x'));

    auto missing_folder = JobStore::open(sqlite_url(folder.file("no/such/folder/jobs.sqlite")));
    REQUIRE_FALSE(missing_folder.ok());
    CHECK(missing_folder.error().message == "the folder " + folder.file("no/such/folder") + " does not exist");
}
