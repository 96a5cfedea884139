#pragma once
// The exact search behind the least-cost and ideal plans: choose options so that every required
// finding is cleared by at least one of them, no two chosen options share a slot (they exclude
// each other), no forbidden combination is chosen, and the total cost is least. Weighted set
// cover with exclusions, solved exactly by branch and bound:
//   - independent parts (no finding or slot in common) are solved separately;
//   - branch on the uncovered finding with the fewest usable options;
//   - bound: each uncovered finding must be paid for at least by the cheapest share
//     cost / (uncovered findings it clears) among the usable options clearing it.
// Costs are integers (pence, or pence plus a penalty); ties go to fewer options, then ids.
// Where exclusions make it impossible to clear every finding, each finding may be left open at a
// penalty larger than any plan's cost, so the plan leaves as few open as it can.

#include <cstdint>
#include <set>
#include <string>
#include <vector>

namespace mendwright::remedies {

struct CoverOption {
    std::string id;
    std::int64_t cost = 0;
    std::vector<std::string> clears;  // finding ids
    std::vector<std::string> slots;
};

struct CoverResult {
    bool found = false;                  // every coverable required finding is cleared (left_open empty)
    std::vector<std::size_t> chosen;     // indices into the options, ascending
    std::int64_t cost = 0;
    std::vector<std::string> uncoverable;  // required findings no option clears (left out)
    // Required findings some option clears, but no allowed combination clears together with the
    // rest (options that exclude each other): the plan clears as many as it can, then costs least.
    std::vector<std::string> left_open;
    long long nodes = 0;                 // search nodes visited
};

// `forbidden`: sets of option indices that must not be chosen as exactly that plan.
CoverResult least_cost_cover(const std::vector<CoverOption>& options, const std::vector<std::string>& required,
                             const std::vector<std::set<std::size_t>>& forbidden = {});

}  // namespace mendwright::remedies
