// make_quote: checks, validity date, what clears each finding, cautions.
#include <catch2/catch.hpp>

#include "planner/pricing/quote.hpp"
#include "pricing_fixture.hpp"

using namespace mendwright;
using namespace mendwright::pricing;

namespace {

QuoteRequest sample_request() {
    QuoteRequest request;
    request.number = "Q-TEST-1";
    request.date = parse_iso_date("2026-02-20", "date").value();
    request.client_name = "Invented Client";
    request.site_address = "1 Invented Row";
    request.works = build_works_list(test::hand_worked_book(),
                                     {{"opt-rcd", "Time-delayed RCD at the origin", {"F1"}, {{"A-RCD", 1, ""}}},
                                      {"opt-test", "Test the circuits", {"F1", "F2"}, {{"C-TEST", 3, ""}}}})
                        .value();
    request.chosen_plan.name = "Least cost";
    request.findings = {{"F1", "C2", "No fault protection", "Board, hall", "411.5.3"},
                        {"F2", "FI", "Insulation resistance not recorded", "Circuit 4", "643.3"},
                        {"F3", "C3", "No surge protection", "Board, hall", "443.4"}};
    return request;
}

}  // namespace

TEST_CASE("pricing quote: figures, validity and what clears each finding are filled in", "[pricing][quote]") {
    const auto quote = make_quote(sample_request());
    REQUIRE(quote.ok());
    // 2026-02-20 + 30 days = 2026-03-22 (February 2026 has 28 days).
    CHECK(quote->valid_until.to_iso() == "2026-03-22");
    CHECK(quote->chosen_plan.total_pence == quote->totals.total_pence);
    REQUIRE(quote->findings.size() == 3);
    CHECK(quote->findings[0].cleared_by ==
          std::vector<std::string>{"Time-delayed RCD at the origin", "Test the circuits"});
    CHECK(quote->findings[1].cleared_by == std::vector<std::string>{"Test the circuits"});
    CHECK(quote->findings[2].cleared_by.empty());
    CHECK(quote->exclusions == default_exclusions());
    REQUIRE(quote->cautions.size() == 4);
    CHECK_THAT(quote->cautions[0], Catch::Contains("planning aid") && Catch::Contains("competent person"));
    CHECK_THAT(quote->cautions[1], Catch::Contains("Local regulations"));
    CHECK_THAT(quote->cautions[2], Catch::Contains("re-measured"));
}

TEST_CASE("pricing quote: bad requests are refused with the field named", "[pricing][quote]") {
    auto request = sample_request();
    request.number = " ";
    CHECK(make_quote(request).problem().to_string() == "number: expected a quote number, got nothing");
    request = sample_request();
    request.client_name.clear();
    CHECK(make_quote(request).problem().field == "client_name");
    request = sample_request();
    request.site_address.clear();
    CHECK(make_quote(request).problem().field == "site_address");
    request = sample_request();
    request.findings[2].code = "C4";
    CHECK(make_quote(request).problem().to_string() == "findings[2].code: expected C1, C2, C3 or FI, got \"C4\"");
    request = sample_request();
    request.findings[2].id = "F1";
    CHECK(make_quote(request).problem().to_string() == "findings[2].id: finding F1 appears twice");
    request = sample_request();
    request.findings.pop_back();
    request.findings.pop_back();
    CHECK(make_quote(request).problem().to_string() ==
          "works.groups[1].clears_findings: finding F2 is not in the findings schedule");
    request = sample_request();
    request.works.groups.clear();
    request.findings.clear();
    CHECK(make_quote(request).problem().field == "works");
}
