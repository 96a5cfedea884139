#pragma once
// Seeded random invented TT installations for the remedies tests: boards in a tree, board
// styles (no RCD, one 30 mA RCD, a 100 mA RCD over two 30 mA ones, a 100 mA RCD over all) and
// circuit readings drawn from the seed, built to stress the rules that add up over many
// circuits (standing leakage and trip times on an RCD feeding several boards, RCDs in series
// across boards). Invented data, no real installation.

#include <random>
#include <string>
#include <vector>

#include "planner/model/installation.hpp"

namespace mendwright::remedy_test {

inline model::Device device(const std::string& id, model::DeviceKind kind, double amps) {
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

inline model::Device residual(const std::string& id, model::DeviceKind kind, double amps, double idn_amps, model::RcdDelay delay) {
    model::Device d = device(id, kind, amps);
    d.residual_current_amps = idn_amps;
    d.rcd_type = model::RcdType::a;
    d.delay = delay;
    return d;
}

// An invented TT installation: `boards` boards in a tree (each board's parent drawn from the
// boards before it), board styles and circuit readings drawn from `seed`.
inline model::Installation random_installation(unsigned seed, int boards, int circuits_per_board) {
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

}  // namespace mendwright::remedy_test
