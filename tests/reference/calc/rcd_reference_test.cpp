// Reference values for RCDs: BS 7671:2018+A2 Table 41.5 and 411.5.3, the break times of
// BS EN 61008-1 / 61009-1, selectivity and additional protection.
#include <catch2/catch.hpp>

#include <cmath>

#include "planner/calc/leakage.hpp"
#include "planner/calc/rcd.hpp"

using mendwright::calc::RcdType;

TEST_CASE("calc reference: BS 7671 Table 41.5 maximum RA for 30, 100, 300 and 500 mA at 50 V") {
    using mendwright::calc::rcd_max_earth_resistance_ohms;
    struct Row {
        double idn_amps;
        double printed_ohms;
    };
    // BS 7671 Table 41.5 (read): printed in whole ohms.
    const Row rows[] = {{0.030, 1667}, {0.100, 500}, {0.300, 167}, {0.500, 100}};
    for (const auto& row : rows) {
        INFO("IΔn " << row.idn_amps << " A");
        auto ra = rcd_max_earth_resistance_ohms(row.idn_amps);
        REQUIRE(ra.ok());
        CHECK(std::round(*ra) == row.printed_ohms);
        CHECK(std::fabs(*ra - row.printed_ohms) <= 0.5);
    }
}

TEST_CASE("calc reference: a lower touch-voltage limit scales RA_max in proportion (411.5.3, RA x IΔn <= UL)") {
    // BS 7671 411.5.3 (read): 25 V on a 30 mA device allows 833.3 ohm.
    auto ra = mendwright::calc::rcd_max_earth_resistance_ohms(0.030, 25.0);
    REQUIRE(ra.ok());
    CHECK(*ra == Approx(833.333333).epsilon(1e-6));
}

TEST_CASE("calc reference: BS EN 61008-1 break times of general and S-type RCDs") {
    using mendwright::calc::rcd_time_limits;
    // BS EN 61008-1 / 61009-1 (read), general: 300 ms, 150 ms, 40 ms at 1, 2, 5 IΔn.
    CHECK(rcd_time_limits(RcdType::general, 1)->max_break_s == Approx(0.300));
    CHECK(rcd_time_limits(RcdType::general, 2)->max_break_s == Approx(0.150));
    CHECK(rcd_time_limits(RcdType::general, 5)->max_break_s == Approx(0.040));
    CHECK_FALSE(rcd_time_limits(RcdType::general, 1)->min_non_actuating_s.has_value());
    // S-type maximum break: 500 ms (read), 200 ms (from memory), 150 ms (read).
    CHECK(rcd_time_limits(RcdType::time_delayed, 1)->max_break_s == Approx(0.500));
    CHECK(rcd_time_limits(RcdType::time_delayed, 2)->max_break_s == Approx(0.200));
    CHECK(rcd_time_limits(RcdType::time_delayed, 5)->max_break_s == Approx(0.150));
    // S-type minimum non-actuating: 130 ms, 60 ms, 50 ms (read).
    CHECK(*rcd_time_limits(RcdType::time_delayed, 1)->min_non_actuating_s == Approx(0.130));
    CHECK(*rcd_time_limits(RcdType::time_delayed, 2)->min_non_actuating_s == Approx(0.060));
    CHECK(*rcd_time_limits(RcdType::time_delayed, 5)->min_non_actuating_s == Approx(0.050));
}

TEST_CASE("calc reference: measured trip times judged against BS EN 61008-1 limits") {
    using mendwright::calc::check_rcd_trip_time;
    // BS EN 61008-1 (read): a general device at 5 IΔn must break within 40 ms.
    CHECK(check_rcd_trip_time(RcdType::general, 5, 0.018)->within);
    CHECK_FALSE(check_rcd_trip_time(RcdType::general, 5, 0.045)->within);
    CHECK(check_rcd_trip_time(RcdType::general, 1, 0.300)->within);  // exactly the limit passes
    // An S-type at IΔn that breaks in 100 ms is faster than its 130 ms minimum (read): fails.
    auto early = check_rcd_trip_time(RcdType::time_delayed, 1, 0.100);
    REQUIRE(early.ok());
    CHECK_FALSE(early->within);
    CHECK_THAT(early->reason, Catch::Contains("sooner than the 130 ms"));
    CHECK(check_rcd_trip_time(RcdType::time_delayed, 1, 0.250)->within);
}

TEST_CASE("calc reference: RCDs in series are selective only with an S-type upstream of 3 x the IΔn") {
    using mendwright::calc::rcd_selectivity;
    // General rule (read), BS 7671 536.4.1.4 (from memory): upstream S-type and IΔn >= 3 x downstream.
    auto good = rcd_selectivity(RcdType::time_delayed, 0.100, RcdType::general, 0.030);
    REQUIRE(good.ok());
    CHECK(good->selective);
    CHECK(good->reasons.size() == 2);

    auto not_delayed = rcd_selectivity(RcdType::general, 0.100, RcdType::general, 0.030);
    REQUIRE(not_delayed.ok());
    CHECK_FALSE(not_delayed->selective);
    CHECK_THAT(not_delayed->reasons[0], Catch::Contains("not time-delayed"));

    // 100 mA is 3.33 x 30 mA; 300 mA over 100 mA is exactly 3 x and passes; 80 mA over 30 mA fails.
    CHECK(rcd_selectivity(RcdType::time_delayed, 0.300, RcdType::time_delayed, 0.100)->selective);
    auto too_close = rcd_selectivity(RcdType::time_delayed, 0.080, RcdType::general, 0.030);
    REQUIRE(too_close.ok());
    CHECK_FALSE(too_close->selective);
    CHECK_THAT(too_close->reasons[1], Catch::Contains("less than 3 x downstream 30 mA (90 mA)"));
}

TEST_CASE("calc reference: additional protection needs a general RCD of at most 30 mA (415.1.1)") {
    using mendwright::calc::rcd_gives_additional_protection;
    // BS 7671 415.1.1 (read): IΔn <= 30 mA, 40 ms at 5 IΔn.
    CHECK(*rcd_gives_additional_protection(RcdType::general, 0.030));
    CHECK(*rcd_gives_additional_protection(RcdType::general, 0.010));
    CHECK_FALSE(*rcd_gives_additional_protection(RcdType::general, 0.100));
    // An S-type may take 150 ms at 5 IΔn (BS EN 61008-1, read), so it does not qualify.
    CHECK_FALSE(*rcd_gives_additional_protection(RcdType::time_delayed, 0.030));
}

TEST_CASE("calc reference: standing protective-conductor current budget is 30 % of IΔn, 9 mA on 30 mA (531.3.2)") {
    using mendwright::calc::leakage_budget;
    // BS 7671 531.3.2 (read): 30 % of IΔn, i.e. 9 mA on a 30 mA device.
    auto budget = leakage_budget(0.030, {0.0035, 0.0040});
    REQUIRE(budget.ok());
    CHECK(budget->budget_amps == Approx(0.009));
    CHECK(budget->used_amps == Approx(0.0075));
    CHECK(budget->remaining_amps == Approx(0.0015));
    CHECK(budget->within);
    auto over = leakage_budget(0.030, {0.0035, 0.0040, 0.0020});
    REQUIRE(over.ok());
    CHECK_FALSE(over->within);
    CHECK(over->remaining_amps == Approx(-0.0005));
}
