#pragma once
// Re-verification: apply an option to a copy of the installation, run the same rules again and
// compare the findings by id. The option's own claims play no part in the verdict.
//
// For speed on large installations an option that changes only some boards is verified on a
// view of the installation: the boards it touches, every board below them and the chain of
// boards above them (with that chain's other submains kept as cables to boards left out). The
// same view of the unchanged installation is the "before", so what the view leaves out is the
// same on both sides. Options at the origin, and every plan (combined_findings), are verified on
// the whole installation.

#include <functional>
#include <map>
#include <unordered_set>
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
    Verifier(const model::Installation& installation, Assessor assess);

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
    std::unordered_set<std::string> baseline_ids_;
    std::map<std::string, std::vector<rules::Finding>> view_baselines_;  // by view key
};

// The view described above: `boards` and everything below and above them. Exposed for tests.
model::Installation board_view(const model::Installation& installation, const std::vector<std::string>& boards);

// Verifies every option (sets option.verification).
void verify_options(Verifier& verifier, std::vector<Option>& options);

}  // namespace mendwright::remedies
