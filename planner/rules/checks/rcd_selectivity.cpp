// RCDs in series must be selective, or one fault trips both and more of the installation than
// needed goes dark: the upstream device time-delayed (S-type) and its IΔn at least the profile's
// ratio (3) times the downstream IΔn (general rule, read; BS 7671 536.4.1.4 as its home from
// memory). Every pair of RCDs/RCBOs above any circuit is checked once.
#include <set>
#include <utility>

#include "planner/rules/checks/checks.hpp"
#include "planner/rules/checks/common.hpp"
#include "planner/rules/text.hpp"

namespace mendwright::rules::checks {

std::vector<Finding> rcd_selectivity(const AssessContext& context) {
    std::vector<Finding> findings;
    const double ratio = context.profile().rcd.selectivity_ratio;
    std::set<std::pair<const model::Device*, const model::Device*>> seen;
    for (const auto& entry : context.circuits()) {
        const auto& rcds = entry.residual_current_devices;
        for (std::size_t down = 0; down < rcds.size(); ++down) {
            for (std::size_t up = down + 1; up < rcds.size(); ++up) {
                const auto& lower = rcds[down];
                const auto& upper = rcds[up];
                if (!lower.device->residual_current_amps || !upper.device->residual_current_amps) continue;
                if (!seen.insert({upper.device, lower.device}).second) continue;
                const double upper_idn = *upper.device->residual_current_amps;
                const double lower_idn = *lower.device->residual_current_amps;
                const bool delayed = upper.device->delay == model::RcdDelay::time_delayed;
                const double needed_amps = ratio * lower_idn;
                const bool enough = upper_idn >= needed_amps * (1.0 - 1e-9);
                if (delayed && enough) continue;

                Finding finding = context.new_finding("rcd.selectivity", "not_selective",
                                                      "device:" + upper.device->id + ">" + lower.device->id, upper.board,
                                                      upper.circuit, upper.device);
                if (context.with_text()) {
                    finding.location = AssessContext::board_text(*upper.board) + " / " + AssessContext::device_text(*upper.device) +
                                       " above " + AssessContext::device_text(*lower.device);
                    finding.title = "RCDs in series not selective: one fault may trip both";
                    const std::string upper_text = number_text(upper_idn * 1000.0) + " mA" + (delayed ? " S-type" : " general");
                    const std::string lower_text = number_text(lower_idn * 1000.0) + " mA" +
                                                   (lower.device->delay == model::RcdDelay::time_delayed ? " S-type" : " general");
                    finding.inputs = {text_input("upstream", AssessContext::device_text(*upper.device) + " " + upper_text),
                                      text_input("downstream", AssessContext::device_text(*lower.device) + " " + lower_text),
                                      number_input("ratio needed", ratio, "", 2)};
                    std::string why;
                    if (!delayed) why = "upstream device is not time-delayed (S-type)";
                    if (!enough)
                        why += (why.empty() ? "" : "; ") + std::string("upstream IΔn ") + number_text(upper_idn * 1000.0) +
                               " mA < " + number_text(ratio) + " × " + number_text(lower_idn * 1000.0) + " mA = " +
                               number_text(needed_amps * 1000.0) + " mA";
                    finding.explanation = "Upstream " + upper_text + ", downstream " + lower_text + ": " + why + ".";
                }
                findings.push_back(std::move(finding));
            }
        }
    }
    return findings;
}

}  // namespace mendwright::rules::checks
