#include "planner/rules/context.hpp"

#include "planner/calc/disconnection_time.hpp"

#include <optional>
#include <string_view>
#include <unordered_map>
#include <vector>

namespace mendwright::rules {

namespace {

const model::Device* board_device(const model::Board& board, const std::string& id) {
    for (const auto& device : board.devices)
        if (device.id == id) return &device;
    return nullptr;
}

}  // namespace

namespace {

// Appends the board's devices above `upstream`, nearest first, with the guard against loops
// of an unvalidated document (at most one step per device of the board).
void append_board_devices(const model::Board& board, const std::optional<std::string>& upstream,
                          std::vector<model::DeviceRef>& chain) {
    const std::optional<std::string>* next = &upstream;
    std::size_t steps = 0;
    while (*next && steps++ <= board.devices.size()) {
        const model::Device* device = board_device(board, **next);
        if (!device) break;
        chain.push_back({&board, device, nullptr});
        next = &device->upstream_id;
    }
}

}  // namespace

AssessContext::AssessContext(const model::Installation& installation, const RulesProfile& profile, FindingDetail detail)
    : installation_(installation), profile_(profile), detail_(detail) {
    // Which circuit feeds each board, looked up once (model::feeding_circuit scans every circuit
    // on each call; assess runs hundreds of times per remedy search).
    std::unordered_map<std::string_view, model::CircuitRef> feeder_of;
    std::unordered_map<const model::Board*, std::size_t> index_of;
    std::size_t circuit_count = 0;
    feeder_of.reserve(installation.boards.size());
    index_of.reserve(installation.boards.size());
    for (std::size_t b = 0; b < installation.boards.size(); ++b) {
        const auto& board = installation.boards[b];
        index_of.emplace(&board, b);
        circuit_count += board.circuits.size();
        for (const auto& circuit : board.circuits)
            if (circuit.feeds_board_id) feeder_of.emplace(*circuit.feeds_board_id, model::CircuitRef{&board, &circuit});
    }
    const std::size_t board_count = installation.boards.size();

    // The same walk as model::devices_above: a circuit's own device, its board's devices above
    // it, then the feeding circuit in the parent board and its devices, up to the origin. What
    // lies above a board's incoming supply is the same for all its circuits, so it is walked
    // once per board (`above[b]`, parents before children). A document whose boards feed each
    // other in a loop has no top: there every circuit's chain is walked on its own, cut off
    // after as many levels as there are boards.
    std::vector<std::vector<model::DeviceRef>> above(board_count);
    std::vector<char> state(board_count, 0);  // 0 not done, 1 in progress, 2 done
    bool looped = false;
    for (std::size_t start = 0; start < board_count && !looped; ++start) {
        // The boards from `start` up to the first one already done (or the origin).
        std::vector<std::size_t> path;
        std::size_t b = start;
        while (state[b] == 0) {
            state[b] = 1;
            path.push_back(b);
            const auto found = feeder_of.find(installation.boards[b].id);
            if (found == feeder_of.end()) break;
            b = index_of.at(found->second.board);
            if (state[b] == 1) {
                looped = true;
                break;
            }
        }
        if (looped) break;
        for (auto it = path.rbegin(); it != path.rend(); ++it) {
            const auto& board = installation.boards[*it];
            auto& chain = above[*it];
            const auto found = feeder_of.find(board.id);
            if (found != feeder_of.end()) {
                const model::Board& parent = *found->second.board;
                const model::Circuit& feed = *found->second.circuit;
                chain.push_back({&parent, &feed.device, &feed});
                append_board_devices(parent, feed.upstream_id, chain);
                const auto& higher = above[index_of.at(&parent)];
                chain.insert(chain.end(), higher.begin(), higher.end());
            }
            state[*it] = 2;
        }
    }

    // Every chain is put in refs_ first (offsets only: refs_ grows), then the spans are set.
    struct Extent {
        std::size_t chain_begin = 0, chain_size = 0, residual_begin = 0, residual_size = 0;
    };
    std::vector<Extent> extents;
    extents.reserve(circuit_count);
    circuits_.reserve(circuit_count);
    std::vector<model::DeviceRef> chain;
    for (std::size_t b = 0; b < board_count; ++b) {
        const auto& board = installation.boards[b];
        for (std::size_t c = 0; c < board.circuits.size(); ++c) {
            chain.clear();
            if (!looped) {
                chain.push_back({&board, &board.circuits[c].device, &board.circuits[c]});
                append_board_devices(board, board.circuits[c].upstream_id, chain);
                chain.insert(chain.end(), above[b].begin(), above[b].end());
            } else {
                const model::Board* current_board = &board;
                const model::Circuit* current_circuit = &board.circuits[c];
                for (std::size_t hops = 0; current_board && current_circuit && hops <= board_count; ++hops) {
                    chain.push_back({current_board, &current_circuit->device, current_circuit});
                    append_board_devices(*current_board, current_circuit->upstream_id, chain);
                    const auto found = feeder_of.find(current_board->id);
                    if (found == feeder_of.end()) break;
                    current_board = found->second.board;
                    current_circuit = found->second.circuit;
                }
            }
            Extent extent;
            extent.chain_begin = refs_.size();
            extent.chain_size = chain.size();
            refs_.insert(refs_.end(), chain.begin(), chain.end());
            extent.residual_begin = refs_.size();
            for (const auto& ref : chain)
                if (model::is_residual_current_device(*ref.device)) refs_.push_back(ref);
            extent.residual_size = refs_.size() - extent.residual_begin;
            extents.push_back(extent);
            circuits_.push_back(CircuitEntry{&board, &board.circuits[c], b, c, {}, {}});
        }
    }
    const model::DeviceRef* base = refs_.data();
    for (std::size_t i = 0; i < circuits_.size(); ++i) {
        circuits_[i].chain = std::span<const model::DeviceRef>(base + extents[i].chain_begin, extents[i].chain_size);
        circuits_[i].residual_current_devices =
            std::span<const model::DeviceRef>(base + extents[i].residual_begin, extents[i].residual_size);
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
    const RuleCase& rule_case = profile_.rule_case(rule_id, case_name);
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
