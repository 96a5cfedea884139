// A consumer unit or similar switchgear assembly in a dwelling must have a non-combustible
// enclosure or be in a cabinet of non-combustible material (BS 7671:2018+A2 421.1.201, read).
// Boards fitted as new work are held to new_work.enclosure instead.
#include "planner/rules/checks/checks.hpp"

namespace mendwright::rules::checks {

std::vector<Finding> combustible_enclosure(const AssessContext& context) {
    std::vector<Finding> findings;
    if (!context.is_dwelling()) return findings;
    for (const auto& board : context.installation().boards) {
        if (board.new_work || board.enclosure != model::EnclosureMaterial::combustible) continue;
        Finding finding = context.new_finding("board.combustible_enclosure", "dwelling", "board:" + board.id, &board, nullptr,
                                              nullptr);
        if (context.with_text()) {
            finding.title = "Board in a dwelling with a combustible enclosure";
            finding.inputs = {{"enclosure", "combustible", ""}};
            finding.explanation = "The enclosure is recorded as combustible (e.g. plastic) and the premises are a dwelling, "
                                  "where a non-combustible enclosure or cabinet is required.";
        }
        findings.push_back(std::move(finding));
    }
    return findings;
}

}  // namespace mendwright::rules::checks
