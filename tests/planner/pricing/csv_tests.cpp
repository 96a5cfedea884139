// The CSV reader against RFC 4180 (Common Format and MIME Type for CSV Files, section 2: fields
// in double quotes may contain commas, line breaks and doubled double quotes).
#include <catch2/catch.hpp>

#include "planner/pricing/csv.hpp"

using namespace mendwright::pricing;

TEST_CASE("pricing csv: quoted fields keep commas, doubled quotes and line breaks (RFC 4180 s.2)", "[pricing][csv]") {
    const auto records = parse_csv("a,\"b, with comma\",\"say \"\"hi\"\"\"\n\"two\nlines\",x,\n", "t.csv");
    REQUIRE(records.ok());
    REQUIRE(records->size() == 2);
    CHECK(records->at(0).fields == std::vector<std::string>{"a", "b, with comma", "say \"hi\""});
    CHECK(records->at(0).line == 1);
    CHECK(records->at(1).fields == std::vector<std::string>{"two\nlines", "x", ""});
    CHECK(records->at(1).line == 2);
}

TEST_CASE("pricing csv: CRLF line ends, a byte-order mark and blank lines are handled", "[pricing][csv]") {
    const auto records = parse_csv("\xEF\xBB\xBFh1,h2\r\n\r\nv1,v2\r\nv3,\"v4\"", "t.csv");
    REQUIRE(records.ok());
    REQUIRE(records->size() == 3);
    CHECK(records->at(0).fields.front() == "h1");
    CHECK(records->at(1).line == 3);
    CHECK(records->at(2).fields == std::vector<std::string>{"v3", "v4"});
    CHECK(records->at(2).line == 4);
}

TEST_CASE("pricing csv: an unterminated quote names the line it opened on", "[pricing][csv]") {
    const auto records = parse_csv("a,b\nc,\"open\nmore\n", "items.csv");
    REQUIRE_FALSE(records.ok());
    CHECK(records.problem().field == "items.csv:2");
    CHECK_THAT(records.problem().message, Catch::Contains("unterminated quoted field"));
}

TEST_CASE("pricing csv: text after a closing quote is an error", "[pricing][csv]") {
    const auto records = parse_csv("a,\"b\"c\n", "items.csv");
    REQUIRE_FALSE(records.ok());
    CHECK(records.problem().to_string() ==
          "items.csv:1: expected a comma or the end of the line after a closing quote, got 'c'");
}

TEST_CASE("pricing csv: a quote inside an unquoted field is an error", "[pricing][csv]") {
    const auto records = parse_csv("a,b\"c\n", "items.csv");
    REQUIRE_FALSE(records.ok());
    CHECK(records.problem().field == "items.csv:1");
    CHECK_THAT(records.problem().message, Catch::Contains("may only open a field"));
}
