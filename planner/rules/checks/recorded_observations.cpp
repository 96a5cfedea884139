// The inspector's own observations pass through as findings with their code, words and
// price-book item kept; the id comes from the observation's id.
#include "planner/rules/checks/checks.hpp"

namespace mendwright::rules::checks {

namespace {

Code observation_code(model::ObservationCode code) {
    switch (code) {
        case model::ObservationCode::c1: return Code::c1;
        case model::ObservationCode::c2: return Code::c2;
        case model::ObservationCode::c3: return Code::c3;
        case model::ObservationCode::fi: return Code::fi;
    }
    return Code::fi;
}

}  // namespace

std::vector<Finding> recorded_observations(const AssessContext& context) {
    std::vector<Finding> findings;
    const auto& installation = context.installation();
    for (const auto& observation : installation.observations) {
        Finding finding;
        finding.rule = "recorded";
        finding.id = "recorded@observation:" + observation.id;
        finding.code = observation_code(observation.code);
        if (context.with_text()) {
            finding.title = observation.text;
            finding.explanation = "Recorded by the inspector: " + observation.text;
            finding.clause = "as recorded";
        }
        finding.origin = FindingOrigin::recorded;
        finding.item_code = observation.item_code;
        finding.item_quantity = observation.item_quantity;
        const model::Board* board = observation.board_id ? model::find_board(installation, *observation.board_id) : nullptr;
        const model::CircuitRef circuit =
            observation.circuit_id ? model::find_circuit(installation, *observation.circuit_id) : model::CircuitRef{};
        if (circuit.board) board = circuit.board;
        if (board) {
            finding.board_id = board->id;
            if (context.with_text()) finding.location = AssessContext::board_text(*board);
        }
        if (circuit.circuit) {
            finding.circuit_id = circuit.circuit->id;
            if (context.with_text()) finding.location += " / " + AssessContext::circuit_text(*circuit.circuit);
        }
        if (finding.location.empty() && context.with_text()) finding.location = "whole installation";
        findings.push_back(std::move(finding));
    }
    return findings;
}

}  // namespace mendwright::rules::checks
