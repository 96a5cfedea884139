// The survey reader builds the document with a SAX handler that also notes each key given twice
// in one object (JSON parsers keep only one of the two values; RFC 8259 section 4 says names
// "SHOULD be unique", from memory). These pin the path it reports inside arrays and nested objects, that a
// repeated key in different objects is no repeat, and that malformed text still reports the
// parser's line and column.
#include <catch2/catch.hpp>

#include "survey_fixture.hpp"

namespace mendwright::io::test {
namespace {

// The survey text with `extra` inserted right after the first occurrence of `needle`.
std::string with_inserted(const std::string& needle, const std::string& extra) {
    std::string text = base_survey().dump(2);
    const auto at = text.find(needle);
    REQUIRE(at != std::string::npos);
    text.insert(at + needle.size(), extra);
    return text;
}

}  // namespace

TEST_CASE("io.survey duplicate keys: the path names the array element and the field", "[io][survey][duplicate]") {
    const Json doc = base_survey();
    REQUIRE(doc["boards"][0]["circuits"].size() >= 2);
    // The second circuit's id is given twice: its path runs through both arrays.
    const std::string second_id = doc["boards"][0]["circuits"][1]["id"].get<std::string>();
    const SurveyLoad result = read_survey(with_inserted("\"id\": \"" + second_id + "\",", " \"id\": \"" + second_id + "\","));
    INFO(all_text(result));
    const auto found = at_path(result, "boards[0].circuits[1].id", Severity::error);
    REQUIRE(found.size() == 1);
    CHECK_THAT(found[0].message, Catch::Contains("appears twice"));
}

TEST_CASE("io.survey duplicate keys: the same key in two objects is not a repeat", "[io][survey][duplicate]") {
    // Every circuit has an "id": a valid survey reads with no error at all.
    const SurveyLoad result = read_survey(base_survey().dump(2));
    INFO(all_text(result));
    CHECK(result.ok());
    CHECK(result.errors().empty());
}

TEST_CASE("io.survey duplicate keys: a repeat inside a nested object after arrays is placed right", "[io][survey][duplicate]") {
    // "electrode" comes after the job and supply objects; its repeated field is reported at its path.
    const std::string needle = "\"measured_ra_ohms\": ";
    std::string text = base_survey().dump(2);
    const auto at = text.find(needle);
    REQUIRE(at != std::string::npos);
    const auto comma = text.find(',', at);
    REQUIRE(comma != std::string::npos);
    text.insert(comma + 1, " \"measured_ra_ohms\": 12.0,");
    const SurveyLoad result = read_survey(text);
    INFO(all_text(result));
    CHECK(at_path(result, "electrode.measured_ra_ohms", Severity::error).size() == 1);
}

TEST_CASE("io.survey duplicate keys: malformed text reports the parser's line and column", "[io][survey][duplicate]") {
    const SurveyLoad result = read_survey("{\n  \"format\": \"x\",\n  \"version\": 1,\n  oops\n}");
    REQUIRE(result.diagnostics.size() == 1);
    CHECK(result.diagnostics[0].path.empty());
    CHECK_THAT(result.diagnostics[0].message, Catch::Contains("not valid JSON") && Catch::Contains("line 4, column 3"));
    // Trailing text after the document is refused too (strict parsing).
    CHECK_FALSE(read_survey(base_survey().dump(2) + " {}").ok());
}

}  // namespace mendwright::io::test
