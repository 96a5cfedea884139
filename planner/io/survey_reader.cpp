#include "planner/io/survey_reader.hpp"

namespace mendwright::io {

using namespace model;

namespace {

// Upper limits beyond which a value cannot describe a low-voltage installation; most catch a
// value typed in the wrong unit. Warnings for unusual but possible values are in survey_checks.
// Low voltage is up to 1000 V a.c. (BS 7671:2018 Part 1, 110.1 scope; common practice).
const NumberRange volts_range = positive(1000.0, "above low voltage");
const NumberRange amps_rating_range = positive(6300.0, "no low-voltage device is rated above 6300 A");
const NumberRange kiloamps_range = positive(200.0, "in kA: 6 kA is 6, not 6000");
const NumberRange ohms_range = positive(100000.0, "in ohms; record an open circuit as an observation");
const NumberRange tails_length_range = positive(100.0, "longer than any meter tails; a run that long is a distribution circuit");
const NumberRange tails_csa_range = positive(500.0, "in mm²");
const NumberRange conductor_csa_range = positive(630.0, "in mm²");
const NumberRange circuit_length_range = positive(2000.0, "in metres");
// Residual operating currents of RCDs are 10 mA to a few amperes; 30 mA is written 0.03.
const NumberRange residual_current_range = positive(3.0, "in amperes: 30 mA is 0.03");
const NumberRange rod_length_range = positive(50.0, "in metres");
const NumberRange rod_diameter_range = positive(0.2, "in metres: a 16 mm rod is 0.016");
const NumberRange spacing_range = positive(1000.0, "in metres");
const NumberRange resistivity_range = positive(1.0e6, "in ohm metres");
const NumberRange insulation_range = non_negative(1.0e6, "in megohms");
const NumberRange leakage_range = non_negative(1000.0, "in milliamperes");
const NumberRange trip_time_range = positive(10000.0, "in milliseconds");
const NumberRange quantity_range = positive(100000.0, "");

const Json& member_or_null(const Json& object, const char* key) {
    static const Json null_value;
    if (!object.is_object()) return null_value;
    const auto it = object.find(key);
    return it == object.end() ? null_value : *it;
}

JobFacts read_job(ObjectReader& parent, Diagnostics& d) {
    JobFacts job;
    const Json* json = parent.field("job", Need::required, "expected an object");
    if (!json) return job;
    ObjectReader r(*json, parent.path_of("job"), d);
    job.reference = r.text("reference", Need::required, false).value_or("");
    job.client = r.text("client", Need::optional).value_or("");
    job.site = r.text("site", Need::optional).value_or("");
    job.occupancy = r.word("occupancy", Need::required, occupancy_words()).value_or(job.occupancy);
    job.inspection_date = r.date("inspection_date", Need::required).value_or(job.inspection_date);
    job.inspector = r.text("inspector", Need::optional).value_or("");
    job.country = r.text("country", Need::required, false).value_or("");
    r.reject_unknown_fields();
    return job;
}

Supply read_supply(ObjectReader& parent, Diagnostics& d) {
    Supply supply;
    const Json* json = parent.field("supply", Need::required, "expected an object");
    if (!json) return supply;
    ObjectReader r(*json, parent.path_of("supply"), d);
    supply.earthing = r.word("earthing", Need::required, earthing_words()).value_or(supply.earthing);
    supply.u0_volts = r.number("u0_volts", Need::required, volts_range).value_or(supply.u0_volts);
    if (auto phases = r.whole_number("phases", Need::optional, 1, 3)) {
        if (*phases == 2) d.error(r.path_of("phases"), "expected 1 or 3, got 2");
        supply.phases = int(*phases);
    }
    supply.supply_fuse_type = r.text("supply_fuse_type", Need::optional).value_or("");
    supply.supply_fuse_rating_amps =
        r.number("supply_fuse_rating_amps", Need::required, amps_rating_range).value_or(supply.supply_fuse_rating_amps);
    supply.prospective_fault_current_ka = r.number("prospective_fault_current_ka", Need::optional, kiloamps_range);
    supply.ze_ohms = r.number("ze_ohms", Need::optional, ohms_range);
    r.reject_unknown_fields();
    return supply;
}

std::optional<Electrode> read_electrode(ObjectReader& parent, Diagnostics& d) {
    const Json* json = parent.field("electrode", Need::optional, "expected an object");
    if (!json) return std::nullopt;
    Electrode e;
    ObjectReader r(*json, parent.path_of("electrode"), d);
    e.kind = r.word("kind", Need::required, electrode_kind_words()).value_or(e.kind);
    e.count = int(r.whole_number("count", Need::optional, 1, 1000).value_or(e.count));
    e.layout = r.word("layout", Need::optional, electrode_layout_words()).value_or(e.layout);
    e.rod_length_m = r.number("rod_length_m", Need::optional, rod_length_range);
    e.rod_diameter_m = r.number("rod_diameter_m", Need::optional, rod_diameter_range);
    e.spacing_m = r.number("spacing_m", Need::optional, spacing_range);
    e.measured_ra_ohms = r.number("measured_ra_ohms", Need::optional, ohms_range);
    e.measured_on = r.date("measured_on", Need::optional);
    e.soil_description = r.text("soil_description", Need::optional).value_or("");
    e.soil_resistivity_ohm_m = r.number("soil_resistivity_ohm_m", Need::optional, resistivity_range);
    e.remeasured_ra_ohms = r.number("remeasured_ra_ohms", Need::optional, ohms_range);
    e.remeasured_on = r.date("remeasured_on", Need::optional);
    r.reject_unknown_fields();
    return e;
}

MeterTails read_tails(ObjectReader& parent, Diagnostics& d) {
    MeterTails tails;
    const Json* json = parent.field("tails", Need::required, "expected an object");
    if (!json) return tails;
    ObjectReader r(*json, parent.path_of("tails"), d);
    tails.length_m = r.number("length_m", Need::required, tails_length_range).value_or(tails.length_m);
    tails.csa_mm2 = r.number("csa_mm2", Need::required, tails_csa_range).value_or(tails.csa_mm2);
    tails.route = r.word("route", Need::required, tails_route_words()).value_or(tails.route);
    tails.mechanically_protected = r.flag("mechanically_protected").value_or(false);
    tails.origin_protection =
        r.word("origin_protection", Need::optional, tails_origin_protection_words()).value_or(tails.origin_protection);
    r.reject_unknown_fields();
    return tails;
}

// `in_circuit`: the circuit's own protective device, whose place in the tree is given by the
// circuit's upstream_id, not its own.
Device read_device(const Json& json, const std::string& path, bool in_circuit, Diagnostics& d) {
    Device device;
    ObjectReader r(json, path, d);
    device.id = r.text("id", Need::required, false).value_or("");
    device.kind = r.word("kind", Need::required, device_kind_words()).value_or(device.kind);
    if (in_circuit) {
        if (r.field("upstream_id", Need::optional, ""))
            d.error(r.path_of("upstream_id"),
                    "not used on a circuit's own device; give the circuit's upstream_id instead");
    } else {
        device.upstream_id = r.text("upstream_id", Need::optional, false);
    }
    device.rating_amps = r.number("rating_amps", Need::required, amps_rating_range).value_or(0.0);
    device.curve = r.word("curve", Need::optional, breaker_curve_words());
    device.breaking_capacity_ka = r.number("breaking_capacity_ka", Need::optional, kiloamps_range);
    device.residual_current_amps = r.number("residual_current_amps", Need::optional, residual_current_range);
    device.rcd_type = r.word("rcd_type", Need::optional, rcd_type_words());
    device.delay = r.word("delay", Need::optional, rcd_delay_words()).value_or(RcdDelay::general);
    device.fuse_standard = r.text("fuse_standard", Need::optional).value_or("");
    device.label = r.text("label", Need::optional).value_or("");
    device.installed_new = r.flag("installed_new").value_or(false);
    r.reject_unknown_fields();
    return device;
}

Circuit read_circuit(const Json& json, const std::string& path, Diagnostics& d) {
    Circuit c;
    ObjectReader r(json, path, d);
    c.id = r.text("id", Need::required, false).value_or("");
    c.number = r.text("number", Need::required, false).value_or("");
    c.description = r.text("description", Need::optional).value_or("");
    c.use = r.word("use", Need::required, circuit_use_words()).value_or(c.use);
    if (const Json* device = r.field("device", Need::required, "expected an object"))
        c.device = read_device(*device, r.path_of("device"), true, d);
    c.upstream_id = r.text("upstream_id", Need::optional, false);
    c.feeds_board_id = r.text("feeds_board_id", Need::optional, false);
    c.line_csa_mm2 = r.number("line_csa_mm2", Need::required, conductor_csa_range).value_or(c.line_csa_mm2);
    c.cpc_csa_mm2 = r.number("cpc_csa_mm2", Need::required, conductor_csa_range).value_or(c.cpc_csa_mm2);
    c.length_m = r.number("length_m", Need::optional, circuit_length_range);
    c.concealed_in_wall = r.flag("concealed_in_wall").value_or(false);
    c.supplies_outdoor_equipment = r.flag("supplies_outdoor_equipment").value_or(false);
    c.measured_zs_ohms = r.number("measured_zs_ohms", Need::optional, ohms_range);
    c.r1_plus_r2_ohms = r.number("r1_plus_r2_ohms", Need::optional, non_negative(100000.0, "in ohms"));
    c.insulation_resistance_megohms = r.number("insulation_resistance_megohms", Need::optional, insulation_range);
    c.standing_leakage_ma = r.number("standing_leakage_ma", Need::optional, leakage_range);
    c.rcd_trip_ms_at_idn = r.number("rcd_trip_ms_at_idn", Need::optional, trip_time_range);
    c.rcd_trip_ms_at_5idn = r.number("rcd_trip_ms_at_5idn", Need::optional, trip_time_range);
    r.reject_unknown_fields();
    return c;
}

// Calls `each(element, path)` for every element of an optional or required array field.
template <class Each>
void for_each_element(ObjectReader& r, const char* key, Need need, Diagnostics& d, Each each) {
    const Json* json = r.field(key, need, "expected an array");
    if (!json) return;
    if (!json->is_array()) {
        d.error(r.path_of(key), "expected an array, got " + shown(*json));
        return;
    }
    for (std::size_t i = 0; i < json->size(); ++i) each((*json)[i], index_path(r.path_of(key), i));
}

Board read_board(const Json& json, const std::string& path, Diagnostics& d) {
    Board b;
    ObjectReader r(json, path, d);
    b.id = r.text("id", Need::required, false).value_or("");
    b.name = r.text("name", Need::optional).value_or("");
    b.location = r.text("location", Need::optional).value_or("");
    b.enclosure = r.word("enclosure", Need::required, enclosure_material_words()).value_or(b.enclosure);
    b.spare_ways = int(r.whole_number("spare_ways", Need::optional, 0, 200).value_or(0));
    b.accepts_rcbos = r.flag("accepts_rcbos").value_or(false);
    b.surge_protection_fitted = r.flag("surge_protection_fitted").value_or(false);
    b.new_work = r.flag("new_work").value_or(false);
    for_each_element(r, "devices", Need::optional, d, [&](const Json& element, const std::string& element_path) {
        b.devices.push_back(read_device(element, element_path, false, d));
    });
    for_each_element(r, "circuits", Need::optional, d, [&](const Json& element, const std::string& element_path) {
        b.circuits.push_back(read_circuit(element, element_path, d));
    });
    r.reject_unknown_fields();
    return b;
}

Observation read_observation(const Json& json, const std::string& path, Diagnostics& d) {
    Observation o;
    ObjectReader r(json, path, d);
    o.id = r.text("id", Need::required, false).value_or("");
    o.text = r.text("text", Need::required, false).value_or("");
    o.code = r.word("code", Need::required, observation_code_words()).value_or(o.code);
    o.board_id = r.text("board_id", Need::optional, false);
    o.circuit_id = r.text("circuit_id", Need::optional, false);
    o.item_code = r.text("item_code", Need::optional, false);
    o.item_quantity = r.number("item_quantity", Need::optional, quantity_range).value_or(1.0);
    r.reject_unknown_fields();
    return o;
}

}  // namespace

Installation read_installation(const Json& root, Diagnostics& d) {
    Installation installation;
    ObjectReader r(root, "", d);
    r.field("format", Need::required, "");   // checked before this function is called
    r.field("version", Need::required, "");
    installation.job = read_job(r, d);
    installation.supply = read_supply(r, d);
    installation.electrode = read_electrode(r, d);
    installation.tails = read_tails(r, d);
    for_each_element(r, "boards", Need::required, d, [&](const Json& element, const std::string& path) {
        installation.boards.push_back(read_board(element, path, d));
    });
    if (member_or_null(root, "boards").is_array() && installation.boards.empty())
        d.error("boards", "expected at least one board (the one the meter tails land on)");
    for_each_element(r, "observations", Need::optional, d, [&](const Json& element, const std::string& path) {
        installation.observations.push_back(read_observation(element, path, d));
    });
    r.reject_unknown_fields();
    return installation;
}

}  // namespace mendwright::io
