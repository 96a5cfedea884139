#include "planner/rules/context.hpp"

#include <unordered_map>

namespace mendwright::rules {

namespace {

const model::Device* board_device(const model::Board& board, const std::string& id) {
    for (const auto& device : board.devices)
        if (device.id == id) return &device;
    return nullptr;
}

}  // namespace

AssessContext::AssessContext(const model::Installation& installation, const RulesProfile& profile)
    : installation_(installation), profile_(profile) {
    // Which circuit feeds each board, looked up once (model::feeding_circuit scans every circuit
    // on each call; assess runs hundreds of times per remedy search).
    std::unordered_map<std::string, model::CircuitRef> feeder_of;
    for (const auto& board : installation.boards)
        for (const auto& circuit : board.circuits)
            if (circuit.feeds_board_id) feeder_of.emplace(*circuit.feeds_board_id, model::CircuitRef{&board, &circuit});

    // The same walk as model::devices_above, with the same guards against loops in an
    // unvalidated document.
    for (std::size_t b = 0; b < installation.boards.size(); ++b) {
        const auto& board = installation.boards[b];
        for (std::size_t c = 0; c < board.circuits.size(); ++c) {
            CircuitEntry entry{&board, &board.circuits[c], b, c, {}, {}};
            const model::Board* current_board = &board;
            const model::Circuit* current_circuit = &board.circuits[c];
            for (std::size_t hops = 0; current_board && current_circuit && hops <= installation.boards.size(); ++hops) {
                entry.chain.push_back({current_board, &current_circuit->device, current_circuit});
                std::optional<std::string> next = current_circuit->upstream_id;
                std::size_t steps = 0;
                while (next && steps++ <= current_board->devices.size()) {
                    const model::Device* device = board_device(*current_board, *next);
                    if (!device) break;
                    entry.chain.push_back({current_board, device, nullptr});
                    next = device->upstream_id;
                }
                const auto found = feeder_of.find(current_board->id);
                if (found == feeder_of.end()) break;
                current_board = found->second.board;
                current_circuit = found->second.circuit;
            }
            for (const auto& ref : entry.chain)
                if (model::is_residual_current_device(*ref.device)) entry.residual_current_devices.push_back(ref);
            circuits_.push_back(std::move(entry));
        }
    }
}

bool AssessContext::is_tt() const { return installation_.supply.earthing == model::EarthingArrangement::tt; }

bool AssessContext::is_dwelling() const {
    const auto occupancy = installation_.job.occupancy;
    return occupancy == model::Occupancy::owner_occupied_dwelling ||
           occupancy == model::Occupancy::privately_rented_dwelling;
}

std::optional<double> AssessContext::earth_resistance_ohms() const {
    if (!installation_.electrode) return std::nullopt;
    if (installation_.electrode->remeasured_ra_ohms) return installation_.electrode->remeasured_ra_ohms;
    return installation_.electrode->measured_ra_ohms;
}

std::optional<Date> AssessContext::earth_resistance_measured_on() const {
    if (!installation_.electrode) return std::nullopt;
    if (installation_.electrode->remeasured_ra_ohms) return installation_.electrode->remeasured_on;
    return installation_.electrode->measured_on;
}

std::string AssessContext::board_text(const model::Board& board) {
    std::string text = board.name.empty() ? "board " + board.id : board.name;
    if (!board.location.empty()) text += ", " + board.location;
    return text;
}

std::string AssessContext::circuit_text(const model::Circuit& circuit) {
    std::string text = "circuit " + (circuit.number.empty() ? circuit.id : circuit.number);
    if (!circuit.description.empty()) text += " " + circuit.description;
    return text;
}

std::string AssessContext::device_text(const model::Device& device) {
    if (!device.label.empty()) return device.label;  // as marked on the board: "RCD 100 mA (whole board)"
    std::string kind;
    switch (device.kind) {
        case model::DeviceKind::main_switch: kind = "main switch"; break;
        case model::DeviceKind::rcd: kind = "RCD"; break;
        case model::DeviceKind::circuit_breaker: kind = "circuit-breaker"; break;
        case model::DeviceKind::rcbo: kind = "RCBO"; break;
        case model::DeviceKind::fuse: kind = "fuse"; break;
        case model::DeviceKind::switch_fuse: kind = "switch-fuse"; break;
    }
    return kind + " " + device.id;
}

double AssessContext::required_disconnection_time_s(const CircuitEntry& entry) const {
    const auto& limits = profile_.fault_protection;
    const auto& circuit = *entry.circuit;
    // BS 7671 411.3.2.2: final circuits up to 63 A with socket-outlets, up to 32 A for fixed
    // equipment, get the short times; 411.3.2.3/411.3.2.4: distribution and larger final circuits.
    bool small_final = false;
    if (!entry.is_submain()) {
        const double largest = circuit.use == model::CircuitUse::sockets ? limits.final_circuit_with_sockets_max_amps
                                                                         : limits.final_circuit_fixed_equipment_max_amps;
        small_final = circuit.device.rating_amps <= largest;
    }
    if (is_tt()) return small_final ? limits.tt_final_circuit_s : limits.tt_distribution_circuit_s;
    return small_final ? limits.tn_final_circuit_s : limits.tn_distribution_circuit_s;
}

Finding AssessContext::new_finding(std::string_view rule_id, std::string_view case_name, const std::string& location_key,
                                   const model::Board* board, const model::Circuit* circuit,
                                   const model::Device* device) const {
    const RuleCase& rule_case = profile_.rule_case(std::string(rule_id), std::string(case_name));
    Finding finding;
    finding.rule = std::string(rule_id);
    finding.id = finding.rule + "@" + location_key;
    finding.code = rule_case.code;
    finding.clause = rule_case.clause;
    if (board) {
        finding.board_id = board->id;
        finding.location = board_text(*board);
    }
    if (circuit) {
        finding.circuit_id = circuit->id;
        finding.location += (finding.location.empty() ? "" : " / ") + circuit_text(*circuit);
    }
    if (device) {
        finding.device_id = device->id;
        if (!circuit || &circuit->device != device)
            finding.location += (finding.location.empty() ? "" : " / ") + device_text(*device);
    }
    if (finding.location.empty()) finding.location = "whole installation";
    return finding;
}

}  // namespace mendwright::rules
