#include "planner/rules/finding.hpp"

namespace mendwright::rules {

std::string code_text(Code code) {
    switch (code) {
        case Code::c1: return "C1";
        case Code::c2: return "C2";
        case Code::c3: return "C3";
        case Code::fi: return "FI";
        case Code::note: return "note";
    }
    return "note";
}

std::optional<Code> parse_code(std::string_view text) {
    if (text == "C1") return Code::c1;
    if (text == "C2") return Code::c2;
    if (text == "C3") return Code::c3;
    if (text == "FI") return Code::fi;
    if (text == "note") return Code::note;
    return std::nullopt;
}

// Condition report practice: any C1, C2 or FI makes the report unsatisfactory and needs action.
bool is_urgent(Code code) { return code == Code::c1 || code == Code::c2 || code == Code::fi; }

}  // namespace mendwright::rules
