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
//
// verify_options shares the options out over the machine's cores (parallel.hpp): each option's
// copy, assessment and verdict are its own, and the views' "before" findings are all assessed
// and kept first, so the verifications only read what they share. The Assessor is therefore
// called from several threads at once and must be safe to (rules::assess with a profile that
// nothing changes meanwhile is).

#include <functional>
#include <map>
#include <memory>
#include <set>
#include <unordered_map>
#include <string>
#include <type_traits>
#include <vector>

#include "planner/model/installation.hpp"
#include "planner/remedies/option.hpp"
#include "planner/rules/finding.hpp"

namespace mendwright::remedies {

// The rules, as the caller configured them (profile and all). Made from a function of the
// installation and the rules::FindingDetail wanted, verification asks for verdicts only (no
// words: titles, places, inputs and explanations are never compared), which is most of the time
// the rules take on a large installation; made from a function of the installation alone, every
// assessment is a full one (same verdicts, slower).
//
//   remedies::Assessor assess = [&profile](const model::Installation& i, rules::FindingDetail detail) {
//       return rules::assess(i, profile, {detail});
//   };
class Assessor {
public:
    using Function = std::function<std::vector<rules::Finding>(const model::Installation&, rules::FindingDetail)>;

    Assessor() = default;
    template <typename F>
        requires(!std::is_same_v<std::remove_cvref_t<F>, Assessor> &&
                 std::is_invocable_r_v<std::vector<rules::Finding>, const F&, const model::Installation&, rules::FindingDetail>)
    Assessor(F function) : function_(std::move(function)) {}  // NOLINT: converts like std::function
    template <typename F>
        requires(!std::is_same_v<std::remove_cvref_t<F>, Assessor> &&
                 !std::is_invocable_v<const F&, const model::Installation&, rules::FindingDetail> &&
                 std::is_invocable_r_v<std::vector<rules::Finding>, const F&, const model::Installation&>)
    Assessor(F function)  // NOLINT: converts like std::function
        : function_([full = std::move(function)](const model::Installation& installation, rules::FindingDetail) {
              return full(installation);
          }) {}

    std::vector<rules::Finding> operator()(const model::Installation& installation,
                                           rules::FindingDetail detail = rules::FindingDetail::full) const {
        return function_(installation, detail);
    }
    explicit operator bool() const { return static_cast<bool>(function_); }

private:
    Function function_;
};

// Compares findings before and after by id. `targets` are the ids the option aimed at.
Verification compare_findings(const std::vector<rules::Finding>& before, const std::vector<rules::Finding>& after,
                              const std::vector<std::string>& targets);

class Verifier {
public:
    struct BoardTree;  // parents, children and feeding circuits by board id (verify.cpp)

    struct ViewPlan;      // which boards a view keeps, whole or cut down (verify.cpp)
    struct ViewBaseline;  // the findings of a view of the surveyed installation (verify.cpp)
    struct FindingIndex;  // finding id -> whether it is urgent (verify.cpp)

    Verifier(const model::Installation& installation, Assessor assess);
    ~Verifier();
    Verifier(const Verifier&) = delete;
    Verifier& operator=(const Verifier&) = delete;

    // The surveyed installation's findings in full (proposals, rankings and the quote read their
    // words); every other assessment the Verifier makes asks for verdicts only.
    [[nodiscard]] const std::vector<rules::Finding>& baseline() const { return baseline_; }
    [[nodiscard]] const model::Installation& installation() const { return installation_; }

    // Applies the option to a copy (or a view) and compares. Sets nothing on the option.
    Verification verify(const Option& option);
    // The same on the whole installation, never a view (tests compare the two).
    [[nodiscard]] Verification verify_whole(const Option& option) const;

    // Assesses and keeps the "before" of every view these options are verified on (the distinct
    // views shared over the cores), so that verify_prepared finds them all.
    void prepare(const std::vector<Option>& options);
    // verify() without keeping anything: a view not prepared is assessed and let go. Changes
    // nothing in the Verifier, so several threads may call it at once.
    [[nodiscard]] Verification verify_prepared(const Option& option) const;

    // Every option of a plan applied to one copy, in the order given; the rules run on it.
    [[nodiscard]] model::Installation combined_copy(const std::vector<const Option*>& options) const;
    // The rules on any installation; FindingDetail::verdict where only ids and codes are read.
    std::vector<rules::Finding> assess(const model::Installation& installation,
                                       rules::FindingDetail detail = rules::FindingDetail::full) const {
        return assess_(installation, detail);
    }

private:
    const model::Installation& installation_;
    Assessor assess_;
    std::vector<rules::Finding> baseline_;
    std::unordered_map<std::string, std::string> baseline_boards_;  // finding id -> its board (empty: installation-wide)
    std::unique_ptr<FindingIndex> baseline_index_;
    std::map<std::string, std::unique_ptr<const ViewBaseline>> view_baselines_;  // by view key; verdicts only
    std::unique_ptr<BoardTree> tree_;  // the surveyed installation's board tree, walked once

    struct Route;  // whole installation, or a view (verify.cpp)
    [[nodiscard]] Route route_of(const Option& option) const;
    [[nodiscard]] std::unique_ptr<const ViewBaseline> view_baseline(const ViewPlan& plan) const;
    [[nodiscard]] Verification verify_on_view(const Option& option, const Route& route, const ViewBaseline& before) const;
};

// The view described above of `boards` (touched boards). Exposed for tests.
model::Installation board_view(const model::Installation& installation, const std::vector<std::string>& boards);

// Verifies every option (sets option.verification), the options shared over the cores; the
// verdicts are those verify() gives one by one.
void verify_options(Verifier& verifier, std::vector<Option>& options);

}  // namespace mendwright::remedies
