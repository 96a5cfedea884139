#pragma once
// Errors of the job store, as values: nothing in the store's API throws. Every error says what
// went wrong and where (`field`: a URL, a job id, "findings[3].id"), and has a kind, so that a
// caller can tell a save conflict (reload and edit again) from a broken database.

#include <cassert>
#include <string>
#include <utility>
#include <variant>

namespace mendwright::store {

enum class ErrorKind {
    invalid_input,    // the caller passed something the store cannot hold (bad date, unknown state)
    not_found,        // no such job, revision or urgent item
    conflict,         // a save edited from an older revision than the latest one
    schema_too_new,   // the database was written by a newer Mendwright
    not_a_job_store,  // the file or database holds something else
    database,         // the driver or the server reported an error
};

std::string kind_text(ErrorKind kind);  // "conflict", "not found", ...

struct StoreError {
    ErrorKind kind = ErrorKind::database;
    std::string field;    // what the error is about; may be empty
    std::string message;  // what was expected, what was found, what to do

    [[nodiscard]] std::string to_string() const { return field.empty() ? message : field + ": " + message; }
};

inline StoreError store_error(ErrorKind kind, std::string field, std::string message) {
    return StoreError{kind, std::move(field), std::move(message)};
}

// The value of a store call that returns nothing else.
struct Done {};

template <class T>
class [[nodiscard]] Outcome {
public:
    Outcome(T value) : state_(std::move(value)) {}               // NOLINT(google-explicit-constructor)
    Outcome(StoreError error) : state_(std::move(error)) {}      // NOLINT(google-explicit-constructor)

    [[nodiscard]] bool ok() const { return std::holds_alternative<T>(state_); }
    explicit operator bool() const { return ok(); }

    [[nodiscard]] const T& value() const& { assert(ok()); return std::get<T>(state_); }
    [[nodiscard]] T& value() & { assert(ok()); return std::get<T>(state_); }
    [[nodiscard]] T&& value() && { assert(ok()); return std::get<T>(std::move(state_)); }
    [[nodiscard]] const StoreError& error() const { assert(!ok()); return std::get<StoreError>(state_); }

    const T& operator*() const& { return value(); }
    T& operator*() & { return value(); }
    const T* operator->() const { return &value(); }
    T* operator->() { return &value(); }

private:
    std::variant<T, StoreError> state_;
};

}  // namespace mendwright::store
