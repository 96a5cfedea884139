#pragma once
// An electrical installation as an inspector surveys it: pure data, no behaviour beyond
// lookups. Input data only: rules and remedies never write their results back into it
// (remedies change *copies*).
//
// Shape of the device tree:
//   meter --tails--> origin board --(circuit feeding a board, e.g. a submain)--> other boards
// Inside a board, `devices` holds the board's distribution devices (main switch, RCDs,
// switch-fuses), each optionally below another by `upstream_id`; every circuit has its own
// protective device (circuit-breaker, RCBO or fuse) and hangs below one of the board's devices
// (`upstream_id`) or directly below the board's incoming supply. An upstream RCD in its own
// enclosure at the meter is simply an origin board holding that RCD and one circuit feeding the
// consumer unit.

#include <optional>
#include <string>
#include <vector>

#include "planner/core/date.hpp"

namespace mendwright::model {

enum class Occupancy { owner_occupied_dwelling, privately_rented_dwelling, commercial, other };
enum class EarthingArrangement { tt, tn_s, tn_c_s };
enum class ObservationCode { c1, c2, c3, fi };

struct JobFacts {
    std::string reference;  // the contractor's own job reference
    std::string client;
    std::string site;       // address or description of the premises
    Occupancy occupancy = Occupancy::owner_occupied_dwelling;
    Date inspection_date;
    std::string inspector;
    std::string country;    // "england", "wales", "scotland", ... ; due dates depend on it

    bool operator==(const JobFacts&) const = default;  // field by field (remedies compare copies)
};

struct Supply {
    EarthingArrangement earthing = EarthingArrangement::tt;
    double u0_volts = 230.0;
    int phases = 1;
    std::string supply_fuse_type;  // as marked: "BS 1361", "BS 88-3", ...
    double supply_fuse_rating_amps = 100.0;
    std::optional<double> prospective_fault_current_ka;
    std::optional<double> ze_ohms;

    bool operator==(const Supply&) const = default;  // field by field (remedies compare copies)
};

enum class ElectrodeKind { rod, tape, plate };
enum class ElectrodeLayout { single, line, hollow_square };

// The installation's earth electrode system (TT), as found.
struct Electrode {
    ElectrodeKind kind = ElectrodeKind::rod;
    int count = 1;                          // rods in the system
    ElectrodeLayout layout = ElectrodeLayout::single;
    std::optional<double> rod_length_m;
    std::optional<double> rod_diameter_m;
    std::optional<double> spacing_m;        // between rods, where count > 1
    std::optional<double> measured_ra_ohms; // electrode + protective conductor, as measured
    std::optional<Date> measured_on;        // the month matters: soil dries in summer
    std::string soil_description;
    std::optional<double> soil_resistivity_ohm_m;  // only when measured
    // When re-measured after remedial work: the figure the re-test gave.
    std::optional<double> remeasured_ra_ohms;
    std::optional<Date> remeasured_on;

    bool operator==(const Electrode&) const = default;  // field by field (remedies compare copies)
};

enum class TailsRoute { surface, concealed_in_wall, buried };
enum class TailsOriginProtection { none, switch_fuse };  // device at the meter outside our boards

struct MeterTails {
    double length_m = 1.0;
    double csa_mm2 = 25.0;
    TailsRoute route = TailsRoute::surface;
    bool mechanically_protected = false;  // armoured, or in conduit/trunking that protects them
    TailsOriginProtection origin_protection = TailsOriginProtection::none;

    bool operator==(const MeterTails&) const = default;  // field by field (remedies compare copies)
};

enum class DeviceKind { main_switch, rcd, circuit_breaker, rcbo, fuse, switch_fuse };
enum class RcdType { ac, a, f, b };
enum class RcdDelay { general, time_delayed };  // time_delayed = S-type
enum class BreakerCurve { b, c, d };

struct Device {
    std::string id;                        // unique across the installation
    DeviceKind kind = DeviceKind::circuit_breaker;
    std::optional<std::string> upstream_id;  // a device in the same board; none = board's incoming
    double rating_amps = 0.0;              // rated current In
    std::optional<BreakerCurve> curve;     // circuit-breakers and RCBOs
    std::optional<double> breaking_capacity_ka;
    std::optional<double> residual_current_amps;  // IΔn, RCDs and RCBOs
    std::optional<RcdType> rcd_type;
    RcdDelay delay = RcdDelay::general;
    std::string fuse_standard;             // fuses: "BS 3036", "BS 1361", "BS 88-3", ...
    std::string label;                     // as marked on the board, optional
    bool installed_new = false;            // fitted by remedial work (set by remedies)

    bool operator==(const Device&) const = default;  // field by field (remedies compare copies)
};

enum class CircuitUse { sockets, lighting, cooker, shower, immersion, outdoor, submain, other };

struct Circuit {
    std::string id;                        // unique across the installation
    std::string number;                    // as on the circuit chart: "1", "L2/4"
    std::string description;
    CircuitUse use = CircuitUse::other;
    Device device;                         // its own protective device
    std::optional<std::string> upstream_id;  // a device in the board's `devices`
    std::optional<std::string> feeds_board_id;  // a submain: the board it supplies
    double line_csa_mm2 = 2.5;
    double cpc_csa_mm2 = 1.5;
    std::optional<double> length_m;
    bool concealed_in_wall = false;        // at < 50 mm without earthed protection
    bool supplies_outdoor_equipment = false;
    std::optional<double> measured_zs_ohms;
    std::optional<double> r1_plus_r2_ohms;
    std::optional<double> insulation_resistance_megohms;
    std::optional<double> standing_leakage_ma;  // protective-conductor current in normal use
    std::optional<double> rcd_trip_ms_at_idn;   // RCD test at IΔn, at this circuit
    std::optional<double> rcd_trip_ms_at_5idn;  // RCD test at 5 IΔn

    bool operator==(const Circuit&) const = default;  // field by field (remedies compare copies)
};

enum class EnclosureMaterial { metal, non_combustible_other, combustible };

struct Board {
    std::string id;
    std::string name;
    std::string location;
    EnclosureMaterial enclosure = EnclosureMaterial::metal;
    int spare_ways = 0;
    bool accepts_rcbos = false;   // RCBOs of a compatible make can be fitted in place of breakers
    bool surge_protection_fitted = false;
    bool new_work = false;        // installed by remedial work: the rules for new work apply
    std::vector<Device> devices;  // main switch, RCDs, switch-fuses
    std::vector<Circuit> circuits;

    bool operator==(const Board&) const = default;  // field by field (remedies compare copies)
};

struct Observation {
    std::string id;
    std::string text;             // the inspector's own words
    ObservationCode code = ObservationCode::c3;
    std::optional<std::string> board_id;
    std::optional<std::string> circuit_id;
    std::optional<std::string> item_code;  // price-book item for the fix
    double item_quantity = 1.0;

    bool operator==(const Observation&) const = default;  // field by field (remedies compare copies)
};

struct Installation {
    JobFacts job;
    Supply supply;
    std::optional<Electrode> electrode;
    MeterTails tails;
    std::vector<Board> boards;
    std::vector<Observation> observations;

    bool operator==(const Installation&) const = default;  // field by field (remedies compare copies)
};

}  // namespace mendwright::model
