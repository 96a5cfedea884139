#pragma once
// The job store: jobs, every revision of each job's survey document, the findings of the
// latest revision, the urgent items (C1, C2, FI) with their due dates and state, and the
// quotes issued. SQLite by default, PostgreSQL for a shared office; the same schema on both
// (app/store/migrations.cpp, docs/store.md).
//
//   auto url = mendwright::store::resolve_database_url(std::nullopt);  // the embedded store
//   auto store = mendwright::store::JobStore::open(*url);
//   if (!store) return fail(store.error().to_string());
//   auto id = (*store)->add_job(snapshot);                      // revision 1, status "surveyed"
//   auto saved = (*store)->save_revision(*id, 1, edited);       // revision 2, or a conflict
//   auto urgent = (*store)->list_jobs({.urgent_only = true});   // overdue first
//   auto page = (*store)->job_page({.search = "flat 2"}, 100, 50);  // lines 100..149 found
//
// A save never overwrites: it adds a revision. A save edited from an older revision than the
// latest is refused with ErrorKind::conflict. Every call is one transaction: it happens whole
// or not at all, also when the process is killed half-way. Nothing throws; one JobStore is
// used from one thread (open one per thread).

#include <memory>
#include <optional>
#include <string>
#include <vector>

#include "app/store/connection.hpp"
#include "app/store/database_url.hpp"
#include "app/store/outcome.hpp"
#include "app/store/records.hpp"

namespace mendwright::store {

struct OpenOptions {
    Clock clock = system_today;     // "today": dates of saves and changes, and what is overdue
    std::optional<int> schema_version;  // tests of upgrades only: stop at this version
};

class JobStore {
public:
    // Opens the store, creating or upgrading its schema (see migrations.hpp).
    static Outcome<std::unique_ptr<JobStore>> open(const DatabaseUrl& url, OpenOptions options = {});

    [[nodiscard]] const DatabaseUrl& url() const { return connection_->url(); }
    [[nodiscard]] int schema_version() const { return schema_version_; }
    // The copy taken before this open upgraded an older SQLite file, if it did.
    [[nodiscard]] const std::optional<std::string>& upgrade_backup() const { return upgrade_backup_; }
    [[nodiscard]] Date today() const { return clock_(); }
    // The connection underneath, for tests and tools (integrity checks, the benchmark).
    [[nodiscard]] Connection& connection() { return *connection_; }

    // A new job from a survey and its assessment: revision 1, status "surveyed".
    Outcome<JobId> add_job(const SurveySnapshot& snapshot);

    // Adds revision based_on_revision + 1 with the edited survey and its assessment, and updates
    // the urgent items (see reassess). A conflict when `based_on_revision` is not the latest.
    Outcome<int> save_revision(JobId job, int based_on_revision, const SurveySnapshot& snapshot);

    // Replaces the findings of the latest revision (the same survey assessed again, e.g. with a
    // new rules profile). Urgent items whose finding is still reported keep their state and
    // dates; items no longer reported leave the lists (kept in the store, and restored with
    // their state if a later assessment reports them again). A conflict when `revision` is not
    // the latest.
    Outcome<Done> reassess(JobId job, int revision, const std::vector<FindingRecord>& findings);

    // Moves a job to another status, dated today, with a note, kept in its history.
    Outcome<Done> set_status(JobId job, JobStatus status, const std::string& note = {});

    // An open urgent item is remedied (on `on`, default today); a remedied one re-tested.
    // Dates in the future, re-testing before remedying, and re-test dates before the remedy are refused.
    Outcome<Done> mark_remedied(JobId job, const std::string& finding_id, std::optional<Date> on = std::nullopt,
                                const std::string& note = {});
    Outcome<Done> mark_retested(JobId job, const std::string& finding_id, std::optional<Date> on = std::nullopt,
                                const std::string& note = {});

    // Records a quote issued for a revision of a job. Quote numbers are unique in the store.
    Outcome<Done> record_quote(JobId job, const QuoteRecord& quote);

    // One job with its history, current urgent items, findings, revisions and quotes.
    Outcome<JobDetail> job(JobId job);
    // The survey document of one revision, as saved.
    Outcome<Revision> revision(JobId job, int number);

    // Jobs with open urgent items first (overdue first, then by next due date, undated last),
    // then the others by id.
    Outcome<std::vector<JobSummary>> list_jobs(const JobFilter& filter = {});

    // The job list a page at a time, in list_jobs' order, filtered by `query`: at most `limit`
    // (1 .. 10,000) lines from line `offset` (0 = the first). With job_count, a view of 100,000
    // jobs reads only the lines it shows; each page is read straight from an index in list order
    // (migration 4) unless a search or a status filter narrows the list first.
    Outcome<std::vector<JobSummary>> job_page(const JobQuery& query, long long offset, int limit);
    // How many jobs `query` matches.
    Outcome<long long> job_count(const JobQuery& query);

    // Jobs with open urgent items (at most `limit`), counts of jobs by status and of open
    // urgent items by code, and how many items are overdue.
    Outcome<Dashboard> dashboard(std::optional<int> limit = std::nullopt);

private:
    JobStore(std::unique_ptr<Connection> connection, Clock clock)
        : connection_(std::move(connection)), clock_(std::move(clock)) {}

    Outcome<int> latest_revision(JobId job);
    Outcome<Done> write_findings(JobId job, int revision, const std::vector<FindingRecord>& findings);
    Outcome<Done> merge_urgent_items(JobId job, int revision, const std::vector<FindingRecord>& findings);
    // The job list's lines for `query` from `offset`, at most `limit` of them (all without one).
    Outcome<std::vector<JobSummary>> read_job_lines(const JobQuery& query, long long offset, std::optional<int> limit,
                                                    const std::string& what);
    Outcome<UrgentItem> current_urgent_item(JobId job, const std::string& finding_id);
    // Recomputes the job's urgent_open and next_due (schema 3) after its urgent items changed.
    Outcome<Done> refresh_urgent_summary(JobId job);
    // Adds `change` (+1 or -1) to the count of jobs in `status` (schema 3).
    Outcome<Done> count_status(JobStatus status, int change);

    std::unique_ptr<Connection> connection_;
    Clock clock_;
    int schema_version_ = 0;
    std::optional<std::string> upgrade_backup_;
};

// Checks a snapshot before anything is written: names the field of the first problem.
std::optional<StoreError> check_snapshot(const SurveySnapshot& snapshot);
std::optional<StoreError> check_findings(const std::vector<FindingRecord>& findings);

}  // namespace mendwright::store
