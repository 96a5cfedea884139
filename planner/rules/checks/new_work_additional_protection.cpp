// New work (a board with new_work set, e.g. a replacement consumer unit): every circuit of it
// that BS 7671:2018+A2 asks additional protection for must have a 30 mA RCD without delay above
// it: socket-outlets (411.3.3), lighting in dwellings (411.3.4), outdoor circuits (411.3.3),
// cables concealed in a wall (522.6.202). New work has no room for "improvement recommended",
// so the profile codes these as the departures they would be on a new certificate.
#include "planner/rules/checks/checks.hpp"
#include "planner/rules/checks/common.hpp"
#include "planner/rules/text.hpp"

namespace mendwright::rules::checks {

std::vector<Finding> new_work_additional_protection(const AssessContext& context) {
    std::vector<Finding> findings;
    const double max_idn_amps = context.profile().rcd.additional_protection_max_idn_amps;
    for (const auto& entry : context.circuits()) {
        if (entry.is_submain() || !entry.board->new_work) continue;
        const auto& circuit = *entry.circuit;
        std::string case_name;
        std::string why;
        if (circuit.use == model::CircuitUse::sockets) {
            case_name = "sockets";
            why = "a socket-outlet circuit";
        } else if (circuit.use == model::CircuitUse::outdoor || circuit.supplies_outdoor_equipment) {
            case_name = "outdoor";
            why = "a circuit supplying equipment outdoors";
        } else if (circuit.use == model::CircuitUse::lighting && context.is_dwelling()) {
            case_name = "lighting";
            why = "a lighting circuit in a dwelling";
        } else if (circuit.concealed_in_wall) {
            case_name = "concealed_cable";
            why = "a circuit with cables concealed in a wall";
        } else {
            continue;
        }
        if (additional_protection_rcd(context, entry)) continue;
        Finding finding = context.new_finding("new_work.additional_protection", case_name, "circuit:" + circuit.id,
                                              entry.board, &circuit, &circuit.device);
        if (context.with_text()) {
            finding.title = "New board: circuit without a " + number_text(max_idn_amps * 1000.0) + " mA RCD";
            finding.inputs = {text_input("circuit", why), number_input("IΔn needed at most", max_idn_amps, "A", 3)};
            finding.explanation = "The board is new work and this is " + why + "; no RCD of IΔn ≤ " +
                                  number_text(max_idn_amps * 1000.0) + " mA without time delay is above it.";
        }
        findings.push_back(std::move(finding));
    }
    return findings;
}

}  // namespace mendwright::rules::checks
