#pragma once
// A finding: what the rules (or the inspector) say about one place in the installation.
// Findings have stable ids (rule + location) so that a re-assessment, a remedy's
// re-verification and the job store can recognise the same finding again.

#include <optional>
#include <string>
#include <vector>

#include "planner/core/date.hpp"

namespace mendwright::rules {

// C1 danger present; C2 potentially dangerous; C3 improvement recommended; FI further
// investigation; note = advice that carries no code.
enum class Code { c1, c2, c3, fi, note };

std::string code_text(Code code);                 // "C1", "C2", "C3", "FI", "note"
std::optional<Code> parse_code(std::string_view text);
bool is_urgent(Code code);                        // C1, C2 and FI (condition report practice)

enum class FindingOrigin { derived, recorded };   // by a rule, or recorded by the inspector

struct FindingInput {
    std::string name;   // "RA", "IΔn", "month measured"
    std::string value;  // as shown: "310"
    std::string unit;   // "Ω", "A", ""
};

struct Finding {
    std::string id;           // stable: "<rule>@<location key>", e.g. "tt.fault_protection@circuit:c3"
    std::string rule;         // rule id, e.g. "tt.fault_protection"; "recorded" for observations
    Code code = Code::note;
    std::string title;        // in the trade's words
    std::string board_id;     // empty when installation-wide
    std::string circuit_id;   // empty when not about one circuit
    std::string device_id;    // empty when not about one device
    std::string location;     // readable: "Consumer unit, hall / circuit 3 Kitchen sockets"
    std::string clause;       // "BS 7671:2018+A2 411.5.3"
    std::vector<FindingInput> inputs;
    std::string explanation;  // with the arithmetic: "RA 310 Ω × IΔn 0.1 A = 31 V ≤ 50 V"
    FindingOrigin origin = FindingOrigin::derived;
    std::optional<Date> due;  // urgent findings with a statutory or profile deadline
    std::string due_text;     // "2027-01-03", or "as agreed" where no deadline applies
    std::optional<std::string> item_code;  // recorded observations: price-book item for the fix
    double item_quantity = 1.0;

    [[nodiscard]] bool urgent() const { return is_urgent(code); }
};

// How much of each finding an assessment fills in. `verdict` is for re-verification, which
// runs the rules hundreds of times and compares findings by id and code only: the findings,
// their order, ids, rule, code, board/circuit/device ids, origin, due date and price-book item
// are the same as in `full`, while the words people read (title, location, clause, inputs,
// explanation) are left empty.
enum class FindingDetail { full, verdict };

struct AssessOptions {
    FindingDetail detail = FindingDetail::full;
};

}  // namespace mendwright::rules
