#pragma once
// What the job store holds, as plain data. Nothing here depends on the planner's model: the
// caller turns a survey and its assessment into these records (see app/cli/jobs_store_command.cpp).

#include <functional>
#include <map>
#include <optional>
#include <string>
#include <string_view>
#include <vector>

#include "planner/core/date.hpp"

namespace mendwright::store {

using JobId = long long;

// A job's place in the contractor's workflow. Stored and printed as the text of status_text().
enum class JobStatus { surveyed, quoted, accepted, in_progress, completed, closed, declined };

std::string status_text(JobStatus status);                        // "in_progress"
std::optional<JobStatus> parse_status(std::string_view text);     // also accepts "in-progress", "in progress"
const std::vector<JobStatus>& all_statuses();

// An urgent item's state: open until remedied, then re-tested by a competent person.
enum class UrgentState { open, remedied, retested };

std::string urgent_state_text(UrgentState state);                 // "open", "remedied", "retested"
std::optional<UrgentState> parse_urgent_state(std::string_view text);

// The facts of a job, as on the survey's front page.
struct JobFacts {
    std::string reference;   // the contractor's own job reference
    std::string client;
    std::string site;
    std::string occupancy;   // "owner_occupied_dwelling", "privately_rented_dwelling", ...
    Date inspection_date;
    std::string inspector;
};

// One finding of an assessment (rules::Finding, flattened). `id` is stable across assessments.
struct FindingRecord {
    std::string id;           // "tt.fault_protection@circuit:c3"
    std::string rule;
    std::string code;         // "C1", "C2", "C3", "FI" or "note"
    std::string title;
    std::string location;
    std::string clause;
    std::string explanation;
    bool urgent = false;      // must agree with the code: C1, C2 and FI are urgent
    std::optional<Date> due;
    std::string due_text;     // "2026-04-09", or "as agreed" where no deadline applies
};

// A survey document and its assessment: what every save of a job carries.
struct SurveySnapshot {
    JobFacts facts;
    std::string document;     // the survey document (JSON text), kept verbatim
    std::vector<FindingRecord> findings;
};

struct StatusChange {
    JobStatus status = JobStatus::surveyed;
    Date changed_on;
    std::string note;
};

struct UrgentItem {
    std::string finding_id;
    std::string code;         // "C1", "C2" or "FI"
    std::string title;
    std::string location;
    std::optional<Date> due;
    std::string due_text;
    UrgentState state = UrgentState::open;
    std::optional<Date> remedied_on;
    std::string remedied_note;
    std::optional<Date> retested_on;
    std::string retested_note;
    int first_revision = 1;   // the revision whose assessment first reported it

    // Overdue: still open and its due date has passed.
    [[nodiscard]] bool overdue(const Date& today) const { return state == UrgentState::open && due && *due < today; }
};

struct RevisionInfo {
    int number = 1;
    std::optional<int> based_on;  // the revision it was edited from; none for the first
    Date saved_on;
};

struct Revision {
    RevisionInfo info;
    std::string document;
};

// A quote issued for a job.
struct QuoteRecord {
    std::string number;       // the contractor's quote number, unique in the store
    int revision = 1;         // the survey revision it prices
    std::string plan;         // "least-cost", "ideal", "custom", ...
    long long net_pence = 0;
    long long tax_pence = 0;
    long long total_pence = 0;
    Date issued_on;
    std::string file_path;    // the spreadsheet written
};

// One line of a job list or of the dashboard.
struct JobSummary {
    JobId id = 0;
    std::string reference;
    std::string client;
    std::string site;
    JobStatus status = JobStatus::surveyed;
    int urgent_open = 0;
    std::optional<Date> next_due;  // earliest due date of its open urgent items
    bool overdue = false;          // next_due < today
};

struct JobDetail {
    JobId id = 0;
    JobFacts facts;
    JobStatus status = JobStatus::surveyed;
    Date created_on;
    int latest_revision = 1;
    std::vector<StatusChange> history;         // oldest first
    std::vector<UrgentItem> urgent_items;      // reported by the latest assessment: due first
    std::vector<FindingRecord> findings;       // of the latest revision
    std::vector<RevisionInfo> revisions;       // oldest first
    std::vector<QuoteRecord> quotes;           // oldest first
};

struct JobFilter {
    bool urgent_only = false;   // jobs with at least one open urgent item
    bool overdue_only = false;  // jobs with an open urgent item past its due date
    std::optional<int> limit;   // at most this many lines
};

// What a page of the job list shows (JobStore::job_page and job_count): the filters together.
struct JobQuery {
    bool urgent_only = false;                // jobs with at least one open urgent item
    bool overdue_only = false;               // jobs with an open urgent item past its due date
    std::optional<JobStatus> status;         // jobs in this status only
    std::string search;                      // found anywhere in reference, client or site, regardless
                                             // of ASCII case; % and _ are plain text
};

struct Dashboard {
    std::vector<JobSummary> urgent_jobs;           // overdue first, then by next due date
    std::map<std::string, long long> jobs_by_status;     // every status, 0 when none
    std::map<std::string, long long> open_items_by_code; // "C1", "C2", "FI", 0 when none
    long long overdue_items = 0;
};

// Where "today" comes from: the system's local date, or a fixed one in tests.
using Clock = std::function<Date()>;
Date system_today();
Clock fixed_clock(Date today);

}  // namespace mendwright::store
