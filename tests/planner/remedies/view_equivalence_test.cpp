// The shortcut in Verifier::verify (an option that changes some boards is judged on a view of
// them) must give exactly the verdict of re-running the rules on the whole changed copy
// (Verifier::verify_whole), for every option proposed: on the three invented demo jobs, on a
// synthetic survey shaped like the benchmark's, and on seeded random installations built to
// stress the rules that add up over many circuits (standing leakage and trip times on an RCD
// feeding several boards, RCDs in series across boards). A wrong shortcut fails here.
#include <catch2/catch.hpp>

#include <filesystem>
#include <fstream>
#include <random>
#include <sstream>

#include "planner/io/survey_document.hpp"
#include "planner/remedies/proposals.hpp"
#include "planner/remedies/verify.hpp"
#include "tests/planner/remedies/remedy_fixtures.hpp"

using namespace mendwright;

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
        CHECK(shortcut.cleared == whole.cleared);
        CHECK(shortcut.still_open == whole.still_open);
        CHECK(shortcut.introduced == whole.introduced);
        CHECK(shortcut.introduced_urgent == whole.introduced_urgent);
        CHECK(shortcut.clears_every_urgent_target == whole.clears_every_urgent_target);
        ++compared;
    }
    return compared;
}

model::Device device(const std::string& id, model::DeviceKind kind, double amps) {
    model::Device d;
    d.id = id;
    d.kind = kind;
    d.rating_amps = amps;
    if (kind == model::DeviceKind::circuit_breaker || kind == model::DeviceKind::rcbo) {
        d.curve = model::BreakerCurve::b;
        d.breaking_capacity_ka = 6.0;
    }
    return d;
}

model::Device residual(const std::string& id, model::DeviceKind kind, double amps, double idn_amps, model::RcdDelay delay) {
    model::Device d = device(id, kind, amps);
    d.residual_current_amps = idn_amps;
    d.rcd_type = model::RcdType::a;
    d.delay = delay;
    return d;
}

// An invented TT installation: `boards` boards in a tree (each board's parent drawn from the
// boards before it), board styles and circuit readings drawn from `seed`.
model::Installation random_installation(unsigned seed, int boards, int circuits_per_board) {
    std::mt19937 random(seed);
    const auto pick = [&](int n) { return static_cast<int>(random() % static_cast<unsigned>(n)); };
    model::Installation installation;
    installation.job.reference = "INVENTED-" + std::to_string(seed);
    installation.job.occupancy = pick(2) ? model::Occupancy::owner_occupied_dwelling : model::Occupancy::commercial;
    installation.job.inspection_date = Date{2026, 3, 10};
    installation.job.country = "england";
    installation.supply.earthing = model::EarthingArrangement::tt;
    installation.supply.supply_fuse_type = "BS 88-3";
    if (pick(2)) installation.supply.prospective_fault_current_ka = 1.5;
    model::Electrode electrode;
    electrode.measured_ra_ohms = std::vector<double>{40.0, 90.0, 150.0, 260.0, 480.0}[static_cast<std::size_t>(pick(5))];
    electrode.measured_on = Date{2026, unsigned(1 + pick(12)), 10};
    electrode.rod_length_m = 1.2;
    electrode.rod_diameter_m = 0.016;
    installation.electrode = electrode;
    installation.tails.length_m = pick(2) ? 2.0 : 4.5;
    installation.tails.route = pick(2) ? model::TailsRoute::surface : model::TailsRoute::concealed_in_wall;

    const model::CircuitUse uses[] = {model::CircuitUse::sockets, model::CircuitUse::lighting, model::CircuitUse::cooker,
                                      model::CircuitUse::shower,  model::CircuitUse::immersion, model::CircuitUse::outdoor,
                                      model::CircuitUse::other};
    std::vector<int> parent(static_cast<std::size_t>(boards), -1);
    for (int b = 1; b < boards; ++b) parent[static_cast<std::size_t>(b)] = pick(b);
    for (int b = 0; b < boards; ++b) {
        const std::string bid = "b" + std::to_string(b);
        model::Board board;
        board.id = bid;
        board.name = "Invented board " + std::to_string(b);
        board.enclosure = pick(4) == 0 ? model::EnclosureMaterial::combustible : model::EnclosureMaterial::metal;
        board.accepts_rcbos = pick(2) == 0;
        board.devices.push_back(device(bid + "-ms", model::DeviceKind::main_switch, 100.0));
        std::vector<std::string> hang = {bid + "-ms"};
        switch (pick(4)) {
            case 0: break;  // no RCD in this board
            case 1:
                board.devices.push_back(residual(bid + "-rcd", model::DeviceKind::rcd, 63.0, 0.03, model::RcdDelay::general));
                board.devices.back().upstream_id = bid + "-ms";
                hang = {bid + "-rcd", bid + "-ms"};
                break;
            case 2:
                board.devices.push_back(residual(bid + "-rcd100", model::DeviceKind::rcd, 100.0, 0.1,
                                                 pick(2) ? model::RcdDelay::general : model::RcdDelay::time_delayed));
                board.devices.back().upstream_id = bid + "-ms";
                for (const char* side : {"a", "b"}) {
                    board.devices.push_back(
                        residual(bid + "-rcd" + side, model::DeviceKind::rcd, 63.0, 0.03, model::RcdDelay::general));
                    board.devices.back().upstream_id = bid + "-rcd100";
                }
                hang = {bid + "-rcda", bid + "-rcdb"};
                break;
            default:  // a general 100 mA RCD over the whole board
                board.devices.push_back(residual(bid + "-rcd", model::DeviceKind::rcd, 100.0, 0.1, model::RcdDelay::general));
                board.devices.back().upstream_id = bid + "-ms";
                hang = {bid + "-rcd"};
                break;
        }
        for (int c = 0; c < circuits_per_board; ++c) {
            model::Circuit circuit;
            circuit.id = bid + "-c" + std::to_string(c + 1);
            circuit.number = std::to_string(c + 1);
            circuit.use = uses[pick(7)];
            circuit.description = "invented circuit";
            const double amps = circuit.use == model::CircuitUse::lighting ? 6.0 : 32.0;
            circuit.device = pick(5) == 0 ? residual(circuit.id + "-rcbo", model::DeviceKind::rcbo, amps, 0.03, model::RcdDelay::general)
                                          : device(circuit.id + "-cb", model::DeviceKind::circuit_breaker, amps);
            circuit.upstream_id = hang[static_cast<std::size_t>(pick(static_cast<int>(hang.size())))];
            circuit.r1_plus_r2_ohms = 0.5;
            if (pick(3) == 0) circuit.measured_zs_ohms = std::vector<double>{1.2, 150.0, 900.0}[static_cast<std::size_t>(pick(3))];
            circuit.standing_leakage_ma = 0.5 * pick(8);  // some boards over a 30 mA RCD's 9 mA budget
            if (pick(3) == 0) circuit.rcd_trip_ms_at_idn = std::vector<double>{25.0, 180.0, 340.0}[static_cast<std::size_t>(pick(3))];
            if (pick(3) == 0) circuit.rcd_trip_ms_at_5idn = std::vector<double>{12.0, 35.0, 60.0}[static_cast<std::size_t>(pick(3))];
            circuit.concealed_in_wall = pick(4) == 0;
            circuit.supplies_outdoor_equipment = circuit.use == model::CircuitUse::sockets && pick(3) == 0;
            board.circuits.push_back(circuit);
        }
        installation.boards.push_back(board);
    }
    // Submains: one circuit in the parent board for each child, hung from the parent's devices.
    for (int b = 1; b < boards; ++b) {
        auto& parent_board = installation.boards[static_cast<std::size_t>(parent[static_cast<std::size_t>(b)])];
        model::Circuit feed;
        feed.id = parent_board.id + "-feed-b" + std::to_string(b);
        feed.number = "F" + std::to_string(b);
        feed.description = "invented submain";
        feed.use = model::CircuitUse::submain;
        feed.feeds_board_id = "b" + std::to_string(b);
        feed.device = device(feed.id + "-cb", model::DeviceKind::circuit_breaker, 40.0);
        const auto& hang_devices = parent_board.devices;
        feed.upstream_id = hang_devices[static_cast<std::size_t>(pick(static_cast<int>(hang_devices.size())))].id;
        feed.line_csa_mm2 = 10.0;
        feed.cpc_csa_mm2 = 4.0;
        parent_board.circuits.push_back(feed);
    }
    return installation;
}

}  // namespace

TEST_CASE("remedies view verification: the same verdict as the whole installation on the demo jobs",
          "[remedies][verify][equivalence]") {
    const std::filesystem::path folder = std::filesystem::path(MENDWRIGHT_SOURCE_DIR) / "pricebook-demo" / "jobs";
    int jobs = 0;
    for (const auto& entry : std::filesystem::directory_iterator(folder)) {
        if (entry.path().extension() != ".json") continue;
        std::ifstream stream(entry.path());
        std::stringstream text;
        text << stream.rdbuf();
        const auto load = io::read_survey(text.str());
        INFO(entry.path().string());
        REQUIRE(load.ok());
        CHECK(compare_every_option(*load.installation, entry.path().filename().string()) > 0);
        ++jobs;
    }
    CHECK(jobs == 3);
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
