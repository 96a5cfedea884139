// `mendwright-cli calc zs-max`: maximum earth fault loop impedance for a BS EN 60898-1
// circuit-breaker (planner/calc/circuit_breaker.hpp).
#include <nlohmann/json.hpp>

#include "app/cli/calc_output.hpp"
#include "app/cli/command.hpp"
#include "planner/calc/circuit_breaker.hpp"
#include "planner/calc/rounding.hpp"

namespace mendwright::cli {
namespace {

const ParameterFlags zs_flags = {
    {"rating_amps", "rating"},
    {"u0_volts", "u0"},
    {"cmin", "cmin"},
};

int run_zs_max(const ParsedArgs& args, CommandContext& context) {
    const std::string path = "calc zs-max";
    auto fail = [&](const Problem& p) { return usage_error(context, path, as_flag_problem(p, zs_flags)); };

    auto curve_name = choice_flag(args, "curve", {"B", "C", "D"});
    if (!curve_name) return fail(curve_name.problem());
    const auto curve = *curve_name == "B" ? calc::BreakerCurve::b
                       : *curve_name == "C" ? calc::BreakerCurve::c
                                            : calc::BreakerCurve::d;
    auto rating = args.number("rating", true);
    if (!rating) return fail(rating.problem());
    auto u0 = args.number_or("u0", calc::default_u0_volts, true);
    if (!u0) return fail(u0.problem());
    auto cmin = args.number_or("cmin", calc::default_cmin, true);
    if (!cmin) return fail(cmin.problem());

    auto max_zs = calc::breaker_max_zs_ohms(curve, *rating, 0.4, *u0, *cmin);
    if (!max_zs) return fail(max_zs.problem());
    auto measured_limit = calc::measured_zs_limit_ohms(*max_zs);
    if (!measured_limit) return fail(measured_limit.problem());
    const double trip_multiple = calc::instantaneous_trip_band(curve).upper_multiple;
    const double table_value = calc::round_half_up(*max_zs, 2);

    const std::string source = "BS 7671 411.4.4 / Table 41.3: Zs = Cmin x U0 / Ia, Ia = " + shown(trip_multiple) +
                               " x In (BS EN 60898-1 curve " + *curve_name + ")";
    nlohmann::json result = {
        {"value", *max_zs},
        {"unit", "ohm"},
        {"source", source},
        {"table_precision_ohms", table_value},
        {"measured_limit_ohms", *measured_limit},
        {"measured_limit_rule", "0.8 x maximum, for a Zs measured at ambient temperature (GN3 / Appendix 3)"},
        {"curve", *curve_name},
        {"rating_amps", *rating},
        {"trip_current_amps", trip_multiple * *rating},
        {"disconnection_time_s", 0.4},
        {"u0_volts", *u0},
        {"cmin", *cmin},
    };
    const std::string line = shown_fixed(table_value, 2) + " ohm - maximum Zs for a " + *curve_name + shown(*rating) +
                             " circuit-breaker at 0.4 s (" + source + "); compare a measured Zs with " +
                             shown_fixed(*measured_limit, 2) + " ohm (0.8 rule, GN3)";
    return print_calc_result(context, args, result, line, true);
}

[[maybe_unused]] const bool registered = register_command({
    "calc zs-max",
    "",
    "Maximum earth fault loop impedance Zs for a B, C or D circuit-breaker (BS 7671 Table 41.3)",
    {
        {"curve", "B|C|D", "tripping curve of the circuit-breaker"},
        {"rating", "A", "rated current In, amperes"},
        {"u0", "V", "nominal voltage to earth U0 (default 230)"},
        {"cmin", "F", "minimum voltage factor Cmin (default 0.95)"},
        json_flag(),
    },
    0,
    0,
    run_zs_max,
});

}  // namespace
}  // namespace mendwright::cli
