// Fault protection in a TT system (BS 7671:2018+A2 411.5): every circuit needs either an RCD
// above it with RA x IΔn <= UL (411.5.3), or an overcurrent device that disconnects within the
// Table 41.1 time at the fault current the earth path allows. With RA in the loop that current
// is a few amperes, so a circuit-breaker alone almost never does; the rule computes it.
#include "planner/rules/checks/checks.hpp"
#include "planner/rules/checks/common.hpp"
#include "planner/rules/text.hpp"

namespace mendwright::rules::checks {

namespace {

constexpr const char* rule_id = "tt.fault_protection";

// The loop an earth fault current flows round in TT, as far as it was measured: the measured Zs
// (which includes RA), or RA + R1+R2, or RA alone (fault current then overstated, which only
// matters when it passes: say so).
struct FaultLoop {
    double impedance_ohms = 0.0;
    std::string expression;  // "RA 45 Ω + R1+R2 0.62 Ω"
    bool partial = false;    // RA only: the circuit's own R1+R2 not known
};

std::optional<FaultLoop> fault_loop(const model::Circuit& circuit, std::optional<double> ra_ohms) {
    if (circuit.measured_zs_ohms) return FaultLoop{*circuit.measured_zs_ohms, "Zs " + number_text(*circuit.measured_zs_ohms) + " Ω", false};
    if (ra_ohms && circuit.r1_plus_r2_ohms)
        return FaultLoop{*ra_ohms + *circuit.r1_plus_r2_ohms,
                         "RA " + number_text(*ra_ohms) + " Ω + R1+R2 " + number_text(*circuit.r1_plus_r2_ohms) + " Ω", false};
    if (ra_ohms) return FaultLoop{*ra_ohms, "RA " + number_text(*ra_ohms) + " Ω", true};
    return std::nullopt;
}

std::optional<Finding> without_rcd(const AssessContext& context, const CircuitEntry& entry, std::optional<double> ra_ohms) {
    const auto& circuit = *entry.circuit;
    const auto& device = circuit.device;
    const double u0_volts = context.installation().supply.u0_volts;

    // Whether there is a finding at all: there is, unless the breaker's instantaneous trip is
    // shown to open at the fault current the whole measured loop allows (see below).
    const bool loop_known = circuit.measured_zs_ohms || ra_ohms;
    const bool loop_partial = !circuit.measured_zs_ohms && !(ra_ohms && circuit.r1_plus_r2_ohms);
    if (loop_known && !loop_partial && has_breaker_curve(device)) {
        // The same loop as fault_loop, without its words; Ohm's law: If = U0 / Zloop.
        const double loop_ohms = circuit.measured_zs_ohms ? *circuit.measured_zs_ohms : *ra_ohms + *circuit.r1_plus_r2_ohms;
        const double fault_current_amps = u0_volts / loop_ohms;
        const double ia_amps = calc::instantaneous_trip_band(calc_curve(*device.curve)).upper_multiple * device.rating_amps;
        if (fault_current_amps >= ia_amps) return std::nullopt;
    }
    Finding finding = context.new_finding(rule_id, "no_rcd", "circuit:" + circuit.id, entry.board, &circuit, &device);
    if (!context.with_text()) return finding;

    const std::optional<double> time_s = context.required_disconnection_time_s(entry);
    const auto loop = fault_loop(circuit, ra_ohms);
    finding.title = "No RCD: fault protection in a TT system not achieved";
    finding.inputs.push_back(text_input("device", device_rating_text(device)));
    finding.inputs.push_back(number_input("U0", u0_volts, "V"));
    if (time_s) finding.inputs.push_back(number_input("disconnection time required", *time_s, "s"));
    if (ra_ohms) finding.inputs.push_back(number_input("RA", *ra_ohms, "Ω"));
    if (circuit.measured_zs_ohms) finding.inputs.push_back(number_input("Zs measured", *circuit.measured_zs_ohms, "Ω"));
    if (circuit.r1_plus_r2_ohms) finding.inputs.push_back(number_input("R1+R2", *circuit.r1_plus_r2_ohms, "Ω"));

    const std::string lead = "No RCD above this circuit in a TT system. ";
    const std::string within = time_s ? " within " + number_text(*time_s) + " s (Table 41.1, TT)"
                                      : " within the Table 41.1 time for U0 " + number_text(u0_volts) +
                                            " V (not held: only 120 V < U0 <= 230 V is)";
    const std::string device_words = device_rating_text(device);
    if (!loop) {
        finding.explanation = lead + "Neither Zs nor RA is recorded, so the fault current cannot be computed; the " +
                              device_words + " must open" + within +
                              ", which with the earth electrode in the loop an overcurrent device almost never does.";
        return finding;
    }
    // Ohm's law round the fault loop: If = U0 / Zloop.
    const double fault_current_amps = u0_volts / loop->impedance_ohms;
    finding.inputs.push_back(number_input("fault current", fault_current_amps, "A"));
    const std::string current_text = "If = U0 " + number_text(u0_volts) + " V / (" + loop->expression + ") = " +
                                     number_text(fault_current_amps) + " A";
    if (!has_breaker_curve(device)) {
        finding.explanation = lead + current_text + "; the " + device_words + " must open" + within +
                              ", and the current that opens it in that time is not held in the profile: it cannot be "
                              "shown to disconnect at a few amperes.";
        return finding;
    }
    // BS EN 60898-1: Ia = upper instantaneous multiple x In opens the breaker within 0.1 s,
    // inside any Table 41.1 time (411.4.4 / Appendix 3).
    const double multiple = calc::instantaneous_trip_band(calc_curve(*device.curve)).upper_multiple;
    const double ia_amps = multiple * device.rating_amps;
    finding.inputs.push_back(number_input("Ia", ia_amps, "A"));
    const std::string ia_text = "Ia " + number_text(ia_amps) + " A (" + number_text(multiple) + " × " +
                                number_text(device.rating_amps) + " A)";
    if (fault_current_amps >= ia_amps) {
        // RA alone already lets enough current flow: the circuit's own R1+R2 can only lower it,
        // so this cannot be called a pass; ask for the measurement.
        finding.explanation = lead + current_text + " ≥ " + ia_text + " counting RA only; R1+R2 and Zs are not "
                              "recorded, so disconnection of the " + device_words + within + " is not confirmed.";
        return finding;
    }
    finding.explanation = lead + current_text + " < " + ia_text + ", the current that opens the " + device_words + within + ".";
    return finding;
}

}  // namespace

std::vector<Finding> tt_fault_protection(const AssessContext& context) {
    std::vector<Finding> findings;
    if (!context.is_tt()) return findings;
    // At most one finding per circuit and one for the installation: room for all at once, so the
    // findings are not moved again as the list grows (only the part used is ever touched).
    findings.reserve(context.circuits().size() + 1);
    const auto ra_ohms = context.earth_resistance_ohms();
    const double limit_volts = context.profile().fault_protection.touch_voltage_limit_volts;
    bool needs_ra = false;

    for (const auto& entry : context.circuits()) {
        const model::DeviceRef* rcd = fault_protection_rcd(entry);
        if (!rcd) {
            if (auto finding = without_rcd(context, entry, ra_ohms)) findings.push_back(std::move(*finding));
            continue;
        }
        if (!ra_ohms) {
            needs_ra = true;
            continue;
        }
        const double idn_amps = *rcd->device->residual_current_amps;
        // BS 7671 411.5.3: RA x IΔn <= UL.
        const double touch_volts = *ra_ohms * idn_amps;
        if (touch_volts <= limit_volts) continue;
        const auto& circuit = *entry.circuit;
        Finding finding = context.new_finding(rule_id, "ra_over_limit", "circuit:" + circuit.id, entry.board, &circuit,
                                              rcd->device);
        if (!context.with_text()) {
            findings.push_back(std::move(finding));
            continue;
        }
        finding.title = "Earth electrode resistance too high for the RCD: touch voltage over the limit";
        finding.inputs = {number_input("RA", *ra_ohms, "Ω"), number_input("IΔn", idn_amps, "A", 3),
                          number_input("touch-voltage limit", limit_volts, "V")};
        finding.explanation = "RA " + number_text(*ra_ohms) + " Ω × IΔn " + number_text(idn_amps, 3) + " A = " +
                              number_text(touch_volts, 1) + " V > " + number_text(limit_volts) + " V (" +
                              AssessContext::device_text(*rcd->device) + " gives fault protection to this circuit).";
        findings.push_back(std::move(finding));
    }

    if (needs_ra) {
        Finding finding = context.new_finding(rule_id, "not_recorded", "installation", nullptr, nullptr, nullptr);
        if (context.with_text()) {
            finding.title = "Earth electrode resistance RA not recorded: fault protection not confirmed";
            finding.explanation = "The RCDs need RA × IΔn ≤ " + number_text(limit_volts) +
                                  " V, and no RA measurement is recorded for this TT installation.";
        }
        findings.push_back(std::move(finding));
    }
    return findings;
}

}  // namespace mendwright::rules::checks
