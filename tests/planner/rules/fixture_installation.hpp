#pragma once
// Small builders for installations used by the rules tests. Every installation here is an
// invented scenario.

#include <optional>
#include <string>
#include <vector>

#include "planner/model/installation.hpp"

namespace mendwright::test {

inline model::Device breaker(const std::string& id, model::BreakerCurve curve, double amps) {
    model::Device device;
    device.id = id;
    device.kind = model::DeviceKind::circuit_breaker;
    device.curve = curve;
    device.rating_amps = amps;
    device.breaking_capacity_ka = 6.0;
    return device;
}

inline model::Device rcbo(const std::string& id, model::BreakerCurve curve, double amps, double idn_amps) {
    model::Device device = breaker(id, curve, amps);
    device.kind = model::DeviceKind::rcbo;
    device.residual_current_amps = idn_amps;
    device.rcd_type = model::RcdType::a;
    return device;
}

inline model::Device rcd(const std::string& id, double idn_amps, model::RcdDelay delay = model::RcdDelay::general,
                         std::optional<std::string> upstream = std::nullopt) {
    model::Device device;
    device.id = id;
    device.kind = model::DeviceKind::rcd;
    device.rating_amps = 63.0;
    device.residual_current_amps = idn_amps;
    device.rcd_type = model::RcdType::a;
    device.delay = delay;
    device.upstream_id = std::move(upstream);
    return device;
}

inline model::Device main_switch(const std::string& id) {
    model::Device device;
    device.id = id;
    device.kind = model::DeviceKind::main_switch;
    device.rating_amps = 100.0;
    return device;
}

inline model::Circuit circuit(const std::string& id, model::CircuitUse use, model::Device device,
                              std::optional<std::string> upstream = std::nullopt) {
    model::Circuit result;
    result.id = id;
    result.number = id.substr(1);
    result.description = "invented circuit " + id;
    result.use = use;
    result.device = std::move(device);
    result.upstream_id = std::move(upstream);
    return result;
}

inline model::Board board(const std::string& id, std::vector<model::Device> devices, std::vector<model::Circuit> circuits) {
    model::Board result;
    result.id = id;
    result.name = "Board " + id;
    result.location = "invented location";
    result.enclosure = model::EnclosureMaterial::metal;
    result.devices = std::move(devices);
    result.circuits = std::move(circuits);
    return result;
}

// An invented owner-occupied dwelling in England on TT, RA measured on `measured_on`, with no
// boards yet. Tails short and on the surface.
inline model::Installation tt_dwelling(std::optional<double> ra_ohms, Date measured_on = Date{2026, 7, 15}) {
    model::Installation installation;
    installation.job.reference = "INVENTED-1";
    installation.job.client = "Invented client";
    installation.job.site = "Invented cottage";
    installation.job.occupancy = model::Occupancy::owner_occupied_dwelling;
    installation.job.inspection_date = Date{2026, 12, 2};
    installation.job.country = "england";
    installation.supply.earthing = model::EarthingArrangement::tt;
    installation.supply.u0_volts = 230.0;
    installation.supply.supply_fuse_type = "BS 1361";
    installation.supply.supply_fuse_rating_amps = 100.0;
    model::Electrode electrode;
    electrode.measured_ra_ohms = ra_ohms;
    electrode.measured_on = measured_on;
    installation.electrode = electrode;
    installation.tails.length_m = 1.5;
    return installation;
}

// An invented dwelling on TN-C-S with no boards yet.
inline model::Installation tn_dwelling() {
    model::Installation installation = tt_dwelling(std::nullopt);
    installation.supply.earthing = model::EarthingArrangement::tn_c_s;
    installation.supply.ze_ohms = 0.35;
    installation.electrode.reset();
    return installation;
}

// The usual split-load shape: main switch, one 30 mA RCD over a sockets circuit (B32) and a
// lighting circuit (B6), all in board "cu".
inline model::Installation tt_dwelling_with_rcd(double ra_ohms) {
    auto installation = tt_dwelling(ra_ohms);
    installation.boards.push_back(board("cu", {main_switch("ms"), rcd("rcd1", 0.03, model::RcdDelay::general, "ms")},
                                        {circuit("c1", model::CircuitUse::sockets, breaker("cb1", model::BreakerCurve::b, 32), "rcd1"),
                                         circuit("c2", model::CircuitUse::lighting, breaker("cb2", model::BreakerCurve::b, 6), "rcd1")}));
    return installation;
}

}  // namespace mendwright::test
