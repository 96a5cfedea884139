// The store's promises on a shared office database: a real PostgreSQL server, started for this
// process on loopback in a temporary folder and stopped at the end (support/postgres_server).
// The server must be there: scripts/bootstrap installs it, so its absence is a failure.
#include <catch2/catch.hpp>

#include "tests/store/support/contract.hpp"
#include "tests/store/support/postgres_server.hpp"

using namespace mendwright::store;
using namespace mendwright::store::testing;

namespace {

Backend postgres_backend() {
    PostgresServer& server = PostgresServer::shared();
    INFO(server.problem());
    REQUIRE(server.problem().empty());
    return Backend{"postgresql", [&server] {
                       DatabaseUrl url = server.create_database();
                       INFO(server.problem());
                       REQUIRE(server.problem().empty());
                       return url;
                   }};
}

}  // namespace

TEST_CASE("postgresql: the store keeps the same promises as on SQLite") {
    const Backend backend = postgres_backend();
    SECTION("a new job keeps its facts, revision 1 and urgent items") {
        check_new_job_keeps_facts_revision_and_urgent_items(backend);
    }
    SECTION("every save adds a revision; an older base is a conflict") {
        check_every_save_adds_a_revision_and_old_edits_conflict(backend);
    }
    SECTION("re-assessment keeps remedied and re-tested state") { check_reassessment_keeps_remedied_and_retested_state(backend); }
    SECTION("dashboard order and counts") { check_dashboard_orders_overdue_first_and_counts(backend); }
    SECTION("status history") { check_status_changes_are_kept_in_history(backend); }
    SECTION("remedy and re-test rules") { check_remedy_and_retest_rules(backend); }
    SECTION("quotes recorded once") { check_quotes_are_recorded_once(backend); }
    SECTION("bound parameters") { check_text_with_sql_characters_round_trips(backend); }
    SECTION("upgrade from schema 1") { check_upgrade_from_schema_1_keeps_the_jobs(backend); }
    SECTION("job pages, filters and search") { check_job_pages_keep_the_list_order_filters_and_search(backend); }
    SECTION("upgrade from schema 3") { check_upgrade_from_schema_3_adds_the_list_indexes_and_keeps_the_jobs(backend); }
}

TEST_CASE("postgresql: two connections saving the same job conflict instead of overwriting") {
    const Backend backend = postgres_backend();
    SECTION("one after the other") { check_two_connections_conflict_instead_of_overwriting(backend); }
    SECTION("at the same time, from two threads") { check_two_threads_saving_lose_no_revision(backend); }
}

TEST_CASE("postgresql: a server that does not answer gives an error naming the URL") {
    auto url = parse_database_url("postgresql://mw@127.0.0.1:1/nothing");
    REQUIRE(url.ok());
    auto store = JobStore::open(*url);
    REQUIRE_FALSE(store.ok());
    CHECK(store.error().kind == ErrorKind::database);
    CHECK_THAT(store.error().to_string(),
               Catch::StartsWith("postgresql://mw@127.0.0.1:1/nothing: cannot open the database: "));
}
