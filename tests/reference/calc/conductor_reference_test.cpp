// Reference values for copper conductors: IEC 60228 resistances, twin and earth R1+R2, the
// temperature multipliers of BS 7671 Appendix 3 / GN3, and Zs = Ze + (R1+R2).
#include <catch2/catch.hpp>

#include "planner/calc/conductor.hpp"

using mendwright::calc::copper_resistance_mohm_per_m;
using mendwright::calc::r1_plus_r2_ohms;

TEST_CASE("calc reference: IEC 60228 copper resistance at 20 C, 1.0 to 50 mm2") {
    struct Row {
        double csa_mm2;
        double mohm_per_m;
    };
    // IEC 60228 maxima, plain copper, 20 C: 1.0-25 mm2 read; 35 and 50 mm2 from memory.
    const Row rows[] = {{1.0, 18.10}, {1.5, 12.10}, {2.5, 7.41},  {4, 4.61},    {6, 3.08},
                        {10, 1.83},   {16, 1.15},   {25, 0.727}, {35, 0.524}, {50, 0.387}};
    for (const auto& row : rows) {
        INFO(row.csa_mm2 << " mm2");
        auto r = copper_resistance_mohm_per_m(row.csa_mm2);
        REQUIRE(r.ok());
        CHECK(*r == row.mohm_per_m);
    }
}

TEST_CASE("calc reference: twin and earth R1+R2 per metre, 2.5/1.5 19.51 and 1.5/1.0 30.20 mohm/m") {
    // Published R1+R2 per metre for twin and earth at 20 C (read): 19.51 and 30.20 mohm/m.
    CHECK(*r1_plus_r2_ohms(2.5, 1.5, 1000.0) == Approx(19.51).epsilon(1e-12));
    CHECK(*r1_plus_r2_ohms(1.5, 1.0, 1000.0) == Approx(30.20).epsilon(1e-12));
    // 20 m of 2.5/1.5: 0.3902 ohm.
    CHECK(*r1_plus_r2_ohms(2.5, 1.5, 20.0) == Approx(0.3902).epsilon(1e-12));
}

TEST_CASE("calc reference: copper multipliers from 20 C are 1.20 at 70 C and 1.28 at 90 C") {
    using mendwright::calc::copper_temperature_multiplier;
    // BS 7671 Appendix 3 / GN3 multipliers (from memory), consistent with 1 + 0.004 x (t - 20).
    CHECK(*copper_temperature_multiplier(70.0) == Approx(1.20).epsilon(1e-12));
    CHECK(*copper_temperature_multiplier(90.0) == Approx(1.28).epsilon(1e-12));
    CHECK(*copper_temperature_multiplier(20.0) == Approx(1.0).epsilon(1e-12));
    // 2.5/1.5 over 20 m at 70 C: 0.3902 x 1.20 = 0.46824 ohm.
    CHECK(*r1_plus_r2_ohms(2.5, 1.5, 20.0, 70.0) == Approx(0.46824).epsilon(1e-9));
}

TEST_CASE("calc reference: Zs is Ze plus R1+R2") {
    // BS 7671 Appendix 3 / GN3 (read): Zs = Ze + (R1 + R2); Ze 0.35 + 0.47 = 0.82 ohm.
    CHECK(*mendwright::calc::loop_impedance_ohms(0.35, 0.47) == Approx(0.82));
}
