#pragma once
// Writing a file so that nothing half-written is ever left under its name: the content goes to
// a temporary file in the same folder, which is renamed into place only once it is complete.
// A failure removes the temporary file and leaves any earlier file at the target untouched.

#include <filesystem>
#include <functional>
#include <optional>

#include "planner/core/result.hpp"

namespace mendwright::spreadsheet {

// `write` writes the whole content to the path it is given and returns a Problem on failure.
// Errors name the target: "<target>: the folder /x does not exist".
Result<std::filesystem::path> replace_file(const std::filesystem::path& target,
                                           const std::function<std::optional<Problem>(const std::filesystem::path&)>& write);

}  // namespace mendwright::spreadsheet
