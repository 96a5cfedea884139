#pragma once
// Independent pieces of work shared over the machine's cores: verification assesses a hundred
// or more changed copies, each on its own, and on a 2-core machine two at a time halve the wait.
//
//   remedies::run_in_parallel(options.size(), [&](std::size_t i) { results[i] = work(options[i]); });
//
// Each index is run exactly once, on the calling thread or on one of up to
// parallel_thread_count() - 1 helper threads started for the call; the call returns when all
// are done. Results must go to a place of their own per index (no shared writes), which keeps
// the outcome the same whatever the number of threads. The first exception a task throws is
// rethrown to the caller once every thread has stopped (tasks not yet started are skipped).

#include <cstddef>
#include <functional>

namespace mendwright::remedies {

// The cores the machine reports, at least 1 and at most 4.
std::size_t parallel_thread_count();

void run_in_parallel(std::size_t count, const std::function<void(std::size_t)>& task);

}  // namespace mendwright::remedies
