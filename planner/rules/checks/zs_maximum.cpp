// Measured earth fault loop impedance Zs against the maximum for the device giving fault
// protection. TN: the circuit-breaker's maximum Cmin x U0 / Ia (BS 7671 411.4.4, Table 41.3,
// printed to 2 decimals) times the profile's factor for a Zs measured at ambient temperature
// (the 0.8 rule, Appendix 3 / GN3); where an RCD above would still disconnect (Zs x IΔn <= UL,
// 411.4.5) the profile gives a milder code. TT: the RCD's maximum UL / IΔn (Table 41.5), no 0.8
// factor since it does not rest on conductor temperature. Fuses: no maximum is held for them
// here, so they are not checked. A TT circuit with no RCD is tt.fault_protection's finding.
#include "planner/calc/rounding.hpp"
#include "planner/rules/checks/checks.hpp"
#include "planner/rules/checks/common.hpp"
#include "planner/rules/text.hpp"

namespace mendwright::rules::checks {

namespace {

constexpr const char* rule_id = "zs.maximum";

std::optional<Finding> check_tn(const AssessContext& context, const CircuitEntry& entry, double zs_ohms) {
    const auto& circuit = *entry.circuit;
    const auto& device = circuit.device;
    if (!has_breaker_curve(device)) return std::nullopt;
    const auto& limits = context.profile().fault_protection;
    const double u0_volts = context.installation().supply.u0_volts;
    // The instantaneous trip opens a B or C breaker well inside either Table 41.3 time, so the
    // 0.4 s maximum holds for both; for curve D it is also the safe side of the 5 s value.
    const auto table_max = calc::breaker_max_zs_ohms(calc_curve(*device.curve), device.rating_amps, 0.4, u0_volts, limits.cmin);
    if (!table_max) return std::nullopt;
    // Table 41.3 prints the maximum rounded half up to 2 decimals; inspectors compare with the print.
    const double max_ohms = calc::round_half_up(*table_max, 2);
    const double limit_ohms = limits.measured_zs_factor * max_ohms;
    if (zs_ohms <= limit_ohms) return std::nullopt;

    const double multiple = calc::instantaneous_trip_band(calc_curve(*device.curve)).upper_multiple;
    std::string case_name = "over_breaker_maximum";
    std::string rcd_words;
    if (const model::DeviceRef* rcd = fault_protection_rcd(entry)) {
        const double idn_amps = *rcd->device->residual_current_amps;
        const double touch_volts = zs_ohms * idn_amps;
        if (touch_volts <= limits.touch_voltage_limit_volts) {
            case_name = "over_breaker_maximum_rcd_covers";
            if (context.with_text())
                rcd_words = " " + AssessContext::device_text(*rcd->device) + " above still disconnects: Zs × IΔn " +
                            number_text(idn_amps, 3) + " A = " + number_text(touch_volts, 1) + " V ≤ " +
                            number_text(limits.touch_voltage_limit_volts) + " V (411.4.5).";
        }
    }
    Finding finding = context.new_finding(rule_id, case_name, "circuit:" + circuit.id, entry.board, &circuit, &device);
    if (!context.with_text()) return finding;
    finding.title = "Measured Zs above the maximum for the circuit-breaker";
    finding.inputs = {number_input("Zs measured", zs_ohms, "Ω"), text_input("device", device_rating_text(device)),
                      number_input("Zs maximum (Table 41.3)", max_ohms, "Ω"),
                      number_input("factor for measured Zs", limits.measured_zs_factor, "", 2),
                      number_input("Cmin", limits.cmin, "", 2), number_input("U0", u0_volts, "V")};
    finding.explanation = "Zs " + number_text(zs_ohms, 3) + " Ω > " + number_text(limits.measured_zs_factor) + " × " +
                          number_text(max_ohms) + " Ω = " + number_text(limit_ohms, 3) + " Ω (" + device_rating_text(device) +
                          ": Cmin " + number_text(limits.cmin) + " × U0 " + number_text(u0_volts) + " V / (" +
                          number_text(multiple) + " × " + number_text(device.rating_amps) + " A) = " + number_text(max_ohms) +
                          " Ω, Table 41.3)." + rcd_words;
    return finding;
}

std::optional<Finding> check_tt(const AssessContext& context, const CircuitEntry& entry, double zs_ohms) {
    const model::DeviceRef* rcd = fault_protection_rcd(entry);
    if (!rcd) return std::nullopt;
    const double limit_volts = context.profile().fault_protection.touch_voltage_limit_volts;
    const double idn_amps = *rcd->device->residual_current_amps;
    const auto max_ohms = calc::rcd_max_earth_resistance_ohms(idn_amps, limit_volts);
    if (!max_ohms || zs_ohms <= *max_ohms) return std::nullopt;
    const auto& circuit = *entry.circuit;
    Finding finding = context.new_finding(rule_id, "over_rcd_maximum", "circuit:" + circuit.id, entry.board, &circuit, rcd->device);
    if (!context.with_text()) return finding;
    finding.title = "Measured Zs above the maximum for the RCD";
    finding.inputs = {number_input("Zs measured", zs_ohms, "Ω"), number_input("IΔn", idn_amps, "A", 3),
                      number_input("Zs maximum (Table 41.5)", *max_ohms, "Ω", 1)};
    finding.explanation = "Zs " + number_text(zs_ohms, 3) + " Ω > " + number_text(limit_volts) + " V / IΔn " +
                          number_text(idn_amps, 3) + " A = " + number_text(*max_ohms, 1) + " Ω (Table 41.5, " +
                          AssessContext::device_text(*rcd->device) + ").";
    return finding;
}

}  // namespace

std::vector<Finding> zs_maximum(const AssessContext& context) {
    std::vector<Finding> findings;
    for (const auto& entry : context.circuits()) {
        if (!entry.circuit->measured_zs_ohms) continue;
        const double zs_ohms = *entry.circuit->measured_zs_ohms;
        auto finding = context.is_tt() ? check_tt(context, entry, zs_ohms) : check_tn(context, entry, zs_ohms);
        if (finding) findings.push_back(std::move(*finding));
    }
    return findings;
}

}  // namespace mendwright::rules::checks
