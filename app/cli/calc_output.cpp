#include "app/cli/calc_output.hpp"

#include <algorithm>
#include <cctype>
#include <cstdio>
#include <ostream>

namespace mendwright::cli {

namespace {

std::string lower(std::string text) {
    std::transform(text.begin(), text.end(), text.begin(), [](unsigned char c) { return std::tolower(c); });
    return text;
}

}  // namespace

Problem as_flag_problem(const Problem& calc_problem, const ParameterFlags& flags) {
    for (const auto& [parameter, flag] : flags) {
        if (calc_problem.field == parameter) return problem("--" + flag, calc_problem.message);
        // A list item: "resistances_ohms[2]" -> "--ohms: item 3: ...".
        const std::string prefix = parameter + "[";
        if (calc_problem.field.rfind(prefix, 0) == 0 && calc_problem.field.back() == ']') {
            const std::string index_text =
                calc_problem.field.substr(prefix.size(), calc_problem.field.size() - prefix.size() - 1);
            const unsigned long index = std::stoul(index_text);
            return problem("--" + flag, "item " + std::to_string(index + 1) + ": " + calc_problem.message);
        }
    }
    return calc_problem;
}

Result<std::string> choice_flag(const ParsedArgs& args, const std::string& flag,
                                const std::vector<std::string>& choices, const std::string& fallback) {
    auto raw = args.text(flag);
    if (!raw) {
        if (fallback.empty()) return problem("--" + flag, "is required");
        return fallback;
    }
    for (const auto& choice : choices)
        if (lower(choice) == lower(*raw)) return choice;
    std::string listed;
    for (const auto& choice : choices) listed += (listed.empty() ? "" : ", ") + choice;
    return problem("--" + flag, "expected one of " + listed + ", got \"" + *raw + "\"");
}

std::string shown(double value) {
    char text[64];
    std::snprintf(text, sizeof text, "%.4g", value);
    return text;
}

std::string shown_fixed(double value, int decimals) {
    char text[64];
    std::snprintf(text, sizeof text, "%.*f", decimals, value);
    return text;
}

int print_calc_result(CommandContext& context, const ParsedArgs& args, nlohmann::json result,
                      const std::string& human_line, bool safety_result) {
    if (args.has("json")) {
        if (safety_result) result["caution"] = caution_text;
        context.out << result.dump() << "\n";
    } else {
        context.out << human_line << "\n";
        if (safety_result) context.out << caution_text << "\n";
    }
    return exit_ok;
}

FlagSpec json_flag() { return {"json", "", "print one JSON object instead of a line of text"}; }

}  // namespace mendwright::cli
