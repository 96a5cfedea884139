// The survey reader parses a large document in parts (the rest of the document and two halves of
// its "boards" array side by side) and falls back to one parse of the whole text at any sign of
// trouble. Spelling the key "boards" with a JSON escape ("b\u006fards", the same key once decoded,
// RFC 8259 section 7) hides the array from the part-finder, so the same document is read in one
// go: the two readings must give the same installation and the same diagnostics, for clean
// documents and for documents broken inside a board.
#include <catch2/catch.hpp>

#include <filesystem>
#include <fstream>
#include <sstream>

#include "survey_fixture.hpp"

namespace mendwright::io::test {
namespace {

std::string demo_text(const std::string& name) {
    std::ifstream stream(std::filesystem::path(MENDWRIGHT_SOURCE_DIR) / "pricebook-demo" / "jobs" / name);
    std::stringstream text;
    text << stream.rdbuf();
    return text.str();
}

// The base survey with `extra` more boards (copies of its first with fresh ids), as text.
std::string survey_with_boards(int extra) {
    Json doc = base_survey();
    const Json first = doc["boards"][0];
    for (int n = 1; n <= extra; ++n) {
        Json board = first;
        const std::string suffix = "-x" + std::to_string(n);
        board["id"] = board["id"].get<std::string>() + suffix;
        for (auto& device : board["devices"]) {
            device["id"] = device["id"].get<std::string>() + suffix;
            if (device.contains("upstream_id")) device["upstream_id"] = device["upstream_id"].get<std::string>() + suffix;
        }
        for (auto& circuit : board["circuits"]) {
            circuit["id"] = circuit["id"].get<std::string>() + suffix;
            circuit["device"]["id"] = circuit["device"]["id"].get<std::string>() + suffix;
            if (circuit.contains("upstream_id")) circuit["upstream_id"] = circuit["upstream_id"].get<std::string>() + suffix;
            circuit.erase("feeds_board_id");
        }
        doc["boards"].push_back(board);
    }
    return doc.dump(2);
}

// The same text with the "boards" key spelt with an escape (read in one go).
std::string one_go(std::string text) {
    const std::string key = "\"boards\":";
    const auto at = text.find(key);
    REQUIRE(at != std::string::npos);
    text.replace(at, key.size(), "\"b\\u006fards\":");
    return text;
}

void check_same_reading(const std::string& text) {
    const SurveyLoad parts = read_survey(text);
    const SurveyLoad whole = read_survey(one_go(text));
    INFO("in parts:\n" << all_text(parts) << "\nin one go:\n" << all_text(whole));
    REQUIRE(parts.diagnostics.size() == whole.diagnostics.size());
    for (std::size_t i = 0; i < parts.diagnostics.size(); ++i) {
        CHECK(parts.diagnostics[i].severity == whole.diagnostics[i].severity);
        CHECK(parts.diagnostics[i].path == whole.diagnostics[i].path);
        CHECK(parts.diagnostics[i].message == whole.diagnostics[i].message);
    }
    REQUIRE(parts.installation.has_value() == whole.installation.has_value());
    if (parts.installation) CHECK(*parts.installation == *whole.installation);
}

// `text` with `bad` put in place of the first `needle` after the start of board number `board`.
std::string broken_in_board(const std::string& text, int board, const std::string& needle, const std::string& bad) {
    std::size_t at = text.find("\"boards\":");
    for (int b = 0; b <= board; ++b) at = text.find("\"name\":", at + 1);
    at = text.find(needle, at);
    REQUIRE(at != std::string::npos);
    std::string broken = text;
    broken.replace(at, needle.size(), bad);
    return broken;
}

}  // namespace

TEST_CASE("io.survey in parts: clean surveys read the same as in one go", "[io][survey][parts]") {
    check_same_reading(demo_text("farmhouse-tt-partial-rcd.json"));  // two boards: split
    check_same_reading(demo_text("rented-terrace-tt-no-rcd.json"));   // one board: one go either way
    for (int extra : {1, 2, 5, 9}) check_same_reading(survey_with_boards(extra));
    // Compact text (no spaces at all) and the boards key last.
    check_same_reading(Json::parse(survey_with_boards(4)).dump());
}

TEST_CASE("io.survey in parts: a survey broken inside a board reports as in one go", "[io][survey][parts]") {
    const std::string text = survey_with_boards(5);
    // Malformed JSON in the first and in the second half of the boards: the parser's line and column.
    check_same_reading(broken_in_board(text, 1, "\"id\":", "\"id\" "));
    check_same_reading(broken_in_board(text, 4, "\"circuits\":", "\"circuits\": ,"));
    // A key given twice inside a board.
    check_same_reading(broken_in_board(text, 3, "\"name\":", "\"location\": \"twice\", \"location\":"));
    // A wrong value inside a board (a field error, not a JSON error).
    check_same_reading(broken_in_board(text, 2, "\"spare_ways\": 2", "\"spare_ways\": -4"));
    // A comma before the array's end, and text after the document.
    std::string trailing = text;
    const auto end_of_boards = trailing.rfind(']', trailing.find("\"observations\"") == std::string::npos
                                                       ? std::string::npos
                                                       : trailing.find("\"observations\""));
    REQUIRE(end_of_boards != std::string::npos);
    trailing.insert(end_of_boards, ",");
    CHECK_FALSE(read_survey(trailing).ok());
    check_same_reading(trailing);
    check_same_reading(text + " {}");
}

}  // namespace mendwright::io::test
