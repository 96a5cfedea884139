#include "planner/remedies/parallel.hpp"

#include <algorithm>
#include <atomic>
#include <exception>
#include <mutex>
#include <thread>
#include <vector>

namespace mendwright::remedies {

std::size_t parallel_thread_count() {
    const unsigned reported = std::thread::hardware_concurrency();  // 0 when unknown
    return std::clamp<std::size_t>(reported, 1, 4);
}

void run_in_parallel(std::size_t count, const std::function<void(std::size_t)>& task) {
    const std::size_t threads = std::min(parallel_thread_count(), count);
    if (threads <= 1) {
        for (std::size_t i = 0; i < count; ++i) task(i);
        return;
    }
    std::atomic<std::size_t> next{0};
    std::atomic<bool> failed{false};
    std::exception_ptr first_error;
    std::mutex error_mutex;
    const auto work = [&] {
        for (std::size_t i = next.fetch_add(1); i < count && !failed.load(); i = next.fetch_add(1)) {
            try {
                task(i);
            } catch (...) {
                const std::lock_guard<std::mutex> lock(error_mutex);
                if (!first_error) first_error = std::current_exception();
                failed.store(true);
            }
        }
    };
    std::vector<std::thread> helpers;
    helpers.reserve(threads - 1);
    try {
        for (std::size_t t = 1; t < threads; ++t) helpers.emplace_back(work);
    } catch (...) {
        // No thread could be started (resources): the caller's thread does the rest alone.
    }
    work();
    for (auto& helper : helpers) helper.join();
    if (first_error) std::rethrow_exception(first_error);
}

}  // namespace mendwright::remedies
