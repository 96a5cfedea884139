// The assessment context walks what lies above each board once and shares it between the
// board's circuits. Each circuit's chain must still be exactly model::devices_above (the walk
// one circuit at a time, planner/model/navigation.cpp): the same devices, boards and circuits
// in the same order, on seeded random invented board trees up to 30 boards deep in places, and
// on an unvalidated document whose boards feed each other in a loop (cut off the same way).
#include <catch2/catch.hpp>

#include "planner/model/navigation.hpp"
#include "planner/rules/context.hpp"
#include "planner/rules/profile.hpp"
#include "tests/planner/remedies/random_installation.hpp"

using namespace mendwright;

namespace {

void check_chains(const model::Installation& installation) {
    const rules::AssessContext context(installation, rules::default_rules_profile());
    std::size_t circuits = 0;
    for (const auto& board : installation.boards) circuits += board.circuits.size();
    REQUIRE(context.circuits().size() == circuits);
    for (const auto& entry : context.circuits()) {
        INFO(entry.circuit->id);
        const auto expected = model::devices_above(installation, *entry.board, *entry.circuit);
        REQUIRE(entry.chain.size() == expected.size());
        for (std::size_t i = 0; i < expected.size(); ++i) {
            CHECK(entry.chain[i].device == expected[i].device);
            CHECK(entry.chain[i].board == expected[i].board);
            CHECK(entry.chain[i].circuit == expected[i].circuit);
        }
        const auto residual = model::residual_current_devices_above(installation, *entry.board, *entry.circuit);
        REQUIRE(entry.residual_current_devices.size() == residual.size());
        for (std::size_t i = 0; i < residual.size(); ++i) CHECK(entry.residual_current_devices[i].device == residual[i].device);
    }
}

// Board b feeds board b + 1: a chain of `boards` boards, each circuit's chain passing all above.
model::Installation deep_chain(int boards) {
    model::Installation installation = remedy_test::random_installation(7, 1, 3);
    for (int b = 1; b < boards; ++b) {
        model::Board board = installation.boards.front();
        const std::string id = "deep" + std::to_string(b);
        board.id = id;
        for (auto& circuit : board.circuits) {
            circuit.id = id + "-" + circuit.id;
            circuit.device.id = id + "-" + circuit.device.id;
            circuit.feeds_board_id.reset();
        }
        installation.boards.push_back(board);
    }
    for (int b = 0; b + 1 < boards; ++b) installation.boards[static_cast<std::size_t>(b)].circuits.front().feeds_board_id = installation.boards[static_cast<std::size_t>(b + 1)].id;
    return installation;
}

}  // namespace

TEST_CASE("rules context: shared chains equal devices_above on seeded random board trees", "[rules][context]") {
    for (unsigned seed = 1; seed <= 30; ++seed) {
        INFO("seed " << seed);
        check_chains(remedy_test::random_installation(seed, 12, 6));
    }
}

TEST_CASE("rules context: shared chains equal devices_above down a chain of 30 boards", "[rules][context]") {
    const auto installation = deep_chain(30);
    check_chains(installation);
    const rules::AssessContext context(installation, rules::default_rules_profile());
    // The last board's circuits pass every feeding circuit above them: 29 more levels.
    CHECK(context.circuits().back().chain.size() > 29);
}

TEST_CASE("rules context: boards feeding each other in a loop are cut off as devices_above cuts them", "[rules][context]") {
    auto installation = deep_chain(4);
    // The last board feeds the first: no board is the origin.
    installation.boards.back().circuits.front().feeds_board_id = installation.boards.front().id;
    check_chains(installation);
    // The origin board feeding itself.
    auto self_fed = remedy_test::random_installation(3, 3, 4);
    self_fed.boards[0].circuits.front().feeds_board_id = self_fed.boards[0].id;
    check_chains(self_fed);
}
