#pragma once
// Comma-separated text as spreadsheets write it (RFC 4180): fields in double quotes may hold
// commas, line breaks and doubled quotes (""); CRLF or LF line ends; a UTF-8 byte-order mark at
// the start is skipped. Blank lines are skipped. Records keep the line they start on, so that
// validation messages can name it.

#include <string>
#include <string_view>
#include <vector>

#include "planner/core/result.hpp"

namespace mendwright::pricing {

struct CsvRecord {
    int line = 0;  // 1-based line of the file where the record starts
    std::vector<std::string> fields;
};

// `file_name` only names the text in messages: "items.csv:7: unterminated quoted field ...".
Result<std::vector<CsvRecord>> parse_csv(std::string_view text, std::string_view file_name);

}  // namespace mendwright::pricing
