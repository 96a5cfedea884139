// Values that are possible but unusual: the document still loads, and a warning names the field.
#include <catch2/catch.hpp>

#include <functional>

#include "survey_fixture.hpp"

namespace mendwright::io::test {
namespace {

struct WarningCase {
    const char* what;
    std::function<void(Json&)> change;
    std::string path;
    std::string gist;
};

Json& circuit(Json& doc, int board, int index) { return doc["boards"][board]["circuits"][index]; }

const std::vector<WarningCase>& warning_cases() {
    static const std::vector<WarningCase> cases = {
        // BS 7671:2018+A2 Table 41.5, note: a resistance above 200 ohms may not be stable (read).
        {"electrode over 200 ohms", [](Json& d) { d["electrode"]["measured_ra_ohms"] = 260.0; },
         "electrode.measured_ra_ohms", "over 200 ohms"},
        {"electrode reading with no date", [](Json& d) { d["electrode"].erase("measured_on"); },
         "electrode.measured_on", "month of the RA measurement matters"},
        {"TT with no electrode recorded", [](Json& d) { d.erase("electrode"); }, "electrode", "TT installation"},
        // Tails are commonly kept to about 3 m by network operators (common practice); 10 m is our
        // threshold for "check this".
        {"tails over 10 m", [](Json& d) { d["tails"]["length_m"] = 14.0; }, "tails.length_m", "over 10 m"},
        {"100 A breaker on a lighting circuit", [](Json& d) { circuit(d, 0, 0)["device"]["rating_amps"] = 100.0; },
         "boards[0].circuits[0].device.rating_amps", "unusual for a lighting circuit"},
        {"40 A on a socket-outlet circuit", [](Json& d) { circuit(d, 0, 1)["device"]["rating_amps"] = 40.0; },
         "boards[0].circuits[1].device.rating_amps", "unusual for a socket-outlet circuit"},
        // Usual IΔn ratings 10, 30, 100, 300, 500 mA (common practice).
        {"IΔn of 50 mA", [](Json& d) { d["boards"][0]["devices"][1]["residual_current_amps"] = 0.05; },
         "boards[0].devices[1].residual_current_amps", "50 mA is not one of the usual ratings"},
        {"Zs without R1+R2", [](Json& d) { circuit(d, 0, 0).erase("r1_plus_r2_ohms"); },
         "boards[0].circuits[0].r1_plus_r2_ohms", "cannot be cross-checked"},
        // Zs = Ze + (R1 + R2) (BS 7671 Appendix 3 / GN3 method; common practice): R1+R2 cannot exceed Zs.
        {"R1+R2 above Zs", [](Json& d) { circuit(d, 0, 0)["r1_plus_r2_ohms"] = 120.0; },
         "boards[0].circuits[0].r1_plus_r2_ohms", "exceeds the measured Zs"},
        {"trip at 5 IΔn slower than at IΔn", [](Json& d) { circuit(d, 0, 0)["rcd_trip_ms_at_5idn"] = 40.0; },
         "boards[0].circuits[0].rcd_trip_ms_at_5idn", "slower than the test at IΔn"},
        {"RCD trip time on a circuit without an RCD", [](Json& d) { circuit(d, 0, 2)["rcd_trip_ms_at_idn"] = 25.0; },
         "boards[0].circuits[2].rcd_trip_ms_at_idn", "no RCD or RCBO protects this circuit"},
        {"protective conductor larger than the line", [](Json& d) { circuit(d, 0, 1)["cpc_csa_mm2"] = 4.0; },
         "boards[0].circuits[1].cpc_csa_mm2", "larger than the line conductor"},
        {"submain to a board not surveyed", [](Json& d) {
             Json extra = circuit(d, 0, 3);
             extra["id"] = "c5";
             extra["device"]["id"] = "rcbo5";
             extra.erase("feeds_board_id");
             d["boards"][0]["circuits"].push_back(extra);
         },
         "boards[0].circuits[4].feeds_board_id", "feeds no board of this survey"},
        {"a 110 V supply", [](Json& d) { d["supply"]["u0_volts"] = 110.0; }, "supply.u0_volts", "230 V"},
        {"two rods with no spacing", [](Json& d) { d["electrode"]["count"] = 2; d["electrode"]["layout"] = "line"; },
         "electrode.spacing_m", "spacing between rods"},
    };
    return cases;
}

}  // namespace

TEST_CASE("io.survey: unusual but possible values load with a warning at their path", "[io][survey]") {
    for (const auto& c : warning_cases()) {
        Json doc = base_survey();
        c.change(doc);
        const SurveyLoad result = load(doc);
        INFO("case: " << c.what << "\n" << all_text(result));
        CHECK(result.ok());
        CHECK(result.installation.has_value());
        CHECK(result.warnings().size() == 1);
        const auto found = at_path(result, c.path, Severity::warning);
        CHECK(found.size() == 1);
        if (!found.empty()) CHECK_THAT(found[0].message, Catch::Contains(c.gist));
    }
}

TEST_CASE("io.survey: errors and warnings are reported together", "[io][survey]") {
    Json doc = base_survey();
    doc["electrode"]["measured_ra_ohms"] = 260.0;
    doc["tails"]["csa_mm2"] = "25mm";
    const SurveyLoad result = load(doc);
    CHECK_FALSE(result.ok());
    CHECK(at_path(result, "tails.csa_mm2", Severity::error).size() == 1);
    CHECK(at_path(result, "electrode.measured_ra_ohms", Severity::warning).size() == 1);
}

}  // namespace mendwright::io::test
