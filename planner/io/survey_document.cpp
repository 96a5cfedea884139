#include "planner/io/survey_document.hpp"

#include <algorithm>
#include <set>

#include "planner/io/json_fields.hpp"
#include "planner/io/survey_checks.hpp"
#include "planner/io/survey_reader.hpp"
#include "planner/io/survey_writer.hpp"

namespace mendwright::io {

std::string Diagnostic::to_string() const { return path.empty() ? message : path + ": " + message; }

bool SurveyLoad::ok() const {
    for (const auto& d : diagnostics)
        if (d.severity == Severity::error) return false;
    return true;
}

std::vector<Diagnostic> SurveyLoad::errors() const {
    std::vector<Diagnostic> result;
    for (const auto& d : diagnostics)
        if (d.severity == Severity::error) result.push_back(d);
    return result;
}

std::vector<Diagnostic> SurveyLoad::warnings() const {
    std::vector<Diagnostic> result;
    for (const auto& d : diagnostics)
        if (d.severity == Severity::warning) result.push_back(d);
    return result;
}

namespace {

// Parses the text, recording each key that appears twice in one object (JSON parsers keep
// only one of the two values, which would silently drop the other).
std::optional<Json> parse_json(std::string_view text, Diagnostics& d) {
    // One frame per open object or array. Frames are reused as the parser goes in and out (no
    // allocation per object), and JSON paths are put together only for a key that repeats.
    struct Frame {
        bool is_array = false;
        std::size_t index = 0;
        std::vector<std::string> keys;  // an object's keys so far (a handful: a linear search)
        std::size_t key_count = 0;
    };
    std::vector<Frame> stack;
    std::size_t depth = 0;
    const auto path_of_open = [&]() {  // the path of the innermost open object or array
        std::string path;
        for (std::size_t i = 1; i < depth; ++i) {
            const Frame& parent = stack[i - 1];
            path = parent.is_array ? index_path(path, parent.index) : field_path(path, parent.keys[parent.key_count - 1]);
        }
        return path;
    };
    const auto value_done = [&] {
        if (depth > 0 && stack[depth - 1].is_array) ++stack[depth - 1].index;
    };
    const Json::parser_callback_t callback = [&](int, Json::parse_event_t event, Json& parsed) {
        switch (event) {
            case Json::parse_event_t::object_start:
            case Json::parse_event_t::array_start: {
                if (depth == stack.size()) stack.emplace_back();
                Frame& frame = stack[depth++];
                frame.is_array = event == Json::parse_event_t::array_start;
                frame.index = 0;
                frame.key_count = 0;
                break;
            }
            case Json::parse_event_t::key: {
                Frame& top = stack[depth - 1];
                const auto& key = parsed.get_ref<const std::string&>();
                const auto begin = top.keys.begin();
                const auto end = begin + static_cast<std::ptrdiff_t>(top.key_count);
                const bool repeated = std::find(begin, end, key) != end;
                if (top.key_count == top.keys.size()) top.keys.emplace_back();
                top.keys[top.key_count++] = key;
                if (repeated)
                    d.error(field_path(path_of_open(), key), "appears twice in the same object; expected each field once");
                break;
            }
            case Json::parse_event_t::object_end:
            case Json::parse_event_t::array_end:
                if (depth > 0) --depth;
                value_done();
                break;
            case Json::parse_event_t::value:
                value_done();
                break;
        }
        return true;
    };
    try {
        return Json::parse(text.begin(), text.end(), callback, true, false);
    } catch (const Json::parse_error& e) {
        // what(): "[json.exception.parse_error.101] parse error at line 3, column 5: ..."
        std::string message = e.what();
        if (const auto at = message.find("parse error"); at != std::string::npos) message = message.substr(at);
        d.items.clear();
        d.error("", "not valid JSON: " + message);
    } catch (const std::exception& e) {
        d.items.clear();
        d.error("", std::string("not valid JSON: ") + e.what());
    }
    return std::nullopt;
}

// The format and version gate: anything else in a document of another format or a newer
// version may mean something different, so nothing more is read.
bool check_format_and_version(const Json& root, Diagnostics& d) {
    if (!root.is_object()) {
        d.error("", "expected a JSON object with \"format\": \"" + std::string(survey_format_name) + "\", got " + shown(root));
        return false;
    }
    const auto format = root.find("format");
    if (format == root.end()) {
        d.error("format", "missing; expected \"" + std::string(survey_format_name) + "\"");
        return false;
    }
    if (!format->is_string() || format->get<std::string>() != survey_format_name) {
        d.error("format", "expected \"" + std::string(survey_format_name) + "\", got " + shown(*format) +
                              "; this is not a Mendwright survey document");
        return false;
    }
    const auto version = root.find("version");
    if (version == root.end()) {
        d.error("version", "missing; expected a whole number (this program reads version " +
                               std::to_string(survey_format_version) + ")");
        return false;
    }
    const std::optional<long long> number = whole_number_of(*version);
    if (!number || *number < 1) {
        d.error("version", "expected a whole number >= 1, got " + shown(*version));
        return false;
    }
    if (*number > survey_format_version) {
        d.error("version", "this document is version " + std::to_string(*number) +
                               " of the survey format; this program reads version " +
                               std::to_string(survey_format_version) +
                               " and older. Open it with a newer Mendwright; it has not been changed");
        return false;
    }
    return true;
}

}  // namespace

SurveyLoad read_survey(std::string_view json_text) {
    SurveyLoad load;
    Diagnostics d;
    try {
        const std::optional<Json> root = parse_json(json_text, d);
        if (root && check_format_and_version(*root, d)) {
            model::Installation installation = read_installation(*root, d);
            check_installation(installation, d);
            if (!d.has_errors()) load.installation = std::move(installation);
        }
    } catch (const std::exception& e) {  // keeps the promise never to throw (e.g. out of memory)
        d.error("", std::string("could not read the document: ") + e.what());
    }
    load.diagnostics = std::move(d.items);
    return load;
}

std::string write_survey(const model::Installation& installation) {
    return installation_json(installation).dump(2, ' ', false, Json::error_handler_t::replace) + "\n";
}

}  // namespace mendwright::io
