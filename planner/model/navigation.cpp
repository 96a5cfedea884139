#include "planner/model/navigation.hpp"

#include <algorithm>

namespace mendwright::model {

const Board* find_board(const Installation& installation, std::string_view board_id) {
    for (const auto& board : installation.boards)
        if (board.id == board_id) return &board;
    return nullptr;
}

CircuitRef find_circuit(const Installation& installation, std::string_view circuit_id) {
    for (const auto& board : installation.boards)
        for (const auto& circuit : board.circuits)
            if (circuit.id == circuit_id) return {&board, &circuit};
    return {};
}

DeviceRef find_device(const Installation& installation, std::string_view device_id) {
    for (const auto& board : installation.boards) {
        for (const auto& device : board.devices)
            if (device.id == device_id) return {&board, &device, nullptr};
        for (const auto& circuit : board.circuits)
            if (!circuit.device.id.empty() && circuit.device.id == device_id) return {&board, &circuit.device, &circuit};
    }
    return {};
}

CircuitRef feeding_circuit(const Installation& installation, const Board& board) {
    for (const auto& parent : installation.boards)
        for (const auto& circuit : parent.circuits)
            if (circuit.feeds_board_id && *circuit.feeds_board_id == board.id) return {&parent, &circuit};
    return {};
}

const Board* origin_board(const Installation& installation) {
    for (const auto& board : installation.boards)
        if (!feeding_circuit(installation, board).circuit) return &board;
    return nullptr;
}

bool is_residual_current_device(const Device& device) {
    return device.kind == DeviceKind::rcd || device.kind == DeviceKind::rcbo;
}

namespace {

const Device* board_device(const Board& board, const std::string& id) {
    for (const auto& device : board.devices)
        if (device.id == id) return &device;
    return nullptr;
}

}  // namespace

std::vector<DeviceRef> devices_above(const Installation& installation, const Board& board, const Circuit& circuit) {
    std::vector<DeviceRef> chain;
    const Board* current_board = &board;
    const Circuit* current_circuit = &circuit;
    // Bounded by the number of boards: a validated document has no loops, and this guard keeps an
    // unvalidated one from spinning.
    for (std::size_t hops = 0; current_board && current_circuit && hops <= installation.boards.size(); ++hops) {
        chain.push_back({current_board, &current_circuit->device, current_circuit});
        std::optional<std::string> next = current_circuit->upstream_id;
        std::size_t steps = 0;
        while (next && steps++ <= current_board->devices.size()) {
            const Device* device = board_device(*current_board, *next);
            if (!device) break;
            chain.push_back({current_board, device, nullptr});
            next = device->upstream_id;
        }
        const CircuitRef feeder = feeding_circuit(installation, *current_board);
        current_board = feeder.board;
        current_circuit = feeder.circuit;
    }
    return chain;
}

std::vector<DeviceRef> residual_current_devices_above(const Installation& installation, const Board& board,
                                                      const Circuit& circuit) {
    std::vector<DeviceRef> result;
    for (const auto& ref : devices_above(installation, board, circuit))
        if (is_residual_current_device(*ref.device)) result.push_back(ref);
    return result;
}

std::vector<CircuitRef> final_circuits(const Installation& installation) {
    std::vector<CircuitRef> result;
    for (const auto& board : installation.boards)
        for (const auto& circuit : board.circuits)
            if (!circuit.feeds_board_id) result.push_back({&board, &circuit});
    return result;
}

std::vector<CircuitRef> final_circuits_below(const Installation& installation, std::string_view device_id) {
    std::vector<CircuitRef> result;
    for (const auto& ref : final_circuits(installation)) {
        const auto chain = devices_above(installation, *ref.board, *ref.circuit);
        const bool below = std::any_of(chain.begin(), chain.end(), [&](const DeviceRef& d) {
            return !d.device->id.empty() && d.device->id == device_id;
        });
        if (below) result.push_back(ref);
    }
    return result;
}

}  // namespace mendwright::model
