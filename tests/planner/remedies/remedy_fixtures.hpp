#pragma once
// Invented installations for the remedies tests (no real people, places or products), and a
// helper that runs the whole remedies step with the shipped rules profile and the demo price book.

#include <algorithm>
#include <catch2/catch.hpp>
#include <filesystem>
#include <fstream>
#include <optional>
#include <sstream>
#include <string>
#include <vector>

#include "planner/io/survey_document.hpp"
#include "planner/model/installation.hpp"
#include "planner/pricing/price_book.hpp"
#include "planner/remedies/analysis.hpp"
#include "planner/remedies/verify.hpp"
#include "planner/rules/assess.hpp"

namespace mendwright::remedy_test {

inline model::Device breaker(const std::string& id, double amps, model::BreakerCurve curve = model::BreakerCurve::b) {
    model::Device d;
    d.id = id;
    d.kind = model::DeviceKind::circuit_breaker;
    d.rating_amps = amps;
    d.curve = curve;
    d.breaking_capacity_ka = 6.0;
    return d;
}

inline model::Device rcd(const std::string& id, double idn_amps, model::RcdDelay delay = model::RcdDelay::general,
                         std::optional<std::string> upstream = std::nullopt) {
    model::Device d;
    d.id = id;
    d.kind = model::DeviceKind::rcd;
    d.rating_amps = 63.0;
    d.residual_current_amps = idn_amps;
    d.rcd_type = model::RcdType::a;
    d.delay = delay;
    d.upstream_id = std::move(upstream);
    return d;
}

inline model::Device rcbo(const std::string& id, double amps) {
    model::Device d = breaker(id, amps);
    d.kind = model::DeviceKind::rcbo;
    d.residual_current_amps = 0.03;
    d.rcd_type = model::RcdType::a;
    return d;
}

inline model::Device main_switch(const std::string& id) {
    model::Device d;
    d.id = id;
    d.kind = model::DeviceKind::main_switch;
    d.rating_amps = 100.0;
    return d;
}

inline model::Circuit circuit(const std::string& id, const std::string& description, model::CircuitUse use,
                              model::Device device, std::optional<std::string> upstream = std::nullopt,
                              std::optional<double> leakage_ma = std::nullopt) {
    model::Circuit c;
    c.id = id;
    c.number = id;
    c.description = description;
    c.use = use;
    c.device = std::move(device);
    c.upstream_id = std::move(upstream);
    c.r1_plus_r2_ohms = 0.6;
    c.insulation_resistance_megohms = 200.0;
    c.standing_leakage_ma = leakage_ma;
    return c;
}

// An invented TT cottage in England: one plastic board "cu1" with a main switch and no RCD, six
// circuits, RA 160 ohms measured in March, tails 1.5 m on the surface.
inline model::Installation tt_cottage_without_rcd() {
    model::Installation i;
    i.job.reference = "INVENTED-R1";
    i.job.client = "Invented client";
    i.job.site = "Invented cottage";
    i.job.occupancy = model::Occupancy::owner_occupied_dwelling;
    i.job.inspection_date = Date{2026, 3, 10};
    i.job.country = "england";
    i.supply.earthing = model::EarthingArrangement::tt;
    i.supply.supply_fuse_type = "BS 1361";
    i.supply.supply_fuse_rating_amps = 100.0;
    model::Electrode e;
    e.count = 1;
    e.rod_length_m = 1.2;
    e.rod_diameter_m = 0.016;
    e.measured_ra_ohms = 160.0;
    e.measured_on = Date{2026, 3, 10};
    i.electrode = e;
    i.tails.length_m = 1.5;
    model::Board b;
    b.id = "cu1";
    b.name = "Consumer unit";
    b.location = "hall";
    b.enclosure = model::EnclosureMaterial::combustible;
    b.devices = {main_switch("ms1")};
    using U = model::CircuitUse;
    b.circuits = {circuit("c1", "Downstairs sockets", U::sockets, breaker("cb1", 32), "ms1", 1.5),
                  circuit("c2", "Upstairs sockets", U::sockets, breaker("cb2", 32), "ms1", 1.0),
                  circuit("c3", "Downstairs lights", U::lighting, breaker("cb3", 6), "ms1", 0.3),
                  circuit("c4", "Upstairs lights", U::lighting, breaker("cb4", 6), "ms1", 0.3),
                  circuit("c5", "Cooker", U::cooker, breaker("cb5", 32), "ms1", 0.5),
                  circuit("c6", "Shower", U::shower, breaker("cb6", 40), "ms1", 0.2)};
    i.boards.push_back(b);
    return i;
}

inline const pricing::PriceBook& demo_price_book() {
    static const pricing::PriceBook book = [] {
        auto read = pricing::read_price_book(std::string(MENDWRIGHT_SOURCE_DIR) + "/pricebook-demo");
        return read ? std::move(read).value() : pricing::PriceBook{};
    }();
    return book;
}

// One invented demo job (pricebook-demo/jobs/NAME), read with the survey reader.
inline model::Installation read_demo_job(const std::string& file_name) {
    const auto path = std::filesystem::path(MENDWRIGHT_SOURCE_DIR) / "pricebook-demo" / "jobs" / file_name;
    std::ifstream stream(path);
    std::stringstream text;
    text << stream.rdbuf();
    auto load = io::read_survey(text.str());
    INFO(path.string());
    REQUIRE(load.ok());
    return *load.installation;
}

// Every invented demo job, by file name in name order.
struct DemoInstallation {
    std::string file_name;
    model::Installation installation;
};
inline std::vector<DemoInstallation> demo_installations() {
    std::vector<std::string> names;
    for (const auto& entry : std::filesystem::directory_iterator(std::filesystem::path(MENDWRIGHT_SOURCE_DIR) / "pricebook-demo" / "jobs")) {
        if (entry.path().extension() == ".json") names.push_back(entry.path().filename().string());
    }
    std::sort(names.begin(), names.end());
    std::vector<DemoInstallation> jobs;
    for (const auto& name : names) jobs.push_back({name, read_demo_job(name)});
    return jobs;
}

// Two verifications of one option agree on every verdict field.
inline void check_same_verdict(const remedies::Verification& a, const remedies::Verification& b) {
    CHECK(a.cleared == b.cleared);
    CHECK(a.still_open == b.still_open);
    CHECK(a.introduced == b.introduced);
    CHECK(a.introduced_urgent == b.introduced_urgent);
    CHECK(a.clears_every_urgent_target == b.clears_every_urgent_target);
}

inline remedies::Assessor shipped_rules() {
    return [](const model::Installation& installation, rules::FindingDetail detail) {
        return rules::assess(installation, rules::default_rules_profile(), {detail});
    };
}

inline remedies::RemedySettings shipped_settings() {
    return remedies::settings_from_profile(rules::default_rules_profile());
}

inline const remedies::Option* find_option(const remedies::Analysis& analysis, const std::string& id) {
    for (const auto& option : analysis.options)
        if (option.id == id) return &option;
    return nullptr;
}

inline bool contains(const std::vector<std::string>& list, const std::string& text) {
    for (const auto& item : list)
        if (item == text) return true;
    return false;
}

inline bool contains_prefix(const std::vector<std::string>& list, const std::string& prefix) {
    for (const auto& item : list)
        if (item.rfind(prefix, 0) == 0) return true;
    return false;
}

}  // namespace mendwright::remedy_test
