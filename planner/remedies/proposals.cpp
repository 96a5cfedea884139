#include "planner/remedies/proposals.hpp"

#include <algorithm>
#include <charconv>
#include <cmath>
#include <set>
#include <sstream>
#include <iomanip>
#include <unordered_map>

#include "planner/remedies/parallel.hpp"

namespace mendwright::remedies {

std::vector<Option> propose_options(const ProposalContext& context) {
    // Each kind is proposed on its own from the same read-only context, so the kinds are shared
    // across the cores (parallel.hpp); the options are then put in this order.
    using Proposer = std::vector<Option> (*)(const ProposalContext&);
    static constexpr Proposer proposers[] = {propose_upstream_rcd, propose_replacement_boards, propose_rcbo_swaps,
                                             propose_selectivity,  propose_electrodes,         propose_tails,
                                             propose_manual_lines};
    constexpr std::size_t kinds = sizeof(proposers) / sizeof(proposers[0]);
    std::vector<std::vector<Option>> by_kind(kinds);
    run_in_parallel(kinds, [&](std::size_t i) { by_kind[i] = proposers[i](context); });
    std::size_t total = 0;
    for (const auto& some : by_kind) total += some.size();
    std::vector<Option> options;
    options.reserve(total);
    for (auto& some : by_kind)
        for (auto& option : some) options.push_back(std::move(option));
    return options;
}

Option make_free_line(const std::string& id, const std::string& title, std::vector<pricing::BillLine> bill) {
    Option option;
    option.id = id;
    option.kind = "free-line";
    option.title = title;
    option.description = "A line added by the contractor; it changes nothing the rules check.";
    option.bill = std::move(bill);
    option.certificate = "none";
    return option;
}

namespace detail {

std::vector<std::string> targets_for(const CatalogueEntry& entry, const std::vector<rules::Finding>& findings,
                                     const std::vector<std::string>& boards) {
    std::vector<std::string> ids;
    for (const auto& finding : findings) {
        if (finding.code == rules::Code::note) continue;
        if (!entry.targets_rule(finding.rule)) continue;
        if (!boards.empty() && !finding.board_id.empty() &&
            std::find(boards.begin(), boards.end(), finding.board_id) == boards.end())
            continue;
        ids.push_back(finding.id);
    }
    return ids;
}

namespace {

std::string replace_words(std::string text, const std::map<std::string, std::string>& words) {
    for (const auto& [key, value] : words) {
        const std::string token = "{" + key + "}";
        for (std::size_t at = text.find(token); at != std::string::npos; at = text.find(token, at + value.size()))
            text.replace(at, token.size(), value);
    }
    return text;
}

}  // namespace

Option from_entry(const CatalogueEntry& entry, const std::string& id, const std::map<std::string, std::string>& words,
                  const std::map<std::string, double>& counts, int circuits_off) {
    Option option;
    option.id = id;
    option.kind = entry.kind;
    option.title = replace_words(entry.title, words);
    option.description = replace_words(entry.description, words);
    option.bill = entry.bill(counts);
    for (const auto& text : entry.assumptions) option.assumptions.push_back(replace_words(text, words));
    for (const auto& text : entry.prerequisites) option.prerequisites.push_back(replace_words(text, words));
    for (const auto& text : entry.leaves_open) option.leaves_open.push_back(replace_words(text, words));
    option.notifiable = entry.notifiable;
    option.certificate = entry.certificate;
    option.hours_off_supply = entry.hours_off_supply(circuits_off);
    option.ideal_avoid = entry.ideal_avoid;
    return option;
}

std::vector<std::string> board_and_below(const model::Installation& installation, const std::string& board_id) {
    std::unordered_map<std::string, std::vector<std::string>> children;
    for (const auto& board : installation.boards)
        for (const auto& circuit : board.circuits)
            if (circuit.feeds_board_id) children[board.id].push_back(*circuit.feeds_board_id);
    std::vector<std::string> result;
    std::set<std::string> seen;
    std::vector<std::string> stack = {board_id};
    while (!stack.empty()) {
        std::string id = stack.back();
        stack.pop_back();
        if (!seen.insert(id).second) continue;
        result.push_back(id);
        for (const auto& child : children[id]) stack.push_back(child);
    }
    return result;
}

std::string board_name(const model::Board& board) {
    std::string text = board.name.empty() ? "board " + board.id : board.name;
    if (!board.location.empty()) text += ", " + board.location;
    return text;
}

std::string number_text(double value, int decimals) {
    // What std::fixed with setprecision prints (printf's "%.*f", which std::to_chars in fixed
    // format with a precision matches, C++17 [charconv.to.chars]), without a stream per number:
    // ranking writes thousands of these.
    char text[64];
    const auto [end, error] = std::to_chars(text, text + sizeof text, value, std::chars_format::fixed, decimals);
    if (error == std::errc()) return std::string(text, end);
    std::ostringstream out;
    out << std::fixed << std::setprecision(decimals) << value;
    return out.str();
}

}  // namespace detail

}  // namespace mendwright::remedies
