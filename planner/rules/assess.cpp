#include "planner/rules/assess.hpp"

#include <algorithm>
#include <cctype>
#include <string_view>
#include <unordered_map>

#include "planner/rules/context.hpp"
#include "planner/rules/rule_table.hpp"

namespace mendwright::rules {

namespace {

// Most urgent first: C1, C2, FI (all three make a condition report unsatisfactory), then C3 and notes.
int code_rank(Code code) {
    switch (code) {
        case Code::c1: return 0;
        case Code::c2: return 1;
        case Code::fi: return 2;
        case Code::c3: return 3;
        case Code::note: return 4;
    }
    return 5;
}

std::string lower(std::string text) {
    for (auto& ch : text) ch = char(std::tolower(static_cast<unsigned char>(ch)));
    return text;
}

}  // namespace

DueDate due_date_for(const model::JobFacts& job, const RulesProfile& profile) {
    for (const auto& rule : profile.due_dates.rules) {
        if (rule.occupancy != job.occupancy || lower(rule.country) != lower(job.country)) continue;
        const Date date = job.inspection_date.plus_days(rule.days);
        return DueDate{date, date.to_iso(), rule.basis};
    }
    return DueDate{std::nullopt, profile.due_dates.default_text, ""};
}

std::vector<Finding> assess(const model::Installation& installation, const RulesProfile& profile, AssessOptions options) {
    const AssessContext context(installation, profile, options.detail);
    // Each rule's findings stay where the rule put them until they are moved, once, into their
    // place in the order below (assess runs hundreds of times per remedy search).
    std::vector<std::vector<Finding>> by_rule;
    by_rule.reserve(rule_table().size());
    for (const auto& rule : rule_table()) by_rule.push_back(rule.check(context));

    const DueDate due = due_date_for(installation.job, profile);
    for (auto& found : by_rule) {
        for (auto& finding : found) {
            if (!finding.urgent()) continue;
            finding.due = due.date;
            finding.due_text = due.text;
        }
    }

    // Deterministic order: code, then place in the document (installation-wide first), then id;
    // findings equal on all of these keep the order of the rule table (a stable sort).
    std::unordered_map<std::string_view, std::size_t> board_position;
    std::unordered_map<std::string_view, std::size_t> circuit_position;
    board_position.reserve(installation.boards.size());
    circuit_position.reserve(context.circuits().size());
    for (const auto& entry : context.circuits()) circuit_position.emplace(entry.circuit->id, entry.circuit_index);
    for (std::size_t b = 0; b < installation.boards.size(); ++b) board_position.emplace(installation.boards[b].id, b + 1);
    struct SortKey {
        int code = 0;
        std::size_t board = 0;
        std::size_t circuit = 0;
        Finding* finding = nullptr;
    };
    std::vector<SortKey> keys;
    for (auto& found : by_rule) {
        for (auto& f : found) {
            const auto board = board_position.find(f.board_id);
            const auto circuit = circuit_position.find(f.circuit_id);
            keys.push_back({code_rank(f.code), board == board_position.end() ? 0 : board->second,
                            circuit == circuit_position.end() ? 0 : circuit->second + 1, &f});
        }
    }
    std::stable_sort(keys.begin(), keys.end(), [](const SortKey& a, const SortKey& b) {
        if (a.code != b.code) return a.code < b.code;
        if (a.board != b.board) return a.board < b.board;
        if (a.circuit != b.circuit) return a.circuit < b.circuit;
        return a.finding->id < b.finding->id;
    });
    std::vector<Finding> findings;
    findings.reserve(keys.size());
    for (const auto& key : keys) findings.push_back(std::move(*key.finding));
    return findings;
}

CodeSummary summarise(const std::vector<Finding>& findings) {
    CodeSummary summary;
    for (const auto& finding : findings) {
        switch (finding.code) {
            case Code::c1: ++summary.c1; break;
            case Code::c2: ++summary.c2; break;
            case Code::c3: ++summary.c3; break;
            case Code::fi: ++summary.fi; break;
            case Code::note: ++summary.note; break;
        }
    }
    return summary;
}

}  // namespace mendwright::rules
