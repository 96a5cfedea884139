#include "planner/remedies/verify.hpp"

#include <algorithm>
#include <set>
#include <unordered_map>
#include <unordered_set>

#include "planner/model/navigation.hpp"

namespace mendwright::remedies {

model::Installation applied_copy(const model::Installation& installation, const Option& option) {
    model::Installation copy = installation;
    if (option.apply) option.apply(copy);
    return copy;
}

Verification compare_findings(const std::vector<rules::Finding>& before, const std::vector<rules::Finding>& after,
                              const std::vector<std::string>& targets) {
    std::unordered_set<std::string> before_ids;
    std::unordered_set<std::string> after_ids;
    for (const auto& f : before) before_ids.insert(f.id);
    for (const auto& f : after) after_ids.insert(f.id);
    Verification v;
    v.done = true;
    for (const auto& f : before)
        if (!after_ids.count(f.id)) v.cleared.push_back(f.id);
    for (const auto& f : after) {
        if (before_ids.count(f.id)) continue;
        v.introduced.push_back(f.id);
        if (f.urgent()) v.introduced_urgent.push_back(f.id);
    }
    std::unordered_map<std::string, bool> urgent_before;
    for (const auto& f : before) urgent_before[f.id] = f.urgent();
    bool all_urgent_cleared = true;
    for (const auto& id : targets) {
        if (after_ids.count(id)) {
            v.still_open.push_back(id);
            if (urgent_before[id]) all_urgent_cleared = false;
        }
    }
    v.clears_every_urgent_target = all_urgent_cleared;
    // Stable order for output and comparison.
    std::sort(v.cleared.begin(), v.cleared.end());
    std::sort(v.introduced.begin(), v.introduced.end());
    std::sort(v.introduced_urgent.begin(), v.introduced_urgent.end());
    return v;
}

namespace {

// Parent board of each board (by the circuit feeding it), built once per installation.
std::unordered_map<std::string, std::string> parent_boards(const model::Installation& installation) {
    std::unordered_map<std::string, std::string> parent;
    for (const auto& board : installation.boards)
        for (const auto& circuit : board.circuits)
            if (circuit.feeds_board_id) parent[*circuit.feeds_board_id] = board.id;
    return parent;
}

std::set<std::string> view_boards(const model::Installation& installation, const std::vector<std::string>& boards) {
    const auto parent = parent_boards(installation);
    std::unordered_map<std::string, std::vector<std::string>> children;
    for (const auto& [child, p] : parent) children[p].push_back(child);
    std::set<std::string> keep;
    std::vector<std::string> stack(boards.begin(), boards.end());
    while (!stack.empty()) {  // the touched boards and everything below them
        std::string id = stack.back();
        stack.pop_back();
        if (!keep.insert(id).second) continue;
        for (const auto& child : children[id]) stack.push_back(child);
    }
    for (const auto& id : boards) {  // and the chain above
        std::string current = id;
        for (std::size_t hops = 0; hops <= installation.boards.size(); ++hops) {
            auto it = parent.find(current);
            if (it == parent.end()) break;
            current = it->second;
            keep.insert(current);
        }
    }
    return keep;
}

std::string view_key(const std::set<std::string>& boards) {
    std::string key;
    for (const auto& id : boards) key += id + "\n";
    return key;
}

}  // namespace

model::Installation board_view(const model::Installation& installation, const std::vector<std::string>& boards) {
    const std::set<std::string> keep = view_boards(installation, boards);
    model::Installation view;
    view.job = installation.job;
    view.supply = installation.supply;
    view.electrode = installation.electrode;
    view.tails = installation.tails;
    for (const auto& board : installation.boards)
        if (keep.count(board.id)) view.boards.push_back(board);
    for (const auto& observation : installation.observations)
        if (!observation.board_id || keep.count(*observation.board_id)) view.observations.push_back(observation);
    return view;
}

Verifier::Verifier(const model::Installation& installation, Assessor assess)
    : installation_(installation), assess_(std::move(assess)), baseline_(assess_(installation)) {
    for (const auto& f : baseline_) baseline_ids_.insert(f.id);
}

Verification Verifier::verify_whole(const Option& option) {
    const model::Installation copy = applied_copy(installation_, option);
    return compare_findings(baseline_, assess_(copy), option.targets);
}

Verification Verifier::verify(const Option& option) {
    if (option.whole_installation || option.touched_boards.empty() ||
        view_boards(installation_, option.touched_boards).size() == installation_.boards.size())
        return verify_whole(option);
    // Before: the view of the surveyed installation (cached per set of boards).
    const std::set<std::string> keep = view_boards(installation_, option.touched_boards);
    const std::string key = view_key(keep);
    auto cached = view_baselines_.find(key);
    if (cached == view_baselines_.end())
        cached = view_baselines_.emplace(key, assess_(board_view(installation_, option.touched_boards))).first;
    // After: the option applied to that same view.
    model::Installation view = board_view(installation_, option.touched_boards);
    if (option.apply) option.apply(view);
    Verification v = compare_findings(cached->second, assess_(view), option.targets);
    // A view can show findings that the whole installation does not have (a submain to a board
    // left out of the view); only findings the whole installation has count as cleared.
    v.cleared.erase(std::remove_if(v.cleared.begin(), v.cleared.end(),
                                   [&](const std::string& id) { return !baseline_ids_.count(id); }),
                    v.cleared.end());
    return v;
}

model::Installation Verifier::combined_copy(const std::vector<const Option*>& options) const {
    model::Installation copy = installation_;
    for (const Option* option : options)
        if (option && option->apply) option->apply(copy);
    return copy;
}

void verify_options(Verifier& verifier, std::vector<Option>& options) {
    for (auto& option : options) option.verification = verifier.verify(option);
}

}  // namespace mendwright::remedies
