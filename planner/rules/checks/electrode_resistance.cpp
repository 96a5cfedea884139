// The earth electrode's resistance RA in a TT system against the stability threshold (BS 7671
// Table 41.5 note: above 200 Ω RA may not be stable) and the trade's ideal target (below 100 Ω,
// common practice, since soil resistance rises as it dries). Both numbers come from the profile.
#include "planner/rules/checks/checks.hpp"
#include "planner/rules/text.hpp"

namespace mendwright::rules::checks {

std::vector<Finding> electrode_resistance(const AssessContext& context) {
    std::vector<Finding> findings;
    const auto ra_ohms = context.earth_resistance_ohms();
    if (!context.is_tt() || !ra_ohms) return findings;
    const auto& limits = context.profile().electrode;
    constexpr const char* rule_id = "electrode.resistance";

    if (*ra_ohms > limits.stability_limit_ohms) {
        Finding finding = context.new_finding(rule_id, "above_stability_limit", "installation", nullptr, nullptr, nullptr);
        if (context.with_text()) {
            finding.title = "Earth electrode resistance above " + number_text(limits.stability_limit_ohms) + " Ω: may not be stable";
            finding.inputs = {number_input("RA", *ra_ohms, "Ω"), number_input("stability threshold", limits.stability_limit_ohms, "Ω")};
            finding.explanation = "RA " + number_text(*ra_ohms) + " Ω > " + number_text(limits.stability_limit_ohms) +
                                  " Ω: a resistance this high may not be stable as the soil dries or freezes.";
        }
        findings.push_back(std::move(finding));
    } else if (*ra_ohms > limits.target_ohms) {
        Finding finding = context.new_finding(rule_id, "above_target", "installation", nullptr, nullptr, nullptr);
        if (context.with_text()) {
            finding.title = "Earth electrode resistance above the " + number_text(limits.target_ohms) + " Ω aimed for";
            finding.inputs = {number_input("RA", *ra_ohms, "Ω"), number_input("target", limits.target_ohms, "Ω")};
            finding.explanation = "RA " + number_text(*ra_ohms) + " Ω > " + number_text(limits.target_ohms) + " Ω target (≤ " +
                                  number_text(limits.stability_limit_ohms) +
                                  " Ω stability threshold): acceptable, with little margin for a dry season.";
        }
        findings.push_back(std::move(finding));
    }
    return findings;
}

}  // namespace mendwright::rules::checks
