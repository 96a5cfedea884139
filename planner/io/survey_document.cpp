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

// Builds the document (nlohmann's own DOM builder does the building) while recording each key
// that appears twice in one object (JSON parsers keep only one of the two values, which would
// silently drop the other). A SAX handler rather than a parse callback: the callback parser
// builds every value twice over and calls back for each, which on a large survey was most of
// the reading time.
class DuplicateKeyCheck {
public:
    using number_integer_t = Json::number_integer_t;
    using number_unsigned_t = Json::number_unsigned_t;
    using number_float_t = Json::number_float_t;
    using string_t = Json::string_t;
    using binary_t = Json::binary_t;

    DuplicateKeyCheck(Json& root, Diagnostics& d) : dom_(root, true), d_(d) {}

    bool null() { return value_done(dom_.null()); }
    bool boolean(bool value) { return value_done(dom_.boolean(value)); }
    bool number_integer(number_integer_t value) { return value_done(dom_.number_integer(value)); }
    bool number_unsigned(number_unsigned_t value) { return value_done(dom_.number_unsigned(value)); }
    bool number_float(number_float_t value, const string_t& text) { return value_done(dom_.number_float(value, text)); }
    bool string(string_t& value) { return value_done(dom_.string(value)); }
    bool binary(binary_t& value) { return value_done(dom_.binary(value)); }

    bool start_object(std::size_t length) { return open(false) && dom_.start_object(length); }
    bool start_array(std::size_t length) { return open(true) && dom_.start_array(length); }
    bool end_object() { return close() && dom_.end_object() && value_done(true); }
    bool end_array() { return close() && dom_.end_array() && value_done(true); }

    bool key(string_t& key) {
        Frame& top = stack_[depth_ - 1];
        const auto begin = top.keys.begin();
        const auto end = begin + static_cast<std::ptrdiff_t>(top.key_count);
        const bool repeated = std::find(begin, end, key) != end;
        if (top.key_count == top.keys.size()) top.keys.emplace_back();
        top.keys[top.key_count++] = key;
        if (repeated) d_.error(field_path(path_of_open(), key), "appears twice in the same object; expected each field once");
        return dom_.key(key);
    }

    template <class Exception>
    bool parse_error(std::size_t position, const std::string& token, const Exception& error) {
        return dom_.parse_error(position, token, error);  // throws it
    }

private:
    // One frame per open object or array. Frames are reused as the parser goes in and out (no
    // allocation per object), and JSON paths are put together only for a key that repeats.
    struct Frame {
        bool is_array = false;
        std::size_t index = 0;
        std::vector<std::string> keys;  // an object's keys so far (a handful: a linear search)
        std::size_t key_count = 0;
    };

    bool open(bool is_array) {
        if (depth_ == stack_.size()) stack_.emplace_back();
        Frame& frame = stack_[depth_++];
        frame.is_array = is_array;
        frame.index = 0;
        frame.key_count = 0;
        return true;
    }
    bool close() {
        if (depth_ > 0) --depth_;
        return true;
    }
    bool value_done(bool ok) {
        if (depth_ > 0 && stack_[depth_ - 1].is_array) ++stack_[depth_ - 1].index;
        return ok;
    }
    // The path of the innermost open object or array.
    std::string path_of_open() const {
        std::string path;
        for (std::size_t i = 1; i < depth_; ++i) {
            const Frame& parent = stack_[i - 1];
            path = parent.is_array ? index_path(path, parent.index) : field_path(path, parent.keys[parent.key_count - 1]);
        }
        return path;
    }

    nlohmann::detail::json_sax_dom_parser<Json> dom_;
    Diagnostics& d_;
    std::vector<Frame> stack_;
    std::size_t depth_ = 0;
};

// Parses the text, recording each key that appears twice in one object.
std::optional<Json> parse_json(std::string_view text, Diagnostics& d) {
    try {
        Json root;
        DuplicateKeyCheck handler(root, d);
        Json::sax_parse(text.begin(), text.end(), &handler, nlohmann::detail::input_format_t::json, true, false);
        return std::optional<Json>(std::move(root));
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
