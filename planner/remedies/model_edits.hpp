#pragma once
// Small edits on a copy of the installation, shared by the apply functions of several kinds.
// Each looks things up by id and does nothing when the thing is not there (a verification view
// may leave a board out).

#include <string>
#include <string_view>
#include <unordered_set>
#include <vector>

#include "planner/model/installation.hpp"
#include "planner/model/navigation.hpp"

namespace mendwright::remedies::edits {

model::Board* board(model::Installation& installation, const std::string& board_id);
model::Device* device(model::Installation& installation, const std::string& device_id);

// An id not yet used by any board, device or circuit: `wanted`, else `wanted-2`, `wanted-3`...
std::string unused_id(const model::Installation& installation, const std::string& wanted);

// The same for many ids against one state of the installation: the ids in use are gathered once
// (unused_id walks the whole installation on every call). Ids handed out are not added: each
// answer is what unused_id would give for the installation as it was when this was made. Holds
// views into the installation, which must not change while this is used.
class IdsInUse {
public:
    explicit IdsInUse(const model::Installation& installation);
    [[nodiscard]] std::string unused(const std::string& wanted) const;

private:
    std::unordered_set<std::string_view> ids_;
};

// Final circuits of a board with no RCD or RCBO anywhere above them.
int circuits_without_rcd(const model::Installation& installation, const model::Board& board);
// Final circuits below a board (its own and those of boards it feeds).
int final_circuits_in_and_below(const model::Installation& installation, const std::string& board_id);

// Every final circuit with its chain of devices (as model::devices_above, nearest first), walked
// once with a map of which circuit feeds each board (model::feeding_circuit scans every circuit
// on each call, which is quadratic over a large installation).
struct CircuitChain {
    model::CircuitRef circuit;
    std::vector<model::DeviceRef> devices;
};
std::vector<CircuitChain> final_circuit_chains(const model::Installation& installation);

// A new RCD or RCBO device (type A, fitted by the remedial work).
model::Device new_residual_device(const std::string& id, model::DeviceKind kind, double rating_amps,
                                  double residual_amps, model::RcdDelay delay);

// An RCD in its own enclosure beside the meter, ahead of the origin board: a new origin "board"
// holding the RCD on one circuit that feeds the old origin board; the old tails run becomes that
// circuit's cable and the new tails are `new_tails_length_m` long, on the surface.
struct UpstreamRcd {
    std::string origin_board_id;
    double residual_amps = 0.1;
    model::RcdDelay delay = model::RcdDelay::time_delayed;
    double new_tails_length_m = 1.0;
};
void insert_rcd_at_meter(model::Installation& installation, const UpstreamRcd& spec);

// Forget test results that belonged to devices now removed (trip times), keep the cable's.
void forget_device_tests(model::Circuit& circuit);

}  // namespace mendwright::remedies::edits
