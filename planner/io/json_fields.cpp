#include "planner/io/json_fields.hpp"

#include <algorithm>
#include <cmath>

#include "planner/core/checks.hpp"

namespace mendwright::io {

void Diagnostics::error(std::string path, std::string message) {
    items.push_back({Severity::error, std::move(path), std::move(message)});
}

void Diagnostics::warning(std::string path, std::string message) {
    items.push_back({Severity::warning, std::move(path), std::move(message)});
}

bool Diagnostics::has_errors() const {
    return std::any_of(items.begin(), items.end(), [](const Diagnostic& d) { return d.severity == Severity::error; });
}

bool Diagnostics::has_error_at(const std::string& path) const {
    return std::any_of(items.begin(), items.end(),
                       [&](const Diagnostic& d) { return d.severity == Severity::error && d.path == path; });
}

std::string shown(const Json& value) {
    if (value.is_object()) return "an object";
    if (value.is_array()) return "an array";
    if (value.is_number_float()) return number_text(value.get<double>());
    std::string text = value.dump(-1, ' ', false, Json::error_handler_t::replace);
    if (text.size() > 60) text = text.substr(0, 57) + "...";
    return text;
}

std::optional<long long> whole_number_of(const Json& value) {
    if (!value.is_number()) return std::nullopt;
    const double number = value.get<double>();
    // Beyond 1e15 a double no longer tells whole numbers apart reliably; no field needs such values.
    if (!std::isfinite(number) || std::floor(number) != number || std::fabs(number) >= 1e15) return std::nullopt;
    return static_cast<long long>(number);
}

std::string field_path(const std::string& parent, std::string_view key) {
    return parent.empty() ? std::string(key) : parent + "." + std::string(key);
}

std::string index_path(const std::string& parent, std::size_t index) {
    return parent + "[" + std::to_string(index) + "]";
}

namespace {

// Levenshtein distance, to suggest the field a misspelt one was meant to be.
std::size_t edit_distance(std::string_view a, std::string_view b) {
    std::vector<std::size_t> row(b.size() + 1);
    for (std::size_t j = 0; j <= b.size(); ++j) row[j] = j;
    for (std::size_t i = 1; i <= a.size(); ++i) {
        std::size_t diagonal = row[0];
        row[0] = i;
        for (std::size_t j = 1; j <= b.size(); ++j) {
            const std::size_t above = row[j];
            row[j] = std::min({row[j] + 1, row[j - 1] + 1, diagonal + (a[i - 1] == b[j - 1] ? 0 : 1)});
            diagonal = above;
        }
    }
    return row[b.size()];
}

std::string range_text(const NumberRange& range) {
    std::string text = "a number " + std::string(range.minimum_exclusive ? "> " : ">= ") + number_text(range.minimum);
    if (range.maximum) text += " and <= " + number_text(*range.maximum);
    return text;
}

}  // namespace

ObjectReader::ObjectReader(const Json& json, std::string path, Diagnostics& diagnostics)
    : path_(std::move(path)), diagnostics_(diagnostics) {
    if (json.is_object()) object_ = &json;
    else diagnostics_.error(path_, "expected an object, got " + shown(json));
}

const Json* ObjectReader::field(std::string_view key, Need need, const std::string& expected) {
    return present(key, need, [&] { return expected; });
}

std::optional<std::string> ObjectReader::text(std::string_view key, Need need, bool allow_empty) {
    const auto expected = [allow_empty] {
        return std::string(allow_empty ? "expected a string" : "expected a non-empty string");
    };
    const Json* value = present(key, need, expected);
    if (!value) return std::nullopt;
    if (!value->is_string() || (!allow_empty && value->get_ref<const std::string&>().empty())) {
        diagnostics_.error(path_of(key), expected() + ", got " + shown(*value));
        return std::nullopt;
    }
    return value->get<std::string>();
}

std::optional<double> ObjectReader::number(std::string_view key, Need need, const NumberRange& range) {
    const auto expected = [&] { return "expected " + range_text(range); };
    const Json* value = present(key, need, expected);
    if (!value) return std::nullopt;
    if (!value->is_number()) {
        diagnostics_.error(path_of(key), expected() + ", got " + shown(*value));
        return std::nullopt;
    }
    const double number = value->get<double>();
    const bool too_small = range.minimum_exclusive ? !(number > range.minimum) : !(number >= range.minimum);
    const bool too_large = range.maximum && number > *range.maximum;
    if (!std::isfinite(number) || too_small || too_large) {
        std::string message = expected() + ", got " + shown(*value);
        if (too_large && !range.maximum_hint.empty()) message += " (" + range.maximum_hint + ")";
        diagnostics_.error(path_of(key), message);
        return std::nullopt;
    }
    return number;
}

std::optional<long long> ObjectReader::whole_number(std::string_view key, Need need, long long minimum, long long maximum) {
    const auto expected = [&] {
        return "expected a whole number from " + std::to_string(minimum) + " to " + std::to_string(maximum);
    };
    const Json* value = present(key, need, expected);
    if (!value) return std::nullopt;
    if (auto number = whole_number_of(*value); number && *number >= minimum && *number <= maximum) return number;
    diagnostics_.error(path_of(key), expected() + ", got " + shown(*value));
    return std::nullopt;
}

std::optional<bool> ObjectReader::flag(std::string_view key) {
    const Json* value = present(key, Need::optional, [] { return std::string("expected true or false"); });
    if (!value) return std::nullopt;
    if (!value->is_boolean()) {
        diagnostics_.error(path_of(key), "expected true or false, got " + shown(*value));
        return std::nullopt;
    }
    return value->get<bool>();
}

std::optional<Date> ObjectReader::date(std::string_view key, Need need) {
    const Json* value = present(key, need, [] { return std::string("expected a date as YYYY-MM-DD"); });
    if (!value) return std::nullopt;
    if (!value->is_string()) {
        diagnostics_.error(path_of(key), "expected a date as YYYY-MM-DD, got " + shown(*value));
        return std::nullopt;
    }
    auto parsed = parse_iso_date(value->get_ref<const std::string&>(), path_of(key));
    if (!parsed) {
        diagnostics_.error(parsed.problem().field, parsed.problem().message);
        return std::nullopt;
    }
    return parsed.value();
}

void ObjectReader::reject_unknown_fields() {
    if (!object_) return;
    for (auto it = object_->begin(); it != object_->end(); ++it) {
        const std::string& key = it.key();
        if (std::find(known_.begin(), known_.end(), std::string_view(key)) != known_.end()) continue;
        std::string message = "unknown field (not part of " + std::string(survey_format_name) + " version " +
                              std::to_string(survey_format_version) + ")";
        std::string best;
        std::size_t best_distance = 3;  // suggest only near misses
        for (const auto& candidate : known_) {
            const std::size_t distance = edit_distance(key, candidate);
            if (distance < best_distance && object_->find(candidate) == object_->end()) {
                best = std::string(candidate);
                best_distance = distance;
            }
        }
        if (!best.empty()) message += "; did you mean \"" + best + "\"?";
        diagnostics_.error(path_of(key), message);
    }
}

}  // namespace mendwright::io
