#pragma once
// The adiabatic check of a protective conductor (BS 7671:2018+A2, 543.1.3): the smallest
// cross-section that carries a fault current for the disconnection time without damage.

#include "planner/core/result.hpp"

namespace mendwright::calc {

// Copper protective conductors of the default profile.
enum class ProtectiveConductorKind {
    thermoplastic_70c_in_cable,  // a core of the cable, e.g. the cpc of twin and earth
    thermoplastic_70c_separate,  // a separate insulated conductor, not bunched with cables
};

// k for copper (values read; the tables they sit in from memory): 115 for a 70 °C
// thermoplastic conductor incorporated in a cable (BS 7671 Table 54.3), 143 for a separate
// 70 °C thermoplastic one (Table 54.2).
double copper_k(ProtectiveConductorKind kind);

// Longest duration the adiabatic equation is applied to, seconds (BS 7671 543.1.3, memory).
inline constexpr double adiabatic_longest_time_s = 5.0;

// Minimum cross-section, mm2: S = sqrt(I^2 t) / k (BS 7671 543.1.3).
// - fault_current_amps: I, the prospective earth fault current, > 0.
// - time_s: t, the operating time of the protective device, > 0 and <= 5 s.
// - k: the factor for the conductor material and insulation, > 0.
Result<double> adiabatic_min_csa_mm2(double fault_current_amps, double time_s, double k);

// The same equation solved for time: the longest fault the conductor withstands,
// t = (k S / I)^2, seconds. csa_mm2 > 0.
Result<double> adiabatic_max_time_s(double fault_current_amps, double csa_mm2, double k);

}  // namespace mendwright::calc
