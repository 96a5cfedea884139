// Survey documents that must be refused: each breaks one rule of docs/survey-format.md (our own
// format; the document is the source of every expected path and message here) and the test
// asserts the exact JSON path of the error and the gist of its message.
#include <catch2/catch.hpp>

#include <functional>

#include "survey_fixture.hpp"

namespace mendwright::io::test {
namespace {

struct MalformedCase {
    const char* what;
    std::function<void(Json&)> change;
    std::string path;
    std::vector<std::string> message_parts;
};

Json& circuit(Json& doc, int board, int index) { return doc["boards"][board]["circuits"][index]; }
Json& device(Json& doc, int board, int index) { return doc["boards"][board]["devices"][index]; }

const std::vector<MalformedCase>& malformed_cases() {
    static const std::vector<MalformedCase> cases = {
        {"rating typed with its unit", [](Json& d) { circuit(d, 0, 1)["device"]["rating_amps"] = "32A"; },
         "boards[0].circuits[1].device.rating_amps", {"expected a number > 0", "got \"32A\""}},
        {"rating of zero", [](Json& d) { circuit(d, 0, 0)["device"]["rating_amps"] = 0; },
         "boards[0].circuits[0].device.rating_amps", {"expected a number > 0", "got 0"}},
        {"RCD of 0 A", [](Json& d) { device(d, 0, 1)["residual_current_amps"] = 0.0; },
         "boards[0].devices[1].residual_current_amps", {"expected a number > 0", "got 0"}},
        {"IΔn typed in milliamperes", [](Json& d) { device(d, 0, 1)["residual_current_amps"] = 30; },
         "boards[0].devices[1].residual_current_amps", {"30 mA is 0.03", "got 30"}},
        {"negative Zs", [](Json& d) { circuit(d, 0, 0)["measured_zs_ohms"] = -0.5; },
         "boards[0].circuits[0].measured_zs_ohms", {"expected a number > 0", "got -0.5"}},
        {"negative electrode resistance", [](Json& d) { d["electrode"]["measured_ra_ohms"] = -90.0; },
         "electrode.measured_ra_ohms", {"expected a number > 0", "got -90"}},
        {"tails of 1 km", [](Json& d) { d["tails"]["length_m"] = 1000.0; },
         "tails.length_m", {"<= 100", "got 1000", "longer than any meter tails"}},
        {"tails csa of zero", [](Json& d) { d["tails"]["csa_mm2"] = 0; },
         "tails.csa_mm2", {"expected a number > 0", "got 0"}},
        {"negative conductor csa", [](Json& d) { circuit(d, 0, 2)["line_csa_mm2"] = -2.5; },
         "boards[0].circuits[2].line_csa_mm2", {"expected a number > 0", "got -2.5"}},
        {"month 13", [](Json& d) { d["job"]["inspection_date"] = "2026-13-01"; },
         "job.inspection_date", {"expected a real calendar date", "2026-13-01"}},
        {"date in the wrong order", [](Json& d) { d["electrode"]["measured_on"] = "10/03/2026"; },
         "electrode.measured_on", {"expected a date as YYYY-MM-DD", "10/03/2026"}},
        {"earthing in capitals", [](Json& d) { d["supply"]["earthing"] = "TN-S"; },
         "supply.earthing", {"expected one of \"tt\", \"tn_s\" or \"tn_c_s\"", "got \"TN-S\""}},
        {"unknown occupancy", [](Json& d) { d["job"]["occupancy"] = "rented"; },
         "job.occupancy", {"privately_rented_dwelling", "got \"rented\""}},
        {"unknown field at the top", [](Json& d) { d["colour"] = "red"; }, "colour", {"unknown field"}},
        {"misspelt field suggests the right one", [](Json& d) {
             auto& dev = circuit(d, 0, 1)["device"];
             dev["ratng_amps"] = dev["rating_amps"];
             dev.erase("rating_amps");
         },
         "boards[0].circuits[1].device.ratng_amps", {"unknown field", "did you mean \"rating_amps\"?"}},
        {"missing required field", [](Json& d) { d["job"].erase("reference"); },
         "job.reference", {"missing", "expected a non-empty string"}},
        {"missing boards", [](Json& d) { d.erase("boards"); }, "boards", {"missing", "expected an array"}},
        {"no boards at all", [](Json& d) { d["boards"] = Json::array(); }, "boards", {"expected at least one board"}},
        {"boards not an array", [](Json& d) { d["boards"] = Json::object(); }, "boards", {"expected an array, got an object"}},
        {"observation not an object", [](Json& d) { d["observations"][0] = 3; }, "observations[0]",
         {"expected an object, got 3"}},
        {"duplicate board id", [](Json& d) { d["boards"][1]["id"] = "cu"; circuit(d, 0, 3)["feeds_board_id"] = "cu"; },
         "boards[1].id", {"duplicate board id \"cu\"", "boards[0].id"}},
        {"device id used twice across boards", [](Json& d) { circuit(d, 1, 0)["device"]["id"] = "rcd1"; },
         "boards[1].circuits[0].device.id", {"duplicate device id \"rcd1\"", "boards[0].devices[1].id"}},
        {"circuit id used twice across boards", [](Json& d) { circuit(d, 1, 0)["id"] = "c2"; d["observations"][0].erase("circuit_id"); },
         "boards[1].circuits[0].id", {"duplicate circuit id \"c2\""}},
        {"duplicate observation id", [](Json& d) { d["observations"].push_back(d["observations"][0]); },
         "observations[1].id", {"duplicate observation id \"o1\""}},
        {"upstream device that does not exist", [](Json& d) { circuit(d, 0, 1)["upstream_id"] = "rcd9"; },
         "boards[0].circuits[1].upstream_id", {"no device \"rcd9\" in this board"}},
        {"upstream device in another board", [](Json& d) { circuit(d, 1, 0)["upstream_id"] = "rcd1"; },
         "boards[1].circuits[0].upstream_id", {"a device of board \"cu\""}},
        {"upstream is a circuit's own device", [](Json& d) { circuit(d, 0, 1)["upstream_id"] = "cb1"; },
         "boards[0].circuits[1].upstream_id", {"the protective device of circuit \"c1\""}},
        {"device upstream of itself", [](Json& d) { device(d, 0, 1)["upstream_id"] = "rcd1"; },
         "boards[0].devices[1].upstream_id", {"cannot be upstream of itself"}},
        {"devices upstream of each other", [](Json& d) { device(d, 0, 0)["upstream_id"] = "rcd1"; },
         "boards[0].devices[0].upstream_id", {"form a loop", "\"ms\" -> \"rcd1\" -> \"ms\""}},
        {"submain to a board that does not exist", [](Json& d) { circuit(d, 0, 3)["feeds_board_id"] = "shed"; },
         "boards[0].circuits[3].feeds_board_id", {"no board \"shed\""}},
        {"boards feeding each other", [](Json& d) {
             Json back = circuit(d, 0, 3);
             back["id"] = "g2";
             back["device"]["id"] = "rcbo-g2";
             back["upstream_id"] = "ms-g";
             back["feeds_board_id"] = "cu";
             d["boards"][1]["circuits"].push_back(back);
         },
         "boards[1].circuits[1].feeds_board_id", {"feed each other in a loop", "\"garage\" -> \"cu\" -> \"garage\""}},
        {"two origin boards", [](Json& d) { circuit(d, 0, 3).erase("feeds_board_id"); circuit(d, 0, 3)["use"] = "other"; },
         "boards", {"more than one origin board", "\"cu\", \"garage\""}},
        {"board fed twice", [](Json& d) {
             Json second = circuit(d, 0, 3);
             second["id"] = "c5";
             second["device"]["id"] = "rcbo5";
             d["boards"][0]["circuits"].push_back(second);
         },
         "boards[0].circuits[4].feeds_board_id", {"already fed by boards[0].circuits[3]"}},
        {"observation on a board that does not exist", [](Json& d) { d["observations"][0]["board_id"] = "loft"; },
         "observations[0].board_id", {"no board \"loft\""}},
        {"observation on a circuit that does not exist", [](Json& d) { d["observations"][0]["circuit_id"] = "c99"; },
         "observations[0].circuit_id", {"no circuit \"c99\""}},
        {"observation circuit in another board", [](Json& d) { d["observations"][0]["circuit_id"] = "c1"; },
         "observations[0].circuit_id", {"circuit \"c1\" is in board \"cu\", not in \"garage\""}},
        {"RCD without IΔn", [](Json& d) { device(d, 0, 1).erase("residual_current_amps"); },
         "boards[0].devices[1].residual_current_amps", {"missing", "needs its rated residual operating current"}},
        {"RCBO without curve", [](Json& d) { circuit(d, 0, 3)["device"].erase("curve"); },
         "boards[0].circuits[3].device.curve", {"missing", "\"rcbo\" needs its curve"}},
        {"RCBO without IΔn", [](Json& d) { circuit(d, 0, 3)["device"].erase("residual_current_amps"); },
         "boards[0].circuits[3].device.residual_current_amps", {"missing"}},
        {"circuit-breaker without curve", [](Json& d) { circuit(d, 0, 1)["device"].erase("curve"); },
         "boards[0].circuits[1].device.curve", {"missing", "\"circuit_breaker\" needs its curve"}},
        {"fuse without standard", [](Json& d) { circuit(d, 0, 2)["device"].erase("fuse_standard"); },
         "boards[0].circuits[2].device.fuse_standard", {"missing", "a fuse needs the standard"}},
        {"circuit-breaker with an IΔn", [](Json& d) { circuit(d, 0, 1)["device"]["residual_current_amps"] = 0.03; },
         "boards[0].circuits[1].device.residual_current_amps", {"only RCDs and RCBOs"}},
        {"fuse with a curve", [](Json& d) { circuit(d, 0, 2)["device"]["curve"] = "b"; },
         "boards[0].circuits[2].device.curve", {"only circuit-breakers and RCBOs have a curve"}},
        {"time-delayed circuit-breaker", [](Json& d) { circuit(d, 0, 1)["device"]["delay"] = "time_delayed"; },
         "boards[0].circuits[1].device.delay", {"only RCDs and RCBOs can be time-delayed"}},
        {"final circuit protected by an RCD alone", [](Json& d) {
             circuit(d, 0, 1)["device"] = Json::parse(R"({"id": "rc2", "kind": "rcd", "rating_amps": 40.0, "residual_current_amps": 0.03})");
         },
         "boards[0].circuits[1].device.kind", {"final circuit's own device", "got \"rcd\""}},
        {"upstream_id on a circuit's own device", [](Json& d) { circuit(d, 0, 1)["device"]["upstream_id"] = "rcd1"; },
         "boards[0].circuits[1].device.upstream_id", {"give the circuit's upstream_id instead"}},
        {"circuit feeding a board is not a submain", [](Json& d) { circuit(d, 0, 3)["use"] = "sockets"; },
         "boards[0].circuits[3].use", {"expected \"submain\"", "got \"sockets\""}},
        {"two phases", [](Json& d) { d["supply"]["phases"] = 2; }, "supply.phases", {"expected 1 or 3, got 2"}},
        {"single rod layout with two rods", [](Json& d) { d["electrode"]["count"] = 2; d["electrode"]["spacing_m"] = 2.4; },
         "electrode.count", {"expected 1 for layout \"single\", got 2"}},
        {"negative spare ways", [](Json& d) { d["boards"][0]["spare_ways"] = -1; },
         "boards[0].spare_ways", {"expected a whole number from 0", "got -1"}},
        {"fractional rod count", [](Json& d) { d["electrode"]["count"] = 1.5; },
         "electrode.count", {"expected a whole number", "got 1.5"}},
        {"whole number too large to be a count", [](Json& d) { d["electrode"]["count"] = 1e300; },
         "electrode.count", {"expected a whole number", "got 1e+300"}},
        {"yes for a true/false field", [](Json& d) { circuit(d, 0, 0)["concealed_in_wall"] = "yes"; },
         "boards[0].circuits[0].concealed_in_wall", {"expected true or false", "got \"yes\""}},
        {"quantity of zero", [](Json& d) { d["observations"][0]["item_quantity"] = 0; },
         "observations[0].item_quantity", {"expected a number > 0", "got 0"}},
        {"empty item code", [](Json& d) { d["observations"][0]["item_code"] = ""; },
         "observations[0].item_code", {"expected a non-empty string"}},
        {"observation code in capitals", [](Json& d) { d["observations"][0]["code"] = "C2"; },
         "observations[0].code", {"\"c1\", \"c2\", \"c3\" or \"fi\"", "got \"C2\""}},
        {"number where a string is expected", [](Json& d) { circuit(d, 0, 0)["number"] = 1; },
         "boards[0].circuits[0].number", {"expected a non-empty string", "got 1"}},
        {"prospective fault current typed in amperes", [](Json& d) { d["supply"]["prospective_fault_current_ka"] = 1500; },
         "supply.prospective_fault_current_ka", {"in kA"}},
        {"rod diameter typed in millimetres", [](Json& d) { d["electrode"]["rod_diameter_m"] = 16; },
         "electrode.rod_diameter_m", {"a 16 mm rod is 0.016"}},
    };
    return cases;
}

}  // namespace

TEST_CASE("io.survey: the base document of the malformed cases is valid with no warnings", "[io][survey]") {
    const SurveyLoad result = load(base_survey());
    INFO(all_text(result));
    CHECK(result.ok());
    CHECK(result.diagnostics.empty());
    CHECK(result.installation.has_value());
}

TEST_CASE("io.survey: each malformed document is refused with the exact path and what was expected", "[io][survey]") {
    REQUIRE(malformed_cases().size() >= 30);
    for (const auto& c : malformed_cases()) {
        Json doc = base_survey();
        c.change(doc);
        const SurveyLoad result = load(doc);
        INFO("case: " << c.what << "\n" << all_text(result));
        CHECK_FALSE(result.ok());
        CHECK_FALSE(result.installation.has_value());
        const auto found = at_path(result, c.path, Severity::error);
        CHECK(found.size() == 1);
        if (found.empty()) continue;
        for (const auto& part : c.message_parts) CHECK_THAT(found[0].message, Catch::Contains(part));
    }
}

TEST_CASE("io.survey: a document with several problems reports every one of them", "[io][survey]") {
    Json doc = base_survey();
    circuit(doc, 0, 1)["device"]["rating_amps"] = "32A";
    doc["tails"]["length_m"] = -3;
    doc["observations"][0]["circuit_id"] = "nowhere";
    device(doc, 0, 1).erase("residual_current_amps");
    doc["boards"][1]["colour"] = "grey";
    const SurveyLoad result = load(doc);
    INFO(all_text(result));
    const std::vector<std::string> expected_paths = {
        "boards[0].circuits[1].device.rating_amps", "tails.length_m", "observations[0].circuit_id",
        "boards[0].devices[1].residual_current_amps", "boards[1].colour"};
    CHECK(result.errors().size() == expected_paths.size());
    for (const auto& path : expected_paths) CHECK(at_path(result, path, Severity::error).size() == 1);
}

TEST_CASE("io.survey: invalid JSON is one error giving line and column", "[io][survey]") {
    const SurveyLoad result = read_survey("{\n  \"format\": \"mendwright-survey\",\n  \"version\": 1,,\n}\n");
    REQUIRE(result.diagnostics.size() == 1);
    CHECK(result.diagnostics[0].path.empty());
    CHECK_THAT(result.diagnostics[0].message, Catch::Contains("not valid JSON") && Catch::Contains("line 3, column"));
    CHECK_FALSE(result.ok());
}

TEST_CASE("io.survey: empty text and a bare value are refused without throwing", "[io][survey]") {
    CHECK_FALSE(read_survey("").ok());
    const SurveyLoad bare = read_survey("[1, 2]");
    REQUIRE(bare.errors().size() == 1);
    CHECK_THAT(bare.errors()[0].message, Catch::Contains("expected a JSON object"));
}

TEST_CASE("io.survey: a field given twice in one object is an error, not a silent overwrite", "[io][survey]") {
    std::string text = base_survey().dump(2);
    const std::string needle = "\"u0_volts\": 230.0,";
    const auto at = text.find(needle);
    REQUIRE(at != std::string::npos);
    text.insert(at + needle.size(), " \"u0_volts\": 110.0,");
    const SurveyLoad result = read_survey(text);
    INFO(all_text(result));
    const auto found = at_path(result, "supply.u0_volts", Severity::error);
    REQUIRE(found.size() == 1);
    CHECK_THAT(found[0].message, Catch::Contains("appears twice"));
}

TEST_CASE("io.survey: a newer version is refused with a clear message and nothing else", "[io][survey]") {
    Json doc = base_survey();
    doc["version"] = 2;
    doc["something_new"] = true;  // a newer version may add fields: not reported one by one
    const SurveyLoad result = load(doc);
    REQUIRE(result.diagnostics.size() == 1);
    CHECK(result.diagnostics[0].path == "version");
    CHECK_THAT(result.diagnostics[0].message, Catch::Contains("version 2") && Catch::Contains("reads version 1") &&
                                                  Catch::Contains("newer Mendwright"));
}

TEST_CASE("io.survey: another format is refused at the format field", "[io][survey]") {
    Json doc = base_survey();
    doc["format"] = "some-other-format";
    const SurveyLoad result = load(doc);
    REQUIRE(result.diagnostics.size() == 1);
    CHECK(result.diagnostics[0].path == "format");
    CHECK_THAT(result.diagnostics[0].message, Catch::Contains("not a Mendwright survey document"));
    doc.erase("version");
    doc["format"] = "mendwright-survey";
    CHECK(at_path(load(doc), "version", Severity::error).size() == 1);
}

TEST_CASE("io.survey: null stands for an absent optional field but not for a required one", "[io][survey]") {
    Json doc = base_survey();
    doc["supply"]["ze_ohms"] = nullptr;
    CHECK(load(doc).ok());
    doc["supply"]["u0_volts"] = nullptr;
    const SurveyLoad result = load(doc);
    const auto found = at_path(result, "supply.u0_volts", Severity::error);
    REQUIRE(found.size() == 1);
    CHECK_THAT(found[0].message, Catch::Contains("got null"));
}

TEST_CASE("io.survey: Diagnostic::to_string joins path and message", "[io][survey]") {
    CHECK(Diagnostic{Severity::error, "tails.length_m", "expected a number > 0, got -3"}.to_string() ==
          "tails.length_m: expected a number > 0, got -3");
    CHECK(Diagnostic{Severity::error, "", "not valid JSON"}.to_string() == "not valid JSON");
}

}  // namespace mendwright::io::test

namespace mendwright::io::test {

TEST_CASE("io.survey: the version may be written 1.0 but not 1.5, and 2.0 is a newer version", "[io][survey]") {
    Json doc = base_survey();
    doc["version"] = 1.0;
    CHECK(load(doc).ok());
    doc["version"] = 1.5;
    CHECK(at_path(load(doc), "version", Severity::error).size() == 1);
    doc["version"] = 2.0;
    const SurveyLoad newer = load(doc);
    REQUIRE(newer.diagnostics.size() == 1);
    CHECK_THAT(newer.diagnostics[0].message, Catch::Contains("version 2 of the survey format"));
    doc["version"] = 1e300;
    CHECK(at_path(load(doc), "version", Severity::error).size() == 1);
}

}  // namespace mendwright::io::test
