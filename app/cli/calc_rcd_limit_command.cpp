// `mendwright-cli calc rcd-limit`: the largest earth path resistance RA an RCD protects within
// the touch-voltage limit (planner/calc/rcd.hpp).
#include <cmath>

#include <nlohmann/json.hpp>

#include "app/cli/calc_output.hpp"
#include "app/cli/command.hpp"
#include "planner/calc/rcd.hpp"

namespace mendwright::cli {
namespace {

const ParameterFlags rcd_flags = {
    {"rated_residual_amps", "idn"},
    {"touch_limit_volts", "touch-limit"},
};

// A guard against milliamperes typed where amperes are asked (30 for 30 mA): ours, not a
// standard's; RCDs for final circuits are rated well below it.
constexpr double largest_idn_amps = 10.0;

int run_rcd_limit(const ParsedArgs& args, CommandContext& context) {
    const std::string path = "calc rcd-limit";
    auto fail = [&](const Problem& p) { return usage_error(context, path, as_flag_problem(p, rcd_flags)); };

    auto idn = args.number("idn", true);
    if (!idn) return fail(idn.problem());
    if (*idn > largest_idn_amps)
        return fail(problem("--idn", "expected IΔn in amperes (0.03 for 30 mA), at most 10, got \"" +
                                         *args.text("idn") + "\""));
    auto touch_limit = args.number_or("touch-limit", calc::default_touch_limit_volts, true);
    if (!touch_limit) return fail(touch_limit.problem());

    auto max_ra = calc::rcd_max_earth_resistance_ohms(*idn, *touch_limit);
    if (!max_ra) return fail(max_ra.problem());

    const std::string source = "BS 7671 411.5.3: RA x IΔn <= " + shown(*touch_limit) + " V (Table 41.5)";
    nlohmann::json notes = nlohmann::json::array();
    if (*max_ra > calc::ra_stability_limit_ohms)
        notes.push_back("an RA above 200 ohm may not be stable (BS 7671 Table 41.5 note); aim lower, as soil "
                        "resistance rises when it dries");
    nlohmann::json result = {
        {"value", *max_ra},
        {"unit", "ohm"},
        {"source", source},
        {"table_precision_ohms", std::round(*max_ra)},
        {"idn_amps", *idn},
        {"touch_limit_volts", *touch_limit},
        {"notes", notes},
    };
    std::string line = shown(*max_ra) + " ohm - maximum RA for an RCD of IΔn " + shown(*idn * 1000.0) + " mA (" +
                       source + ")";
    for (const auto& note : notes) line += "; " + note.get<std::string>();
    return print_calc_result(context, args, result, line, true);
}

[[maybe_unused]] const bool registered = register_command({
    "calc rcd-limit",
    "",
    "Maximum earth path resistance RA for an RCD at the touch-voltage limit (BS 7671 411.5.3)",
    {
        {"idn", "A", "rated residual operating current IΔn, amperes (0.03 for 30 mA)"},
        {"touch-limit", "V", "touch-voltage limit UL (default 50)"},
        json_flag(),
    },
    0,
    0,
    run_rcd_limit,
});

}  // namespace
}  // namespace mendwright::cli
