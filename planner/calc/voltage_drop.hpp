#pragma once
// Voltage drop along a circuit from the tabulated millivolts per ampere per metre
// (BS 7671:2018+A2 Appendix 4), against the limits for an installation fed from a public supply.

#include "planner/core/result.hpp"

namespace mendwright::calc {

// Flat twin and earth (70 °C thermoplastic), mV/A/m, BS 7671 Table 4D5: 1.0 44, 1.5 29 (read);
// 2.5 18, 4 11, 6 7.3, 10 4.4, 16 2.8 (memory). Problem on "csa_mm2" for any other size.
Result<double> twin_and_earth_mv_per_amp_metre(double csa_mm2);

// Drop in volts: mV/A/m x I x L / 1000 (BS 7671 Appendix 4).
// - mv_per_amp_metre: > 0; current_amps: design current Ib, >= 0; length_m: > 0.
Result<double> voltage_drop_volts(double mv_per_amp_metre, double current_amps, double length_m);

// BS 7671 Appendix 4, Table 4Ab (read): public supply, lighting 3 %, other uses 5 % of nominal.
inline constexpr double lighting_drop_limit_percent = 3.0;
inline constexpr double other_drop_limit_percent = 5.0;

// The drop as a percentage of the nominal voltage (> 0).
Result<double> voltage_drop_percent(double drop_volts, double nominal_volts);

}  // namespace mendwright::calc
