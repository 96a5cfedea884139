// End to end: `mendwright-cli jobs ...` on a temporary SQLite store, with today pinned by
// MENDWRIGHT_TODAY, against the invented demo survey pricebook-demo/jobs/rented-terrace-tt-no-rcd.json.
#include <QProcess>
#include <QProcessEnvironment>
#include <catch2/catch.hpp>
#include <nlohmann/json.hpp>

#include "tests/store/support/fixtures.hpp"

using namespace mendwright::store::testing;

namespace {

struct Run {
    int exit_code = -1;
    std::string out;
    std::string err;
};

Run cli(const std::string& db, QStringList arguments) {
    QProcess process;
    QProcessEnvironment environment = QProcessEnvironment::systemEnvironment();
    environment.insert(QStringLiteral("MENDWRIGHT_TODAY"), QStringLiteral("2026-12-20"));
    environment.remove(QStringLiteral("MENDWRIGHT_DB"));
    process.setProcessEnvironment(environment);
    arguments.prepend(QStringLiteral("jobs"));
    arguments << QStringLiteral("--db") << QString::fromStdString(db);
    process.start(QStringLiteral(MENDWRIGHT_CLI_PATH), arguments);
    REQUIRE(process.waitForFinished(60000));
    return Run{process.exitCode(), process.readAllStandardOutput().toStdString(), process.readAllStandardError().toStdString()};
}

const std::string terrace = std::string(MENDWRIGHT_SOURCE_DIR) + "/pricebook-demo/jobs/rented-terrace-tt-no-rcd.json";

}  // namespace

TEST_CASE("jobs cli: add, list --json in the documented shape, show, remedied and retested") {
    TempFolder folder;
    const std::string db = "sqlite:" + folder.file("jobs.sqlite");
    const Run added = cli(db, {"add", QString::fromStdString(terrace)});
    INFO(added.err);
    REQUIRE(added.exit_code == 0);
    CHECK(added.out.rfind("Added job 1: ", 0) == 0);
    CHECK(added.out.find("competent person") != std::string::npos);  // the caution

    const Run listed = cli(db, {"list", "--urgent", "--json"});
    REQUIRE(listed.exit_code == 0);
    const auto list = nlohmann::ordered_json::parse(listed.out);
    REQUIRE(list.size() == 1);
    REQUIRE(list.at("jobs").size() == 1);
    const auto& line = list["jobs"][0];
    std::vector<std::string> keys;
    for (const auto& [key, value] : line.items()) keys.push_back(key);
    CHECK(keys == std::vector<std::string>{"id", "client", "site", "status", "urgent_open", "next_due", "overdue"});
    CHECK(line["id"] == 1);
    CHECK(line["status"] == "surveyed");
    CHECK(line["urgent_open"].get<int>() > 0);
    // The demo's due date comes from the rules profile; on 2026-12-20 it has passed.
    CHECK(line["next_due"].is_string());
    CHECK(line["overdue"] == true);

    const Run shown = cli(db, {"show", "1", "--json"});
    REQUIRE(shown.exit_code == 0);
    const auto job = nlohmann::ordered_json::parse(shown.out);
    CHECK(job["status_history"].size() == 1);
    REQUIRE(job["urgent_items"].size() == line["urgent_open"].get<std::size_t>());
    const auto item = job["urgent_items"][0];
    std::vector<std::string> item_keys;
    for (const auto& [key, value] : item.items()) item_keys.push_back(key);
    CHECK(item_keys == std::vector<std::string>{"id", "code", "title", "due", "state", "remedied_on", "retested_on"});
    const QString finding = QString::fromStdString(item["id"].get<std::string>());

    const Run early = cli(db, {"retested", "1", finding});
    CHECK(early.exit_code == 1);
    CHECK(early.err.find("still open: record the remedy before the re-test") != std::string::npos);
    REQUIRE(cli(db, {"remedied", "1", finding, "--date", "2026-12-18", "--note", "RCD fitted"}).exit_code == 0);
    REQUIRE(cli(db, {"retested", "1", finding}).exit_code == 0);
    const auto after = nlohmann::json::parse(cli(db, {"show", "1", "--json"}).out);
    bool found = false;
    for (const auto& each : after["urgent_items"])
        if (each["id"] == item["id"]) {
            found = true;
            CHECK(each["state"] == "retested");
            CHECK(each["remedied_on"] == "2026-12-18");
            CHECK(each["retested_on"] == "2026-12-20");
        }
    CHECK(found);

    REQUIRE(cli(db, {"status", "1", "in-progress", "--note", "booked"}).exit_code == 0);
    const auto moved = nlohmann::json::parse(cli(db, {"show", "1", "--json"}).out);
    CHECK(moved["status"] == "in_progress");
    CHECK(moved["status_history"][1]["note"] == "booked");
}

TEST_CASE("jobs cli: bad input names the argument and exits 2; a missing job exits 1; an invalid survey 3") {
    TempFolder folder;
    const std::string db = "sqlite:" + folder.file("jobs.sqlite");
    const Run bad_db = cli("mysql://nowhere", {"list"});
    CHECK(bad_db.exit_code == 2);
    CHECK(bad_db.err.find("--db: unknown kind of database") != std::string::npos);
    const Run bad_state = cli(db, {"status", "1", "finished"});
    CHECK(bad_state.exit_code == 2);
    CHECK(bad_state.err.find("STATE: expected one of surveyed, quoted") != std::string::npos);
    const Run bad_date = cli(db, {"remedied", "1", "x", "--date", "2026-02-30"});
    CHECK(bad_date.exit_code == 2);
    CHECK(bad_date.err.find("--date: expected a real calendar date") != std::string::npos);
    const Run missing = cli(db, {"show", "4"});
    CHECK(missing.exit_code == 1);
    CHECK(missing.err.find("job 4: no such job in the store") != std::string::npos);
    const Run invalid = cli(db, {"add", QString::fromStdString(std::string(MENDWRIGHT_SOURCE_DIR) +
                                                                   "/tests/data/surveys/several-problems.json")});
    CHECK(invalid.exit_code == 3);
    CHECK(invalid.err.find("nothing was added") != std::string::npos);
    const auto list = nlohmann::json::parse(cli(db, {"list", "--json"}).out);
    CHECK(list["jobs"].empty());
}
