// Option costs against a hand calculation from the demo price book, and the plans for the three
// invented demo jobs (pricebook-demo/jobs) against what a contractor would expect.
#include <catch2/catch.hpp>


#include "planner/remedies/plans.hpp"
#include "tests/planner/remedies/remedy_fixtures.hpp"

using namespace mendwright;

TEST_CASE("remedies costing: an RCBO board for the cottage, by hand from the demo price book", "[remedies][cost]") {
    // Demo price book (invented figures), labour £48.00/h (settings.json):
    //   CU-METAL-RCBO-12 £392.50 + 6.5 h; SPD-T2-CU £54.20 + 0.75 h; TEST-IR-CIRCUIT x 6 at 0.35 h;
    //   FAULT-FIND-HOUR x 2 at 1 h; LAB-RELABEL-CU 0.5 h; CERT-EIC 1 h; FEE-BC-NOTIFY £3.50 + 0.25 h;
    //   RCD-S100-ENCL £68.40 + 1.5 h and TAILS-25-M x 1 m £6.90 + 0.15 h (the time-delayed RCD at the
    //   meter that a TT origin board gets).
    //   Materials 392.50 + 54.20 + 3.50 + 68.40 + 6.90 = £525.50.
    //   Labour (6.5 + 0.75 + 2.1 + 2 + 0.5 + 1 + 0.25 + 1.5 + 0.15) h = 14.75 h x £48 = £708.00.
    const auto installation = remedy_test::tt_cottage_without_rcd();
    auto analysis = remedies::analyse(installation, remedy_test::shipped_rules(), remedy_test::demo_price_book(),
                                      remedy_test::shipped_settings());
    const auto* option = remedy_test::find_option(analysis, "board-rcbo@board:cu1");
    REQUIRE(option);
    REQUIRE(option->cost.priced);
    CHECK(option->cost.materials_pence == 52550);
    CHECK(option->cost.labour_pence == 70800);
    CHECK(option->cost.total_pence == 123350);  // 525.50 + 708.00
    CHECK(option->notifiable);
    CHECK_THAT(option->certificate, Catch::Contains("Electrical Installation Certificate"));
}

namespace {

struct DemoJob {
    model::Installation installation;
    std::unique_ptr<remedies::Analysis> analysis;
};

// The demo price book plus the item code the demo jobs' observations name, should the book lack it.
pricing::PriceBook demo_book_for_jobs() {
    pricing::PriceBook book = remedy_test::demo_price_book();
    if (!book.find("SOCKET-DBL-REPLACE")) {
        pricing::PriceItem item;
        item.code = "SOCKET-DBL-REPLACE";
        item.description = "Replace a double socket-outlet (test stand-in, invented price)";
        item.unit = "each";
        item.material_pence = 600;
        item.labour_milli_hours = 500;
        item.category = "accessories";
        book.items.push_back(item);
    }
    return book;
}

std::unique_ptr<DemoJob> demo_job(const std::string& name) {
    auto job = std::make_unique<DemoJob>();
    job->installation = remedy_test::read_demo_job(name);
    static const pricing::PriceBook book = demo_book_for_jobs();
    job->analysis = std::make_unique<remedies::Analysis>(
        remedies::analyse(job->installation, remedy_test::shipped_rules(), book, remedy_test::shipped_settings()));
    REQUIRE(job->analysis->pricing_problems.empty());
    return job;
}

int urgent_left(const remedies::Plan& plan) {
    return plan.figures.residual_c1 + plan.figures.residual_c2 + plan.figures.residual_fi;
}

}  // namespace

TEST_CASE("remedies demo jobs: every least-cost plan clears all C1, C2 and FI and costs no more than the ideal",
          "[remedies][demo]") {
    for (const char* name : {"rented-terrace-tt-no-rcd.json", "farmhouse-tt-partial-rcd.json",
                             "workshop-tt-rcd-selectivity.json"}) {
        INFO(name);
        auto job = demo_job(name);
        auto& a = *job->analysis;
        const auto cheapest = remedies::least_cost_plan(*a.verifier, a.options, a.settings);
        const auto ideal = remedies::ideal_plan(*a.verifier, a.options, a.settings);
        CHECK(urgent_left(cheapest) == 0);
        CHECK(urgent_left(ideal) == 0);
        CHECK(cheapest.figures.total_pence <= ideal.figures.total_pence);
        CHECK(ideal.figures.residual_c3 <= cheapest.figures.residual_c3);
        // A contractor's ideal: one circuit lost per fault (a device per circuit).
        CHECK(ideal.figures.circuits_lost_on_one_trip == 1);
        // Every plan carries its own combined verification: nothing urgent introduced.
        for (const auto& id : cheapest.figures.introduced_ids) CHECK(id.rfind("tt.", 0) != 0);
    }
}

TEST_CASE("remedies demo jobs: the workshop's non-selective 100 mA RCD is dealt with by the cheapest plan",
          "[remedies][demo]") {
    auto job = demo_job("workshop-tt-rcd-selectivity.json");
    auto& a = *job->analysis;
    const auto cheapest = remedies::least_cost_plan(*a.verifier, a.options, a.settings);
    CHECK_FALSE(remedy_test::contains_prefix(cheapest.figures.residual_ids, "rcd.selectivity@"));
    // The S-type swap is offered and verified as clearing the selectivity finding.
    const remedies::Option* swap = remedy_test::find_option(a, "rcd-s-type@device:rcd-workshop-100");
    REQUIRE(swap);
    CHECK(remedy_test::contains_prefix(swap->verification.cleared, "rcd.selectivity@device:rcd-workshop-100>"));
}

TEST_CASE("remedies demo jobs: a custom plan of options that exclude each other is refused with both ids",
          "[remedies][demo]") {
    auto job = demo_job("rented-terrace-tt-no-rcd.json");
    auto& a = *job->analysis;
    auto plan = remedies::custom_plan(*a.verifier, a.options,
                                      {"upstream-rcd-s100@board:cu-terrace", "board-rcbo@board:cu-terrace"}, a.settings);
    REQUIRE_FALSE(plan);
    CHECK_THAT(plan.problem().to_string(),
               Catch::Contains("upstream-rcd-s100@board:cu-terrace") && Catch::Contains("board-rcbo@board:cu-terrace"));
    auto unknown = remedies::custom_plan(*a.verifier, a.options, {"no-such-option"}, a.settings);
    REQUIRE_FALSE(unknown);
    CHECK(unknown.problem().field == "--choose");
}
