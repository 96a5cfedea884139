#pragma once
// Re-verification: apply an option to a copy of the installation, run the same rules again and
// compare the findings by id. The option's own claims play no part in the verdict.
//
// For speed on large installations an option that changes only some boards is verified on a
// view of the installation: the boards it touches and everything below them, the chain of
// boards above them, and everything below the board of the furthest RCD or RCBO above them (so
// that the rules adding up over every circuit below an RCD see them all). The same view of the
// unchanged installation is the "before". The view's verdict is the whole installation's
// verdict when the option changed nothing outside the touched boards and those below (checked
// on the copy, not taken from the option), targets no installation-wide finding, and no
// installation-wide finding comes or goes; otherwise, and for options at the origin and every
// plan (combined_copy), the whole installation is assessed. Tests compare the two verdicts for
// every option on the demo jobs and on random installations.

#include <functional>
#include <map>
#include <memory>
#include <unordered_map>
#include <string>
#include <vector>

#include "planner/model/installation.hpp"
#include "planner/remedies/option.hpp"
#include "planner/rules/finding.hpp"

namespace mendwright::remedies {

// The rules, as the caller configured them (profile and all).
using Assessor = std::function<std::vector<rules::Finding>(const model::Installation&)>;

// Compares findings before and after by id. `targets` are the ids the option aimed at.
Verification compare_findings(const std::vector<rules::Finding>& before, const std::vector<rules::Finding>& after,
                              const std::vector<std::string>& targets);

class Verifier {
public:
    struct BoardTree;  // parents, children and feeding circuits by board id (verify.cpp)

    Verifier(const model::Installation& installation, Assessor assess);
    ~Verifier();
    Verifier(const Verifier&) = delete;
    Verifier& operator=(const Verifier&) = delete;

    [[nodiscard]] const std::vector<rules::Finding>& baseline() const { return baseline_; }
    [[nodiscard]] const model::Installation& installation() const { return installation_; }

    // Applies the option to a copy (or a view) and compares. Sets nothing on the option.
    Verification verify(const Option& option);
    // The same on the whole installation, never a view (tests compare the two).
    Verification verify_whole(const Option& option);

    // Every option of a plan applied to one copy, in the order given; the rules run on it.
    [[nodiscard]] model::Installation combined_copy(const std::vector<const Option*>& options) const;
    std::vector<rules::Finding> assess(const model::Installation& installation) const { return assess_(installation); }

private:
    const model::Installation& installation_;
    Assessor assess_;
    std::vector<rules::Finding> baseline_;
    std::unordered_map<std::string, std::string> baseline_boards_;  // finding id -> its board (empty: installation-wide)
    std::map<std::string, std::vector<rules::Finding>> view_baselines_;  // by view key
    std::unique_ptr<BoardTree> tree_;  // the surveyed installation's board tree, walked once
};

// The view described above of `boards` (touched boards). Exposed for tests.
model::Installation board_view(const model::Installation& installation, const std::vector<std::string>& boards);

// Verifies every option (sets option.verification).
void verify_options(Verifier& verifier, std::vector<Option>& options);

}  // namespace mendwright::remedies
