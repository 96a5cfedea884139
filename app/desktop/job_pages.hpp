#pragma once
// The job list's lines, a page at a time, kept in a small window: a view of 100,000 jobs reads
// only the pages it shows (and keeps the last few), however far it scrolls. The lines come from
// JobStore::job_count and JobStore::job_page; nothing here knows the store's tables.
//
//   JobPages pages;                                        // pages of 100 lines, 8 kept
//   auto total = pages.reset(store, query);                // counts the matching jobs
//   const store::JobSummary* line = pages.line(store, 99'950);   // reads lines 99,900..99,999

#include <cstdint>
#include <optional>
#include <string>
#include <vector>

#include "app/store/job_store.hpp"

namespace mendwright::desktop {

class JobPages {
public:
    explicit JobPages(int page_lines = 100, int pages_kept = 8);

    // Forgets every page and counts the jobs `query` matches: the number of lines, or the error.
    store::Outcome<long long> reset(store::JobStore& store, const store::JobQuery& query);
    // Forgets every page; the lines are read again as they are asked for.
    void forget_pages();

    // Line `row` (0 = the first), reading its page unless kept; nullptr when the page has no
    // such line (the store changed since the count) or could not be read (see error()).
    const store::JobSummary* line(store::JobStore& store, long long row);

    [[nodiscard]] long long total() const { return total_; }
    [[nodiscard]] int page_lines() const { return page_lines_; }
    void set_page_lines(int lines);  // forgets every page
    // Lines read from the store since the last reset: what scrolling cost.
    [[nodiscard]] long long lines_read() const { return lines_read_; }
    [[nodiscard]] long long pages_read() const { return pages_read_; }
    // Lines held now: at most page_lines() * pages_kept.
    [[nodiscard]] long long lines_kept() const;
    // The last read error, if the last read failed.
    [[nodiscard]] const std::optional<store::StoreError>& error() const { return error_; }

private:
    struct Page {
        long long number = 0;
        std::uint64_t last_used = 0;
        std::vector<store::JobSummary> lines;
    };

    store::JobQuery query_;
    int page_lines_;
    int pages_kept_;
    long long total_ = 0;
    long long lines_read_ = 0;
    long long pages_read_ = 0;
    std::uint64_t use_clock_ = 0;
    std::vector<Page> pages_;  // at most pages_kept_, the least recently used goes first
    std::optional<store::StoreError> error_;
};

}  // namespace mendwright::desktop
