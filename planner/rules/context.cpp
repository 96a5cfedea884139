#include "planner/rules/context.hpp"

#include "planner/calc/disconnection_time.hpp"

#include <unordered_map>

namespace mendwright::rules {

namespace {

const model::Device* board_device(const model::Board& board, const std::string& id) {
    for (const auto& device : board.devices)
        if (device.id == id) return &device;
    return nullptr;
}

}  // namespace

AssessContext::AssessContext(const model::Installation& installation, const RulesProfile& profile, FindingDetail detail)
    : installation_(installation), profile_(profile), detail_(detail) {
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

std::optional<double> AssessContext::required_disconnection_time_s(const CircuitEntry& entry) const {
    const auto& circuit = *entry.circuit;
    // BS 7671 411.3.2.2-411.3.2.4 and Table 41.1, both held in planner/calc.
    auto duty = calc::circuit_duty(entry.is_submain(), circuit.use == model::CircuitUse::sockets, circuit.device.rating_amps);
    if (!duty.ok()) return std::nullopt;
    auto time_s = calc::required_disconnection_time_s(is_tt() ? calc::EarthingSystem::tt : calc::EarthingSystem::tn, *duty,
                                                      installation().supply.u0_volts);
    if (!time_s.ok()) return std::nullopt;
    return *time_s;
}

Finding AssessContext::new_finding(std::string_view rule_id, std::string_view case_name, const std::string& location_key,
                                   const model::Board* board, const model::Circuit* circuit,
                                   const model::Device* device) const {
    const RuleCase& rule_case = profile_.rule_case(std::string(rule_id), std::string(case_name));
    Finding finding;
    finding.rule = std::string(rule_id);
    finding.id = finding.rule + "@" + location_key;
    finding.code = rule_case.code;
    if (!with_text()) {
        if (board) finding.board_id = board->id;
        if (circuit) finding.circuit_id = circuit->id;
        if (device) finding.device_id = device->id;
        return finding;
    }
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
