#pragma once
// Copper conductor resistance: IEC 60228 maxima at 20 °C, correction to another conductor
// temperature, R1+R2 of a circuit and Zs = Ze + (R1+R2).

#include <vector>

#include "planner/core/result.hpp"

namespace mendwright::calc {

// Resistance of a plain annealed copper conductor at 20 °C, milliohms per metre, for the
// sizes 1.0-25 mm2 (IEC 60228 maxima, read) and 35, 50 mm2 (IEC 60228, memory). Problem on
// "csa_mm2" for any other size.
Result<double> copper_resistance_mohm_per_m(double csa_mm2);

// The cross-sections the table above holds, mm2, smallest first.
const std::vector<double>& copper_table_sizes_mm2();

// Multiplier from 20 °C to a conductor temperature: 1 + 0.004 (t - 20), the linear
// approximation BS 7671 Appendix 3 / GN3 use for copper (memory; IEC 60228 gives 0.00393/K).
// 70 °C gives 1.20, 90 °C 1.28.
// - conductor_temperature_c: -50 to 250 °C (outside that the linear correction is not used).
Result<double> copper_temperature_multiplier(double conductor_temperature_c);

// BS 7671 Appendix 3 (memory): multiplier to the 70 °C operating temperature of thermoplastic cable.
inline constexpr double operating_70c_multiplier = 1.20;

// R1+R2 of a copper circuit, ohms: (r_line + r_cpc) x length x multiplier(t).
// - line_csa_mm2, cpc_csa_mm2: sizes from the table above.
// - length_m: route length of the circuit, > 0.
// - conductor_temperature_c: 20 °C by default (the table's temperature).
Result<double> r1_plus_r2_ohms(double line_csa_mm2, double cpc_csa_mm2, double length_m,
                               double conductor_temperature_c = 20.0);

// Earth fault loop impedance at the end of a circuit: Zs = Ze + (R1+R2) (BS 7671 Appendix 3 /
// GN3; arithmetic sum, which errs on the safe side). Both >= 0.
Result<double> loop_impedance_ohms(double ze_ohms, double r1_plus_r2_ohms);

}  // namespace mendwright::calc
