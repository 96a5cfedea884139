#include "planner/export/heap_kept_for_reuse.hpp"

#include <mutex>

#if defined(__GLIBC__)
#include <malloc.h>
#endif

namespace mendwright::spreadsheet {

namespace {

#if defined(__GLIBC__)
constexpr int kept_bytes = 64 << 20;          // far above what a 2,000-line quote needs (peak ~6 MB)
constexpr int glibc_default_bytes = 128 << 10;  // mallopt(3), M_TRIM_THRESHOLD default
#endif

std::mutex holders_mutex;
int holders = 0;

}  // namespace

HeapKeptForReuse::HeapKeptForReuse() {
    std::lock_guard lock(holders_mutex);
#if defined(__GLIBC__)
    if (holders == 0) mallopt(M_TRIM_THRESHOLD, kept_bytes);
#endif
    ++holders;
}

HeapKeptForReuse::~HeapKeptForReuse() {
    std::lock_guard lock(holders_mutex);
    --holders;
#if defined(__GLIBC__)
    if (holders == 0) mallopt(M_TRIM_THRESHOLD, glibc_default_bytes);
#endif
}

}  // namespace mendwright::spreadsheet
