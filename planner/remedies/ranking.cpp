#include "planner/remedies/ranking.hpp"

#include <algorithm>
#include <string_view>
#include <unordered_map>

#include "planner/remedies/proposals.hpp"

namespace mendwright::remedies {

std::vector<Problem> cost_options(const pricing::PriceBook& book, std::vector<Option>& options) {
    std::vector<Problem> problems;
    for (auto& option : options) {
        auto costed = pricing::cost_bill(book, option.bill, option.id);
        option.cost = OptionCost{};
        if (!costed) {
            option.cost.problem = costed.problem().to_string();
            problems.push_back(costed.problem());
            continue;
        }
        option.cost.priced = true;
        option.cost.materials_pence = costed->materials_pence;
        option.cost.labour_pence = costed->labour_pence;
        option.cost.total_pence = costed->total_pence;
    }
    return problems;
}

std::string money_text(pricing::Pence pence) {
    std::string pounds = std::to_string(pence / 100);
    for (int at = static_cast<int>(pounds.size()) - 3; at > 0; at -= 3) pounds.insert(static_cast<std::size_t>(at), ",");
    const auto p = pence % 100;
    return "£" + pounds + "." + (p < 10 ? "0" : "") + std::to_string(p);
}

namespace {

std::size_t residual_count(const Option& option) {
    return option.verification.still_open.size() + option.verification.introduced.size();
}

}  // namespace

void explain_options(std::vector<Option>& options) {
    for (auto& option : options) {
        option.rank_reasons.clear();
        const auto& v = option.verification;
        const bool free_line = option.kind == "free-line";
        option.ranked_last = !free_line && (!v.introduced_urgent.empty() || v.cleared.empty());
        if (!v.introduced_urgent.empty()) {
            std::string ids;
            for (const auto& id : v.introduced_urgent) ids += (ids.empty() ? "" : ", ") + id;
            option.rank_reasons.push_back("ranked last: introduces urgent finding(s) " + ids);
        }
        if (!free_line && v.cleared.empty()) option.rank_reasons.push_back("ranked last: re-verification shows it clears nothing");
        if (v.clears_every_urgent_target)
            option.rank_reasons.push_back("clears every urgent finding it targets");
        else
            option.rank_reasons.push_back("leaves urgent target(s) open");
        option.rank_reasons.push_back(option.cost.priced ? "costs " + money_text(option.cost.total_pence) + " before markup and VAT"
                                                         : "not priced: " + option.cost.problem);
        option.rank_reasons.push_back(std::to_string(v.still_open.size()) + " target(s) still open, " +
                                      std::to_string(v.introduced.size()) + " finding(s) introduced");
        option.rank_reasons.push_back(detail::number_text(option.hours_off_supply, 1) + " h with the supply off");
    }
}

bool ranks_before(const Option& a, const Option& b) {
    if (a.ranked_last != b.ranked_last) return !a.ranked_last;
    if (a.verification.clears_every_urgent_target != b.verification.clears_every_urgent_target)
        return a.verification.clears_every_urgent_target;
    if (a.cost.priced != b.cost.priced) return a.cost.priced;
    if (a.cost.total_pence != b.cost.total_pence) return a.cost.total_pence < b.cost.total_pence;
    if (residual_count(a) != residual_count(b)) return residual_count(a) < residual_count(b);
    if (a.hours_off_supply != b.hours_off_supply) return a.hours_off_supply < b.hours_off_supply;
    return a.id < b.id;
}

std::vector<FindingRanking> rank_by_finding(const std::vector<rules::Finding>& findings, const std::vector<Option>& options) {
    std::unordered_map<std::string_view, std::vector<const Option*>> by_finding;  // ids held by the options
    // Verification leaves `cleared` sorted, which allows a binary search; checked once per option.
    std::unordered_map<const Option*, bool> cleared_sorted;
    for (const auto& option : options) {
        for (const auto& id : option.targets) by_finding[id].push_back(&option);
        cleared_sorted[&option] = std::is_sorted(option.verification.cleared.begin(), option.verification.cleared.end());
    }
    std::vector<FindingRanking> rankings;
    for (const auto& finding : findings) {
        auto it = by_finding.find(finding.id);
        if (it == by_finding.end()) continue;
        auto& list = it->second;  // sorted in place: sorting it again for a repeated id changes nothing
        std::stable_sort(list.begin(), list.end(), [](const Option* a, const Option* b) { return ranks_before(*a, *b); });
        FindingRanking ranking{finding.id, finding.code, {}, {}};
        for (const Option* option : list) {
            ranking.option_ids.push_back(option->id);
            std::string reason = option->id + ": ";
            if (option->ranked_last) reason += "last (introduces an urgent finding or clears nothing); ";
            const auto& cleared = option->verification.cleared;
            const bool clears_this = cleared_sorted.at(option)
                                         ? std::binary_search(cleared.begin(), cleared.end(), finding.id)
                                         : std::find(cleared.begin(), cleared.end(), finding.id) != cleared.end();
            reason += clears_this ? "clears it" : "does not clear it";
            reason += option->verification.clears_every_urgent_target ? ", clears every urgent target" : ", leaves an urgent target open";
            reason += ", " + (option->cost.priced ? money_text(option->cost.total_pence) : std::string("not priced"));
            reason += ", " + std::to_string(residual_count(*option)) + " left or introduced";
            reason += ", " + detail::number_text(option->hours_off_supply, 1) + " h off";
            ranking.reasons.push_back(std::move(reason));
        }
        rankings.push_back(std::move(ranking));
    }
    return rankings;
}

}  // namespace mendwright::remedies
