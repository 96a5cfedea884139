// `mendwright-cli calc adiabatic`: the smallest protective conductor that withstands a fault
// (planner/calc/adiabatic.hpp).
#include <nlohmann/json.hpp>

#include "app/cli/calc_output.hpp"
#include "app/cli/command.hpp"
#include "planner/calc/adiabatic.hpp"
#include "planner/calc/conductor.hpp"

namespace mendwright::cli {
namespace {

const ParameterFlags adiabatic_flags = {
    {"fault_current_amps", "fault-current"},
    {"time_s", "time"},
    {"k", "k"},
};

int run_adiabatic(const ParsedArgs& args, CommandContext& context) {
    const std::string path = "calc adiabatic";
    auto fail = [&](const Problem& p) { return usage_error(context, path, as_flag_problem(p, adiabatic_flags)); };

    auto current = args.number("fault-current", true);
    if (!current) return fail(current.problem());
    auto time = args.number("time", true);
    if (!time) return fail(time.problem());
    auto k = args.number("k", true);
    if (!k) return fail(k.problem());

    auto csa = calc::adiabatic_min_csa_mm2(*current, *time, *k);
    if (!csa) return fail(csa.problem());

    nlohmann::json next_size = nullptr;
    for (double size : calc::copper_table_sizes_mm2())
        if (size >= *csa) {
            next_size = size;
            break;
        }
    const std::string source = "BS 7671 543.1.3: S = sqrt(I^2 t) / k";
    nlohmann::json result = {
        {"value", *csa},
        {"unit", "mm2"},
        {"source", source},
        {"fault_current_amps", *current},
        {"time_s", *time},
        {"k", *k},
        {"next_standard_csa_mm2", next_size},
    };
    std::string line = shown(*csa) + " mm2 - minimum protective conductor for " + shown(*current) + " A for " +
                       shown(*time) + " s, k " + shown(*k) + " (" + source + ")";
    if (!next_size.is_null()) line += "; next standard size " + shown(next_size.get<double>()) + " mm2";
    return print_calc_result(context, args, result, line, true);
}

[[maybe_unused]] const bool registered = register_command({
    "calc adiabatic",
    "",
    "Minimum protective conductor cross-section for a fault current and time (BS 7671 543.1.3)",
    {
        {"fault-current", "A", "prospective earth fault current, amperes"},
        {"time", "S", "operating time of the protective device, seconds (at most 5)"},
        {"k", "K", "factor for conductor and insulation (copper: 115 in a cable, 143 separate, 70 C thermoplastic)"},
        json_flag(),
    },
    0,
    0,
    run_adiabatic,
});

}  // namespace
}  // namespace mendwright::cli
