#pragma once
// Reading one JSON object field by field, with every problem recorded against its JSON path.
// Used by the survey reader; each accessor records what was expected when the value is wrong
// and returns nothing, so the reader carries on and reports every problem in one pass.

#include <nlohmann/json.hpp>

#include <optional>
#include <string>
#include <string_view>
#include <vector>

#include "planner/core/date.hpp"
#include "planner/io/survey_document.hpp"
#include "planner/io/survey_enums.hpp"

namespace mendwright::io {

using Json = nlohmann::ordered_json;

class Diagnostics {
public:
    void error(std::string path, std::string message);
    void warning(std::string path, std::string message);
    [[nodiscard]] bool has_errors() const;
    [[nodiscard]] bool has_error_at(const std::string& path) const;
    std::vector<Diagnostic> items;
};

// A value as it appears in messages: "\"32A\"", "true", "null", "-3", "an object", "an array".
std::string shown(const Json& value);

// A JSON number that is a whole number (2 or 2.0, not 2.5), or nothing.
std::optional<long long> whole_number_of(const Json& value);

// "boards[0]" + "id" -> "boards[0].id"; "" + "job" -> "job".
std::string field_path(const std::string& parent, std::string_view key);
std::string index_path(const std::string& parent, std::size_t index);

enum class Need { required, optional };

// Allowed range of a number. Below `minimum` (or at it, when exclusive) the value is impossible;
// above `maximum` too, and `maximum_hint` says why ("longer than any meter tails").
struct NumberRange {
    double minimum = 0.0;
    bool minimum_exclusive = true;
    std::optional<double> maximum;
    std::string maximum_hint;
};

inline NumberRange positive(std::optional<double> maximum = std::nullopt, std::string hint = "") {
    return {0.0, true, maximum, std::move(hint)};
}
inline NumberRange non_negative(std::optional<double> maximum = std::nullopt, std::string hint = "") {
    return {0.0, false, maximum, std::move(hint)};
}

class ObjectReader {
public:
    // Records "expected an object" when `json` is not one; every accessor then returns nothing.
    ObjectReader(const Json& json, std::string path, Diagnostics& diagnostics);

    [[nodiscard]] bool is_object() const { return object_ != nullptr; }
    [[nodiscard]] const std::string& path() const { return path_; }
    [[nodiscard]] std::string path_of(std::string_view key) const { return field_path(path_, key); }

    // The raw value of a field (nullptr when absent, or null and optional); marks the key known.
    const Json* field(std::string_view key, Need need, const std::string& expected);

    std::optional<std::string> text(std::string_view key, Need need, bool allow_empty = true);
    std::optional<double> number(std::string_view key, Need need, const NumberRange& range);
    std::optional<long long> whole_number(std::string_view key, Need need, long long minimum, long long maximum);
    std::optional<bool> flag(std::string_view key);  // optional, default decided by the caller
    std::optional<Date> date(std::string_view key, Need need);

    template <class Enum>
    std::optional<Enum> word(std::string_view key, Need need, const WordTable<Enum>& table) {
        // The message is put together only when it is needed (a survey has thousands of fields).
        const auto expected = [&] { return "expected one of " + word_list(table); };
        const Json* value = present(key, need, expected);
        if (!value) return std::nullopt;
        if (value->is_string())
            if (auto found = enum_of(table, value->get_ref<const std::string&>())) return found;
        diagnostics_.error(path_of(key), expected() + ", got " + shown(*value));
        return std::nullopt;
    }

    // Reports every field of the object that no accessor asked for.
    void reject_unknown_fields();

private:
    // field() with the "expected ..." text made by `expected()` only when the field is missing.
    template <class Expected>
    const Json* present(std::string_view key, Need need, const Expected& expected) {
        known_.push_back(key);
        if (!object_) return nullptr;
        const auto it = object_->find(key);
        const bool absent = it == object_->end() || (it->is_null() && need == Need::optional);
        if (absent) {
            if (need == Need::required) diagnostics_.error(path_of(key), "missing; " + expected());
            return nullptr;
        }
        return &*it;
    }

    const Json* object_ = nullptr;
    std::string path_;
    Diagnostics& diagnostics_;
    // The keys asked for; each accessor's key outlives the reader (the survey reader passes
    // string literals).
    std::vector<std::string_view> known_;
};

}  // namespace mendwright::io
