#pragma once
// An invented job store for the benchmarks (bench/store, bench/desktop): `job_count` jobs, ten
// findings each, written straight into the store's tables in one transaction with prepared
// statements (going through add_job one job at a time would only be slower; the generator is
// not what is measured). The schema and indexes are the store's own (JobStore::open).
//
// The data are synthetic and invented: no real clients or sites. Mix (our own assumption of a
// contractor's store after some years, not measured anywhere): jobs in id order over about six
// years up to `today`; 85 % closed with every urgent item re-tested, 5 % completed (items
// remedied), 5 % declined (items left open), 5 % in the pipeline (surveyed .. in progress,
// items open); of the ten findings on average 2.5 are urgent (C1 in 5 % of jobs, two C2, an FI
// in half of them), C1 and C2 due within 28 days of the survey, FI undated. Each job's urgent
// summary and the counts by status are worked out as migration 3 does.

#include "app/store/job_store.hpp"

namespace mendwright::store {

// Fills an empty store; false (and a line on stderr) if a statement fails.
bool fill_synthetic_store(JobStore& store, int job_count, const Date& today);

}  // namespace mendwright::store
