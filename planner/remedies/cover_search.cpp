#include "planner/remedies/cover_search.hpp"

#include <algorithm>
#include <limits>
#include <map>
#include <numeric>
#include <unordered_map>

namespace mendwright::remedies {

namespace {

struct UnionFind {
    std::vector<std::size_t> parent;
    explicit UnionFind(std::size_t n) : parent(n) { std::iota(parent.begin(), parent.end(), 0); }
    std::size_t find(std::size_t x) {
        while (parent[x] != x) x = parent[x] = parent[parent[x]];
        return x;
    }
    void join(std::size_t a, std::size_t b) { parent[find(a)] = find(b); }
};

// One independent part: options (global indices), elements 0..m-1 local.
class PartSearch {
public:
    PartSearch(const std::vector<CoverOption>& all, std::vector<std::size_t> option_ids, std::size_t elements,
               std::vector<std::vector<std::size_t>> clears, std::vector<std::vector<std::size_t>> slot_ids, std::size_t slots)
        : all_(all), ids_(std::move(option_ids)), clears_(std::move(clears)), slots_of_(std::move(slot_ids)),
          covered_(elements, 0), slot_used_(slots, 0), excluded_(ids_.size(), 0) {
        by_element_.resize(elements);
        for (std::size_t o = 0; o < ids_.size(); ++o)
            for (std::size_t e : clears_[o]) by_element_[e].push_back(o);
        // Cheapest first inside each element's list: good plans are met early.
        for (auto& list : by_element_)
            std::sort(list.begin(), list.end(), [&](std::size_t a, std::size_t b) {
                return std::make_pair(all_[ids_[a]].cost, all_[ids_[a]].id) < std::make_pair(all_[ids_[b]].cost, all_[ids_[b]].id);
            });
    }

    void run(const std::vector<std::set<std::size_t>>& forbidden, std::size_t real_options) {
        forbidden_ = &forbidden;
        real_options_ = real_options;
        uncovered_ = covered_.size();
        search(0);
    }

    bool found = false;
    std::int64_t best_cost = std::numeric_limits<std::int64_t>::max();
    std::vector<std::size_t> best;  // global indices
    long long nodes = 0;

private:
    bool usable(std::size_t o) const {
        if (excluded_[o]) return false;
        for (std::size_t s : slots_of_[o])
            if (slot_used_[s]) return false;
        return true;
    }

    std::int64_t lower_bound() const {
        // Sum over uncovered elements of the cheapest share; computed in doubles, rounded down.
        std::vector<std::size_t> fresh(ids_.size(), 0);
        for (std::size_t o = 0; o < ids_.size(); ++o)
            for (std::size_t e : clears_[o]) fresh[o] += covered_[e] ? 0 : 1;
        double bound = 0.0;
        for (std::size_t e = 0; e < covered_.size(); ++e) {
            if (covered_[e]) continue;
            double cheapest = std::numeric_limits<double>::infinity();
            for (std::size_t o : by_element_[e])
                if (usable(o)) cheapest = std::min(cheapest, static_cast<double>(all_[ids_[o]].cost) / static_cast<double>(fresh[o]));
            if (cheapest == std::numeric_limits<double>::infinity()) return std::numeric_limits<std::int64_t>::max();
            bound += cheapest;
        }
        return static_cast<std::int64_t>(bound * (1.0 - 1e-12));
    }

    bool better(std::int64_t cost) const {
        if (!found || cost < best_cost) return true;
        if (cost > best_cost) return false;
        std::vector<std::size_t> mine;
        for (std::size_t o : chosen_) mine.push_back(ids_[o]);
        std::sort(mine.begin(), mine.end());
        if (mine.size() != best.size()) return mine.size() < best.size();
        std::vector<std::string> a, b;
        for (std::size_t i : mine) a.push_back(all_[i].id);
        for (std::size_t i : best) b.push_back(all_[i].id);
        return a < b;
    }

    bool is_forbidden() const {
        std::set<std::size_t> mine;
        for (std::size_t o : chosen_)
            if (ids_[o] < real_options_) mine.insert(ids_[o]);  // "leave open" choices do not count
        for (const auto& f : *forbidden_)
            if (f == mine) return true;
        return false;
    }

    void search(std::int64_t cost) {
        ++nodes;
        if (uncovered_ == 0) {
            if (!is_forbidden() && better(cost)) {
                found = true;
                best_cost = cost;
                best.clear();
                for (std::size_t o : chosen_) best.push_back(ids_[o]);
                std::sort(best.begin(), best.end());
            }
            return;
        }
        const std::int64_t bound = lower_bound();
        if (bound == std::numeric_limits<std::int64_t>::max()) return;
        if (found && cost + bound > best_cost) return;
        // The uncovered element with the fewest usable options.
        std::size_t pick = covered_.size();
        std::size_t fewest = std::numeric_limits<std::size_t>::max();
        for (std::size_t e = 0; e < covered_.size(); ++e) {
            if (covered_[e]) continue;
            std::size_t n = 0;
            for (std::size_t o : by_element_[e]) n += usable(o) ? 1 : 0;
            if (n < fewest) {
                fewest = n;
                pick = e;
            }
        }
        if (fewest == 0) return;
        // Branch: each usable option clearing `pick`; after trying one, it is excluded from the
        // later branches (they are the plans without it), which keeps branches disjoint.
        std::vector<std::size_t> tried;
        for (std::size_t o : by_element_[pick]) {
            if (!usable(o)) continue;
            chosen_.push_back(o);
            for (std::size_t s : slots_of_[o]) ++slot_used_[s];
            for (std::size_t e : clears_[o]) uncovered_ -= covered_[e]++ == 0 ? 1 : 0;
            search(cost + all_[ids_[o]].cost);
            for (std::size_t e : clears_[o]) uncovered_ += --covered_[e] == 0 ? 1 : 0;
            for (std::size_t s : slots_of_[o]) --slot_used_[s];
            chosen_.pop_back();
            excluded_[o] = 1;
            tried.push_back(o);
        }
        for (std::size_t o : tried) excluded_[o] = 0;
    }

    const std::vector<CoverOption>& all_;
    std::vector<std::size_t> ids_;
    std::vector<std::vector<std::size_t>> clears_;
    std::vector<std::vector<std::size_t>> slots_of_;
    std::vector<std::vector<std::size_t>> by_element_;
    std::vector<int> covered_;
    std::vector<int> slot_used_;
    std::vector<char> excluded_;
    std::vector<std::size_t> chosen_;
    std::size_t uncovered_ = 0;
    const std::vector<std::set<std::size_t>>* forbidden_ = nullptr;
    std::size_t real_options_ = 0;
};

}  // namespace

namespace {

// Leaving a finding open costs more than any real plan (whose costs stay below 10^13 pence plus
// the ideal plan's penalties of 10^11 each).
constexpr std::int64_t leave_open_penalty = 100'000'000'000'000LL;

CoverResult cover_with_all(const std::vector<CoverOption>& options, const std::vector<std::string>& required,
                           const std::vector<std::set<std::size_t>>& forbidden, std::size_t real_options);

}  // namespace

CoverResult least_cost_cover(const std::vector<CoverOption>& options, const std::vector<std::string>& required,
                             const std::vector<std::set<std::size_t>>& forbidden) {
    // One "leave it open" choice per coverable finding, after the real options.
    std::set<std::string> coverable;
    for (const auto& option : options) coverable.insert(option.clears.begin(), option.clears.end());
    std::vector<CoverOption> extended = options;
    for (const auto& id : required)
        if (coverable.count(id)) extended.push_back({"(left open) " + id, leave_open_penalty, {id}, {}});
    CoverResult result = cover_with_all(extended, required, forbidden, options.size());
    std::vector<std::size_t> real;
    for (std::size_t i : result.chosen) {
        if (i < options.size()) {
            real.push_back(i);
        } else {
            result.left_open.push_back(extended[i].clears.front());
            result.cost -= leave_open_penalty;
        }
    }
    result.chosen = std::move(real);
    std::sort(result.left_open.begin(), result.left_open.end());
    result.found = result.found && result.left_open.empty();
    return result;
}

namespace {

CoverResult cover_with_all(const std::vector<CoverOption>& options, const std::vector<std::string>& required,
                           const std::vector<std::set<std::size_t>>& forbidden, std::size_t real_options) {
    CoverResult result;
    std::unordered_map<std::string, std::size_t> element_of;
    for (const auto& id : required) element_of.emplace(id, element_of.size());
    std::vector<char> coverable(element_of.size(), 0);
    // Only options that clear a required finding take part.
    std::vector<std::size_t> useful;
    for (std::size_t o = 0; o < options.size(); ++o) {
        bool any = false;
        for (const auto& id : options[o].clears)
            if (auto it = element_of.find(id); it != element_of.end()) {
                coverable[it->second] = 1;
                any = true;
            }
        if (any) useful.push_back(o);
    }
    for (const auto& [id, e] : element_of)
        if (!coverable[e]) result.uncoverable.push_back(id);
    std::sort(result.uncoverable.begin(), result.uncoverable.end());

    // Parts: options joined by a shared required finding or a shared slot.
    UnionFind parts(useful.size());
    std::unordered_map<std::string, std::size_t> first_with_key;
    for (std::size_t u = 0; u < useful.size(); ++u) {
        const auto& option = options[useful[u]];
        for (const auto& id : option.clears) {
            if (!element_of.count(id)) continue;
            auto [it, inserted] = first_with_key.emplace("f:" + id, u);
            if (!inserted) parts.join(u, it->second);
        }
        for (const auto& slot : option.slots) {
            auto [it, inserted] = first_with_key.emplace("s:" + slot, u);
            if (!inserted) parts.join(u, it->second);
        }
    }
    std::map<std::size_t, std::vector<std::size_t>> members;
    for (std::size_t u = 0; u < useful.size(); ++u) members[parts.find(u)].push_back(u);
    // A forbidden combination couples the parts it touches: solve those together.
    for (const auto& f : forbidden) {
        std::size_t first = std::numeric_limits<std::size_t>::max();
        for (std::size_t u = 0; u < useful.size(); ++u)
            if (f.count(useful[u])) {
                if (first == std::numeric_limits<std::size_t>::max()) first = u;
                else parts.join(u, first);
            }
    }
    members.clear();
    for (std::size_t u = 0; u < useful.size(); ++u) members[parts.find(u)].push_back(u);

    result.found = true;
    for (const auto& [root, list] : members) {
        (void)root;
        std::unordered_map<std::string, std::size_t> local_element;
        std::unordered_map<std::string, std::size_t> local_slot;
        std::vector<std::size_t> ids;
        std::vector<std::vector<std::size_t>> clears, slots;
        for (std::size_t u : list) {
            const auto& option = options[useful[u]];
            ids.push_back(useful[u]);
            std::vector<std::size_t> c, s;
            for (const auto& id : option.clears)
                if (element_of.count(id)) c.push_back(local_element.emplace(id, local_element.size()).first->second);
            for (const auto& slot : option.slots) s.push_back(local_slot.emplace(slot, local_slot.size()).first->second);
            std::sort(c.begin(), c.end());
            c.erase(std::unique(c.begin(), c.end()), c.end());
            clears.push_back(std::move(c));
            slots.push_back(std::move(s));
        }
        // Forbidden sets restricted to this part (a set reaching outside it never matches here
        // unless wholly inside, which the joining above ensures).
        std::vector<std::set<std::size_t>> local_forbidden;
        for (const auto& f : forbidden) {
            bool inside = !f.empty() && std::all_of(f.begin(), f.end(), [&](std::size_t i) {
                return std::find(ids.begin(), ids.end(), i) != ids.end();
            });
            if (inside) local_forbidden.push_back(f);
        }
        PartSearch part(options, ids, local_element.size(), clears, slots, local_slot.size());
        part.run(local_forbidden, real_options);
        result.nodes += part.nodes;
        if (!part.found) {
            result.found = false;
            continue;
        }
        result.cost += part.best_cost;
        result.chosen.insert(result.chosen.end(), part.best.begin(), part.best.end());
    }
    std::sort(result.chosen.begin(), result.chosen.end());
    return result;
}

}  // namespace

}  // namespace mendwright::remedies
