#pragma once
// Sharing a board's final circuits between two 30 mA RCDs, as a replacement board with two RCDs
// needs: the lighting and the socket-outlets of one area on different devices (so a trip does
// not leave a room both dark and without power; common practice), and the standing
// protective-conductor current balanced between the two and within each device's budget
// (BS 7671 531.3.2, read: at most 30 % of IΔn, 9 mA on a 30 mA device).

#include <string>
#include <vector>

#include "planner/model/installation.hpp"

namespace mendwright::remedies {

struct SplitCircuit {
    std::string circuit_id;
    std::string area;             // circuit_area()
    model::CircuitUse use = model::CircuitUse::other;
    double leakage_ma = 0.0;      // measured, or the assumed figure
    bool leakage_measured = false;
};

struct TwoRcdSplit {
    std::vector<int> side;         // 0 or 1 for each circuit, in the order given
    double leakage_ma[2] = {0.0, 0.0};
    int circuits[2] = {0, 0};
    double budget_ma = 0.0;
    bool within_budget = true;
    bool exhaustive = true;        // every arrangement was compared (else largest-first placement)
};

// The area a circuit serves, from its description with the words for the use taken out:
// "Upstairs lights" -> "upstairs"; "Sockets" -> "" (the whole premises).
std::string circuit_area(const std::string& description);

// The arrangement with the smallest leakage on the more loaded device (then the smaller
// difference in circuits) among those that keep each area's lighting and sockets apart.
// - budget_ma: the most standing current either device may carry, mA (fraction x IΔn).
TwoRcdSplit split_between_two_rcds(const std::vector<SplitCircuit>& circuits, double budget_ma);

}  // namespace mendwright::remedies
