// `mendwright-cli calc rod`: resistance to earth of one driven rod or a group of rods
// (planner/calc/electrode.hpp), optionally scaled to the worst season.
#include <nlohmann/json.hpp>

#include "app/cli/calc_output.hpp"
#include "app/cli/command.hpp"
#include "planner/calc/electrode.hpp"
#include "planner/calc/rcd.hpp"

namespace mendwright::cli {
namespace {

const ParameterFlags rod_flags = {
    {"resistivity_ohm_m", "resistivity"}, {"length_m", "length"},         {"diameter_m", "diameter"},
    {"spacing_m", "spacing"},             {"rods_per_side", "count"},     {"season_factor", "season-factor"},
};

int run_rod(const ParsedArgs& args, CommandContext& context) {
    const std::string path = "calc rod";
    auto fail = [&](const Problem& p) { return usage_error(context, path, as_flag_problem(p, rod_flags)); };

    auto resistivity = args.number("resistivity", true);
    if (!resistivity) return fail(resistivity.problem());
    auto length = args.number("length", true);
    if (!length) return fail(length.problem());
    auto diameter = args.number("diameter", true);
    if (!diameter) return fail(diameter.problem());
    auto layout_name = choice_flag(args, "layout", {"line", "square"}, "line");
    if (!layout_name) return fail(layout_name.problem());
    const auto layout = *layout_name == "square" ? calc::RodLayout::hollow_square : calc::RodLayout::line;
    long long count = 1;
    if (args.has("count")) {
        auto parsed = args.whole_number("count", 1);
        if (!parsed) return fail(parsed.problem());
        count = *parsed;
    } else if (layout == calc::RodLayout::hollow_square) {
        return fail(problem("--count", "is required with --layout square (rods along each side)"));
    }
    if (count > 10) return fail(problem("--count", "expected at most 10 rods (the range of BS 7430's lambda table), got \"" +
                                                       std::to_string(count) + "\""));
    const bool group = count > 1 || layout == calc::RodLayout::hollow_square;
    double spacing_m = 0.0;
    if (group) {
        auto spacing = args.number("spacing", true);
        if (!spacing) return fail(problem("--spacing", spacing.problem().message + " (needed for more than one rod)"));
        spacing_m = *spacing;
    } else if (args.has("spacing")) {
        auto spacing = args.number("spacing", true);  // checked even when unused
        if (!spacing) return fail(spacing.problem());
    }
    double season_factor = 1.0;
    if (args.has("season-factor")) {
        auto factor = args.number("season-factor", true);
        if (!factor) return fail(factor.problem());
        season_factor = *factor;
    }

    auto single = calc::rod_resistance_ohms(*resistivity, *length, *diameter);
    if (!single) return fail(single.problem());
    calc::RodGroup rods{*single, 1, 0.0, 0.0};
    if (group) {
        auto grouped = calc::rod_group_resistance(*single, *resistivity, spacing_m, layout, static_cast<int>(count));
        if (!grouped) return fail(grouped.problem());
        rods = *grouped;
    }
    auto worst = calc::worst_season_resistance_ohms(rods.resistance_ohms, season_factor);
    if (!worst) return fail(worst.problem());

    std::string source = "Dwight's rod formula (BS 7430, IEEE Std 142): R = rho/(2 pi L) (ln(8L/d) - 1)";
    if (group) source += "; BS 7430 rod group: R (1 + lambda alpha) / N, lambda from memory";
    nlohmann::json result = {
        {"value", rods.resistance_ohms},
        {"unit", "ohm"},
        {"source", source},
        {"single_rod_ohms", *single},
        {"rods", rods.rods},
        {"layout", group ? *layout_name : "single"},
        {"resistivity_ohm_m", *resistivity},
        {"length_m", *length},
        {"diameter_m", *diameter},
        {"assumption", "uniform soil; a measured RA takes precedence"},
    };
    if (group) {
        result["spacing_m"] = spacing_m;
        result["lambda"] = rods.lambda;
        result["alpha"] = rods.alpha;
    }
    if (args.has("season-factor")) {
        result["season_factor"] = season_factor;
        result["worst_season_ohms"] = *worst;
    }
    const double judged_ohms = *worst;
    nlohmann::json notes = nlohmann::json::array();
    if (judged_ohms > calc::ra_stability_limit_ohms)
        notes.push_back("above 200 ohm: may not be stable (BS 7671 Table 41.5 note)");
    result["notes"] = notes;

    std::string line = shown(rods.resistance_ohms) + " ohm - resistance to earth of " +
                       (group ? std::to_string(rods.rods) + " rods (" + *layout_name + ")" : std::string("one rod")) +
                       ", " + source;
    if (args.has("season-factor"))
        line += "; worst season " + shown(*worst) + " ohm at factor " + shown(season_factor) + " (an assumption)";
    for (const auto& note : notes) line += "; " + note.get<std::string>();
    return print_calc_result(context, args, result, line, true);
}

[[maybe_unused]] const bool registered = register_command({
    "calc rod",
    "",
    "Resistance to earth of a driven rod, or of rods in a line or hollow square (BS 7430)",
    {
        {"resistivity", "OHM_M", "soil resistivity, ohm metres"},
        {"length", "M", "driven length of each rod, metres"},
        {"diameter", "M", "rod diameter, metres (0.016 for 16 mm)"},
        {"count", "N", "rods in the line, or along each side with --layout square (1-10; default 1)"},
        {"spacing", "M", "distance between neighbouring rods, metres (needed for more than one rod)"},
        {"layout", "line|square", "rods in a line (default) or a hollow square"},
        {"season-factor", "F", "multiply by this factor (>= 1) for the worst season (an assumption)"},
        json_flag(),
    },
    0,
    0,
    run_rod,
});

}  // namespace
}  // namespace mendwright::cli
