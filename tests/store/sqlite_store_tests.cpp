// The store's promises on its embedded database, SQLite, each in its own test case.
#include <catch2/catch.hpp>

#include "tests/store/support/contract.hpp"

using namespace mendwright::store::testing;

TEST_CASE("sqlite: a new job keeps its facts, revision 1 and its C1/C2/FI as open urgent items") {
    TempFolder folder;
    check_new_job_keeps_facts_revision_and_urgent_items(sqlite_backend(folder));
}

TEST_CASE("sqlite: every save adds a revision and a save from an older revision is a conflict") {
    TempFolder folder;
    check_every_save_adds_a_revision_and_old_edits_conflict(sqlite_backend(folder));
}

TEST_CASE("sqlite: re-assessment keeps the remedied and re-tested state of surviving findings") {
    TempFolder folder;
    check_reassessment_keeps_remedied_and_retested_state(sqlite_backend(folder));
}

TEST_CASE("sqlite: the dashboard lists overdue jobs first, then by due date, and counts by status and code") {
    TempFolder folder;
    check_dashboard_orders_overdue_first_and_counts(sqlite_backend(folder));
}

TEST_CASE("sqlite: status changes are kept in the job's history") {
    TempFolder folder;
    check_status_changes_are_kept_in_history(sqlite_backend(folder));
}

TEST_CASE("sqlite: re-tests need a remedy first, and future or back-to-front dates are refused") {
    TempFolder folder;
    check_remedy_and_retest_rules(sqlite_backend(folder));
}

TEST_CASE("sqlite: a quote number is recorded once") {
    TempFolder folder;
    check_quotes_are_recorded_once(sqlite_backend(folder));
}

TEST_CASE("sqlite: quotes, semicolons and placeholders in text are stored as text (bound parameters)") {
    TempFolder folder;
    check_text_with_sql_characters_round_trips(sqlite_backend(folder));
}

TEST_CASE("sqlite: two connections on one file conflict instead of overwriting each other") {
    TempFolder folder;
    check_two_connections_conflict_instead_of_overwriting(sqlite_backend(folder));
}

TEST_CASE("sqlite: two threads saving the same job lose no revision") {
    TempFolder folder;
    check_two_threads_saving_lose_no_revision(sqlite_backend(folder));
}

TEST_CASE("sqlite: a schema 1 file is upgraded after a backup copy and keeps its jobs") {
    TempFolder folder;
    check_upgrade_from_schema_1_keeps_the_jobs(sqlite_backend(folder));
}

TEST_CASE("sqlite: job pages keep the list order with filters and search and refuse bad offsets and limits") {
    TempFolder folder;
    check_job_pages_keep_the_list_order_filters_and_search(sqlite_backend(folder));
}

TEST_CASE("sqlite: a schema 3 file is upgraded with the job list's indexes and keeps its jobs") {
    TempFolder folder;
    check_upgrade_from_schema_3_adds_the_list_indexes_and_keeps_the_jobs(sqlite_backend(folder));
}
