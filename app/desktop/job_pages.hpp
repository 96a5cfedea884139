#pragma once
// Pages of the job list, read straight from the store's tables so that a list of 100,000 jobs
// never loads every row: a count, then LIMIT/OFFSET pages in the store's own order (jobs with
// open urgent items first, overdue first, then by next due date; the others by id), with
// filters for urgent, overdue, status and a text search over reference, client and site.
//
// A thin adapter over the store's schema (app/store/migrations.cpp, version 3): JobStore's
// list_jobs has no offset or search yet. It only reads.

#include <optional>
#include <string>
#include <vector>

#include "app/store/connection.hpp"
#include "app/store/outcome.hpp"
#include "app/store/records.hpp"

namespace mendwright::desktop {

struct JobQuery {
    bool urgent_only = false;
    bool overdue_only = false;
    std::optional<store::JobStatus> status;
    std::string search;  // matched anywhere in reference, client or site, without regard to case
};

store::Outcome<long long> count_jobs(store::Connection& connection, const JobQuery& query, const Date& today);

store::Outcome<std::vector<store::JobSummary>> job_page(store::Connection& connection, const JobQuery& query,
                                                        const Date& today, long long offset, int limit);

}  // namespace mendwright::desktop
