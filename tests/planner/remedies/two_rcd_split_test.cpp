// Sharing circuits between the two RCDs of a replacement board.
#include <catch2/catch.hpp>

#include "planner/remedies/two_rcd_split.hpp"

using namespace mendwright;
using remedies::SplitCircuit;
using U = model::CircuitUse;

TEST_CASE("remedies two-RCD split: the area is what is left of the description", "[remedies][split]") {
    CHECK(remedies::circuit_area("Upstairs lights") == "upstairs");
    CHECK(remedies::circuit_area("Kitchen sockets (ring)") == "kitchen (ring)");
    CHECK(remedies::circuit_area("Sockets") == "");
}

TEST_CASE("remedies two-RCD split: each area's lighting and sockets go to different RCDs", "[remedies][split]") {
    const std::vector<SplitCircuit> circuits = {
        {"c1", "downstairs", U::sockets, 2.0, true}, {"c2", "upstairs", U::sockets, 2.0, true},
        {"c3", "downstairs", U::lighting, 0.5, true}, {"c4", "upstairs", U::lighting, 0.5, true},
        {"c5", "cooker", U::cooker, 1.0, true},       {"c6", "shower", U::shower, 1.0, true}};
    const auto split = remedies::split_between_two_rcds(circuits, 9.0);
    CHECK(split.side[0] != split.side[2]);  // downstairs sockets / lights
    CHECK(split.side[1] != split.side[3]);  // upstairs sockets / lights
    // Total 7 mA; the best arrangement puts 3.5 mA on each (hand count: 2 + 0.5 + 1 each side).
    CHECK(split.leakage_ma[0] == Approx(3.5));
    CHECK(split.leakage_ma[1] == Approx(3.5));
    CHECK(split.within_budget);
    CHECK(split.exhaustive);
}

TEST_CASE("remedies two-RCD split: leakage no arrangement keeps within 30 % of 30 mA is reported", "[remedies][split]") {
    // BS 7671 531.3.2 (read): 30 % x 30 mA = 9 mA per device. Six circuits of 4 mA = 24 mA: at
    // least 12 mA on one device whatever the arrangement.
    std::vector<SplitCircuit> circuits;
    for (int i = 0; i < 6; ++i) circuits.push_back({"c" + std::to_string(i), "area" + std::to_string(i), U::other, 4.0, true});
    const auto split = remedies::split_between_two_rcds(circuits, 9.0);
    CHECK(std::max(split.leakage_ma[0], split.leakage_ma[1]) == Approx(12.0));
    CHECK_FALSE(split.within_budget);
}
