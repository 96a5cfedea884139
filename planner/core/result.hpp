#pragma once
// One error type for the whole engine: a field path and what was expected there.
// Functions that can fail on bad input return Result<T>; nothing in planner throws for bad input.

#include <cassert>
#include <string>
#include <utility>
#include <variant>

namespace mendwright {

// What went wrong and where. `field` names the input: a parameter name in calc
// ("length_m"), a JSON path in io ("boards[0].circuits[3].device.rating_amps"), a CSV
// position in the price book ("items.csv:12:material_pence").
struct Problem {
    std::string field;
    std::string message;  // what was expected, and what was given: "expected a number > 0, got -3"

    [[nodiscard]] std::string to_string() const { return field.empty() ? message : field + ": " + message; }
};

template <class T>
class [[nodiscard]] Result {
public:
    Result(T value) : state_(std::move(value)) {}  // NOLINT(google-explicit-constructor)
    Result(Problem problem) : state_(std::move(problem)) {}  // NOLINT(google-explicit-constructor)

    [[nodiscard]] bool ok() const { return std::holds_alternative<T>(state_); }
    explicit operator bool() const { return ok(); }

    [[nodiscard]] const T& value() const& { assert(ok()); return std::get<T>(state_); }
    [[nodiscard]] T& value() & { assert(ok()); return std::get<T>(state_); }
    [[nodiscard]] T&& value() && { assert(ok()); return std::get<T>(std::move(state_)); }
    [[nodiscard]] const Problem& problem() const { assert(!ok()); return std::get<Problem>(state_); }

    const T& operator*() const& { return value(); }
    const T* operator->() const { return &value(); }

private:
    std::variant<T, Problem> state_;
};

inline Problem problem(std::string field, std::string message) {
    return Problem{std::move(field), std::move(message)};
}

}  // namespace mendwright
