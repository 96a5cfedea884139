#include "app/cli/command.hpp"

#include <algorithm>
#include <cerrno>
#include <cmath>
#include <cstdlib>
#include <ostream>
#include <sstream>

namespace mendwright::cli {

const char* const caution_text =
    "Caution: results are a planning aid. The work must be designed, done, inspected and certified by a "
    "competent person; local regulations and the installation's own measurements take precedence.";

namespace {

std::vector<CommandSpec>& registry() {
    static std::vector<CommandSpec> commands;
    return commands;
}

std::string quoted(const std::string& text) { return "\"" + text + "\""; }

std::optional<double> parse_double(const std::string& text) {
    if (text.empty()) return std::nullopt;
    char* end = nullptr;
    errno = 0;
    const double value = std::strtod(text.c_str(), &end);
    if (end != text.c_str() + text.size() || errno == ERANGE) return std::nullopt;
    return value;
}

}  // namespace

bool register_command(CommandSpec spec) {
    registry().push_back(std::move(spec));
    return true;
}

const std::vector<CommandSpec>& registered_commands() { return registry(); }

bool ParsedArgs::has(const std::string& flag) const {
    return values.count(flag) > 0 || std::find(switches.begin(), switches.end(), flag) != switches.end();
}

std::optional<std::string> ParsedArgs::text(const std::string& flag) const {
    if (auto it = values.find(flag); it != values.end()) return it->second;
    return std::nullopt;
}

Result<std::string> ParsedArgs::required_text(const std::string& flag) const {
    if (auto value = text(flag)) return *value;
    return problem("--" + flag, "is required");
}

Result<double> ParsedArgs::number(const std::string& flag, bool must_be_positive) const {
    auto raw = text(flag);
    if (!raw) return problem("--" + flag, "is required");
    auto value = parse_double(*raw);
    if (!value || !std::isfinite(*value))
        return problem("--" + flag, std::string(must_be_positive ? "expected a number > 0" : "expected a number") +
                                        ", got " + quoted(*raw));
    if (must_be_positive && *value <= 0.0) return problem("--" + flag, "expected a number > 0, got " + quoted(*raw));
    return *value;
}

Result<double> ParsedArgs::number_or(const std::string& flag, double fallback, bool must_be_positive) const {
    if (!text(flag)) return fallback;
    return number(flag, must_be_positive);
}

Result<long long> ParsedArgs::whole_number(const std::string& flag, long long minimum) const {
    auto raw = text(flag);
    if (!raw) return problem("--" + flag, "is required");
    char* end = nullptr;
    errno = 0;
    const long long value = std::strtoll(raw->c_str(), &end, 10);
    if (raw->empty() || end != raw->c_str() + raw->size() || errno == ERANGE)
        return problem("--" + flag, "expected a whole number, got " + quoted(*raw));
    if (value < minimum)
        return problem("--" + flag, "expected a whole number >= " + std::to_string(minimum) + ", got " + quoted(*raw));
    return value;
}

std::vector<std::string> ParsedArgs::word_list(const std::string& flag) const {
    std::vector<std::string> words;
    auto raw = text(flag);
    if (!raw) return words;
    std::stringstream stream(*raw);
    std::string item;
    while (std::getline(stream, item, ',')) {
        while (!item.empty() && item.front() == ' ') item.erase(item.begin());
        while (!item.empty() && item.back() == ' ') item.pop_back();
        if (!item.empty()) words.push_back(item);
    }
    return words;
}

Result<std::vector<double>> ParsedArgs::number_list(const std::string& flag) const {
    auto raw = text(flag);
    if (!raw) return problem("--" + flag, "is required");
    std::vector<double> numbers;
    std::stringstream stream(*raw);
    std::string item;
    std::size_t index = 0;
    while (std::getline(stream, item, ',')) {
        auto value = parse_double(item);
        if (!value || !std::isfinite(*value) || *value < 0.0)
            return problem("--" + flag, "item " + std::to_string(index + 1) + ": expected a number >= 0, got " + quoted(item));
        numbers.push_back(*value);
        ++index;
    }
    if (numbers.empty()) return problem("--" + flag, "expected a comma-separated list of numbers, got " + quoted(*raw));
    return numbers;
}

int usage_error(CommandContext& context, const std::string& command_path, const Problem& problem) {
    context.err << "mendwright-cli " << command_path << ": " << problem.to_string() << "\n"
                << "Try 'mendwright-cli " << command_path << " --help'.\n";
    return exit_usage;
}

namespace {

void print_command_help(std::ostream& out, const CommandSpec& spec) {
    out << "Usage: mendwright-cli " << spec.path;
    if (!spec.positionals.empty()) out << " " << spec.positionals;
    if (!spec.flags.empty()) out << " [options]";
    out << "\n\n" << spec.summary << "\n";
    if (!spec.flags.empty()) {
        out << "\nOptions:\n";
        for (const auto& flag : spec.flags) {
            std::string left = "  --" + flag.name + (flag.value_name.empty() ? "" : " " + flag.value_name);
            if (left.size() < 30) left.resize(30, ' ');
            else left += "  ";
            out << left << flag.help << "\n";
        }
    }
}

// Lists the commands whose path starts with `prefix` ("" for all, "calc" for the calculator).
void print_overview(std::ostream& out, const std::string& prefix) {
    if (prefix.empty()) {
        out << "mendwright-cli " << MENDWRIGHT_VERSION
            << " - findings, remedy options and quotes from electrical inspection surveys\n\n"
            << "Usage: mendwright-cli COMMAND [arguments] [--help]\n\nCommands:\n";
    } else {
        out << "Usage: mendwright-cli " << prefix << " SUBCOMMAND [options]\n\nSubcommands:\n";
    }
    auto commands = registry();
    std::sort(commands.begin(), commands.end(), [](const auto& a, const auto& b) { return a.path < b.path; });
    for (const auto& spec : commands) {
        if (!prefix.empty() && spec.path.rfind(prefix + " ", 0) != 0) continue;
        std::string left = "  " + spec.path + (spec.positionals.empty() ? "" : " " + spec.positionals);
        if (left.size() < 30) left.resize(30, ' ');
        else left += "  ";
        out << left << spec.summary << "\n";
    }
    out << "\n" << caution_text << "\n";
}

}  // namespace

int run_cli(const std::vector<std::string>& argv, std::ostream& out, std::ostream& err) {
    CommandContext context{out, err};
    std::vector<std::string> args(argv.begin() + (argv.empty() ? 0 : 1), argv.end());
    if (args.empty() || args[0] == "--help" || args[0] == "-h" || args[0] == "help") {
        print_overview(args.empty() ? err : out, "");
        return args.empty() ? exit_usage : exit_ok;
    }
    if (args[0] == "--version") {
        out << "mendwright-cli " << MENDWRIGHT_VERSION << "\n";
        return exit_ok;
    }

    // The longest registered path that prefixes the words given is the command.
    const CommandSpec* chosen = nullptr;
    std::size_t chosen_words = 0;
    bool is_group = false;
    for (const auto& spec : registry()) {
        std::stringstream words(spec.path);
        std::string word;
        std::size_t count = 0;
        bool matches = true;
        while (words >> word) {
            if (count >= args.size() || args[count] != word) { matches = false; break; }
            ++count;
        }
        if (matches && count > chosen_words) { chosen = &spec; chosen_words = count; }
        if (spec.path.rfind(args[0] + " ", 0) == 0) is_group = true;
    }
    if (!chosen) {
        if (is_group) {  // "calc" alone, or "calc --help", or "calc nonsense"
            const bool asked = args.size() >= 2 && (args[1] == "--help" || args[1] == "-h");
            if (args.size() >= 2 && !asked)
                err << "mendwright-cli " << args[0] << ": unknown subcommand \"" << args[1] << "\"\n\n";
            print_overview(asked ? out : err, args[0]);
            return asked ? exit_ok : exit_usage;
        }
        err << "mendwright-cli: unknown command \"" << args[0] << "\"\nTry 'mendwright-cli --help'.\n";
        return exit_usage;
    }

    ParsedArgs parsed;
    for (std::size_t i = chosen_words; i < args.size(); ++i) {
        const std::string& arg = args[i];
        if (arg == "--help" || arg == "-h") {
            print_command_help(out, *chosen);
            return exit_ok;
        }
        if (arg.rfind("--", 0) == 0 && arg.size() > 2) {
            std::string name = arg.substr(2);
            std::optional<std::string> inline_value;
            if (auto eq = name.find('='); eq != std::string::npos) {
                inline_value = name.substr(eq + 1);
                name = name.substr(0, eq);
            }
            auto spec = std::find_if(chosen->flags.begin(), chosen->flags.end(), [&](const auto& f) { return f.name == name; });
            if (spec == chosen->flags.end())
                return usage_error(context, chosen->path, problem("--" + name, "is not an option of this command"));
            if (spec->value_name.empty()) {
                if (inline_value) return usage_error(context, chosen->path, problem("--" + name, "takes no value"));
                parsed.switches.push_back(name);
                continue;
            }
            if (parsed.values.count(name)) return usage_error(context, chosen->path, problem("--" + name, "given more than once"));
            if (inline_value) {
                parsed.values[name] = *inline_value;
            } else {
                if (i + 1 >= args.size())
                    return usage_error(context, chosen->path, problem("--" + name, "expected a value (" + spec->value_name + ")"));
                parsed.values[name] = args[++i];
            }
            continue;
        }
        parsed.positionals.push_back(arg);
    }
    if (parsed.positionals.size() < chosen->min_positionals)
        return usage_error(context, chosen->path, problem(chosen->positionals, "is required"));
    if (parsed.positionals.size() > chosen->max_positionals)
        return usage_error(context, chosen->path,
                           problem(parsed.positionals[chosen->max_positionals], "unexpected argument"));
    return chosen->run(parsed, context);
}

}  // namespace mendwright::cli
