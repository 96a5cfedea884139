#include "planner/io/survey_writer.hpp"

namespace mendwright::io {

using namespace model;

namespace {

template <class T>
void put_optional(Json& json, const char* key, const std::optional<T>& value) {
    if (value) json[key] = *value;
}

void put_optional_date(Json& json, const char* key, const std::optional<Date>& value) {
    if (value) json[key] = value->to_iso();
}

Json job_json(const JobFacts& job) {
    Json j = Json::object();
    j["reference"] = job.reference;
    j["client"] = job.client;
    j["site"] = job.site;
    j["occupancy"] = word_of(occupancy_words(), job.occupancy);
    j["inspection_date"] = job.inspection_date.to_iso();
    j["inspector"] = job.inspector;
    j["country"] = job.country;
    return j;
}

Json supply_json(const Supply& supply) {
    Json j = Json::object();
    j["earthing"] = word_of(earthing_words(), supply.earthing);
    j["u0_volts"] = supply.u0_volts;
    j["phases"] = supply.phases;
    j["supply_fuse_type"] = supply.supply_fuse_type;
    j["supply_fuse_rating_amps"] = supply.supply_fuse_rating_amps;
    put_optional(j, "prospective_fault_current_ka", supply.prospective_fault_current_ka);
    put_optional(j, "ze_ohms", supply.ze_ohms);
    return j;
}

Json electrode_json(const Electrode& e) {
    Json j = Json::object();
    j["kind"] = word_of(electrode_kind_words(), e.kind);
    j["count"] = e.count;
    j["layout"] = word_of(electrode_layout_words(), e.layout);
    put_optional(j, "rod_length_m", e.rod_length_m);
    put_optional(j, "rod_diameter_m", e.rod_diameter_m);
    put_optional(j, "spacing_m", e.spacing_m);
    put_optional(j, "measured_ra_ohms", e.measured_ra_ohms);
    put_optional_date(j, "measured_on", e.measured_on);
    j["soil_description"] = e.soil_description;
    put_optional(j, "soil_resistivity_ohm_m", e.soil_resistivity_ohm_m);
    put_optional(j, "remeasured_ra_ohms", e.remeasured_ra_ohms);
    put_optional_date(j, "remeasured_on", e.remeasured_on);
    return j;
}

Json tails_json(const MeterTails& tails) {
    Json j = Json::object();
    j["length_m"] = tails.length_m;
    j["csa_mm2"] = tails.csa_mm2;
    j["route"] = word_of(tails_route_words(), tails.route);
    j["mechanically_protected"] = tails.mechanically_protected;
    j["origin_protection"] = word_of(tails_origin_protection_words(), tails.origin_protection);
    return j;
}

// Fields that only some kinds of device carry are written when they hold something, so a
// circuit-breaker's entry is not cluttered with an empty fuse standard.
Json device_json(const Device& device) {
    Json j = Json::object();
    j["id"] = device.id;
    j["kind"] = word_of(device_kind_words(), device.kind);
    put_optional(j, "upstream_id", device.upstream_id);
    j["rating_amps"] = device.rating_amps;
    if (device.curve) j["curve"] = word_of(breaker_curve_words(), *device.curve);
    put_optional(j, "breaking_capacity_ka", device.breaking_capacity_ka);
    put_optional(j, "residual_current_amps", device.residual_current_amps);
    if (device.rcd_type) j["rcd_type"] = word_of(rcd_type_words(), *device.rcd_type);
    const bool residual = device.kind == DeviceKind::rcd || device.kind == DeviceKind::rcbo;
    if (residual || device.delay != RcdDelay::general) j["delay"] = word_of(rcd_delay_words(), device.delay);
    if (!device.fuse_standard.empty()) j["fuse_standard"] = device.fuse_standard;
    if (!device.label.empty()) j["label"] = device.label;
    if (device.installed_new) j["installed_new"] = true;
    return j;
}

Json circuit_json(const Circuit& c) {
    Json j = Json::object();
    j["id"] = c.id;
    j["number"] = c.number;
    j["description"] = c.description;
    j["use"] = word_of(circuit_use_words(), c.use);
    j["device"] = device_json(c.device);
    put_optional(j, "upstream_id", c.upstream_id);
    put_optional(j, "feeds_board_id", c.feeds_board_id);
    j["line_csa_mm2"] = c.line_csa_mm2;
    j["cpc_csa_mm2"] = c.cpc_csa_mm2;
    put_optional(j, "length_m", c.length_m);
    j["concealed_in_wall"] = c.concealed_in_wall;
    j["supplies_outdoor_equipment"] = c.supplies_outdoor_equipment;
    put_optional(j, "measured_zs_ohms", c.measured_zs_ohms);
    put_optional(j, "r1_plus_r2_ohms", c.r1_plus_r2_ohms);
    put_optional(j, "insulation_resistance_megohms", c.insulation_resistance_megohms);
    put_optional(j, "standing_leakage_ma", c.standing_leakage_ma);
    put_optional(j, "rcd_trip_ms_at_idn", c.rcd_trip_ms_at_idn);
    put_optional(j, "rcd_trip_ms_at_5idn", c.rcd_trip_ms_at_5idn);
    return j;
}

Json board_json(const Board& b) {
    Json j = Json::object();
    j["id"] = b.id;
    j["name"] = b.name;
    j["location"] = b.location;
    j["enclosure"] = word_of(enclosure_material_words(), b.enclosure);
    j["spare_ways"] = b.spare_ways;
    j["accepts_rcbos"] = b.accepts_rcbos;
    j["surge_protection_fitted"] = b.surge_protection_fitted;
    j["new_work"] = b.new_work;
    j["devices"] = Json::array();
    for (const auto& device : b.devices) j["devices"].push_back(device_json(device));
    j["circuits"] = Json::array();
    for (const auto& circuit : b.circuits) j["circuits"].push_back(circuit_json(circuit));
    return j;
}

Json observation_json(const Observation& o) {
    Json j = Json::object();
    j["id"] = o.id;
    j["text"] = o.text;
    j["code"] = word_of(observation_code_words(), o.code);
    put_optional(j, "board_id", o.board_id);
    put_optional(j, "circuit_id", o.circuit_id);
    put_optional(j, "item_code", o.item_code);
    j["item_quantity"] = o.item_quantity;
    return j;
}

}  // namespace

Json installation_json(const Installation& installation) {
    Json j = Json::object();
    j["format"] = survey_format_name;
    j["version"] = survey_format_version;
    j["job"] = job_json(installation.job);
    j["supply"] = supply_json(installation.supply);
    if (installation.electrode) j["electrode"] = electrode_json(*installation.electrode);
    j["tails"] = tails_json(installation.tails);
    j["boards"] = Json::array();
    for (const auto& board : installation.boards) j["boards"].push_back(board_json(board));
    j["observations"] = Json::array();
    for (const auto& observation : installation.observations) j["observations"].push_back(observation_json(observation));
    return j;
}

}  // namespace mendwright::io
