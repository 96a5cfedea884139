#include "planner/calc/adiabatic.hpp"

#include <cmath>

#include "planner/core/checks.hpp"

namespace mendwright::calc {

double copper_k(ProtectiveConductorKind kind) {
    // BS 7671 Tables 54.3 / 54.2, copper, 70 °C thermoplastic (values read, tables memory).
    switch (kind) {
        case ProtectiveConductorKind::thermoplastic_70c_in_cable: return 115.0;
        case ProtectiveConductorKind::thermoplastic_70c_separate: return 143.0;
    }
    return 115.0;  // unreachable: every kind is handled above
}

Result<double> adiabatic_min_csa_mm2(double fault_current_amps, double time_s, double k) {
    if (auto p = require_positive("fault_current_amps", fault_current_amps)) return *p;
    if (auto p = require_positive("time_s", time_s)) return *p;
    if (time_s > adiabatic_longest_time_s)
        return problem("time_s", "expected a time <= 5 s (the adiabatic equation's range), got " + number_text(time_s));
    if (auto p = require_positive("k", k)) return *p;
    // BS 7671 543.1.3: S = sqrt(I^2 t) / k.
    return std::sqrt(fault_current_amps * fault_current_amps * time_s) / k;
}

Result<double> adiabatic_max_time_s(double fault_current_amps, double csa_mm2, double k) {
    if (auto p = require_positive("fault_current_amps", fault_current_amps)) return *p;
    if (auto p = require_positive("csa_mm2", csa_mm2)) return *p;
    if (auto p = require_positive("k", k)) return *p;
    // BS 7671 543.1.3 solved for t: t = (k S / I)^2.
    const double ratio = k * csa_mm2 / fault_current_amps;
    return ratio * ratio;
}

}  // namespace mendwright::calc
