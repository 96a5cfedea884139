#include "planner/calc/rcd.hpp"

#include <cmath>

#include "planner/core/checks.hpp"

namespace mendwright::calc {

namespace {

std::string milliamps_text(double amps) { return number_text(amps * 1000.0) + " mA"; }

std::string seconds_text(double seconds) { return number_text(seconds * 1000.0) + " ms"; }

}  // namespace

Result<double> rcd_max_earth_resistance_ohms(double rated_residual_amps, double touch_limit_volts) {
    if (auto p = require_positive("rated_residual_amps", rated_residual_amps)) return *p;
    if (auto p = require_positive("touch_limit_volts", touch_limit_volts)) return *p;
    // BS 7671 411.5.3: RA x IΔn <= UL (50 V).
    return touch_limit_volts / rated_residual_amps;
}

Result<RcdTimeLimits> rcd_time_limits(RcdType type, double residual_multiple) {
    if (auto p = require_positive("residual_multiple", residual_multiple)) return *p;
    int column = -1;
    const double multiples[] = {1.0, 2.0, 5.0};
    for (int i = 0; i < 3; ++i)
        if (std::fabs(residual_multiple - multiples[i]) < 1e-9) column = i;
    if (column < 0)
        return problem("residual_multiple",
                       "expected 1, 2 or 5 (the test currents BS EN 61008-1 tabulates), got " +
                           number_text(residual_multiple));
    // BS EN 61008-1 / 61009-1 break-time table (read, except S-type at 2 IΔn: memory).
    const double general_max_s[] = {0.300, 0.150, 0.040};
    const double delayed_max_s[] = {0.500, 0.200, 0.150};
    const double delayed_min_s[] = {0.130, 0.060, 0.050};
    if (type == RcdType::general) return RcdTimeLimits{general_max_s[column], std::nullopt};
    return RcdTimeLimits{delayed_max_s[column], delayed_min_s[column]};
}

Result<RcdTripCheck> check_rcd_trip_time(RcdType type, double residual_multiple, double measured_time_s) {
    auto limits = rcd_time_limits(type, residual_multiple);
    if (!limits) return limits.problem();
    if (auto p = require_non_negative("measured_time_s", measured_time_s)) return *p;
    const std::string at = " at " + number_text(residual_multiple) + " x IΔn";
    if (measured_time_s > limits->max_break_s + 1e-12)
        return RcdTripCheck{false, *limits,
                            "tripped in " + seconds_text(measured_time_s) + at + ", later than the " +
                                seconds_text(limits->max_break_s) + " allowed (BS EN 61008-1 / 61009-1)"};
    if (limits->min_non_actuating_s && measured_time_s < *limits->min_non_actuating_s - 1e-12)
        return RcdTripCheck{false, *limits,
                            "tripped in " + seconds_text(measured_time_s) + at + ", sooner than the " +
                                seconds_text(*limits->min_non_actuating_s) +
                                " a time-delayed device must hold (BS EN 61008-1 / 61009-1)"};
    return RcdTripCheck{true, *limits,
                        "tripped in " + seconds_text(measured_time_s) + at + ", within the " +
                            seconds_text(limits->max_break_s) + " allowed (BS EN 61008-1 / 61009-1)"};
}

Result<RcdSelectivity> rcd_selectivity(RcdType upstream_type, double upstream_idn_amps, RcdType downstream_type,
                                       double downstream_idn_amps) {
    if (auto p = require_positive("upstream_idn_amps", upstream_idn_amps)) return *p;
    if (auto p = require_positive("downstream_idn_amps", downstream_idn_amps)) return *p;
    (void)downstream_type;  // the rule asks nothing of the downstream device's type
    RcdSelectivity result{true, {}};
    // General rule (read), BS 7671 536.4.1.4 (memory): upstream S-type ...
    if (upstream_type == RcdType::time_delayed) {
        result.reasons.push_back("upstream device is time-delayed (S-type)");
    } else {
        result.selective = false;
        result.reasons.push_back("upstream device is not time-delayed (S-type): both may trip on one fault");
    }
    // ... and IΔn upstream >= 3 x IΔn downstream.
    const double needed_amps = selectivity_ratio * downstream_idn_amps;
    if (upstream_idn_amps >= needed_amps * (1.0 - 1e-9)) {
        result.reasons.push_back("upstream IΔn " + milliamps_text(upstream_idn_amps) + " is at least 3 x downstream " +
                                 milliamps_text(downstream_idn_amps));
    } else {
        result.selective = false;
        result.reasons.push_back("upstream IΔn " + milliamps_text(upstream_idn_amps) + " is less than 3 x downstream " +
                                 milliamps_text(downstream_idn_amps) + " (" + milliamps_text(needed_amps) + ")");
    }
    return result;
}

Result<bool> rcd_gives_additional_protection(RcdType type, double rated_residual_amps) {
    if (auto p = require_positive("rated_residual_amps", rated_residual_amps)) return *p;
    // BS 7671 415.1.1: IΔn <= 30 mA, and 40 ms at 5 IΔn (general devices only, per the table above).
    return type == RcdType::general && rated_residual_amps <= 0.030 + 1e-12;
}

}  // namespace mendwright::calc
