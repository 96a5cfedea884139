// The shortcut in Verifier::verify (an option that changes some boards is judged on a view of
// them) must give exactly the verdict of re-running the rules on the whole changed copy
// (Verifier::verify_whole), for every option proposed: on the three invented demo jobs, on a
// synthetic survey shaped like the benchmark's, and on seeded random installations built to
// stress the rules that add up over many circuits (standing leakage and trip times on an RCD
// feeding several boards, RCDs in series across boards). A wrong shortcut fails here.
#include <catch2/catch.hpp>

#include <random>

#include "planner/remedies/proposals.hpp"
#include "planner/remedies/verify.hpp"
#include "tests/planner/remedies/random_installation.hpp"
#include "tests/planner/remedies/remedy_fixtures.hpp"

using namespace mendwright;
using remedy_test::random_installation;

namespace {

// Every option proposed for the installation: the view verdict against the whole one.
int compare_every_option(const model::Installation& installation, const std::string& name) {
    remedies::Verifier verifier(installation, remedy_test::shipped_rules());
    const auto settings = remedy_test::shipped_settings();
    const remedies::ProposalContext context{installation, verifier.baseline(), remedies::default_catalogue(), settings};
    const auto options = remedies::propose_options(context);
    int compared = 0;
    for (const auto& option : options) {
        INFO(name << ": " << option.id);
        const auto shortcut = verifier.verify(option);
        const auto whole = verifier.verify_whole(option);
        remedy_test::check_same_verdict(shortcut, whole);
        ++compared;
    }
    return compared;
}

}  // namespace

TEST_CASE("remedies view verification: the same verdict as the whole installation on the demo jobs",
          "[remedies][verify][equivalence]") {
    const auto jobs = remedy_test::demo_installations();
    for (const auto& job : jobs) CHECK(compare_every_option(job.installation, job.file_name) > 0);
    CHECK(jobs.size() == 3);
}

TEST_CASE("remedies view verification: the same verdict as the whole installation on seeded random installations",
          "[remedies][verify][equivalence]") {
    int compared = 0;
    for (unsigned seed = 1; seed <= 40; ++seed) compared += compare_every_option(random_installation(seed, 6, 5), "seed " + std::to_string(seed));
    CHECK(compared > 200);
}

TEST_CASE("remedies view verification: an RCD feeding two boards keeps its slow-trip finding when one board is changed",
          "[remedies][verify][equivalence]") {
    // Invented: board p has a general 100 mA RCD x feeding boards cb and sb, neither with an RCD
    // of its own; a socket circuit on each was tested through x at 340 ms, over the 300 ms a
    // general RCD may take at IΔn (BS EN 61008-1, read). RCBOs on cb leave sb's reading: x's
    // finding stays, which a view of cb and p alone would miss.
    using namespace remedy_test;
    model::Installation installation = tt_cottage_without_rcd();
    installation.boards.clear();
    model::Board p;
    p.id = "p";
    p.name = "Invented main board";
    p.devices = {main_switch("p-ms"), rcd("x", 0.1, model::RcdDelay::general, std::string("p-ms"))};
    for (const std::string child : {"cb", "sb"}) {
        auto feed = circuit("feed-" + child, "Feed", model::CircuitUse::submain, breaker("fcb-" + child, 32), std::string("x"));
        feed.feeds_board_id = child;
        p.circuits.push_back(feed);
    }
    installation.boards.push_back(p);
    for (const std::string id : {"cb", "sb"}) {
        model::Board b;
        b.id = id;
        b.name = "Invented board " + id;
        b.accepts_rcbos = true;
        b.devices = {main_switch(id + "-ms")};
        auto sockets = circuit(id + "-c1", "Sockets", model::CircuitUse::sockets, breaker(id + "-cb1", 32), id + "-ms", 1.0);
        sockets.rcd_trip_ms_at_idn = 340.0;
        b.circuits.push_back(sockets);
        installation.boards.push_back(b);
    }
    remedies::Verifier verifier(installation, shipped_rules());
    bool found = false;
    for (const auto& f : verifier.baseline()) found = found || f.id == "rcd.trip_time@device:x";
    REQUIRE(found);
    const auto settings = shipped_settings();
    const remedies::ProposalContext context{installation, verifier.baseline(), remedies::default_catalogue(), settings};
    int swaps = 0;
    for (const auto& option : remedies::propose_options(context)) {
        if (option.id != "rcbo-swap@board:cb") continue;
        const auto v = verifier.verify(option);
        CHECK(contains(v.cleared, "additional_protection@circuit:cb-c1"));
        CHECK_FALSE(contains(v.cleared, "rcd.trip_time@device:x"));
        CHECK(v.cleared == verifier.verify_whole(option).cleared);
        ++swaps;
    }
    CHECK(swaps == 1);
}

TEST_CASE("remedies view verification: boards of the chain above keep only their feeding circuits, verdicts unchanged",
          "[remedies][verify][equivalence]") {
    // Invented: board top feeds mid, mid feeds leaf; no RCD anywhere above leaf. A view of leaf
    // holds top and mid with their devices and only the circuits feeding the view's boards.
    using namespace remedy_test;
    model::Installation installation = remedy_test::random_installation(5, 1, 4);
    installation.boards.clear();
    for (const std::string id : {"top", "mid", "leaf"}) {
        model::Board b;
        b.id = id;
        b.name = "Invented board " + id;
        b.accepts_rcbos = true;
        b.devices = {main_switch(id + "-ms")};
        for (int c = 1; c <= 3; ++c)
            b.circuits.push_back(circuit(id + "-c" + std::to_string(c), "Sockets", model::CircuitUse::sockets,
                                         breaker(id + "-cb" + std::to_string(c), 32), id + "-ms", 1.0));
        installation.boards.push_back(b);
    }
    installation.boards[0].circuits[1].feeds_board_id = "mid";
    installation.boards[1].circuits[2].feeds_board_id = "leaf";
    const model::Installation view = remedies::board_view(installation, {"leaf"});
    REQUIRE(view.boards.size() == 3);
    CHECK(view.boards[0].id == "top");
    REQUIRE(view.boards[0].circuits.size() == 1);
    CHECK(view.boards[0].circuits[0].id == "top-c2");
    CHECK(view.boards[0].devices == installation.boards[0].devices);
    REQUIRE(view.boards[1].circuits.size() == 1);
    CHECK(view.boards[1].circuits[0].id == "mid-c3");
    CHECK(view.boards[2] == installation.boards[2]);
    // And every option's verdict on such chains still equals the whole installation's.
    CHECK(compare_every_option(installation, "chain of three") > 0);
    int compared = 0;
    for (unsigned seed = 201; seed <= 215; ++seed)
        compared += compare_every_option(random_installation(seed, 12, 4), "seed " + std::to_string(seed));
    CHECK(compared > 100);
}
