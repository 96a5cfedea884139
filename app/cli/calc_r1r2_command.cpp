// `mendwright-cli calc r1r2`: R1+R2 of a copper circuit from its conductor sizes and length
// (planner/calc/conductor.hpp).
#include <nlohmann/json.hpp>

#include "app/cli/calc_output.hpp"
#include "app/cli/command.hpp"
#include "planner/calc/conductor.hpp"

namespace mendwright::cli {
namespace {

const ParameterFlags r1r2_flags = {
    {"line_csa_mm2", "line-csa"},
    {"cpc_csa_mm2", "cpc-csa"},
    {"length_m", "length"},
    {"conductor_temperature_c", "temperature"},
};

int run_r1r2(const ParsedArgs& args, CommandContext& context) {
    const std::string path = "calc r1r2";
    auto fail = [&](const Problem& p) { return usage_error(context, path, as_flag_problem(p, r1r2_flags)); };

    auto line_csa = args.number("line-csa", true);
    if (!line_csa) return fail(line_csa.problem());
    auto cpc_csa = args.number("cpc-csa", true);
    if (!cpc_csa) return fail(cpc_csa.problem());
    auto length = args.number("length", true);
    if (!length) return fail(length.problem());
    auto temperature = args.number_or("temperature", 20.0, false);
    if (!temperature) return fail(temperature.problem());

    auto ohms = calc::r1_plus_r2_ohms(*line_csa, *cpc_csa, *length, *temperature);
    if (!ohms) return fail(ohms.problem());
    auto at_20c = calc::r1_plus_r2_ohms(*line_csa, *cpc_csa, *length, 20.0);
    auto at_70c = calc::r1_plus_r2_ohms(*line_csa, *cpc_csa, *length, 70.0);
    auto line_r = calc::copper_resistance_mohm_per_m(*line_csa);
    auto cpc_r = calc::copper_resistance_mohm_per_m(*cpc_csa);
    auto multiplier = calc::copper_temperature_multiplier(*temperature);
    if (!at_20c || !at_70c || !line_r || !cpc_r || !multiplier)  // cannot fail once the first call passed
        return fail(problem("", "internal: inconsistent conductor table"));

    const std::string source = "IEC 60228 copper at 20 C; x (1 + 0.004 (t - 20)) (BS 7671 Appendix 3 / GN3, memory)";
    nlohmann::json result = {
        {"value", *ohms},
        {"unit", "ohm"},
        {"source", source},
        {"line_mohm_per_m", *line_r},
        {"cpc_mohm_per_m", *cpc_r},
        {"r1_plus_r2_mohm_per_m_at_20c", *line_r + *cpc_r},
        {"temperature_c", *temperature},
        {"temperature_multiplier", *multiplier},
        {"ohms_at_20c", *at_20c},
        {"ohms_at_70c", *at_70c},
        {"length_m", *length},
    };
    const std::string line_text = shown(*ohms) + " ohm - R1+R2 of " + shown(*line_csa) + "/" + shown(*cpc_csa) +
                                  " mm2 copper over " + shown(*length) + " m at " + shown(*temperature) + " C (" +
                                  source + ")";
    return print_calc_result(context, args, result, line_text, true);
}

[[maybe_unused]] const bool registered = register_command({
    "calc r1r2",
    "",
    "R1+R2 of a copper circuit from line and protective conductor sizes and length (IEC 60228)",
    {
        {"line-csa", "MM2", "line conductor cross-section, mm2"},
        {"cpc-csa", "MM2", "circuit protective conductor cross-section, mm2"},
        {"length", "M", "circuit length, metres"},
        {"temperature", "C", "conductor temperature, degrees Celsius (default 20; 70 for operating)"},
        json_flag(),
    },
    0,
    0,
    run_r1r2,
});

}  // namespace
}  // namespace mendwright::cli
