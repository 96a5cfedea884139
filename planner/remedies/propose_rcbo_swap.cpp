// Kind 4: RCBOs in place of the circuit-breakers of the existing board, where the board takes
// them (Board::accepts_rcbos), for every final circuit that has no 30 mA device above it.
#include <algorithm>
#include <set>

#include "planner/model/navigation.hpp"
#include "planner/remedies/model_edits.hpp"
#include "planner/remedies/proposals.hpp"

namespace mendwright::remedies {

namespace {

constexpr double additional_protection_amps = 0.03;  // BS 7671 415.1.1 (read): IΔn <= 30 mA

bool has_30ma(const std::vector<model::DeviceRef>& chain) {
    for (const auto& ref : chain)
        if (model::is_residual_current_device(*ref.device) && ref.device->residual_current_amps &&
            *ref.device->residual_current_amps <= additional_protection_amps + 1e-9)
            return true;
    return false;
}

void swap_to_rcbos(model::Installation& installation, const std::string& board_id,
                   const std::vector<std::pair<std::string, std::string>>& circuit_and_new_id) {
    model::Board* board = edits::board(installation, board_id);
    if (!board) return;
    for (auto& circuit : board->circuits) {
        for (const auto& [circuit_id, device_id] : circuit_and_new_id) {
            if (circuit.id != circuit_id) continue;
            const model::Device old = circuit.device;
            circuit.device = edits::new_residual_device(device_id, model::DeviceKind::rcbo, old.rating_amps, 0.03,
                                                        model::RcdDelay::general);
            circuit.device.curve = old.curve.value_or(model::BreakerCurve::b);
            circuit.device.breaking_capacity_ka = old.breaking_capacity_ka;
            circuit.device.label = old.label;
            edits::forget_device_tests(circuit);
        }
    }
}

}  // namespace

std::vector<Option> propose_rcbo_swaps(const ProposalContext& context) {
    std::vector<Option> options;
    const CatalogueEntry* entry = context.catalogue.find("rcbo-swap");
    if (!entry) return options;
    const auto& installation = context.installation;
    std::set<const model::Circuit*> protected_30ma;
    for (const auto& chain : edits::final_circuit_chains(installation))
        if (has_30ma(chain.devices)) protected_30ma.insert(chain.circuit.circuit);
    const edits::IdsInUse in_use(installation);
    for (const auto& board : installation.boards) {
        if (!board.accepts_rcbos) continue;
        std::vector<std::pair<std::string, std::string>> swaps;
        std::set<std::string> swapped;
        for (const auto& circuit : board.circuits) {
            if (circuit.feeds_board_id) continue;
            if (circuit.device.kind != model::DeviceKind::circuit_breaker) continue;
            if (protected_30ma.count(&circuit)) continue;
            swaps.emplace_back(circuit.id, in_use.unused(board.id + "-rcbo-" + circuit.id));
            swapped.insert(circuit.id);
        }
        if (swaps.empty()) continue;
        std::vector<std::string> targets;
        for (const auto& id : detail::targets_for(*entry, context.findings, {board.id})) {
            for (const auto& finding : context.findings) {
                if (finding.id != id) continue;
                if (finding.circuit_id.empty() || swapped.count(finding.circuit_id)) targets.push_back(id);
            }
        }
        if (targets.empty()) continue;
        const int n = static_cast<int>(swaps.size());
        Option option = detail::from_entry(*entry, "rcbo-swap@board:" + board.id,
                                           {{"board", detail::board_name(board)}, {"circuits", std::to_string(n)}},
                                           {{"circuit", n}}, n);
        option.targets = std::move(targets);
        option.slots = {"board:" + board.id};
        option.touched_boards = {board.id};
        option.apply = [board_id = board.id, swaps](model::Installation& copy) { swap_to_rcbos(copy, board_id, swaps); };
        options.push_back(std::move(option));
    }
    return options;
}

}  // namespace mendwright::remedies
