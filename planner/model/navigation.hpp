#pragma once
// Read-only walks over the device tree of an Installation (see installation.hpp for its shape).
// Pointers returned point into the Installation passed in and live as long as it does.

#include <string_view>
#include <vector>

#include "planner/model/installation.hpp"

namespace mendwright::model {

struct CircuitRef {
    const Board* board = nullptr;
    const Circuit* circuit = nullptr;
};

struct DeviceRef {
    const Board* board = nullptr;
    const Device* device = nullptr;
    const Circuit* circuit = nullptr;  // set when the device is a circuit's own protective device
};

const Board* find_board(const Installation& installation, std::string_view board_id);
CircuitRef find_circuit(const Installation& installation, std::string_view circuit_id);
DeviceRef find_device(const Installation& installation, std::string_view device_id);

// The circuit (in another board) whose load is `board`, or an empty ref for an origin board.
CircuitRef feeding_circuit(const Installation& installation, const Board& board);

// The board the meter tails land on: the first board that no circuit feeds.
const Board* origin_board(const Installation& installation);

bool is_residual_current_device(const Device& device);  // RCD or RCBO

// Every device a fault current on `circuit` passes through, nearest first: the circuit's own
// device, the board's devices above it, then the feeding circuit in the parent board and its
// devices, and so on up to the origin.
std::vector<DeviceRef> devices_above(const Installation& installation, const Board& board, const Circuit& circuit);

// Only the RCDs and RCBOs among devices_above, nearest first.
std::vector<DeviceRef> residual_current_devices_above(const Installation& installation, const Board& board,
                                                      const Circuit& circuit);

// Every final circuit that loses supply when `device_id` opens, including circuits of boards fed
// from below it. Submain circuits themselves are not counted as lost circuits.
std::vector<CircuitRef> final_circuits_below(const Installation& installation, std::string_view device_id);

// Every final circuit of the installation (submains excluded), board by board.
std::vector<CircuitRef> final_circuits(const Installation& installation);

}  // namespace mendwright::model
