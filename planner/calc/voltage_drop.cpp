#include "planner/calc/voltage_drop.hpp"

#include <cmath>

#include "planner/core/checks.hpp"

namespace mendwright::calc {

Result<double> twin_and_earth_mv_per_amp_metre(double csa_mm2) {
    if (auto p = require_positive("csa_mm2", csa_mm2)) return *p;
    struct Row {
        double csa_mm2;
        double mv_per_amp_metre;
    };
    // BS 7671 Table 4D5, flat twin and earth 70 °C (1.0, 1.5 read; the rest from memory).
    const Row rows[] = {{1.0, 44.0}, {1.5, 29.0}, {2.5, 18.0}, {4.0, 11.0}, {6.0, 7.3}, {10.0, 4.4}, {16.0, 2.8}};
    for (const auto& row : rows)
        if (std::fabs(row.csa_mm2 - csa_mm2) < 1e-9) return row.mv_per_amp_metre;
    return problem("csa_mm2", "expected one of the sizes 1, 1.5, 2.5, 4, 6, 10, 16 mm2, got " + number_text(csa_mm2));
}

Result<double> voltage_drop_volts(double mv_per_amp_metre, double current_amps, double length_m) {
    if (auto p = require_positive("mv_per_amp_metre", mv_per_amp_metre)) return *p;
    if (auto p = require_non_negative("current_amps", current_amps)) return *p;
    if (auto p = require_positive("length_m", length_m)) return *p;
    // BS 7671 Appendix 4: drop = (mV/A/m) x Ib x L / 1000.
    return mv_per_amp_metre * current_amps * length_m / 1000.0;
}

Result<double> voltage_drop_percent(double drop_volts, double nominal_volts) {
    if (auto p = require_non_negative("drop_volts", drop_volts)) return *p;
    if (auto p = require_positive("nominal_volts", nominal_volts)) return *p;
    return 100.0 * drop_volts / nominal_volts;
}

}  // namespace mendwright::calc
