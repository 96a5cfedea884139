// Save -> load -> save gives the same bytes (docs/survey-format.md, "Canonical text"), on every
// demo job and on a document that sets every field the format has.
#include <catch2/catch.hpp>

#include <filesystem>
#include <fstream>
#include <regex>
#include <set>
#include <sstream>

#include "planner/io/survey_enums.hpp"
#include "survey_fixture.hpp"

namespace mendwright::io::test {
namespace {

std::string read_text(const std::filesystem::path& path) {
    std::ifstream stream(path, std::ios::binary);
    std::ostringstream text;
    text << stream.rdbuf();
    return text.str();
}

// An installation with every optional value present and every enumeration off its default.
model::Installation maximal_installation() {
    using namespace model;
    Installation x;
    x.job = {"MAX-1", "Client \"quoted\" – invented", "Site, ünïcode ✓ (invented)", Occupancy::privately_rented_dwelling,
             Date{2026, 8, 31}, "Inspector (invented)", "england"};
    x.supply = {EarthingArrangement::tn_c_s, 230.0, 3, "BS 88-3", 100.0, 0.1 + 0.2, 0.35};
    Electrode e;
    e.kind = ElectrodeKind::plate;
    e.count = 4;
    e.layout = ElectrodeLayout::hollow_square;
    e.rod_length_m = 2.4;
    e.rod_diameter_m = 0.0159;
    e.spacing_m = 2.5;
    e.measured_ra_ohms = 123.456789012;
    e.measured_on = Date{2026, 8, 1};
    e.soil_description = "chalk\nwith flints";
    e.soil_resistivity_ohm_m = 1e-7 + 60.0;
    e.remeasured_ra_ohms = 45.0;
    e.remeasured_on = Date{2026, 9, 30};
    x.electrode = e;
    x.tails = {4.5, 35.0, TailsRoute::concealed_in_wall, true, TailsOriginProtection::switch_fuse};

    Board origin;
    origin.id = "origin";
    origin.name = "Board at the meter";
    origin.location = "Meter cupboard";
    origin.enclosure = EnclosureMaterial::non_combustible_other;
    origin.spare_ways = 3;
    origin.accepts_rcbos = true;
    origin.surge_protection_fitted = true;
    origin.new_work = true;
    Device rcd;
    rcd.id = "rcd-s";
    rcd.kind = DeviceKind::rcd;
    rcd.rating_amps = 100.0;
    rcd.breaking_capacity_ka = 10.0;
    rcd.residual_current_amps = 0.1;
    rcd.rcd_type = RcdType::b;
    rcd.delay = RcdDelay::time_delayed;
    rcd.label = "S-type";
    rcd.installed_new = true;
    Device main_switch;
    main_switch.id = "ms";
    main_switch.kind = DeviceKind::switch_fuse;
    main_switch.upstream_id = "rcd-s";
    main_switch.rating_amps = 80.0;
    main_switch.fuse_standard = "BS 88-3";
    origin.devices = {rcd, main_switch};
    Circuit feed;
    feed.id = "feed";
    feed.number = "L1/1";
    feed.description = "Submain";
    feed.use = CircuitUse::submain;
    feed.device = {"rcbo-feed", DeviceKind::rcbo, std::nullopt, 40.0, BreakerCurve::d, 10.0, 0.3, RcdType::f,
                   RcdDelay::time_delayed, "", "RCBO", true};
    feed.upstream_id = "ms";
    feed.feeds_board_id = "shed";
    feed.line_csa_mm2 = 10.0;
    feed.cpc_csa_mm2 = 10.0;
    feed.length_m = 42.5;
    feed.concealed_in_wall = true;
    feed.supplies_outdoor_equipment = true;
    feed.measured_zs_ohms = 0.91;
    feed.r1_plus_r2_ohms = 0.56;
    feed.insulation_resistance_megohms = 0.0;
    feed.standing_leakage_ma = 0.0;
    feed.rcd_trip_ms_at_idn = 210.0;
    feed.rcd_trip_ms_at_5idn = 95.5;
    origin.circuits = {feed};

    Board shed;
    shed.id = "shed";
    shed.enclosure = EnclosureMaterial::combustible;
    Circuit fused;
    fused.id = "shed-1";
    fused.number = "1";
    fused.use = CircuitUse::outdoor;
    fused.device.id = "fuse-1";
    fused.device.kind = DeviceKind::fuse;
    fused.device.rating_amps = 20.0;
    fused.device.fuse_standard = "BS 3036";
    fused.device.breaking_capacity_ka = 1.0;
    shed.circuits = {fused};
    for (CircuitUse use : {CircuitUse::sockets, CircuitUse::lighting, CircuitUse::cooker, CircuitUse::shower,
                           CircuitUse::immersion, CircuitUse::other}) {
        Circuit c;
        c.id = "shed-use-" + word_of(circuit_use_words(), use);
        c.number = std::to_string(shed.circuits.size() + 1);
        c.use = use;
        c.device.id = "cb-" + c.id;
        c.device.kind = DeviceKind::circuit_breaker;
        c.device.rating_amps = 16.0;
        c.device.curve = BreakerCurve::c;
        c.measured_zs_ohms = 1.2;
        c.r1_plus_r2_ohms = 0.85;
        shed.circuits.push_back(c);
    }
    Device shed_main;
    shed_main.id = "shed-main";
    shed_main.kind = DeviceKind::main_switch;
    shed_main.rating_amps = 63.0;
    Device shed_rcd;
    shed_rcd.id = "shed-rcd";
    shed_rcd.kind = DeviceKind::rcd;
    shed_rcd.upstream_id = "shed-main";
    shed_rcd.rating_amps = 63.0;
    shed_rcd.residual_current_amps = 0.03;
    shed_rcd.rcd_type = RcdType::ac;
    shed_rcd.installed_new = false;
    Device shed_breaker;
    shed_breaker.id = "shed-cb";
    shed_breaker.kind = DeviceKind::circuit_breaker;
    shed_breaker.rating_amps = 50.0;
    shed_breaker.curve = BreakerCurve::b;
    shed.devices = {shed_main, shed_rcd, shed_breaker};
    shed.circuits[0].upstream_id = "shed-rcd";
    x.boards = {origin, shed};

    x.observations = {
        {"obs-1", "Scorched terminal in the shed board", ObservationCode::c1, "shed", "shed-1", "FAULT-FIND-HOUR", 2.5},
        {"obs-2", "Sealing missing", ObservationCode::fi, std::nullopt, std::nullopt, std::nullopt, 1.0},
        {"obs-3", "Labels faded", ObservationCode::c3, "origin", std::nullopt, "LAB-RELABEL-CU", 1.0},
        {"obs-4", "Damaged accessory", ObservationCode::c2, std::nullopt, "feed", "SOCKET-DBL-REPLACE", 1.0},
    };
    return x;
}

void collect_keys(const Json& json, std::set<std::string>& keys) {
    if (json.is_object())
        for (auto it = json.begin(); it != json.end(); ++it) {
            keys.insert(it.key());
            collect_keys(it.value(), keys);
        }
    if (json.is_array())
        for (const auto& element : json) collect_keys(element, keys);
}

}  // namespace

TEST_CASE("io.survey: every demo job loads and saves back to the same bytes", "[io][survey][demo]") {
    const std::filesystem::path folder = std::filesystem::path(MENDWRIGHT_SOURCE_DIR) / "pricebook-demo" / "jobs";
    std::size_t count = 0;
    for (const auto& entry : std::filesystem::directory_iterator(folder)) {
        if (entry.path().extension() != ".json") continue;
        ++count;
        INFO(entry.path().string());
        const std::string original = read_text(entry.path());
        const SurveyLoad first = read_survey(original);
        INFO(all_text(first));
        REQUIRE(first.ok());
        const std::string saved = write_survey(*first.installation);
        CHECK(saved == original);  // the demo files are kept in canonical form
        const SurveyLoad second = read_survey(saved);
        REQUIRE(second.ok());
        CHECK(write_survey(*second.installation) == saved);
    }
    CHECK(count >= 3);
}

TEST_CASE("io.survey: a document with every field saves, loads and saves to the same bytes", "[io][survey]") {
    const std::string saved = write_survey(maximal_installation());
    const SurveyLoad loaded = read_survey(saved);
    INFO(saved << "\n" << all_text(loaded));
    REQUIRE(loaded.ok());
    CHECK(write_survey(*loaded.installation) == saved);
    CHECK(saved.back() == '\n');
    CHECK(saved.rfind("{\n  \"format\": \"mendwright-survey\",\n  \"version\": 1,\n", 0) == 0);
    // Values that a careless number format would change.
    CHECK(loaded.installation->supply.prospective_fault_current_ka == 0.1 + 0.2);
    CHECK(loaded.installation->electrode->measured_ra_ohms == 123.456789012);
    CHECK(loaded.installation->job.client == "Client \"quoted\" – invented");
    CHECK(loaded.installation->electrode->soil_description == "chalk\nwith flints");
}

TEST_CASE("io.survey: every field of the format is documented and the maximal document uses them all",
          "[io][survey][docs]") {
    const std::string doc = read_text(std::filesystem::path(MENDWRIGHT_SOURCE_DIR) / "docs" / "survey-format.md");
    REQUIRE_FALSE(doc.empty());
    // Field tables in the doc start each row with the field name in backquotes: "| `rating_amps` |".
    std::set<std::string> documented;
    const std::regex row(R"(\n\| `([a-z0-9_]+)` \|)");
    for (auto it = std::sregex_iterator(doc.begin(), doc.end(), row); it != std::sregex_iterator(); ++it)
        documented.insert((*it)[1]);
    std::set<std::string> written;
    collect_keys(Json::parse(write_survey(maximal_installation())), written);
    for (const auto& key : written) CHECK(documented.count(key) == 1);
    for (const auto& key : documented) CHECK(written.count(key) == 1);
}

TEST_CASE("io.survey: every enumeration word reads back to its value and words are unique", "[io][survey]") {
    const auto check = [](const auto& table) {
        std::set<std::string> words;
        for (const auto& [value, word] : table) {
            CHECK(enum_of(table, word) == value);
            CHECK(words.insert(word).second);
        }
    };
    check(occupancy_words());
    check(earthing_words());
    check(observation_code_words());
    check(electrode_kind_words());
    check(electrode_layout_words());
    check(tails_route_words());
    check(tails_origin_protection_words());
    check(device_kind_words());
    check(rcd_type_words());
    check(rcd_delay_words());
    check(breaker_curve_words());
    check(circuit_use_words());
    check(enclosure_material_words());
}

TEST_CASE("io.survey: writing never throws on text that is not UTF-8", "[io][survey]") {
    model::Installation x = maximal_installation();
    x.job.client = std::string("bad \xff\xfe bytes");
    std::string saved;
    CHECK_NOTHROW(saved = write_survey(x));
    CHECK(read_survey(saved).ok());
}

}  // namespace mendwright::io::test

namespace mendwright::io::test {

TEST_CASE("io.survey: the example in docs/survey-format.md is valid with no warnings", "[io][survey][docs]") {
    const std::string doc = read_text(std::filesystem::path(MENDWRIGHT_SOURCE_DIR) / "docs" / "survey-format.md");
    const auto start = doc.find("```json\n");
    REQUIRE(start != std::string::npos);
    const auto end = doc.find("\n```", start + 8);
    REQUIRE(end != std::string::npos);
    const SurveyLoad result = read_survey(doc.substr(start + 8, end - start - 8));
    INFO(all_text(result));
    CHECK(result.ok());
    CHECK(result.diagnostics.empty());
}

}  // namespace mendwright::io::test
