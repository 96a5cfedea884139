#include "app/desktop/job_pages.hpp"

#include <algorithm>

namespace mendwright::desktop {

JobPages::JobPages(int page_lines, int pages_kept)
    : page_lines_(std::max(1, page_lines)), pages_kept_(std::max(1, pages_kept)) {}

store::Outcome<long long> JobPages::reset(store::JobStore& store, const store::JobQuery& query) {
    query_ = query;
    forget_pages();
    lines_read_ = 0;
    pages_read_ = 0;
    total_ = 0;
    auto total = store.job_count(query_);
    if (!total) {
        error_ = total.error();
        return total.error();
    }
    error_.reset();
    total_ = *total;
    return total_;
}

void JobPages::forget_pages() { pages_.clear(); }

void JobPages::set_page_lines(int lines) {
    if (lines < 1 || lines == page_lines_) return;
    page_lines_ = lines;
    forget_pages();
}

long long JobPages::lines_kept() const {
    long long kept = 0;
    for (const Page& page : pages_) kept += static_cast<long long>(page.lines.size());
    return kept;
}

const store::JobSummary* JobPages::line(store::JobStore& store, long long row) {
    if (row < 0 || row >= total_) return nullptr;
    const long long number = row / page_lines_;
    auto kept = std::find_if(pages_.begin(), pages_.end(), [number](const Page& page) { return page.number == number; });
    if (kept == pages_.end()) {
        auto lines = store.job_page(query_, number * page_lines_, page_lines_);
        if (!lines) {
            error_ = lines.error();
            return nullptr;
        }
        error_.reset();
        lines_read_ += static_cast<long long>(lines->size());
        ++pages_read_;
        if (static_cast<int>(pages_.size()) >= pages_kept_) {
            auto oldest = std::min_element(pages_.begin(), pages_.end(),
                                           [](const Page& a, const Page& b) { return a.last_used < b.last_used; });
            pages_.erase(oldest);
        }
        pages_.push_back(Page{number, 0, std::move(*lines)});
        kept = std::prev(pages_.end());
    }
    kept->last_used = ++use_clock_;
    const auto index = static_cast<std::size_t>(row - number * page_lines_);
    return index < kept->lines.size() ? &kept->lines[index] : nullptr;
}

}  // namespace mendwright::desktop
