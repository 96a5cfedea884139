#include "planner/export/heap_kept_for_reuse.hpp"

#include <cstdlib>  // also brings in the C library's feature macros (__GLIBC__)
#include <cstring>
#include <mutex>

#if defined(__GLIBC__)
#include <malloc.h>
#endif

namespace mendwright::spreadsheet {

namespace {

#if defined(__GLIBC__)
constexpr int kept_bytes = 64 << 20;            // far above what a 2,000-line quote needs (peak ~6 MB)
constexpr int glibc_initial_bytes = 128 << 10;  // mallopt(3), M_TRIM_THRESHOLD initial value

bool user_chose_trim_threshold() {
    if (std::getenv("MALLOC_TRIM_THRESHOLD_") != nullptr) return true;
    const char* tunables = std::getenv("GLIBC_TUNABLES");
    return tunables != nullptr && std::strstr(tunables, "glibc.malloc.trim_threshold") != nullptr;
}
#endif

std::mutex holders_mutex;
int holders = 0;

void set_trim_threshold([[maybe_unused]] bool keep) {
#if defined(__GLIBC__)
    static const bool left_to_user = user_chose_trim_threshold();
    if (!left_to_user) mallopt(M_TRIM_THRESHOLD, keep ? kept_bytes : glibc_initial_bytes);
#endif
}

}  // namespace

HeapKeptForReuse::HeapKeptForReuse() {
    std::lock_guard lock(holders_mutex);
    if (holders == 0) set_trim_threshold(true);
    ++holders;
}

HeapKeptForReuse::~HeapKeptForReuse() {
    std::lock_guard lock(holders_mutex);
    --holders;
    if (holders == 0) set_trim_threshold(false);
}

}  // namespace mendwright::spreadsheet
