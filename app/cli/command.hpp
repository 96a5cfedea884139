#pragma once
// The command-line dispatcher: each command (calc, validate, assess, ...) lives in its own
// file and registers a CommandSpec at start-up. Flags are declared, so unknown flags and
// missing values are usage errors that name the flag.

#include <functional>
#include <iosfwd>
#include <map>
#include <optional>
#include <string>
#include <vector>

#include "planner/core/result.hpp"

namespace mendwright::cli {

// Exit codes shared by every command.
inline constexpr int exit_ok = 0;
inline constexpr int exit_failure = 1;       // the command ran but could not finish (I/O, store)
inline constexpr int exit_usage = 2;         // a usage or range error in the arguments
inline constexpr int exit_invalid_input = 3; // a document that fails validation

struct FlagSpec {
    std::string name;        // without the leading "--"
    std::string value_name;  // e.g. "OHM_M"; empty for a switch such as --json
    std::string help;
};

class ParsedArgs;

struct CommandContext {
    std::ostream& out;
    std::ostream& err;
};

struct CommandSpec {
    std::string path;        // "calc rod", "assess", "jobs list"
    std::string positionals; // e.g. "FILE" for the usage line; empty when none
    std::string summary;
    std::vector<FlagSpec> flags;
    std::size_t min_positionals = 0;
    std::size_t max_positionals = 0;
    std::function<int(const ParsedArgs&, CommandContext&)> run;
};

// Parsed arguments of one command; numeric accessors check the value and return a Problem
// naming the flag ("--length: expected a number > 0, got \"abc\"").
class ParsedArgs {
public:
    std::vector<std::string> positionals;
    std::map<std::string, std::string> values;  // flags with a value
    std::vector<std::string> switches;          // flags without a value that were given

    [[nodiscard]] bool has(const std::string& flag) const;
    [[nodiscard]] std::optional<std::string> text(const std::string& flag) const;
    [[nodiscard]] Result<std::string> required_text(const std::string& flag) const;
    // A finite number; `must_be_positive` rejects zero and negatives.
    [[nodiscard]] Result<double> number(const std::string& flag, bool must_be_positive) const;
    [[nodiscard]] Result<double> number_or(const std::string& flag, double fallback, bool must_be_positive) const;
    [[nodiscard]] Result<long long> whole_number(const std::string& flag, long long minimum) const;
    // A comma-separated list of words (option ids, ...), blanks trimmed, empty items dropped;
    // empty when the flag was not given.
    [[nodiscard]] std::vector<std::string> word_list(const std::string& flag) const;
    // A comma-separated list of finite numbers >= 0.
    [[nodiscard]] Result<std::vector<double>> number_list(const std::string& flag) const;
};

// Registration from each command file: `static const bool registered = register_command({...});`
bool register_command(CommandSpec spec);
const std::vector<CommandSpec>& registered_commands();

// Runs the program on argv; used by main and by in-process tests.
int run_cli(const std::vector<std::string>& argv, std::ostream& out, std::ostream& err);

// Prints a usage error naming the flag, and returns exit_usage.
int usage_error(CommandContext& context, const std::string& command_path, const Problem& problem);

// The cautions every result-bearing command prints (planning aid, competent person, local rules).
extern const char* const caution_text;

}  // namespace mendwright::cli
