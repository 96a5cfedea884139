#include "tests/store/support/contract.hpp"

#include <algorithm>
#include <catch2/catch.hpp>
#include <thread>

#include "app/store/migrations.hpp"

namespace mendwright::store::testing {

namespace {

template <class T>
const T& must(const Outcome<T>& outcome) {
    INFO((outcome ? std::string() : outcome.error().to_string()));
    REQUIRE(outcome.ok());
    return outcome.value();
}

const UrgentItem* item_of(const JobDetail& job, const std::string& id) {
    for (const auto& item : job.urgent_items)
        if (item.finding_id == id) return &item;
    return nullptr;
}

}  // namespace

void check_new_job_keeps_facts_revision_and_urgent_items(const Backend& backend) {
    auto store = open_store(backend.fresh_url());
    const auto snapshot = sample_snapshot(1);
    const JobId id = must(store->add_job(snapshot));
    const JobDetail job = must(store->job(id));
    CHECK(job.facts.client == "Invented Client 1");
    CHECK(job.facts.site == "1 Example Row (invented)");
    CHECK(job.facts.occupancy == "owner_occupied_dwelling");
    CHECK(job.facts.inspection_date == Date{2026, 2, 20});
    CHECK(job.status == JobStatus::surveyed);
    CHECK(job.created_on == pinned_today);
    CHECK(job.latest_revision == 1);
    REQUIRE(job.history.size() == 1);
    CHECK(job.history[0].status == JobStatus::surveyed);
    CHECK(job.findings.size() == 4);
    // Condition report practice (common practice): C1, C2 and FI need action; C3 does not.
    REQUIRE(job.urgent_items.size() == 3);
    CHECK(job.urgent_items[0].finding_id == "tt.fault_protection@circuit:c3");  // due first
    CHECK(job.urgent_items[0].due == Date{2026, 3, 1});
    CHECK(job.urgent_items[0].overdue(pinned_today));
    CHECK(job.urgent_items[1].finding_id == "tails.protection@origin");
    CHECK_FALSE(job.urgent_items[1].overdue(pinned_today));
    CHECK(job.urgent_items[2].finding_id == "rcd.type@board:cu");  // no deadline: last
    CHECK_FALSE(job.urgent_items[2].due.has_value());
    CHECK(job.urgent_items[2].due_text == "as agreed");
    for (const auto& item : job.urgent_items) CHECK(item.state == UrgentState::open);
    CHECK(must(store->revision(id, 1)).document == snapshot.document);

    auto missing = store->job(id + 100);
    REQUIRE_FALSE(missing.ok());
    CHECK(missing.error().kind == ErrorKind::not_found);
    CHECK(missing.error().to_string() == "job " + std::to_string(id + 100) + ": no such job in the store");

    auto bad = sample_snapshot(2);
    bad.findings[1].urgent = false;  // a C2 that claims not to be urgent
    auto refused = store->add_job(bad);
    REQUIRE_FALSE(refused.ok());
    CHECK(refused.error().kind == ErrorKind::invalid_input);
    CHECK(refused.error().field == "findings[1].urgent");
    CHECK(must(store->list_jobs()).size() == 1);  // nothing of the refused job was written
}

void check_every_save_adds_a_revision_and_old_edits_conflict(const Backend& backend) {
    auto store = open_store(backend.fresh_url());
    const JobId id = must(store->add_job(sample_snapshot(1)));
    auto edited = sample_snapshot(1);
    edited.document = "{\"edit\": 2}";
    edited.facts.client = "Invented Client 1 (renamed)";
    CHECK(must(store->save_revision(id, 1, edited)) == 2);

    // A second editor who loaded revision 1 saves afterwards: refused, nothing written.
    auto stale = sample_snapshot(1);
    stale.document = "{\"edit\": \"stale\"}";
    auto conflict = store->save_revision(id, 1, stale);
    REQUIRE_FALSE(conflict.ok());
    CHECK(conflict.error().kind == ErrorKind::conflict);
    CHECK(conflict.error().to_string() ==
          "job " + std::to_string(id) +
              ": this edit started from revision 1 but the latest revision is 2: nothing was saved; reload revision 2 and "
              "apply the changes to it");

    const JobDetail job = must(store->job(id));
    CHECK(job.latest_revision == 2);
    CHECK(job.facts.client == "Invented Client 1 (renamed)");
    REQUIRE(job.revisions.size() == 2);
    CHECK_FALSE(job.revisions[0].based_on.has_value());
    CHECK(job.revisions[1].based_on == 1);
    CHECK(must(store->revision(id, 1)).document == sample_snapshot(1).document);  // never overwritten
    CHECK(must(store->revision(id, 2)).document == "{\"edit\": 2}");
    auto missing = store->revision(id, 3);
    REQUIRE_FALSE(missing.ok());
    CHECK(missing.error().kind == ErrorKind::not_found);

    auto unknown_job = store->save_revision(id + 7, 1, edited);
    REQUIRE_FALSE(unknown_job.ok());
    CHECK(unknown_job.error().kind == ErrorKind::not_found);
}

void check_reassessment_keeps_remedied_and_retested_state(const Backend& backend) {
    auto store = open_store(backend.fresh_url());
    const JobId id = must(store->add_job(sample_snapshot(1)));
    must(store->mark_remedied(id, "tt.fault_protection@circuit:c3", Date{2026, 3, 5}, "second rod driven"));
    must(store->mark_retested(id, "tt.fault_protection@circuit:c3", Date{2026, 3, 6}));
    must(store->mark_remedied(id, "tails.protection@origin", Date{2026, 3, 7}));

    // Re-assessed with another profile: the C1 is still reported (now due later), the C2 and
    // the FI are gone, a new C2 appears.
    std::vector<FindingRecord> findings{
        finding("tt.fault_protection@circuit:c3", "C1", Date{2026, 3, 20}),
        finding("spd.absent@board:cu", "C3"),
        finding("bonding.gas@origin", "C2", Date{2026, 5, 1}),
    };
    must(store->reassess(id, 1, findings));
    JobDetail job = must(store->job(id));
    CHECK(job.findings.size() == 3);
    REQUIRE(job.urgent_items.size() == 2);
    const UrgentItem* kept = item_of(job, "tt.fault_protection@circuit:c3");
    REQUIRE(kept);
    CHECK(kept->state == UrgentState::retested);
    CHECK(kept->remedied_on == Date{2026, 3, 5});
    CHECK(kept->remedied_note == "second rod driven");
    CHECK(kept->retested_on == Date{2026, 3, 6});
    CHECK(kept->due == Date{2026, 3, 20});  // the description follows the latest assessment
    const UrgentItem* added = item_of(job, "bonding.gas@origin");
    REQUIRE(added);
    CHECK(added->state == UrgentState::open);
    CHECK(item_of(job, "tails.protection@origin") == nullptr);

    // A new revision whose assessment reports the C2 again: its remedied state comes back.
    auto snapshot = sample_snapshot(1);
    CHECK(must(store->save_revision(id, 1, snapshot)) == 2);
    job = must(store->job(id));
    const UrgentItem* back = item_of(job, "tails.protection@origin");
    REQUIRE(back);
    CHECK(back->state == UrgentState::remedied);
    CHECK(back->remedied_on == Date{2026, 3, 7});
    CHECK(item_of(job, "bonding.gas@origin") == nullptr);

    auto stale = store->reassess(id, 1, findings);
    REQUIRE_FALSE(stale.ok());
    CHECK(stale.error().kind == ErrorKind::conflict);
}

void check_dashboard_orders_overdue_first_and_counts(const Backend& backend) {
    auto store = open_store(backend.fresh_url());
    // Job A: items due 2026-04-09 and undated -> not overdue, next due 2026-04-09.
    auto a = sample_snapshot(1);
    a.findings.erase(a.findings.begin());
    // Job B: the sample, with its C1 due 2026-03-01 -> overdue.
    auto b = sample_snapshot(2);
    // Job C: one C2 due 2026-03-09 -> overdue, due earlier than... no: later than B's.
    auto c = sample_snapshot(3);
    c.findings = {finding("tails.protection@origin", "C2", Date{2026, 3, 9})};
    // Job D: no urgent items at all.
    auto d = sample_snapshot(4);
    d.findings = {finding("spd.absent@board:cu", "C3")};
    // Job E: only an undated FI.
    auto e = sample_snapshot(5);
    e.findings = {finding("rcd.type@board:cu", "FI")};
    const JobId ia = must(store->add_job(a)), ib = must(store->add_job(b)), ic = must(store->add_job(c)),
                id = must(store->add_job(d)), ie = must(store->add_job(e));

    const auto urgent = must(store->list_jobs(JobFilter{true, false, std::nullopt}));
    REQUIRE(urgent.size() == 4);
    CHECK(urgent[0].id == ib);  // overdue since 2026-03-01
    CHECK(urgent[0].overdue);
    CHECK(urgent[0].urgent_open == 3);
    CHECK(urgent[0].next_due == Date{2026, 3, 1});
    CHECK(urgent[1].id == ic);  // overdue since 2026-03-09
    CHECK(urgent[1].overdue);
    CHECK(urgent[2].id == ia);  // due 2026-04-09
    CHECK_FALSE(urgent[2].overdue);
    CHECK(urgent[3].id == ie);  // open but undated: last
    CHECK_FALSE(urgent[3].next_due.has_value());
    CHECK_FALSE(urgent[3].overdue);

    const auto overdue = must(store->list_jobs(JobFilter{false, true, std::nullopt}));
    REQUIRE(overdue.size() == 2);
    CHECK(overdue[0].id == ib);
    CHECK(overdue[1].id == ic);

    const auto all = must(store->list_jobs());
    REQUIRE(all.size() == 5);
    CHECK(all[4].id == id);
    CHECK(all[4].urgent_open == 0);

    // Remedying B's overdue C1 moves B behind C: its next due date is now 2026-04-09.
    must(store->mark_remedied(ib, "tt.fault_protection@circuit:c3"));
    const auto after = must(store->list_jobs(JobFilter{true, false, 2}));
    REQUIRE(after.size() == 2);
    CHECK(after[0].id == ic);
    CHECK(after[1].next_due == Date{2026, 4, 9});

    must(store->set_status(ia, JobStatus::quoted));
    const Dashboard board = must(store->dashboard());
    CHECK(board.urgent_jobs.size() == 4);
    CHECK(board.jobs_by_status.at("surveyed") == 4);
    CHECK(board.jobs_by_status.at("quoted") == 1);
    CHECK(board.jobs_by_status.at("closed") == 0);
    // Open items: A (C2, FI), B (C2, FI; C1 remedied), C (C2), E (FI).
    CHECK(board.open_items_by_code.at("C1") == 0);
    CHECK(board.open_items_by_code.at("C2") == 3);
    CHECK(board.open_items_by_code.at("FI") == 3);
    CHECK(board.overdue_items == 1);  // C's C2

    // The same store seen a month later: A's C2 is overdue too.
    auto later = open_store(store->url(), Date{2026, 4, 10});
    CHECK(must(later->list_jobs(JobFilter{false, true, std::nullopt})).size() == 3);
}

void check_status_changes_are_kept_in_history(const Backend& backend) {
    auto store = open_store(backend.fresh_url());
    const JobId id = must(store->add_job(sample_snapshot(1)));
    must(store->set_status(id, JobStatus::quoted, "quote Q-1 sent"));
    must(store->set_status(id, JobStatus::accepted));
    auto same = store->set_status(id, JobStatus::accepted);
    REQUIRE_FALSE(same.ok());
    CHECK(same.error().to_string() == "job " + std::to_string(id) + ": the job is already accepted");
    const JobDetail job = must(store->job(id));
    CHECK(job.status == JobStatus::accepted);
    REQUIRE(job.history.size() == 3);
    CHECK(job.history[1].status == JobStatus::quoted);
    CHECK(job.history[1].note == "quote Q-1 sent");
    CHECK(job.history[1].changed_on == pinned_today);
    CHECK(job.history[2].status == JobStatus::accepted);
    CHECK(store->set_status(id + 5, JobStatus::closed).error().kind == ErrorKind::not_found);
}

void check_remedy_and_retest_rules(const Backend& backend) {
    auto store = open_store(backend.fresh_url());
    const JobId id = must(store->add_job(sample_snapshot(1)));
    const std::string c1 = "tt.fault_protection@circuit:c3";
    auto early = store->mark_retested(id, c1);
    REQUIRE_FALSE(early.ok());
    CHECK(early.error().to_string() ==
          "job " + std::to_string(id) + ", finding " + c1 + ": still open: record the remedy before the re-test");
    auto future = store->mark_remedied(id, c1, Date{2026, 3, 11});
    REQUIRE_FALSE(future.ok());
    CHECK(future.error().to_string() == "date: 2026-03-11 is after today (2026-03-10)");
    auto not_urgent = store->mark_remedied(id, "spd.absent@board:cu");
    REQUIRE_FALSE(not_urgent.ok());
    CHECK(not_urgent.error().kind == ErrorKind::not_found);

    must(store->mark_remedied(id, c1, Date{2026, 3, 8}, "RCD fitted"));
    auto twice = store->mark_remedied(id, c1);
    REQUIRE_FALSE(twice.ok());
    CHECK(twice.error().kind == ErrorKind::invalid_input);
    auto before = store->mark_retested(id, c1, Date{2026, 3, 7});
    REQUIRE_FALSE(before.ok());
    CHECK(before.error().to_string() == "date: the re-test date 2026-03-07 is before the remedy (2026-03-08)");
    must(store->mark_retested(id, c1, std::nullopt, "Zs 0.4 ohm"));
    const JobDetail job = must(store->job(id));
    const UrgentItem* item = item_of(job, c1);
    REQUIRE(item);
    CHECK(item->state == UrgentState::retested);
    CHECK(item->remedied_on == Date{2026, 3, 8});
    CHECK(item->retested_on == pinned_today);
    CHECK(item->retested_note == "Zs 0.4 ohm");
}

void check_quotes_are_recorded_once(const Backend& backend) {
    auto store = open_store(backend.fresh_url());
    const JobId id = must(store->add_job(sample_snapshot(1)));
    QuoteRecord quote{"Q-2026-001", 1, "least-cost", 41000, 8200, 49200, pinned_today, "/tmp/q.xlsx"};
    must(store->record_quote(id, quote));
    auto again = store->record_quote(id, quote);
    REQUIRE_FALSE(again.ok());
    CHECK(again.error().to_string() ==
          "quote.number: quote Q-2026-001 was already issued (job " + std::to_string(id) + ")");
    quote.number = "Q-2026-002";
    quote.revision = 2;
    CHECK(store->record_quote(id, quote).error().kind == ErrorKind::not_found);
    quote.revision = 1;
    quote.total_pence = 1;
    CHECK(store->record_quote(id, quote).error().field == "quote.total_pence");
    const JobDetail job = must(store->job(id));
    REQUIRE(job.quotes.size() == 1);
    CHECK(job.quotes[0].total_pence == 49200);
    CHECK(job.quotes[0].plan == "least-cost");
}

void check_text_with_sql_characters_round_trips(const Backend& backend) {
    // Would break, or drop the table, if any value were spliced into SQL text.
    auto store = open_store(backend.fresh_url());
    auto snapshot = sample_snapshot(1);
    snapshot.facts.client = "O'Neill \"& Sons\"; DROP TABLE jobs; -- ? :name $1";
    snapshot.facts.site = "Flat 2 – Ünïcode Höuse, ½ Row (invented)";
    snapshot.findings[0].id = "rule'x@circuit:\"c3\"";
    const JobId id = must(store->add_job(snapshot));
    const JobDetail job = must(store->job(id));
    CHECK(job.facts.client == snapshot.facts.client);
    CHECK(job.facts.site == snapshot.facts.site);
    CHECK(item_of(job, "rule'x@circuit:\"c3\"") != nullptr);
    must(store->mark_remedied(id, "rule'x@circuit:\"c3\""));
}

void check_two_connections_conflict_instead_of_overwriting(const Backend& backend) {
    const DatabaseUrl url = backend.fresh_url();
    auto office = open_store(url);
    auto van = open_store(url);  // a second connection to the same database
    const JobId id = must(office->add_job(sample_snapshot(1)));
    const int loaded_by_office = must(office->job(id)).latest_revision;
    const int loaded_by_van = must(van->job(id)).latest_revision;
    auto from_van = sample_snapshot(1);
    from_van.document = "{\"from\": \"van\"}";
    CHECK(must(van->save_revision(id, loaded_by_van, from_van)) == 2);
    auto from_office = sample_snapshot(1);
    from_office.document = "{\"from\": \"office\"}";
    auto refused = office->save_revision(id, loaded_by_office, from_office);
    REQUIRE_FALSE(refused.ok());
    CHECK(refused.error().kind == ErrorKind::conflict);
    CHECK(must(office->revision(id, 2)).document == "{\"from\": \"van\"}");
    CHECK(must(office->save_revision(id, 2, from_office)) == 3);
}

void check_two_threads_saving_lose_no_revision(const Backend& backend) {
    const DatabaseUrl url = backend.fresh_url();
    JobId id = 0;
    {
        auto store = open_store(url);
        id = must(store->add_job(sample_snapshot(1)));
    }
    constexpr int saves_each = 15;
    std::vector<std::string> failures(2);
    std::vector<int> conflicts(2, 0);
    auto worker = [&](int who) {
        auto store = JobStore::open(url, OpenOptions{fixed_clock(pinned_today), std::nullopt});
        if (!store) { failures[who] = store.error().to_string(); return; }
        for (int done = 0; done < saves_each;) {
            auto latest = (*store)->job(id);
            if (!latest) { failures[who] = latest.error().to_string(); return; }
            auto snapshot = sample_snapshot(1);
            snapshot.document = "{\"writer\": " + std::to_string(who) + ", \"n\": " + std::to_string(done) + "}";
            auto saved = (*store)->save_revision(id, latest->latest_revision, snapshot);
            if (saved) { ++done; continue; }
            if (saved.error().kind != ErrorKind::conflict) { failures[who] = saved.error().to_string(); return; }
            ++conflicts[who];
        }
    };
    std::thread first(worker, 0), second(worker, 1);
    first.join();
    second.join();
    CHECK(failures[0].empty());
    CHECK(failures[1].empty());
    auto store = open_store(url);
    const JobDetail job = must(store->job(id));
    CHECK(job.latest_revision == 1 + 2 * saves_each);
    REQUIRE(job.revisions.size() == std::size_t(1 + 2 * saves_each));
    for (std::size_t i = 1; i < job.revisions.size(); ++i) CHECK(job.revisions[i].based_on == int(i));
}

void check_upgrade_from_schema_1_keeps_the_jobs(const Backend& backend) {
    const DatabaseUrl url = backend.fresh_url();
    JobId id = 0;
    {
        auto old = JobStore::open(url, OpenOptions{fixed_clock(pinned_today), 1});
        REQUIRE(old.ok());
        CHECK((*old)->schema_version() == 1);
        id = must((*old)->add_job(sample_snapshot(1)));
        must((*old)->mark_remedied(id, "tails.protection@origin", Date{2026, 3, 2}));
    }
    auto store = open_store(url);
    CHECK(store->schema_version() == latest_schema_version());
    if (url.dialect == Dialect::sqlite) {
        REQUIRE(store->upgrade_backup().has_value());
        CHECK(*store->upgrade_backup() ==
              url.sqlite_path + ".before-schema-" + std::to_string(latest_schema_version()) + ".bak");
        // The copy is the old store, still at schema 1, with the job in it.
        DatabaseUrl backup_url = url;
        backup_url.sqlite_path = *store->upgrade_backup();
        auto backup = JobStore::open(backup_url, OpenOptions{fixed_clock(pinned_today), 1});
        REQUIRE(backup.ok());
        CHECK((*backup)->schema_version() == 1);
        CHECK(must((*backup)->job(id)).facts.client == "Invented Client 1");
    }
    const JobDetail job = must(store->job(id));
    CHECK(job.facts.client == "Invented Client 1");
    const UrgentItem* item = item_of(job, "tails.protection@origin");
    REQUIRE(item);
    CHECK(item->state == UrgentState::remedied);
    // Migration 3 worked out the job's summary from its items: C1 (overdue) and FI still open.
    const auto lines = must(store->list_jobs(JobFilter{true, false, std::nullopt}));
    REQUIRE(lines.size() == 1);
    CHECK(lines[0].urgent_open == 2);
    CHECK(lines[0].next_due == Date{2026, 3, 1});
    CHECK(lines[0].overdue);
    const Dashboard board = must(store->dashboard());
    CHECK(board.jobs_by_status.at("surveyed") == 1);
    CHECK(board.open_items_by_code.at("C1") == 1);
    // What migration 2 added works on the upgraded store.
    must(store->record_quote(id, QuoteRecord{"Q-1", 1, "ideal", 100, 20, 120, pinned_today, "q.xlsx"}));
    CHECK(must(store->job(id)).quotes.size() == 1);
    // Opening again changes nothing and takes no second copy.
    auto again = open_store(url);
    CHECK_FALSE(again->upgrade_backup().has_value());
}

namespace {

std::vector<JobId> ids_of(const std::vector<JobSummary>& lines) {
    std::vector<JobId> ids;
    for (const auto& line : lines) ids.push_back(line.id);
    return ids;
}

// Every page of `query`, `limit` lines at a time, joined.
std::vector<JobId> paged_ids(JobStore& store, const JobQuery& query, int limit) {
    std::vector<JobId> ids;
    for (long long offset = 0;; offset += limit) {
        const auto page = must(store.job_page(query, offset, limit));
        REQUIRE(page.size() <= static_cast<std::size_t>(limit));
        for (const auto& line : page) ids.push_back(line.id);
        if (page.size() < static_cast<std::size_t>(limit)) return ids;
    }
}

// The names of the indexes on table `jobs`.
std::vector<std::string> job_indexes(JobStore& store) {
    const bool sqlite = store.connection().dialect() == Dialect::sqlite;
    auto rows = store.connection().run(
        sqlite ? QStringLiteral("SELECT name FROM sqlite_master WHERE type = 'index' AND tbl_name = 'jobs' ORDER BY name")
               : QStringLiteral("SELECT indexname FROM pg_indexes WHERE tablename = 'jobs' AND schemaname = current_schema()"
                                " ORDER BY indexname"),
        {}, "listing indexes");
    REQUIRE(rows.ok());
    std::vector<std::string> names;
    while (rows->next()) names.push_back(text_of(rows->value(0)));
    return names;
}

}  // namespace

void check_job_pages_keep_the_list_order_filters_and_search(const Backend& backend) {
    auto store = open_store(backend.fresh_url());
    // The jobs of the dashboard check, and three without urgent items, one with % and _ in its client.
    auto a = sample_snapshot(1);
    a.findings.erase(a.findings.begin());  // C2 due 2026-04-09 and an undated FI
    auto b = sample_snapshot(2);           // C1 due 2026-03-01: overdue
    auto c = sample_snapshot(3);
    c.findings = {finding("tails.protection@origin", "C2", Date{2026, 3, 9})};  // overdue
    auto d = sample_snapshot(4);
    d.findings = {finding("spd.absent@board:cu", "C3")};
    auto e = sample_snapshot(5);
    e.findings = {finding("rcd.type@board:cu", "FI")};  // open, undated
    auto f = sample_snapshot(6);
    f.findings = {};
    f.facts.client = "Invented 100%_ Lettings";
    auto g = sample_snapshot(7);
    g.findings = {};
    g.facts.client = "Invented 1000 Lettings";
    const JobId ia = must(store->add_job(a)), ib = must(store->add_job(b)), ic = must(store->add_job(c)),
                id = must(store->add_job(d)), ie = must(store->add_job(e)), jf = must(store->add_job(f)),
                jg = must(store->add_job(g));
    must(store->set_status(ia, JobStatus::quoted));
    must(store->set_status(jg, JobStatus::quoted));

    // The whole list: open urgent items first (overdue first, then by due date, undated last), then by id.
    const std::vector<JobId> order{ib, ic, ia, ie, id, jf, jg};
    CHECK(must(store->job_count({})) == 7);
    CHECK(ids_of(must(store->list_jobs())) == order);
    for (int limit : {1, 2, 3, 7, 10}) {
        INFO("limit " << limit);
        CHECK(paged_ids(*store, {}, limit) == order);
    }
    const auto middle = must(store->job_page({}, 2, 3));
    REQUIRE(middle.size() == 3);
    CHECK(middle[0].id == ia);
    CHECK(middle[0].urgent_open == 2);
    CHECK(middle[0].next_due == Date{2026, 4, 9});
    CHECK_FALSE(middle[0].overdue);
    CHECK(middle[0].status == JobStatus::quoted);
    CHECK(middle[0].client == "Invented Client 1");
    CHECK(middle[2].id == id);
    CHECK(middle[2].urgent_open == 0);
    CHECK_FALSE(middle[2].next_due.has_value());
    CHECK(must(store->job_page({}, 7, 5)).empty());  // past the end

    // Filters, alone and together; their pages agree with their counts.
    JobQuery urgent;
    urgent.urgent_only = true;
    CHECK(must(store->job_count(urgent)) == 4);
    CHECK(paged_ids(*store, urgent, 3) == std::vector<JobId>{ib, ic, ia, ie});
    CHECK(ids_of(must(store->list_jobs(JobFilter{true, false, std::nullopt}))) == std::vector<JobId>{ib, ic, ia, ie});
    JobQuery overdue;
    overdue.overdue_only = true;
    CHECK(must(store->job_count(overdue)) == 2);
    const auto overdue_lines = must(store->job_page(overdue, 0, 10));
    CHECK(ids_of(overdue_lines) == std::vector<JobId>{ib, ic});
    CHECK(overdue_lines[0].overdue);
    JobQuery quoted;
    quoted.status = JobStatus::quoted;
    CHECK(must(store->job_count(quoted)) == 2);
    CHECK(paged_ids(*store, quoted, 1) == std::vector<JobId>{ia, jg});
    quoted.urgent_only = true;
    CHECK(paged_ids(*store, quoted, 5) == std::vector<JobId>{ia});
    JobQuery closed;
    closed.status = JobStatus::closed;
    CHECK(must(store->job_count(closed)) == 0);
    CHECK(must(store->job_page(closed, 0, 5)).empty());

    // Search: reference, client or site, anywhere in them, regardless of (ASCII) case.
    JobQuery search;
    search.search = "EXAMPLE ROW";  // every site
    CHECK(must(store->job_count(search)) == 7);
    CHECK(paged_ids(*store, search, 4) == order);
    search.search = "inv-3";  // a reference
    CHECK(paged_ids(*store, search, 5) == std::vector<JobId>{ic});
    search.search = "client 4";
    CHECK(paged_ids(*store, search, 5) == std::vector<JobId>{id});
    search.search = "100%_";  // % and _ are text: not "100" followed by anything
    CHECK(paged_ids(*store, search, 5) == std::vector<JobId>{jf});
    search.search = "1%0";
    CHECK(must(store->job_count(search)) == 0);
    search.search = "_";  // only the client with an underscore, not every job
    CHECK(paged_ids(*store, search, 5) == std::vector<JobId>{jf});
    search.search = "lettings";
    search.status = JobStatus::quoted;
    CHECK(paged_ids(*store, search, 5) == std::vector<JobId>{jg});
    search.search = "no such job";
    search.status.reset();
    CHECK(must(store->job_count(search)) == 0);

    // A page is asked for with a line number of 0 or more and 1 to 10,000 lines.
    auto negative = store->job_page({}, -1, 10);
    REQUIRE_FALSE(negative.ok());
    CHECK(negative.error().kind == ErrorKind::invalid_input);
    CHECK(negative.error().field == "offset");
    auto empty = store->job_page({}, 0, 0);
    REQUIRE_FALSE(empty.ok());
    CHECK(empty.error().field == "limit");
    CHECK_FALSE(store->job_page({}, 0, 10001).ok());
    CHECK(store->job_page({}, 0, 10000).ok());
}

void check_upgrade_from_schema_3_adds_the_list_indexes_and_keeps_the_jobs(const Backend& backend) {
    const DatabaseUrl url = backend.fresh_url();
    JobId first = 0, second = 0;
    {
        auto old = JobStore::open(url, OpenOptions{fixed_clock(pinned_today), 3});
        REQUIRE(old.ok());
        CHECK((*old)->schema_version() == 3);
        first = must((*old)->add_job(sample_snapshot(1)));
        auto plain = sample_snapshot(2);
        plain.findings = {finding("spd.absent@board:cu", "C3")};
        second = must((*old)->add_job(plain));
        must((*old)->set_status(second, JobStatus::accepted));
        const auto indexes = job_indexes(**old);
        CHECK(std::find(indexes.begin(), indexes.end(), "jobs_by_status") != indexes.end());
        CHECK(std::find(indexes.begin(), indexes.end(), "jobs_in_list_order") == indexes.end());
    }
    auto store = open_store(url);
    CHECK(store->schema_version() == 4);
    const auto indexes = job_indexes(*store);
    CHECK(std::find(indexes.begin(), indexes.end(), "jobs_in_list_order") != indexes.end());
    CHECK(std::find(indexes.begin(), indexes.end(), "jobs_by_status_in_list_order") != indexes.end());
    CHECK(std::find(indexes.begin(), indexes.end(), "jobs_by_status") == indexes.end());
    const auto lines = must(store->job_page({}, 0, 10));
    REQUIRE(lines.size() == 2);
    CHECK(lines[0].id == first);
    CHECK(lines[0].urgent_open == 3);
    CHECK(lines[0].overdue);
    CHECK(lines[1].id == second);
    CHECK(lines[1].status == JobStatus::accepted);
    CHECK(must(store->job(second)).history.size() == 2);
    CHECK(must(store->dashboard()).jobs_by_status.at("accepted") == 1);
}

}  // namespace mendwright::store::testing
