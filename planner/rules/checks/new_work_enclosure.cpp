// New work: a board fitted in a dwelling must have a non-combustible enclosure or be in a
// non-combustible cabinet (BS 7671:2018+A2 421.1.201, read).
#include "planner/rules/checks/checks.hpp"

namespace mendwright::rules::checks {

std::vector<Finding> new_work_enclosure(const AssessContext& context) {
    std::vector<Finding> findings;
    if (!context.is_dwelling()) return findings;
    for (const auto& board : context.installation().boards) {
        if (!board.new_work || board.enclosure != model::EnclosureMaterial::combustible) continue;
        Finding finding = context.new_finding("new_work.enclosure", "combustible_in_dwelling", "board:" + board.id, &board,
                                              nullptr, nullptr);
        if (context.with_text()) {
            finding.title = "New board in a dwelling with a combustible enclosure";
            finding.inputs = {{"enclosure", "combustible", ""}};
            finding.explanation = "The board is new work in a dwelling and its enclosure is combustible; a non-combustible "
                                  "enclosure or cabinet is required.";
        }
        findings.push_back(std::move(finding));
    }
    return findings;
}

}  // namespace mendwright::rules::checks
