#pragma once
// Shared by the `calc ...` commands: turning calc Problems into flag errors, reading choice
// flags, and printing one result as JSON or as a short human line.

#include <initializer_list>
#include <string>
#include <utility>
#include <vector>

#include <nlohmann/json.hpp>

#include "app/cli/command.hpp"
#include "planner/core/result.hpp"

namespace mendwright::cli {

// One calc parameter and the flag that feeds it: {"length_m", "length"}.
using ParameterFlags = std::vector<std::pair<std::string, std::string>>;

// A calc Problem on a parameter ("length_m", "resistances_ohms[2]") as a Problem on its flag
// ("--length", "--ohms" with "item 3: " before the message). Unknown fields pass unchanged.
Problem as_flag_problem(const Problem& calc_problem, const ParameterFlags& flags);

// The value of a flag that must be one of `choices` (compared without case); the canonical
// spelling from `choices` is returned. `fallback` is used when the flag is absent, unless empty
// (then the flag is required).
Result<std::string> choice_flag(const ParsedArgs& args, const std::string& flag,
                                const std::vector<std::string>& choices, const std::string& fallback = "");

// A number for people: four significant figures ("17.12", "1667", "0.2185").
std::string shown(double value);
// A number at fixed decimals ("1.37").
std::string shown_fixed(double value, int decimals);

// Prints `result` (which must hold "value", "unit", "source") as one JSON object when --json
// was given, else `human_line`; a safety result adds the caution (a "caution" member in JSON,
// a closing line in text). Returns exit_ok.
int print_calc_result(CommandContext& context, const ParsedArgs& args, nlohmann::json result,
                      const std::string& human_line, bool safety_result);

// The --json switch every calc command takes.
FlagSpec json_flag();

}  // namespace mendwright::cli
