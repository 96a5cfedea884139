// `mendwright-cli calc fault-path`: current, voltages and touch voltage of an earth fault
// through a series chain of resistances (planner/calc/fault_path.hpp).
#include <cstddef>

#include <nlohmann/json.hpp>

#include "app/cli/calc_output.hpp"
#include "app/cli/command.hpp"
#include "planner/calc/fault_path.hpp"
#include "planner/calc/rcd.hpp"

namespace mendwright::cli {
namespace {

const ParameterFlags fault_flags = {
    {"supply_volts", "u0"},
    {"resistances_ohms", "ohms"},
    {"touch_index", "touch-index"},
};

int run_fault_path(const ParsedArgs& args, CommandContext& context) {
    const std::string path = "calc fault-path";
    auto fail = [&](const Problem& p) { return usage_error(context, path, as_flag_problem(p, fault_flags)); };

    auto u0 = args.number("u0", true);
    if (!u0) return fail(u0.problem());
    auto ohms = args.number_list("ohms");
    if (!ohms) return fail(ohms.problem());
    std::optional<std::size_t> touch_index;
    if (args.has("touch-index")) {
        auto index = args.whole_number("touch-index", 0);
        if (!index) return fail(index.problem());
        if (static_cast<unsigned long long>(*index) >= ohms->size())
            return fail(problem("--touch-index", "expected an index from 0 to " + std::to_string(ohms->size() - 1) +
                                                     " (0 is the first of --ohms), got \"" + *args.text("touch-index") +
                                                     "\""));
        touch_index = static_cast<std::size_t>(*index);
    }

    auto fault = calc::series_fault_path(*u0, *ohms, touch_index);
    if (!fault) return fail(fault.problem());

    nlohmann::json elements = nlohmann::json::array();
    for (std::size_t i = 0; i < fault->elements.size(); ++i)
        elements.push_back({{"index", i}, {"ohms", fault->elements[i].resistance_ohms}, {"volts", fault->elements[i].volts}});
    const double touch_limit_volts = calc::default_touch_limit_volts;
    const std::string source = "Ohm's law I = U / sum(R); series voltage divider; touch voltage = I x R[" +
                               std::to_string(fault->touch_index) + "]";
    nlohmann::json result = {
        {"value", fault->current_amps},
        {"unit", "A"},
        {"source", source},
        {"current_amps", fault->current_amps},
        {"total_ohms", fault->total_ohms},
        {"u0_volts", *u0},
        {"elements", elements},
        {"node_volts", fault->node_potentials_volts},
        {"node_volts_reference", "the return end of the chain (last node, 0 V); node 0 is the supply terminal"},
        {"touch_index", fault->touch_index},
        {"touch_volts", fault->touch_volts},
        {"touch_limit_volts", touch_limit_volts},
        {"touch_above_limit", fault->touch_volts > touch_limit_volts},
    };
    std::string line = shown(fault->current_amps) + " A fault current through " + shown(fault->total_ohms) +
                       " ohm; touch voltage " + shown(fault->touch_volts) + " V across element " +
                       std::to_string(fault->touch_index) + " (" + source + ")";
    if (fault->touch_volts > touch_limit_volts) line += "; above the 50 V limit of BS 7671 411.5.3";
    return print_calc_result(context, args, result, line, true);
}

[[maybe_unused]] const bool registered = register_command({
    "calc fault-path",
    "",
    "Fault current, voltage across each resistance and touch voltage of a series earth fault path",
    {
        {"u0", "V", "voltage driving the fault (U0), volts"},
        {"ohms", "R1,R2,...", "resistances of the path in order, ohms; the last is taken as electrode to earth"},
        {"touch-index", "K", "element between exposed metalwork and true earth (0-based; default the last)"},
        json_flag(),
    },
    0,
    0,
    run_fault_path,
});

}  // namespace
}  // namespace mendwright::cli
