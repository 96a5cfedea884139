// Reference values for circuit-breaker maximum Zs: BS 7671:2018+A2 Table 41.3 and the
// instantaneous tripping bands of IEC/BS EN 60898-1.
#include <catch2/catch.hpp>

#include <cmath>

#include "planner/calc/circuit_breaker.hpp"
#include "planner/calc/rounding.hpp"

using mendwright::calc::BreakerCurve;
using mendwright::calc::breaker_max_zs_ohms;
using mendwright::calc::round_half_up;

namespace {

struct TableRow {
    BreakerCurve curve;
    const char* name;
    double printed_ohms[9];
};

const double ratings_amps[9] = {6, 10, 16, 20, 25, 32, 40, 50, 63};

// BS 7671:2018+A2 Table 41.3, 0.4 s, U0 230 V, Cmin 0.95 (read, as quoted in DOMAIN.md).
const TableRow table_41_3[] = {
    {BreakerCurve::b, "B", {7.28, 4.37, 2.73, 2.19, 1.75, 1.37, 1.09, 0.87, 0.69}},
    {BreakerCurve::c, "C", {3.64, 2.19, 1.37, 1.09, 0.87, 0.68, 0.55, 0.44, 0.35}},
    {BreakerCurve::d, "D", {1.82, 1.09, 0.68, 0.55, 0.44, 0.34, 0.27, 0.22, 0.17}},
};

}  // namespace

TEST_CASE("calc reference: every 0.4 s value of BS 7671 Table 41.3 is reproduced at its printed precision") {
    for (const auto& row : table_41_3) {
        for (int i = 0; i < 9; ++i) {
            INFO("curve " << row.name << ", In " << ratings_amps[i] << " A");
            auto zs = breaker_max_zs_ohms(row.curve, ratings_amps[i]);
            REQUIRE(zs.ok());
            // BS 7671 Table 41.3 (read): the printed value, 2 decimals, rounded half up.
            CHECK(round_half_up(*zs, 2) == Approx(row.printed_ohms[i]).margin(1e-9));
            // The unrounded formula lies within half a unit of the last printed place.
            CHECK(std::fabs(*zs - row.printed_ohms[i]) <= 0.005 + 1e-12);
        }
    }
}

TEST_CASE("calc reference: Table 41.3 rounds halves upward (B20 = 2.185 printed 2.19, D50 = 0.2185 printed 0.22)") {
    // BS 7671 Table 41.3 (read): 0.95 x 230 / 100 A = 2.185 exactly, printed 2.19.
    auto b20 = breaker_max_zs_ohms(BreakerCurve::b, 20);
    REQUIRE(b20.ok());
    CHECK(*b20 == Approx(2.185).epsilon(1e-12));
    CHECK(round_half_up(*b20, 2) == Approx(2.19).margin(1e-9));
    // D50: 0.95 x 230 / 1000 A = 0.2185, printed 0.22.
    auto d50 = breaker_max_zs_ohms(BreakerCurve::d, 50);
    REQUIRE(d50.ok());
    CHECK(round_half_up(*d50, 2) == Approx(0.22).margin(1e-9));
}

TEST_CASE("calc reference: B and C curves give the same maximum Zs at 5 s as at 0.4 s (Table 41.3)") {
    // BS 7671 Table 41.3 (read via DOMAIN.md): B and C have the same values at 5 s.
    for (double rating : ratings_amps) {
        for (auto curve : {BreakerCurve::b, BreakerCurve::c}) {
            auto fast = breaker_max_zs_ohms(curve, rating, 0.4);
            auto slow = breaker_max_zs_ohms(curve, rating, 5.0);
            REQUIRE(fast.ok());
            REQUIRE(slow.ok());
            CHECK(*slow == Approx(*fast).epsilon(1e-12));
        }
    }
}

TEST_CASE("calc reference: without Cmin the formula gives the 2008 edition's B32 value of 1.44 ohm") {
    // BS 7671:2008 Table 41.3 used U0 / Ia without Cmin: B32 = 1.44 ohm (read, DOMAIN.md).
    auto b32 = breaker_max_zs_ohms(BreakerCurve::b, 32, 0.4, 230.0, 1.0);
    REQUIRE(b32.ok());
    CHECK(round_half_up(*b32, 2) == Approx(1.44).margin(1e-9));
}

TEST_CASE("calc reference: instantaneous tripping bands of IEC 60898-1 (B 3-5, C 5-10, D 10-20 In)") {
    using mendwright::calc::instantaneous_trip_band;
    // IEC/BS EN 60898-1 standard ranges of instantaneous tripping (read).
    CHECK(instantaneous_trip_band(BreakerCurve::b).lower_multiple == 3.0);
    CHECK(instantaneous_trip_band(BreakerCurve::b).upper_multiple == 5.0);
    CHECK(instantaneous_trip_band(BreakerCurve::c).lower_multiple == 5.0);
    CHECK(instantaneous_trip_band(BreakerCurve::c).upper_multiple == 10.0);
    CHECK(instantaneous_trip_band(BreakerCurve::d).lower_multiple == 10.0);
    CHECK(instantaneous_trip_band(BreakerCurve::d).upper_multiple == 20.0);
}

TEST_CASE("calc reference: a measured Zs is compared with 0.8 x the tabulated maximum") {
    // GN3 / BS 7671 Appendix 3 rule of thumb (read): 0.8 x 1.37 ohm (B32) = 1.096 ohm.
    auto limit = mendwright::calc::measured_zs_limit_ohms(1.37);
    REQUIRE(limit.ok());
    CHECK(*limit == Approx(1.096).epsilon(1e-12));
}
