// New work: protection against transient overvoltages (BS 7671:2018+A2 443.4, surge protective
// devices selected to 534). 443.4.1 calls for it unless a risk assessment (or, for a single
// dwelling, the owner's view that the value at risk does not justify it) says otherwise: a
// judgement the planner cannot make. A new board without it is therefore "improvement
// recommended" (C3 by default, the profile may make it a note): visible on every plan that
// fits a board, never on its own making the report unsatisfactory.
#include "planner/rules/checks/checks.hpp"

namespace mendwright::rules::checks {

std::vector<Finding> new_work_surge_protection(const AssessContext& context) {
    std::vector<Finding> findings;
    for (const auto& board : context.installation().boards) {
        if (!board.new_work || board.surge_protection_fitted) continue;
        Finding finding = context.new_finding("new_work.surge_protection", "not_fitted", "board:" + board.id, &board, nullptr,
                                              nullptr);
        if (context.with_text()) {
            finding.title = "New board without surge protection";
            finding.inputs = {{"surge protection fitted", "no", ""}};
            finding.explanation = "The board is new work and no surge protective device is recorded; fit one unless a risk "
                                  "assessment under 443.4 shows it is not needed.";
        }
        findings.push_back(std::move(finding));
    }
    return findings;
}

}  // namespace mendwright::rules::checks
