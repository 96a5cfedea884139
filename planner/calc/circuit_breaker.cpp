#include "planner/calc/circuit_breaker.hpp"

#include <cmath>

#include "planner/core/checks.hpp"

namespace mendwright::calc {

TripBand instantaneous_trip_band(BreakerCurve curve) {
    // IEC/BS EN 60898-1 instantaneous tripping ranges (read).
    switch (curve) {
        case BreakerCurve::b: return {3.0, 5.0};
        case BreakerCurve::c: return {5.0, 10.0};
        case BreakerCurve::d: return {10.0, 20.0};
    }
    return {0.0, 0.0};  // unreachable: every curve is handled above
}

Result<double> breaker_max_zs_ohms(BreakerCurve curve, double rating_amps, double disconnection_time_s,
                                   double u0_volts, double cmin) {
    if (auto p = require_positive("rating_amps", rating_amps)) return *p;
    if (rating_amps > breaker_largest_rating_amps)
        return problem("rating_amps", "expected a rating <= 125 A (the scope of BS EN 60898-1), got " +
                                          number_text(rating_amps));
    if (auto p = require_positive("disconnection_time_s", disconnection_time_s)) return *p;
    const bool is_0_4 = std::fabs(disconnection_time_s - 0.4) < 1e-9;
    const bool is_5 = std::fabs(disconnection_time_s - 5.0) < 1e-9;
    if (!is_0_4 && !is_5)
        return problem("disconnection_time_s",
                       "expected 0.4 or 5 (the times of Table 41.3), got " + number_text(disconnection_time_s));
    if (is_5 && curve == BreakerCurve::d)
        return problem("disconnection_time_s",
                       "curve D at 5 s is not held: Table 41.3's values there are unsettled; use the 0.4 s value");
    if (auto p = require_positive("u0_volts", u0_volts)) return *p;
    if (auto p = require_positive("cmin", cmin)) return *p;
    if (cmin > 1.0) return problem("cmin", "expected a factor > 0 and <= 1, got " + number_text(cmin));

    // BS 7671 411.4.4 / Appendix 3: Zs x Ia <= Cmin x U0, Ia = upper instantaneous multiple x In.
    const double ia_amps = instantaneous_trip_band(curve).upper_multiple * rating_amps;
    return cmin * u0_volts / ia_amps;
}

Result<double> measured_zs_limit_ohms(double max_zs_ohms) {
    if (auto p = require_positive("max_zs_ohms", max_zs_ohms)) return *p;
    // GN3 / Appendix 3 rule of thumb: 0.8 x tabulated maximum (read).
    return ambient_measurement_factor * max_zs_ohms;
}

}  // namespace mendwright::calc
