#pragma once
// A small valid survey document for the io tests to break one field at a time: a TT house with
// a consumer unit (main switch, one 30 mA RCD, a fuse, an RCBO) and a garage board on a submain.

#include <nlohmann/json.hpp>

#include <algorithm>
#include <string>
#include <vector>

#include "planner/io/survey_document.hpp"

namespace mendwright::io::test {

using Json = nlohmann::ordered_json;

inline Json base_survey() {
    return Json::parse(R"json({
  "format": "mendwright-survey",
  "version": 1,
  "job": {"reference": "TEST-1", "client": "Test client (invented)", "site": "Test site (invented)",
          "occupancy": "owner_occupied_dwelling", "inspection_date": "2026-03-10", "inspector": "", "country": "england"},
  "supply": {"earthing": "tt", "u0_volts": 230.0, "phases": 1, "supply_fuse_type": "BS 1361",
             "supply_fuse_rating_amps": 100.0, "prospective_fault_current_ka": 1.5, "ze_ohms": 95.0},
  "electrode": {"kind": "rod", "count": 1, "layout": "single", "rod_length_m": 1.2, "rod_diameter_m": 0.016,
                "measured_ra_ohms": 90.0, "measured_on": "2026-03-10", "soil_description": "loam"},
  "tails": {"length_m": 2.0, "csa_mm2": 25.0, "route": "surface", "mechanically_protected": false, "origin_protection": "none"},
  "boards": [
    {"id": "cu", "name": "Consumer unit", "location": "Hall", "enclosure": "metal", "spare_ways": 2,
     "accepts_rcbos": true, "surge_protection_fitted": false, "new_work": false,
     "devices": [
       {"id": "ms", "kind": "main_switch", "rating_amps": 100.0},
       {"id": "rcd1", "kind": "rcd", "upstream_id": "ms", "rating_amps": 63.0, "residual_current_amps": 0.03, "rcd_type": "a", "delay": "general"}
     ],
     "circuits": [
       {"id": "c1", "number": "1", "description": "Lighting", "use": "lighting",
        "device": {"id": "cb1", "kind": "circuit_breaker", "rating_amps": 6.0, "curve": "b", "breaking_capacity_ka": 6.0},
        "upstream_id": "rcd1", "line_csa_mm2": 1.5, "cpc_csa_mm2": 1.0, "length_m": 25.0,
        "measured_zs_ohms": 96.0, "r1_plus_r2_ohms": 0.8, "rcd_trip_ms_at_idn": 25.0, "rcd_trip_ms_at_5idn": 12.0},
       {"id": "c2", "number": "2", "description": "Sockets", "use": "sockets",
        "device": {"id": "cb2", "kind": "circuit_breaker", "rating_amps": 32.0, "curve": "b"},
        "upstream_id": "rcd1", "line_csa_mm2": 2.5, "cpc_csa_mm2": 1.5},
       {"id": "c3", "number": "3", "description": "Immersion", "use": "immersion",
        "device": {"id": "fu3", "kind": "fuse", "rating_amps": 15.0, "fuse_standard": "BS 3036"},
        "upstream_id": "ms", "line_csa_mm2": 2.5, "cpc_csa_mm2": 1.5},
       {"id": "c4", "number": "4", "description": "Garage submain", "use": "submain",
        "device": {"id": "rcbo4", "kind": "rcbo", "rating_amps": 32.0, "curve": "b", "residual_current_amps": 0.03, "delay": "general"},
        "upstream_id": "ms", "feeds_board_id": "garage", "line_csa_mm2": 6.0, "cpc_csa_mm2": 6.0}
     ]},
    {"id": "garage", "name": "Garage board", "location": "Garage", "enclosure": "metal",
     "devices": [{"id": "ms-g", "kind": "main_switch", "rating_amps": 40.0}],
     "circuits": [
       {"id": "g1", "number": "1", "description": "Garage sockets", "use": "sockets",
        "device": {"id": "cb-g1", "kind": "circuit_breaker", "rating_amps": 16.0, "curve": "b"},
        "upstream_id": "ms-g", "line_csa_mm2": 2.5, "cpc_csa_mm2": 1.5}
     ]}
  ],
  "observations": [
    {"id": "o1", "text": "Cracked socket-outlet in the garage", "code": "c2", "board_id": "garage", "circuit_id": "g1",
     "item_code": "SOCKET-DBL-REPLACE", "item_quantity": 1.0}
  ]
})json");
}

inline SurveyLoad load(const Json& document) { return read_survey(document.dump(2)); }

// The diagnostics of `severity` at exactly `path`.
inline std::vector<Diagnostic> at_path(const SurveyLoad& result, const std::string& path, Severity severity) {
    std::vector<Diagnostic> found;
    for (const auto& d : result.diagnostics)
        if (d.path == path && d.severity == severity) found.push_back(d);
    return found;
}

inline std::string all_text(const SurveyLoad& result) {
    std::string text;
    for (const auto& d : result.diagnostics)
        text += (d.severity == Severity::error ? "error " : "warning ") + d.to_string() + "\n";
    return text;
}

}  // namespace mendwright::io::test
