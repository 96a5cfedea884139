#pragma once
// What the store promises, as checks that run against either database: the SQLite tests call
// each in its own test case, the PostgreSQL test calls them all on one throw-away server.

#include "tests/store/support/fixtures.hpp"

namespace mendwright::store::testing {

void check_new_job_keeps_facts_revision_and_urgent_items(const Backend& backend);
void check_every_save_adds_a_revision_and_old_edits_conflict(const Backend& backend);
void check_reassessment_keeps_remedied_and_retested_state(const Backend& backend);
void check_dashboard_orders_overdue_first_and_counts(const Backend& backend);
void check_status_changes_are_kept_in_history(const Backend& backend);
void check_remedy_and_retest_rules(const Backend& backend);
void check_quotes_are_recorded_once(const Backend& backend);
void check_text_with_sql_characters_round_trips(const Backend& backend);
void check_two_connections_conflict_instead_of_overwriting(const Backend& backend);
void check_two_threads_saving_lose_no_revision(const Backend& backend);
void check_upgrade_from_schema_1_keeps_the_jobs(const Backend& backend);
void check_job_pages_keep_the_list_order_filters_and_search(const Backend& backend);
void check_upgrade_from_schema_3_adds_the_list_indexes_and_keeps_the_jobs(const Backend& backend);

}  // namespace mendwright::store::testing
