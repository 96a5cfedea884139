// Worst-season RA: the measured RA times the profile's seasonal factor for the month it was
// measured in (an assumption the user can change; no standard gives the factor), against the
// touch-voltage limit of each RCD giving fault protection (BS 7671 411.5.3, RA x IΔn <= UL).
// Reported only where the measured RA passes, so that an electrode meeting the limit in a wet
// month only is shown; a measured failure is already tt.fault_protection's finding.
#include <algorithm>

#include "planner/calc/electrode.hpp"
#include "planner/rules/checks/checks.hpp"
#include "planner/rules/checks/common.hpp"
#include "planner/rules/text.hpp"

namespace mendwright::rules::checks {

std::vector<Finding> electrode_worst_season(const AssessContext& context) {
    std::vector<Finding> findings;
    const auto ra_ohms = context.earth_resistance_ohms();
    if (!context.is_tt() || !ra_ohms) return findings;
    const auto& profile = context.profile();
    const auto& factors = profile.electrode.seasonal_factor_by_month;
    const auto measured_on = context.earth_resistance_measured_on();

    double factor = *std::max_element(factors.begin(), factors.end());
    std::string when = "month of measurement not recorded, so the largest factor is taken";
    if (measured_on && measured_on->month >= 1 && measured_on->month <= 12) {
        factor = factors[measured_on->month - 1];
        when = "measured in " + month_name(measured_on->month);
    }
    const auto worst = calc::worst_season_resistance_ohms(*ra_ohms, factor);
    if (!worst) return findings;  // the profile's factors are >= 1 once parsed; nothing to say otherwise
    const double worst_ohms = *worst;
    const double limit_volts = profile.fault_protection.touch_voltage_limit_volts;

    std::vector<const model::Device*> seen;
    for (const auto& entry : context.circuits()) {
        const model::DeviceRef* rcd = fault_protection_rcd(entry);
        if (!rcd || std::find(seen.begin(), seen.end(), rcd->device) != seen.end()) continue;
        seen.push_back(rcd->device);
        const double idn_amps = *rcd->device->residual_current_amps;
        // BS 7671 411.5.3 at the measured and at the worst-season RA.
        const double measured_volts = *ra_ohms * idn_amps;
        const double worst_volts = worst_ohms * idn_amps;
        if (measured_volts > limit_volts || worst_volts <= limit_volts) continue;

        Finding finding = context.new_finding("electrode.worst_season", "fails_when_dry", "device:" + rcd->device->id,
                                              rcd->board, rcd->circuit, rcd->device);
        if (context.with_text()) {
            finding.title = "Earth electrode meets the touch-voltage limit only in a wet season";
            finding.inputs = {number_input("RA measured", *ra_ohms, "Ω"), number_input("seasonal factor (assumption)", factor, "", 2),
                              number_input("RA worst season", worst_ohms, "Ω"), number_input("IΔn", idn_amps, "A", 3),
                              number_input("touch-voltage limit", limit_volts, "V")};
            finding.explanation = "RA " + number_text(*ra_ohms) + " Ω (" + when + ") × seasonal factor " + number_text(factor) +
                                  " = " + number_text(worst_ohms, 1) + " Ω; × IΔn " + number_text(idn_amps, 3) + " A = " +
                                  number_text(worst_volts, 1) + " V > " + number_text(limit_volts) + " V (measured: " +
                                  number_text(measured_volts, 1) + " V ≤ " + number_text(limit_volts) + " V). " +
                                  profile.electrode.seasonal_factor_basis;
        }
        findings.push_back(std::move(finding));
    }
    return findings;
}

}  // namespace mendwright::rules::checks
