#include "planner/rules/profile.hpp"

#include <stdexcept>

#include <cmath>
#include <set>
#include <string>

#include <nlohmann/json.hpp>

#include "planner/core/checks.hpp"
#include "planner/rules/rule_table.hpp"

namespace mendwright::rules {

namespace {

using nlohmann::json;

// Thrown inside this file only, and turned into the Problem that parse_rules_profile returns.
struct ProfileError {
    Problem problem;
};

[[noreturn]] void fail(const std::string& path, const std::string& message) { throw ProfileError{problem(path, message)}; }

std::string join(const std::string& path, const std::string& key) { return path.empty() ? key : path + "." + key; }

std::string type_name(const json& value) { return value.type_name(); }

// An object whose keys are all read exactly once: anything left over is an unknown key.
class ObjectReader {
public:
    ObjectReader(const json& value, std::string path) : value_(value), path_(std::move(path)) {
        if (!value_.is_object()) fail(path_.empty() ? "(document)" : path_, "expected an object, got " + type_name(value_));
    }

    const json& at(const std::string& key) {
        read_.insert(key);
        const auto found = value_.find(key);
        if (found == value_.end()) fail(join(path_, key), "is required");
        return *found;
    }

    [[nodiscard]] std::string path(const std::string& key) const { return join(path_, key); }

    std::string text(const std::string& key, bool allow_empty = false) {
        const json& value = at(key);
        if (!value.is_string()) fail(path(key), "expected a string, got " + type_name(value));
        auto result = value.get<std::string>();
        if (!allow_empty && result.empty()) fail(path(key), "expected a non-empty string");
        return result;
    }

    // A finite number with lowest <= x <= highest (bounds optional); `exclusive_low` makes lowest excluded.
    double number(const std::string& key, double lowest, double highest, bool exclusive_low) {
        const json& value = at(key);
        if (!value.is_number()) fail(path(key), "expected a number, got " + type_name(value));
        return checked_number(path(key), value.get<double>(), lowest, highest, exclusive_low);
    }

    double positive(const std::string& key, double highest = INFINITY) { return number(key, 0.0, highest, true); }

    // No key may be left unread.
    void finish() const {
        for (const auto& item : value_.items())
            if (!read_.count(item.key())) fail(path(item.key()), "is not a known key here");
    }

    static double checked_number(const std::string& path, double number, double lowest, double highest, bool exclusive_low) {
        if (!std::isfinite(number)) fail(path, "expected a finite number, got " + number_text(number));
        if (exclusive_low ? number <= lowest : number < lowest)
            fail(path, std::string("expected a number ") + (exclusive_low ? "> " : ">= ") + number_text(lowest) + ", got " +
                           number_text(number));
        if (number > highest) fail(path, "expected a number <= " + number_text(highest) + ", got " + number_text(number));
        return number;
    }

private:
    const json& value_;
    std::string path_;
    std::set<std::string> read_;
};

model::Occupancy occupancy_from(const std::string& path, const std::string& text) {
    if (text == "owner_occupied_dwelling") return model::Occupancy::owner_occupied_dwelling;
    if (text == "privately_rented_dwelling") return model::Occupancy::privately_rented_dwelling;
    if (text == "commercial") return model::Occupancy::commercial;
    if (text == "other") return model::Occupancy::other;
    fail(path, "expected one of owner_occupied_dwelling, privately_rented_dwelling, commercial, other, got \"" + text + "\"");
}

FaultProtectionLimits read_fault_protection(ObjectReader object) {
    FaultProtectionLimits limits;
    limits.touch_voltage_limit_volts = object.positive("touch_voltage_limit_volts");
    limits.cmin = object.positive("cmin", 1.0);
    limits.measured_zs_factor = object.positive("measured_zs_factor", 1.0);
    object.finish();
    return limits;
}

ElectrodeLimits read_electrode(ObjectReader object) {
    ElectrodeLimits limits;
    limits.stability_limit_ohms = object.positive("stability_limit_ohms");
    limits.target_ohms = object.positive("target_ohms");
    if (limits.target_ohms > limits.stability_limit_ohms)
        fail(object.path("target_ohms"), "expected a target no higher than stability_limit_ohms (" +
                                             number_text(limits.stability_limit_ohms) + "), got " +
                                             number_text(limits.target_ohms));
    const std::string factors_path = object.path("seasonal_factor_by_month");
    const json& factors = object.at("seasonal_factor_by_month");
    if (!factors.is_array() || factors.size() != 12)
        fail(factors_path, "expected an array of 12 numbers (January to December), got " +
                               (factors.is_array() ? "an array of " + std::to_string(factors.size()) : type_name(factors)));
    for (std::size_t m = 0; m < 12; ++m) {
        const std::string path = factors_path + "[" + std::to_string(m) + "]";
        if (!factors[m].is_number()) fail(path, "expected a number, got " + type_name(factors[m]));
        // A factor below 1 would make the worst season better than the day measured.
        limits.seasonal_factor_by_month[m] = ObjectReader::checked_number(path, factors[m].get<double>(), 1.0, INFINITY, false);
    }
    limits.seasonal_factor_basis = object.text("seasonal_factor_basis");
    object.finish();
    return limits;
}

TailsLimits read_tails(ObjectReader object) {
    TailsLimits limits;
    limits.surface_max_length_m = object.number("surface_max_length_m", 0.0, INFINITY, false);
    limits.concealed_in_wall_max_length_m = object.number("concealed_in_wall_max_length_m", 0.0, INFINITY, false);
    limits.buried_max_length_m = object.number("buried_max_length_m", 0.0, INFINITY, false);
    limits.basis = object.text("basis");
    object.finish();
    return limits;
}

RcdLimits read_rcd(ObjectReader object) {
    RcdLimits limits;
    limits.leakage_fraction = object.positive("leakage_fraction", 1.0);
    limits.selectivity_ratio = object.number("selectivity_ratio", 1.0, INFINITY, false);
    limits.additional_protection_max_idn_amps = object.positive("additional_protection_max_idn_amps");
    limits.socket_outlet_max_amps = object.positive("socket_outlet_max_amps");
    object.finish();
    return limits;
}

BreakingCapacityLimits read_breaking_capacity(ObjectReader object) {
    BreakingCapacityLimits limits;
    limits.conditional_rating_ka = object.positive("conditional_rating_ka");
    limits.supply_fuse_max_amps = object.positive("supply_fuse_max_amps");
    const std::string path = object.path("supply_fuse_standards");
    const json& standards = object.at("supply_fuse_standards");
    if (!standards.is_array()) fail(path, "expected an array of strings, got " + type_name(standards));
    for (std::size_t i = 0; i < standards.size(); ++i) {
        if (!standards[i].is_string() || standards[i].get<std::string>().empty())
            fail(path + "[" + std::to_string(i) + "]", "expected a non-empty string, got " + type_name(standards[i]));
        limits.supply_fuse_standards.push_back(standards[i].get<std::string>());
    }
    object.finish();
    return limits;
}

DueDates read_due_dates(ObjectReader object) {
    DueDates due;
    due.default_text = object.text("default_text");
    const std::string path = object.path("rules");
    const json& rules = object.at("rules");
    if (!rules.is_array()) fail(path, "expected an array of due rules, got " + type_name(rules));
    for (std::size_t i = 0; i < rules.size(); ++i) {
        ObjectReader rule(rules[i], path + "[" + std::to_string(i) + "]");
        DueRule due_rule;
        due_rule.occupancy = occupancy_from(rule.path("occupancy"), rule.text("occupancy"));
        due_rule.country = rule.text("country");
        due_rule.days = int(rule.number("days", 0.0, 3650.0, false));
        if (double(due_rule.days) != rule.at("days").get<double>()) fail(rule.path("days"), "expected a whole number of days");
        due_rule.basis = rule.text("basis");
        rule.finish();
        due.rules.push_back(std::move(due_rule));
    }
    object.finish();
    return due;
}

decltype(RulesProfile::rules) read_rules(ObjectReader object) {
    decltype(RulesProfile::rules) rules;
    for (const auto& spec : rule_table()) {
        if (spec.cases.empty()) continue;  // rules whose code comes from elsewhere (recorded observations)
        ObjectReader rule(object.at(spec.id), object.path(spec.id));
        auto& cases = rules[spec.id];
        for (const auto& case_name : spec.cases) {
            ObjectReader entry(rule.at(case_name), rule.path(case_name));
            RuleCase rule_case;
            const std::string code_text = entry.text("code");
            const auto code = parse_code(code_text);
            if (!code) fail(entry.path("code"), "expected one of C1, C2, C3, FI, note, got \"" + code_text + "\"");
            rule_case.code = *code;
            rule_case.clause = entry.text("clause");
            entry.finish();
            cases.emplace(case_name, std::move(rule_case));
        }
        rule.finish();
    }
    object.finish();
    return rules;
}

RulesProfile read_profile(const json& document) {
    ObjectReader top(document, "");
    const std::string format = top.text("format");
    if (format != rules_profile_format_name)
        fail("format", std::string("expected \"") + rules_profile_format_name + "\", got \"" + format + "\"");
    const json& version = top.at("version");
    if (!version.is_number_integer() || version.get<long long>() != rules_profile_format_version)
        fail("version", "expected " + std::to_string(rules_profile_format_version) + ", got " + version.dump());
    RulesProfile profile;
    profile.name = top.text("name");
    profile.basis = top.text("basis");
    const json& notes = top.at("notes");
    if (!notes.is_array()) fail("notes", "expected an array of strings, got " + type_name(notes));
    for (std::size_t i = 0; i < notes.size(); ++i) {
        if (!notes[i].is_string()) fail("notes[" + std::to_string(i) + "]", "expected a string, got " + type_name(notes[i]));
        profile.notes.push_back(notes[i].get<std::string>());
    }
    profile.fault_protection = read_fault_protection(ObjectReader(top.at("fault_protection"), "fault_protection"));
    profile.electrode = read_electrode(ObjectReader(top.at("electrode"), "electrode"));
    profile.tails = read_tails(ObjectReader(top.at("tails"), "tails"));
    profile.rcd = read_rcd(ObjectReader(top.at("rcd"), "rcd"));
    profile.breaking_capacity = read_breaking_capacity(ObjectReader(top.at("breaking_capacity"), "breaking_capacity"));
    profile.due_dates = read_due_dates(ObjectReader(top.at("due_dates"), "due_dates"));
    profile.rules = read_rules(ObjectReader(top.at("rules"), "rules"));
    top.finish();
    return profile;
}

}  // namespace

const RuleCase& RulesProfile::rule_case(std::string_view rule_id, std::string_view case_name) const {
    // A parsed profile holds every case of the rule table; reaching past it is a programming error
    // (std::out_of_range, as map::at gives).
    const auto rule = rules.find(rule_id);
    if (rule == rules.end()) throw std::out_of_range("rules profile: no rule " + std::string(rule_id));
    const auto found = rule->second.find(case_name);
    if (found == rule->second.end())
        throw std::out_of_range("rules profile: no case " + std::string(case_name) + " of rule " + std::string(rule_id));
    return found->second;
}

Result<RulesProfile> parse_rules_profile(std::string_view json_text) {
    json document;
    try {
        document = json::parse(json_text);
    } catch (const json::parse_error& error) {
        return problem("(document)", std::string("expected JSON: ") + error.what());
    }
    try {
        return read_profile(document);
    } catch (const ProfileError& error) {
        return error.problem;
    } catch (const json::exception& error) {
        return problem("(document)", error.what());
    }
}

}  // namespace mendwright::rules
