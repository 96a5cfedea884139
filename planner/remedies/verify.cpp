#include "planner/remedies/verify.hpp"

#include <algorithm>
#include <set>
#include <string_view>
#include <unordered_map>
#include <unordered_set>

#include <optional>

#include "planner/model/navigation.hpp"
#include "planner/remedies/parallel.hpp"

namespace mendwright::remedies {

model::Installation applied_copy(const model::Installation& installation, const Option& option) {
    model::Installation copy = installation;
    if (option.apply) option.apply(copy);
    return copy;
}

// What verification reads of a finding it compares against: its id, whether it is coded C1, C2
// or FI, and whether it is installation-wide (no board). A few bytes instead of a whole Finding,
// for the baseline and every view kept.
struct FindingBrief {
    std::string id;
    bool urgent = false;
    bool installation_wide = false;
};

// Findings before, in their order, with their ids indexed (held by view into `briefs`, which
// therefore never changes once made).
struct Verifier::FindingIndex {
    std::vector<FindingBrief> briefs;
    std::unordered_map<std::string_view, bool> urgent;  // id -> urgent

    explicit FindingIndex(const std::vector<rules::Finding>& findings) {
        briefs.reserve(findings.size());
        for (const auto& f : findings) briefs.push_back({f.id, f.urgent(), f.board_id.empty()});
        urgent.reserve(briefs.size());
        for (const auto& f : briefs) urgent[f.id] = f.urgent;
    }
    FindingIndex(const FindingIndex&) = delete;
    FindingIndex& operator=(const FindingIndex&) = delete;
};

namespace {

Verification compare_indexed(const Verifier::FindingIndex& before_index, const std::vector<rules::Finding>& after,
                             const std::vector<std::string>& targets) {
    const auto& before = before_index.briefs;
    const auto& urgent_before = before_index.urgent;
    std::unordered_set<std::string_view> after_ids;
    after_ids.reserve(after.size());
    for (const auto& f : after) after_ids.insert(f.id);
    Verification v;
    v.done = true;
    for (const auto& f : before)
        if (!after_ids.count(f.id)) v.cleared.push_back(f.id);
    for (const auto& f : after) {
        if (urgent_before.count(f.id)) continue;
        v.introduced.push_back(f.id);
        if (f.urgent()) v.introduced_urgent.push_back(f.id);
    }
    bool all_urgent_cleared = true;
    for (const auto& id : targets) {
        if (after_ids.count(id)) {
            v.still_open.push_back(id);
            const auto found = urgent_before.find(id);
            if (found != urgent_before.end() && found->second) all_urgent_cleared = false;
        }
    }
    v.clears_every_urgent_target = all_urgent_cleared;
    // Stable order for output and comparison.
    std::sort(v.cleared.begin(), v.cleared.end());
    std::sort(v.introduced.begin(), v.introduced.end());
    std::sort(v.introduced_urgent.begin(), v.introduced_urgent.end());
    return v;
}

}  // namespace

Verification compare_findings(const std::vector<rules::Finding>& before, const std::vector<rules::Finding>& after,
                              const std::vector<std::string>& targets) {
    // Ids are looked up by view into the findings (no copies: this runs once per option).
    return compare_indexed(Verifier::FindingIndex(before), after, targets);
}

// The board tree by ids: the board each board is fed from, the boards each feeds, and the
// circuit feeding each board.
struct Verifier::BoardTree {
    std::unordered_map<std::string, std::string> parent;
    std::unordered_map<std::string, std::vector<std::string>> children;
    std::unordered_map<std::string, const model::Circuit*> feeder;
    std::unordered_map<std::string, const model::Board*> board;
    // A plain tree: board ids unique, each board fed by at most one circuit, no loop. Only then
    // are the boards of the chain above a view cut down to their feeding circuits (plan_view).
    bool plain = true;
};

// Which boards a view of `touched` keeps, and which of them the option may change.
struct Verifier::ViewPlan {
    std::set<std::string> keep;
    std::set<std::string> changeable;  // the touched boards and every board below them
    // Boards of `keep` that are only the chain above (no RCD or RCBO of a touched board's chain
    // at or below them): the view holds their devices and the circuits feeding boards of the
    // view, not their other circuits. Empty unless the board tree is plain.
    std::set<std::string> chain_only;
};

namespace {

using BoardTree = Verifier::BoardTree;
using ViewPlan = Verifier::ViewPlan;

BoardTree board_tree(const model::Installation& installation) {
    BoardTree tree;
    for (const auto& board : installation.boards) {
        if (!tree.board.emplace(board.id, &board).second) tree.plain = false;  // two boards, one id
        for (const auto& circuit : board.circuits) {
            if (!circuit.feeds_board_id) continue;
            if (!tree.parent.emplace(*circuit.feeds_board_id, board.id).second) tree.plain = false;  // fed twice
            tree.feeder.emplace(*circuit.feeds_board_id, &circuit);
            tree.children[board.id].push_back(*circuit.feeds_board_id);
        }
    }
    for (const auto& board : installation.boards) {  // a loop never reaches a board without a parent
        std::string current = board.id;
        std::size_t hops = 0;
        for (auto up = tree.parent.find(current); up != tree.parent.end() && tree.plain; up = tree.parent.find(current)) {
            current = up->second;
            if (++hops > installation.boards.size()) tree.plain = false;
        }
    }
    return tree;
}

void add_subtree(const BoardTree& tree, const std::string& top, std::set<std::string>& into) {
    std::set<std::string> seen;  // not `into`: it may hold `top` already, as a board above another
    std::vector<std::string> stack = {top};
    while (!stack.empty()) {
        std::string id = stack.back();
        stack.pop_back();
        if (!seen.insert(id).second) continue;
        into.insert(id);
        if (auto it = tree.children.find(id); it != tree.children.end())
            for (const auto& child : it->second) stack.push_back(child);
    }
}


// The touched boards and everything below them; the chain of boards above them; and, so that
// the rules adding up over every circuit below an RCD (standing leakage, trip times) see all of
// them, everything below the board of the furthest RCD or RCBO above a touched board.
ViewPlan plan_view(const model::Installation& installation, const BoardTree& tree, const std::vector<std::string>& touched) {
    ViewPlan plan;
    for (const auto& id : touched) add_subtree(tree, id, plan.changeable);
    plan.keep = plan.changeable;
    std::set<std::string> whole_boards = plan.changeable;  // kept with every circuit
    for (const auto& id : touched) {
        std::string current = id;
        std::string furthest_rcd_board;
        for (std::size_t hops = 0; hops <= installation.boards.size(); ++hops) {
            const auto up = tree.parent.find(current);
            if (up == tree.parent.end()) break;
            const model::Circuit* feed = tree.feeder.at(current);
            const model::Board* parent = tree.board.at(up->second);
            // The feeding circuit's device and the parent board's devices above it.
            bool residual = model::is_residual_current_device(feed->device);
            std::optional<std::string> next = feed->upstream_id;
            for (std::size_t steps = 0; next && steps <= parent->devices.size(); ++steps) {
                const model::Device* found = nullptr;
                for (const auto& device : parent->devices)
                    if (device.id == *next) found = &device;
                if (!found) break;
                residual = residual || model::is_residual_current_device(*found);
                next = found->upstream_id;
            }
            if (residual) furthest_rcd_board = parent->id;
            current = parent->id;
            plan.keep.insert(current);
        }
        if (!furthest_rcd_board.empty()) {
            add_subtree(tree, furthest_rcd_board, plan.keep);
            add_subtree(tree, furthest_rcd_board, whole_boards);
        }
    }
    if (tree.plain)
        for (const auto& id : plan.keep)
            if (!whole_boards.count(id)) plan.chain_only.insert(id);
    return plan;
}

std::string view_key(const ViewPlan& plan) {
    std::string key;
    for (const auto& id : plan.keep) key += id + "\n";
    key += "chain only:\n";
    for (const auto& id : plan.chain_only) key += id + "\n";
    return key;
}

// A board of the chain above a view: its own fields and devices, and of its circuits only those
// feeding a board of the view. (A field added to model::Board must be copied here too.)
model::Board chain_board(const model::Board& board, const std::set<std::string>& keep) {
    model::Board cut;
    cut.id = board.id;
    cut.name = board.name;
    cut.location = board.location;
    cut.enclosure = board.enclosure;
    cut.spare_ways = board.spare_ways;
    cut.accepts_rcbos = board.accepts_rcbos;
    cut.surge_protection_fitted = board.surge_protection_fitted;
    cut.new_work = board.new_work;
    cut.devices = board.devices;
    for (const auto& circuit : board.circuits)
        if (circuit.feeds_board_id && keep.count(*circuit.feeds_board_id)) cut.circuits.push_back(circuit);
    return cut;
}

// A view's boards and observations in the installation's order, by pointer into the
// installation, or into `cut` for the boards of the chain above.
struct ViewParts {
    std::vector<const model::Board*> boards;
    std::vector<const model::Observation*> observations;
    std::vector<model::Board> cut;  // reserved up front: `boards` points into it

    ViewParts() = default;
    ViewParts(const ViewParts&) = delete;
    ViewParts& operator=(const ViewParts&) = delete;
};

void fill_view_parts(const model::Installation& installation, const ViewPlan& plan, ViewParts& parts) {
    parts.cut.reserve(plan.chain_only.size());
    for (const auto& board : installation.boards) {
        if (!plan.keep.count(board.id)) continue;
        if (plan.chain_only.count(board.id)) {
            parts.cut.push_back(chain_board(board, plan.keep));
            parts.boards.push_back(&parts.cut.back());
        } else {
            parts.boards.push_back(&board);
        }
    }
    for (const auto& observation : installation.observations)
        if (!observation.board_id || plan.keep.count(*observation.board_id)) parts.observations.push_back(&observation);
}

model::Installation view_of(const model::Installation& installation, const ViewParts& parts) {
    model::Installation view;
    view.job = installation.job;
    view.supply = installation.supply;
    view.electrode = installation.electrode;
    view.tails = installation.tails;
    view.boards.reserve(parts.boards.size());
    for (const auto* board : parts.boards) view.boards.push_back(*board);
    view.observations.reserve(parts.observations.size());
    for (const auto* observation : parts.observations) view.observations.push_back(*observation);
    return view;
}

model::Installation view_of(const model::Installation& installation, const ViewPlan& plan) {
    ViewParts parts;
    fill_view_parts(installation, plan, parts);
    return view_of(installation, parts);
}

// Whether the option, applied to the view (`before`: its parts in `installation`), changed
// nothing outside the boards it may change: the same supply, electrode, tails and job; the same
// boards in the same places, equal unless changeable; the same observations apart from those
// about changeable boards. The view's verdict rests on this, so it is checked rather than taken
// from the option.
bool changes_confined(const model::Installation& installation, const ViewParts& before, const model::Installation& after,
                      const std::set<std::string>& changeable) {
    if (!(installation.job == after.job) || !(installation.supply == after.supply) ||
        !(installation.electrode == after.electrode) || !(installation.tails == after.tails) ||
        before.boards.size() != after.boards.size())
        return false;
    std::unordered_map<std::string_view, std::string_view> circuit_board;
    for (std::size_t b = 0; b < before.boards.size(); ++b) {
        const auto& was = *before.boards[b];
        const auto& now = after.boards[b];
        if (was.id != now.id) return false;
        if (!changeable.count(was.id) && !(was == now)) return false;
        for (const auto& circuit : was.circuits) circuit_board.emplace(circuit.id, was.id);
    }
    const auto outside = [&](const model::Observation& o) {
        if (o.board_id && changeable.count(*o.board_id)) return false;
        if (o.circuit_id) {
            const auto it = circuit_board.find(*o.circuit_id);
            if (it != circuit_board.end() && changeable.count(std::string(it->second))) return false;
        }
        return true;
    };
    std::vector<const model::Observation*> was, now;
    for (const auto* o : before.observations)
        if (outside(*o)) was.push_back(o);
    for (const auto& o : after.observations)
        if (outside(o)) now.push_back(&o);
    if (was.size() != now.size()) return false;
    for (std::size_t i = 0; i < was.size(); ++i)
        if (!(*was[i] == *now[i])) return false;
    return true;
}

}  // namespace

model::Installation board_view(const model::Installation& installation, const std::vector<std::string>& boards) {
    return view_of(installation, plan_view(installation, board_tree(installation), boards));
}

// The findings (verdicts only) of a view of the surveyed installation, kept per set of boards.
// The view itself is not kept: it is made again, by copy, for each option verified on it.
struct Verifier::ViewBaseline {
    FindingIndex index;

    explicit ViewBaseline(const std::vector<rules::Finding>& findings) : index(findings) {}
};

// How an option is verified: on the whole installation, or on the view `plan.keep` (key `key`).
struct Verifier::Route {
    bool whole = true;
    ViewPlan plan;
    std::string key;
};

Verifier::Verifier(const model::Installation& installation, Assessor assess)
    : installation_(installation), assess_(std::move(assess)), baseline_(assess_(installation)),
      tree_(std::make_unique<BoardTree>(board_tree(installation))) {
    for (const auto& f : baseline_) baseline_boards_.emplace(f.id, f.board_id);
    baseline_index_ = std::make_unique<FindingIndex>(baseline_);
}

Verifier::~Verifier() = default;

Verification Verifier::verify_whole(const Option& option) const {
    const model::Installation copy = applied_copy(installation_, option);
    return compare_indexed(*baseline_index_, assess_(copy, rules::FindingDetail::verdict), option.targets);
}

Verifier::Route Verifier::route_of(const Option& option) const {
    Route route;
    if (option.whole_installation || option.touched_boards.empty()) return route;
    route.plan = plan_view(installation_, *tree_, option.touched_boards);
    if (route.plan.keep.size() >= installation_.boards.size()) return route;
    // A target must be a finding about a board of the view: an installation-wide one (RA not
    // recorded, say) may rest on boards the view leaves out.
    for (const auto& id : option.targets) {
        const auto found = baseline_boards_.find(id);
        if (found == baseline_boards_.end() || found->second.empty() || !route.plan.keep.count(found->second) ||
            route.plan.chain_only.count(found->second))
            return route;
    }
    route.whole = false;
    route.key = view_key(route.plan);
    return route;
}

std::unique_ptr<const Verifier::ViewBaseline> Verifier::view_baseline(const ViewPlan& plan) const {
    return std::make_unique<const ViewBaseline>(assess_(view_of(installation_, plan), rules::FindingDetail::verdict));
}

Verification Verifier::verify(const Option& option) {
    const Route route = route_of(option);
    if (route.whole) return verify_whole(option);
    // Before: the view of the surveyed installation (kept per set of boards).
    auto cached = view_baselines_.find(route.key);
    if (cached == view_baselines_.end()) cached = view_baselines_.emplace(route.key, view_baseline(route.plan)).first;
    return verify_on_view(option, route, *cached->second);
}

Verification Verifier::verify_prepared(const Option& option) const {
    const Route route = route_of(option);
    if (route.whole) return verify_whole(option);
    const auto cached = view_baselines_.find(route.key);
    if (cached != view_baselines_.end()) return verify_on_view(option, route, *cached->second);
    const auto before = view_baseline(route.plan);
    return verify_on_view(option, route, *before);
}

void Verifier::prepare(const std::vector<Option>& options) {
    std::vector<const ViewPlan*> wanted;
    std::vector<std::string> keys;
    std::vector<Route> routes;
    routes.reserve(options.size());
    std::set<std::string> seen;
    for (const auto& option : options) {
        routes.push_back(route_of(option));
        const Route& route = routes.back();
        if (route.whole || view_baselines_.count(route.key) || !seen.insert(route.key).second) continue;
        wanted.push_back(&route.plan);
        keys.push_back(route.key);
    }
    std::vector<std::unique_ptr<const ViewBaseline>> made(wanted.size());
    run_in_parallel(wanted.size(), [&](std::size_t i) { made[i] = view_baseline(*wanted[i]); });
    for (std::size_t i = 0; i < made.size(); ++i) view_baselines_.emplace(keys[i], std::move(made[i]));
}

Verification Verifier::verify_on_view(const Option& option, const Route& route, const ViewBaseline& baseline) const {
    // After: the option applied to a copy of that same view; it must have changed only the
    // boards it touches (and those below), or the whole installation is assessed instead.
    ViewParts parts;
    fill_view_parts(installation_, route.plan, parts);
    model::Installation changed = view_of(installation_, parts);
    if (option.apply) option.apply(changed);
    if (!changes_confined(installation_, parts, changed, route.plan.changeable)) return verify_whole(option);
    const std::vector<rules::Finding> after = assess_(changed, rules::FindingDetail::verdict);
    Verification v = compare_indexed(baseline.index, after, option.targets);
    // An installation-wide finding that comes or goes in the view may rest on boards left out
    // (RA not recorded is there if any circuit anywhere has an RCD): the whole decides.
    std::unordered_set<std::string_view> moved(v.cleared.begin(), v.cleared.end());
    moved.insert(v.introduced.begin(), v.introduced.end());
    for (const auto& f : baseline.index.briefs)
        if (f.installation_wide && moved.count(f.id)) return verify_whole(option);
    for (const auto& f : after)
        if (f.board_id.empty() && moved.count(f.id)) return verify_whole(option);
    // Defensive: only findings the whole installation has can count as cleared.
    v.cleared.erase(std::remove_if(v.cleared.begin(), v.cleared.end(),
                                   [&](const std::string& id) { return !baseline_boards_.count(id); }),
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
    verifier.prepare(options);
    const Verifier& shared = verifier;  // from here on only read
    run_in_parallel(options.size(), [&](std::size_t i) { options[i].verification = shared.verify_prepared(options[i]); });
}

}  // namespace mendwright::remedies
