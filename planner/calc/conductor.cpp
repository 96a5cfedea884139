#include "planner/calc/conductor.hpp"

#include <cmath>

#include "planner/core/checks.hpp"

namespace mendwright::calc {

namespace {

struct CopperSize {
    double csa_mm2;
    double mohm_per_m_20c;
};

// IEC 60228 maximum resistance of plain copper conductors at 20 °C (1.0-25 mm2 read;
// 35 and 50 mm2 from memory).
const CopperSize copper_sizes[] = {
    {1.0, 18.10}, {1.5, 12.10}, {2.5, 7.41},  {4.0, 4.61},   {6.0, 3.08},
    {10.0, 1.83}, {16.0, 1.15}, {25.0, 0.727}, {35.0, 0.524}, {50.0, 0.387},
};

std::string sizes_text() {
    std::string text;
    for (const auto& size : copper_sizes) text += (text.empty() ? "" : ", ") + number_text(size.csa_mm2);
    return text;
}

}  // namespace

const std::vector<double>& copper_table_sizes_mm2() {
    static const std::vector<double> sizes = [] {
        std::vector<double> list;
        for (const auto& size : copper_sizes) list.push_back(size.csa_mm2);
        return list;
    }();
    return sizes;
}

Result<double> copper_resistance_mohm_per_m(double csa_mm2) {
    if (auto p = require_positive("csa_mm2", csa_mm2)) return *p;
    for (const auto& size : copper_sizes)
        if (std::fabs(size.csa_mm2 - csa_mm2) < 1e-9) return size.mohm_per_m_20c;
    return problem("csa_mm2", "expected one of the sizes " + sizes_text() + " mm2, got " + number_text(csa_mm2));
}

Result<double> copper_temperature_multiplier(double conductor_temperature_c) {
    if (auto p = require_finite("conductor_temperature_c", conductor_temperature_c)) return *p;
    // A plausibility bound of ours (no standard): beyond it the linear correction is not trusted.
    if (conductor_temperature_c < -50.0 || conductor_temperature_c > 250.0)
        return problem("conductor_temperature_c",
                       "expected a temperature from -50 to 250 °C, got " + number_text(conductor_temperature_c));
    // BS 7671 Appendix 3 / GN3 linear approximation for copper (memory): 1 + 0.004 (t - 20).
    return 1.0 + 0.004 * (conductor_temperature_c - 20.0);
}

Result<double> r1_plus_r2_ohms(double line_csa_mm2, double cpc_csa_mm2, double length_m,
                               double conductor_temperature_c) {
    auto line = copper_resistance_mohm_per_m(line_csa_mm2);
    if (!line) return problem("line_csa_mm2", line.problem().message);
    auto cpc = copper_resistance_mohm_per_m(cpc_csa_mm2);
    if (!cpc) return problem("cpc_csa_mm2", cpc.problem().message);
    if (auto p = require_positive("length_m", length_m)) return *p;
    auto multiplier = copper_temperature_multiplier(conductor_temperature_c);
    if (!multiplier) return multiplier.problem();
    // (R1 + R2) per metre x length, corrected from 20 °C; mOhm -> ohm.
    return (*line + *cpc) * length_m * *multiplier / 1000.0;
}

Result<double> loop_impedance_ohms(double ze_ohms, double r1_plus_r2_ohms) {
    if (auto p = require_non_negative("ze_ohms", ze_ohms)) return *p;
    if (auto p = require_non_negative("r1_plus_r2_ohms", r1_plus_r2_ohms)) return *p;
    // Zs = Ze + (R1 + R2) (BS 7671 Appendix 3 / GN3).
    return ze_ohms + r1_plus_r2_ohms;
}

}  // namespace mendwright::calc
