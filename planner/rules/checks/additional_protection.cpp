// Additional protection by a 30 mA RCD where BS 7671:2018+A2 requires it: socket-outlets up to
// 32 A (411.3.3), lighting in dwellings (411.3.4), cables concealed in a wall at less than 50 mm
// without other protection (522.6.202), mobile equipment used outdoors (411.3.3). Common practice
// codes sockets that may supply outdoor equipment C2, the rest C3 (the profile holds the codes).
// Boards fitted as new work are held to the new-work rule instead (new_work_additional_protection).
#include "planner/rules/checks/checks.hpp"
#include "planner/rules/checks/common.hpp"
#include "planner/rules/text.hpp"

namespace mendwright::rules::checks {

namespace {

constexpr const char* rule_id = "additional_protection";

int urgency(Code code) {
    switch (code) {
        case Code::c1: return 0;
        case Code::c2: return 1;
        case Code::fi: return 2;
        case Code::c3: return 3;
        case Code::note: return 4;
    }
    return 5;
}

struct Reason {
    std::string case_name;
    std::string words;
};

}  // namespace

std::vector<Finding> additional_protection(const AssessContext& context) {
    std::vector<Finding> findings;
    const auto& limits = context.profile().rcd;
    for (const auto& entry : context.circuits()) {
        if (entry.is_submain() || entry.board->new_work) continue;
        const auto& circuit = *entry.circuit;
        const bool sockets = circuit.use == model::CircuitUse::sockets &&
                             circuit.device.rating_amps <= limits.socket_outlet_max_amps;
        // The words only where the finding's text is wanted (see AssessContext::with_text).
        const bool text = context.with_text();
        std::vector<Reason> reasons;
        if (circuit.use == model::CircuitUse::outdoor || (sockets && circuit.supplies_outdoor_equipment))
            reasons.push_back({"outdoor", text ? "may supply equipment used outdoors" : ""});
        if (sockets)
            reasons.push_back({"sockets", text ? "socket-outlets of up to " + number_text(limits.socket_outlet_max_amps) + " A"
                                               : std::string()});
        if (circuit.use == model::CircuitUse::lighting && context.is_dwelling())
            reasons.push_back({"lighting", text ? "lighting in a dwelling" : ""});
        if (circuit.concealed_in_wall)
            reasons.push_back({"concealed_cable",
                               text ? "cables concealed in a wall at less than 50 mm without other protection" : ""});
        if (reasons.empty()) continue;
        if (additional_protection_rcd(context, entry)) continue;

        const auto& profile = context.profile();
        const Reason* chosen = &reasons.front();
        for (const auto& reason : reasons)
            if (urgency(profile.rule_case(rule_id, reason.case_name).code) <
                urgency(profile.rule_case(rule_id, chosen->case_name).code))
                chosen = &reason;

        Finding finding = context.new_finding(rule_id, chosen->case_name, "circuit:" + circuit.id, entry.board, &circuit,
                                              &circuit.device);
        if (context.with_text()) {
            finding.title = "No additional protection by a " + number_text(limits.additional_protection_max_idn_amps * 1000.0) +
                            " mA RCD";
            std::string why;
            for (const auto& reason : reasons) why += (why.empty() ? "" : "; ") + reason.words;
            std::string above = "none";
            if (!entry.residual_current_devices.empty()) {
                above.clear();
                for (const auto& ref : entry.residual_current_devices) {
                    above += (above.empty() ? "" : ", ") + AssessContext::device_text(*ref.device);
                    if (ref.device->residual_current_amps)
                        above += " " + number_text(*ref.device->residual_current_amps * 1000.0) + " mA";
                    if (ref.device->delay == model::RcdDelay::time_delayed) above += " S-type";
                }
            }
            finding.inputs = {text_input("required because", why), text_input("RCDs above", above),
                              number_input("IΔn needed at most", limits.additional_protection_max_idn_amps, "A", 3)};
            finding.explanation = "Required for this circuit (" + why + "); no RCD of IΔn ≤ " +
                                  number_text(limits.additional_protection_max_idn_amps * 1000.0) +
                                  " mA without time delay is above it (RCDs above: " + above + ").";
        }
        findings.push_back(std::move(finding));
    }
    return findings;
}

}  // namespace mendwright::rules::checks
