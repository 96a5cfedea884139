#include "planner/pricing/csv.hpp"

namespace mendwright::pricing {

Result<std::vector<CsvRecord>> parse_csv(std::string_view text, std::string_view file_name) {
    if (text.substr(0, 3) == "\xEF\xBB\xBF") text.remove_prefix(3);

    std::vector<CsvRecord> records;
    CsvRecord record;
    std::string field;
    bool in_quotes = false;
    bool field_was_quoted = false;
    bool record_has_content = false;  // any character seen since the record began
    int line = 1;
    int quote_line = 0;
    record.line = 1;

    auto end_field = [&] {
        record.fields.push_back(std::move(field));
        field.clear();
        field_was_quoted = false;
    };
    auto end_record = [&] {
        if (record_has_content) {
            end_field();
            records.push_back(std::move(record));
        }
        record = CsvRecord{};
        field.clear();
        field_was_quoted = false;
        record_has_content = false;
    };

    for (std::size_t i = 0; i < text.size(); ++i) {
        const char c = text[i];
        if (in_quotes) {
            if (c == '"') {
                if (i + 1 < text.size() && text[i + 1] == '"') {
                    field += '"';
                    ++i;
                } else {
                    in_quotes = false;
                }
            } else {
                if (c == '\n') ++line;
                field += c;
            }
            continue;
        }
        if (c == '\r' && i + 1 < text.size() && text[i + 1] == '\n') continue;  // CRLF: the LF ends it
        if (c == '\n' || c == '\r') {
            end_record();
            ++line;
            record.line = line;
            continue;
        }
        if (!record_has_content) record.line = line;
        record_has_content = true;
        if (c == ',') {
            end_field();
        } else if (c == '"') {
            if (!field.empty() || field_was_quoted) {
                return problem(std::string(file_name) + ":" + std::to_string(line),
                               "a quote (\") may only open a field; inside a quoted field write it twice (\"\")");
            }
            in_quotes = true;
            field_was_quoted = true;
            quote_line = line;
        } else {
            if (field_was_quoted) {
                return problem(std::string(file_name) + ":" + std::to_string(line),
                               "expected a comma or the end of the line after a closing quote, got '" +
                                   std::string(1, c) + "'");
            }
            field += c;
        }
    }
    if (in_quotes) {
        return problem(std::string(file_name) + ":" + std::to_string(quote_line),
                       "unterminated quoted field: expected a closing quote (\") before the end of the file");
    }
    end_record();
    return records;
}

}  // namespace mendwright::pricing
