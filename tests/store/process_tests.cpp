// Other processes on the same SQLite file: two writers at once, and a writer killed with
// SIGKILL at random moments, many times, half-way through its saves.
#include <QProcess>
#include <QSqlDatabase>
#include <QSqlQuery>
#include <QThread>
#include <catch2/catch.hpp>
#include <random>
#include <set>

#include "tests/store/support/fixtures.hpp"
#include "tests/store/support/revision_document.hpp"

using namespace mendwright;
using namespace mendwright::store;
using namespace mendwright::store::testing;

namespace {

std::vector<int> numbers_after(const QByteArray& output, const char* word) {
    std::vector<int> numbers;
    for (const QByteArray& line : output.split('\n')) {
        const QByteArray prefix = QByteArray(word) + ' ';
        if (line.startsWith(prefix)) numbers.push_back(line.mid(prefix.size()).toInt());
    }
    return numbers;
}

// SQLite documentation, "PRAGMA integrity_check": a sound database answers the single row "ok";
// "PRAGMA foreign_key_check" answers no rows when every reference holds.
void require_sound_file(const std::string& path) {
    {
        QSqlDatabase db = QSqlDatabase::addDatabase(QStringLiteral("QSQLITE"), QStringLiteral("checker"));
        db.setDatabaseName(QString::fromStdString(path));
        REQUIRE(db.open());
        QSqlQuery query(db);
        REQUIRE(query.exec(QStringLiteral("PRAGMA integrity_check")));
        REQUIRE(query.next());
        CHECK(query.value(0).toString() == QStringLiteral("ok"));
        CHECK_FALSE(query.next());
        REQUIRE(query.exec(QStringLiteral("PRAGMA foreign_key_check")));
        CHECK_FALSE(query.next());
        query.finish();
        db.close();
    }
    QSqlDatabase::removeDatabase(QStringLiteral("checker"));
}

}  // namespace

TEST_CASE("sqlite process: a writer killed with SIGKILL mid-save leaves a sound file with every committed revision") {
    TempFolder folder;
    const std::string path = folder.file("jobs.sqlite");
    const QString url = QString::fromStdString("sqlite:" + path);
    std::mt19937 random(20260310);  // fixed seed: the same kill moments on every run
    std::uniform_int_distribution<int> pause_ms(0, 80);
    int highest_reported = 0;
    int verified_up_to = 0;
    int killed = 0;
    constexpr int rounds = 30;
    for (int round = 0; round < rounds; ++round) {
        QProcess writer;
        writer.start(QStringLiteral(MENDWRIGHT_STORE_WRITER), {url, QStringLiteral("crash")});
        REQUIRE(writer.waitForStarted(10000));
        // Let it commit at least once, then kill it at a random moment of its loop.
        QByteArray output;
        while (!output.contains("committed") && writer.state() == QProcess::Running) {
            writer.waitForReadyRead(10000);
            output += writer.readAllStandardOutput();
        }
        QThread::msleep(static_cast<unsigned long>(pause_ms(random)));
        writer.kill();  // SIGKILL on Unix (Qt documentation, QProcess::kill)
        REQUIRE(writer.waitForFinished(10000));
        output += writer.readAllStandardOutput();
        INFO("round " << round << ", writer stderr: " << writer.readAllStandardError().toStdString());
        REQUIRE(writer.exitStatus() == QProcess::CrashExit);
        ++killed;
        for (int n : numbers_after(output, "committed")) highest_reported = std::max(highest_reported, n);

        require_sound_file(path);
        auto store = open_store(DatabaseUrl{Dialect::sqlite, path, {}, 5432, {}, {}, {}, false});
        auto job = store->job(1);
        REQUIRE(job.ok());
        // Every revision reported as committed is there, whole, and so is nothing half-made
        // (the new ones here, all of them again at the end).
        REQUIRE(job->latest_revision >= highest_reported);
        REQUIRE(job->revisions.size() == std::size_t(job->latest_revision));
        for (int n = verified_up_to + 1; n <= job->latest_revision; ++n) {
            auto revision = store->revision(1, n);
            REQUIRE(revision.ok());
            INFO("revision " << n);
            REQUIRE(verified_revision(revision->document) == n);
        }
        // The findings are those of the latest revision, all of them.
        REQUIRE(job->findings.size() == 30);
        for (const auto& finding : job->findings)
            REQUIRE(finding.title == "invented finding of revision " + std::to_string(job->latest_revision));
        verified_up_to = job->latest_revision;
    }
    CHECK(killed == rounds);
    CHECK(highest_reported > rounds);
    auto store = open_store(DatabaseUrl{Dialect::sqlite, path, {}, 5432, {}, {}, {}, false});
    for (int n = 1; n <= verified_up_to; ++n) {
        INFO("revision " << n);
        REQUIRE(verified_revision(store->revision(1, n)->document) == n);
    }
}

TEST_CASE("sqlite process: two processes saving the same job lose no revision and never share one") {
    TempFolder folder;
    const std::string path = folder.file("jobs.sqlite");
    {
        auto store = open_store(DatabaseUrl{Dialect::sqlite, path, {}, 5432, {}, {}, {}, false});
        auto first = sample_snapshot(1);
        first.document = revision_document(1);
        REQUIRE(store->add_job(first).ok());
    }
    const QStringList arguments{QString::fromStdString("sqlite:" + path), QStringLiteral("contend"), QStringLiteral("20")};
    QProcess first, second;
    first.start(QStringLiteral(MENDWRIGHT_STORE_WRITER), arguments);
    second.start(QStringLiteral(MENDWRIGHT_STORE_WRITER), arguments);
    REQUIRE(first.waitForFinished(60000));
    REQUIRE(second.waitForFinished(60000));
    INFO(first.readAllStandardError().toStdString() << second.readAllStandardError().toStdString());
    REQUIRE(first.exitCode() == 0);
    REQUIRE(second.exitCode() == 0);
    const QByteArray out_first = first.readAllStandardOutput(), out_second = second.readAllStandardOutput();
    std::set<int> saved;
    for (int n : numbers_after(out_first, "saved")) CHECK(saved.insert(n).second);
    for (int n : numbers_after(out_second, "saved")) CHECK(saved.insert(n).second);
    CHECK(saved.size() == 40);
    CHECK(*saved.begin() == 2);
    CHECK(*saved.rbegin() == 41);

    require_sound_file(path);
    auto store = open_store(DatabaseUrl{Dialect::sqlite, path, {}, 5432, {}, {}, {}, false});
    auto job = store->job(1);
    REQUIRE(job.ok());
    CHECK(job->latest_revision == 41);
    for (int n = 2; n <= 41; ++n) CHECK(verified_revision(store->revision(1, n)->document) == n);
}
