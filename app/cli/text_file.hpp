#pragma once
// Reading a whole input file (survey, rules profile) for a command, in one read where the size
// is known. On failure it writes "<who>: <path>: cannot read: <reason>" to `err` and returns
// nothing; the command then exits with exit_failure.
//
//   auto text = read_text_file(path, context.err, "mendwright-cli validate");

#include <optional>
#include <ostream>
#include <string>
#include <string_view>

namespace mendwright::cli {

std::optional<std::string> read_text_file(const std::string& path, std::ostream& err, std::string_view who);

}  // namespace mendwright::cli
