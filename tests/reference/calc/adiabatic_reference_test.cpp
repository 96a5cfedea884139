// Reference values for the adiabatic check, BS 7671:2018+A2 543.1.3, and copper k values.
#include <catch2/catch.hpp>

#include "planner/calc/adiabatic.hpp"

using mendwright::calc::ProtectiveConductorKind;

TEST_CASE("calc reference: 1000 A for 0.1 s with k 115 needs 2.75 mm2 (543.1.3)") {
    // BS 7671 543.1.3 (read): S = sqrt(1000^2 x 0.1) / 115 = 316.23 / 115 = 2.75 mm2 (DOMAIN.md check).
    auto s = mendwright::calc::adiabatic_min_csa_mm2(1000.0, 0.1, 115.0);
    REQUIRE(s.ok());
    CHECK(*s == Approx(2.75).margin(0.005));
}

TEST_CASE("calc reference: copper k is 115 inside a cable and 143 for a separate 70 C thermoplastic conductor") {
    using mendwright::calc::copper_k;
    // BS 7671 Tables 54.3 / 54.2 (values read; which table holds which, from memory).
    CHECK(copper_k(ProtectiveConductorKind::thermoplastic_70c_in_cable) == 115.0);
    CHECK(copper_k(ProtectiveConductorKind::thermoplastic_70c_separate) == 143.0);
}

TEST_CASE("calc reference: the adiabatic equation solved for time returns the time it started from") {
    // BS 7671 543.1.3 rearranged: t = (k S / I)^2; 1.5 mm2, k 115, 500 A: t = 0.1190 s.
    auto t = mendwright::calc::adiabatic_max_time_s(500.0, 1.5, 115.0);
    REQUIRE(t.ok());
    CHECK(*t == Approx(0.119025).epsilon(1e-9));
    auto s = mendwright::calc::adiabatic_min_csa_mm2(500.0, *t, 115.0);
    REQUIRE(s.ok());
    CHECK(*s == Approx(1.5).epsilon(1e-12));
}
