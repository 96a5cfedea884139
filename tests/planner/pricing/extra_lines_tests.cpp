// Free lines read from a CSV: the same CSV rules as items.csv (RFC 4180), errors naming the file,
// line and column. The amounts follow money.hpp's rules R2 (pence) and R3 (milli-hours).
#include <catch2/catch.hpp>

#include "planner/pricing/extra_lines.hpp"

using namespace mendwright::pricing;

TEST_CASE("extra lines: columns in any order, quoted commas kept, note optional", "[pricing][extra]") {
    auto lines = parse_extra_lines("# invented\r\n"
                                   "labour_hours,quantity,unit,description,material_cost\r\n"
                                   "0.5,2,each,\"Lift and refit floorboards, landing\",1.35\r\n"
                                   "1.25,1,visit,Make good plaster,0\r\n",
                                   "extras.csv");
    REQUIRE(lines.ok());
    REQUIRE(lines->size() == 2);
    CHECK((*lines)[0].description == "Lift and refit floorboards, landing");  // RFC 4180 section 2.6
    CHECK((*lines)[0].quantity == 2.0);
    CHECK((*lines)[0].unit_material_pence == 135);
    CHECK((*lines)[0].labour_milli_hours_per_unit == 500);
    CHECK((*lines)[0].note.empty());
    CHECK((*lines)[1].unit_material_pence == 0);
    CHECK((*lines)[1].labour_milli_hours_per_unit == 1250);
}

TEST_CASE("extra lines: every bad cell is named by file, line and column", "[pricing][extra]") {
    const std::string header = "description,unit,quantity,material_cost,labour_hours,note\n";
    struct Case {
        std::string row;
        std::string field;
    };
    const Case cases[] = {
        {",each,1,1.00,0,", "extras.csv:2:description"},
        {"Plaster,,1,1.00,0,", "extras.csv:2:unit"},
        {"Plaster,each,0,1.00,0,", "extras.csv:2:quantity"},
        {"Plaster,each,-1,1.00,0,", "extras.csv:2:quantity"},
        {"Plaster,each,1e9,1.00,0,", "extras.csv:2:quantity"},
        {"Plaster,each,1,£1.00,0,", "extras.csv:2:material_cost"},
        {"Plaster,each,1,1.005,0,", "extras.csv:2:material_cost"},
        {"Plaster,each,1,1.00,1.2345,", "extras.csv:2:labour_hours"},
        {"Plaster,each,1,0,0,", "extras.csv:2:material_cost"},  // never priced at nothing
        {"Plaster,each,1,1.00", "extras.csv:2"},                // too few fields
    };
    for (const auto& c : cases) {
        INFO(c.row);
        auto lines = parse_extra_lines(header + c.row + "\n", "extras.csv");
        REQUIRE_FALSE(lines.ok());
        CHECK(lines.problem().field == c.field);
    }
}

TEST_CASE("extra lines: a missing or unknown header column is named", "[pricing][extra]") {
    auto missing = parse_extra_lines("description,unit,material_cost,labour_hours\nA,each,1,0\n", "x.csv");
    REQUIRE_FALSE(missing.ok());
    CHECK(missing.problem().field == "x.csv:1:header");
    CHECK_THAT(missing.problem().message, Catch::Contains("quantity"));
    auto unknown = parse_extra_lines("description,unit,quantity,material_cost,labour_hours,price\n", "x.csv");
    REQUIRE_FALSE(unknown.ok());
    CHECK_THAT(unknown.problem().message, Catch::Contains("unknown column \"price\""));
    auto empty = parse_extra_lines("# nothing\n", "x.csv");
    REQUIRE_FALSE(empty.ok());
    CHECK(empty.problem().field == "x.csv");
}

TEST_CASE("extra lines: a file that cannot be read is named", "[pricing][extra]") {
    auto lines = read_extra_lines("/nonexistent/extras.csv");
    REQUIRE_FALSE(lines.ok());
    CHECK(lines.problem().field == "/nonexistent/extras.csv");
}
