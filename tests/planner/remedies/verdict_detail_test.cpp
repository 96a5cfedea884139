// Verification asks the rules for verdicts only (rules::FindingDetail::verdict: no titles,
// places, inputs or explanations). That is safe only if a verdict-only assessment finds exactly
// what the full one finds: the same findings in the same order with the same id, rule, code,
// board/circuit/device ids, origin, due date and price-book item. The reference here is the full
// assessment itself, on the three invented demo jobs, on seeded random invented installations
// (TT and TN-C-S, with recorded observations and new-work boards) and on every changed copy
// that verification sees for them (each proposed option applied). The verdicts given by a
// Verifier whose rules give full findings are compared with those of one asking for verdicts.
#include <catch2/catch.hpp>

#include <set>

#include "planner/remedies/proposals.hpp"
#include "planner/remedies/verify.hpp"
#include "planner/rules/assess.hpp"
#include "planner/rules/profile.hpp"
#include "tests/planner/remedies/random_installation.hpp"
#include "tests/planner/remedies/remedy_fixtures.hpp"

using namespace mendwright;

namespace {

// Full and verdict-only findings of one installation, field by field. Returns how many findings.
std::size_t compare_detail(const model::Installation& installation, const std::string& name) {
    const auto& profile = rules::default_rules_profile();
    const auto full = rules::assess(installation, profile);
    const auto verdict = rules::assess(installation, profile, {rules::FindingDetail::verdict});
    INFO(name);
    REQUIRE(verdict.size() == full.size());
    for (std::size_t i = 0; i < full.size(); ++i) {
        const auto& f = full[i];
        const auto& v = verdict[i];
        INFO(f.id);
        CHECK(v.id == f.id);
        CHECK(v.rule == f.rule);
        CHECK(v.code == f.code);
        CHECK(v.board_id == f.board_id);
        CHECK(v.circuit_id == f.circuit_id);
        CHECK(v.device_id == f.device_id);
        CHECK(v.origin == f.origin);
        CHECK(v.due == f.due);
        CHECK(v.due_text == f.due_text);
        CHECK(v.item_code == f.item_code);
        CHECK(v.item_quantity == f.item_quantity);
        // The words are left out (that is the point), and the full findings have them.
        CHECK(v.title.empty());
        CHECK(v.explanation.empty());
        CHECK(v.inputs.empty());
        CHECK(v.location.empty());
        CHECK(v.clause.empty());
        CHECK_FALSE(f.title.empty());
        CHECK_FALSE(f.location.empty());
    }
    return full.size();
}

// The installation and every copy verification makes of it (each proposed option applied).
std::size_t compare_with_every_option(const model::Installation& installation, const std::string& name) {
    std::size_t findings = compare_detail(installation, name);
    remedies::Verifier verifier(installation, remedy_test::shipped_rules());
    const auto settings = remedy_test::shipped_settings();
    const remedies::ProposalContext context{installation, verifier.baseline(), remedies::default_catalogue(), settings};
    for (const auto& option : remedies::propose_options(context)) {
        model::Installation copy = installation;
        if (option.apply) option.apply(copy);
        findings += compare_detail(copy, name + " with " + option.id);
    }
    return findings;
}

// A random installation with what the generator leaves out, so that every rule has a say:
// recorded observations (board, circuit and installation-wide), a new-work board without surge
// protection, and on odd seeds a TN-C-S supply (Table 41.3 Zs maxima) or RA not recorded.
model::Installation varied_installation(unsigned seed) {
    model::Installation installation = remedy_test::random_installation(seed, 6, 5);
    installation.observations.push_back({"o1", "Invented: cracked socket-outlet", model::ObservationCode::c2, "b0",
                                         std::nullopt, std::string("SOCKET-REPLACE"), 2.0});
    installation.observations.push_back({"o2", "Invented: no circuit chart", model::ObservationCode::c3, std::nullopt,
                                         std::nullopt, std::nullopt, 1.0});
    installation.observations.push_back({"o3", "Invented: scorched terminal", model::ObservationCode::fi, std::nullopt,
                                         installation.boards.back().circuits.front().id, std::nullopt, 1.0});
    installation.boards[1].new_work = true;
    installation.boards[1].enclosure = model::EnclosureMaterial::combustible;
    if (seed % 4 == 1) installation.supply.earthing = model::EarthingArrangement::tn_c_s;
    if (seed % 4 == 3) installation.electrode->measured_ra_ohms.reset();
    if (seed % 5 == 0) installation.supply.prospective_fault_current_ka = 16.0;  // over the breakers' 6 kA
    return installation;
}

}  // namespace

TEST_CASE("rules verdict-only assessment: the same findings, ids and codes as the full one on the demo jobs",
          "[remedies][verify][detail]") {
    const auto jobs = remedy_test::demo_installations();
    std::size_t findings = 0;
    for (const auto& job : jobs) findings += compare_with_every_option(job.installation, job.file_name);
    CHECK(jobs.size() == 3);
    CHECK(findings > 100);
}

TEST_CASE("rules verdict-only assessment: the same findings, ids and codes as the full one on seeded random installations",
          "[remedies][verify][detail]") {
    std::size_t findings = 0;
    std::set<std::string> rules_seen;
    for (unsigned seed = 1; seed <= 40; ++seed) {
        const auto installation = varied_installation(seed);
        for (const auto& f : rules::assess(installation, rules::default_rules_profile())) rules_seen.insert(f.rule);
        findings += compare_with_every_option(installation, "seed " + std::to_string(seed));
    }
    CHECK(findings > 1000);
    // Every rule of the table spoke at least once, so every rule's verdict-only path was compared.
    for (const char* rule : {"tt.fault_protection", "additional_protection", "electrode.resistance", "electrode.worst_season",
                             "tails.origin_protection", "rcd.selectivity", "rcd.standing_leakage", "zs.maximum",
                             "device.breaking_capacity", "rcd.trip_time", "board.combustible_enclosure", "recorded",
                             "new_work.additional_protection", "new_work.enclosure", "new_work.surge_protection"}) {
        INFO(rule);
        CHECK(rules_seen.count(rule) == 1);
    }
}

TEST_CASE("remedies verification: verdict-only rules give the same verdict for every option as full rules",
          "[remedies][verify][detail]") {
    // Rules made from a function of the installation alone always give full findings.
    const remedies::Assessor full_rules = [](const model::Installation& installation) {
        return rules::assess(installation, rules::default_rules_profile());
    };
    int compared = 0;
    for (unsigned seed = 1; seed <= 12; ++seed) {
        const auto installation = varied_installation(seed);
        remedies::Verifier fast(installation, remedy_test::shipped_rules());
        remedies::Verifier slow(installation, full_rules);
        REQUIRE(fast.baseline().size() == slow.baseline().size());
        for (std::size_t i = 0; i < fast.baseline().size(); ++i) {
            // The baseline stays in full: proposals, rankings and the quote read its words.
            CHECK(fast.baseline()[i].explanation == slow.baseline()[i].explanation);
            CHECK(fast.baseline()[i].title == slow.baseline()[i].title);
        }
        const auto settings = remedy_test::shipped_settings();
        const remedies::ProposalContext context{installation, fast.baseline(), remedies::default_catalogue(), settings};
        for (const auto& option : remedies::propose_options(context)) {
            INFO("seed " << seed << ": " << option.id);
            const auto a = fast.verify(option);
            const auto b = slow.verify(option);
            remedy_test::check_same_verdict(a, b);
            ++compared;
        }
    }
    CHECK(compared > 50);
}
