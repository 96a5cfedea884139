// assess as a whole: order, stable and unique ids, due dates (SI 2020/312 reg. 3, read: 28 days
// for a privately rented dwelling in England), summaries, the tree walk, and speed.
#include <catch2/catch.hpp>

#include <chrono>
#include <set>

#include "fixture_findings.hpp"
#include "fixture_installation.hpp"
#include "planner/model/navigation.hpp"
#include "planner/rules/context.hpp"

using namespace mendwright;
using namespace mendwright::test;

namespace {

// An invented TT dwelling with several problems at once: no RCD on c1 sockets (outdoor), long
// surface tails, a plastic board, RA 250 Ω.
model::Installation troubled() {
    auto installation = tt_dwelling(250.0, Date{2026, 2, 1});
    installation.tails.length_m = 4.0;
    installation.boards.push_back(board("cu", {main_switch("ms"), rcd("rcd1", 0.03, model::RcdDelay::general, "ms")},
                                        {circuit("c1", model::CircuitUse::sockets, breaker("cb1", model::BreakerCurve::b, 32), "ms"),
                                         circuit("c2", model::CircuitUse::lighting, breaker("cb2", model::BreakerCurve::b, 6), "rcd1")}));
    installation.boards[0].circuits[0].supplies_outdoor_equipment = true;
    installation.boards[0].enclosure = model::EnclosureMaterial::combustible;
    return installation;
}

int rank(rules::Code code) {
    switch (code) {
        case rules::Code::c1: return 0;
        case rules::Code::c2: return 1;
        case rules::Code::fi: return 2;
        case rules::Code::c3: return 3;
        case rules::Code::note: return 4;
    }
    return 5;
}

}  // namespace

TEST_CASE("rules assess: findings come most urgent first and twice the same", "[rules][assess]") {
    const auto first = assess_default(troubled());
    const auto second = assess_default(troubled());
    REQUIRE(first.size() == second.size());
    for (std::size_t i = 0; i < first.size(); ++i) CHECK(first[i].id == second[i].id);
    for (std::size_t i = 1; i < first.size(); ++i) CHECK(rank(first[i - 1].code) <= rank(first[i].code));
    REQUIRE(first.size() >= 2);
    CHECK(first.front().code == rules::Code::c2);
}

TEST_CASE("rules assess: ids are unique and have the rule@location form", "[rules][assess]") {
    const auto findings = assess_default(troubled());
    std::set<std::string> ids;
    for (const auto& f : findings) {
        CHECK(ids.insert(f.id).second);
        CHECK(f.id.rfind(f.rule + "@", 0) == 0);
    }
    CHECK(ids.count("tt.fault_protection@circuit:c1") == 1);
    CHECK(ids.count("additional_protection@circuit:c1") == 1);
    CHECK(ids.count("tails.origin_protection@installation") == 1);
    CHECK(ids.count("board.combustible_enclosure@board:cu") == 1);
    CHECK(ids.count("electrode.resistance@installation") == 1);
}

TEST_CASE("rules assess: urgent findings are due 28 days after inspection in a privately rented dwelling in England", "[rules][assess][due]") {
    auto installation = troubled();
    installation.job.occupancy = model::Occupancy::privately_rented_dwelling;
    installation.job.country = "England";
    installation.job.inspection_date = Date{2026, 12, 2};
    const auto findings = assess_default(installation);
    // 2026-12-02 + 28 days = 2026-12-30 (hand counted).
    for (const auto& f : findings) {
        if (f.urgent()) {
            REQUIRE(f.due.has_value());
            CHECK(f.due->to_iso() == "2026-12-30");
            CHECK(f.due_text == "2026-12-30");
        } else {
            CHECK_FALSE(f.due.has_value());
            CHECK(f.due_text.empty());
        }
    }
}

TEST_CASE("rules assess: urgent findings elsewhere are due as agreed", "[rules][assess][due]") {
    const auto findings = assess_default(troubled());  // owner-occupied
    bool any_urgent = false;
    for (const auto& f : findings) {
        if (!f.urgent()) continue;
        any_urgent = true;
        CHECK_FALSE(f.due.has_value());
        CHECK(f.due_text == "as agreed");
    }
    CHECK(any_urgent);
    auto wales = troubled();
    wales.job.occupancy = model::Occupancy::privately_rented_dwelling;
    wales.job.country = "wales";
    CHECK(rules::due_date_for(wales.job, rules::default_rules_profile()).text == "as agreed");
}

TEST_CASE("rules assess: summarise counts each code", "[rules][assess]") {
    std::vector<rules::Finding> findings(6);
    findings[0].code = rules::Code::c1;
    findings[1].code = rules::Code::c2;
    findings[2].code = rules::Code::c2;
    findings[3].code = rules::Code::c3;
    findings[4].code = rules::Code::fi;
    findings[5].code = rules::Code::note;
    const auto summary = rules::summarise(findings);
    CHECK(summary == rules::CodeSummary{1, 2, 1, 1, 1});
    CHECK(summary.urgent() == 4);
}

TEST_CASE("rules assess: the context's chains match model::devices_above", "[rules][assess]") {
    auto installation = tt_dwelling(40.0);
    auto feed = circuit("s1", model::CircuitUse::submain, breaker("sm", model::BreakerCurve::c, 40), "up");
    feed.feeds_board_id = "garage";
    installation.boards.push_back(board("house", {main_switch("ms"), rcd("up", 0.1, model::RcdDelay::time_delayed, "ms")},
                                        {feed, circuit("c1", model::CircuitUse::sockets, breaker("cb1", model::BreakerCurve::b, 32), "up")}));
    installation.boards.push_back(board("garage", {rcd("g1", 0.03)},
                                        {circuit("c2", model::CircuitUse::outdoor, breaker("cb2", model::BreakerCurve::b, 16), "g1")}));
    const rules::AssessContext context(installation, rules::default_rules_profile());
    REQUIRE(context.circuits().size() == 3);
    for (const auto& entry : context.circuits()) {
        const auto expected = model::devices_above(installation, *entry.board, *entry.circuit);
        REQUIRE(entry.chain.size() == expected.size());
        for (std::size_t i = 0; i < expected.size(); ++i) CHECK(entry.chain[i].device == expected[i].device);
    }
    // c2: cb2, g1, then the feeding submain's breaker sm, up, ms.
    CHECK(context.circuits()[2].chain.size() == 5);
    CHECK(context.circuits()[2].residual_current_devices.size() == 2);
}

TEST_CASE("rules assess: 50 boards of 24 circuits assess in well under a second", "[rules][assess][speed]") {
    // The remedies run assess hundreds of times per command on installations this size.
    auto installation = tt_dwelling(150.0, Date{2026, 1, 10});
    installation.boards.push_back(board("b0", {main_switch("ms0")}, {}));
    for (int b = 1; b < 50; ++b) {
        const std::string id = "b" + std::to_string(b);
        auto feed = circuit("f" + std::to_string(b), model::CircuitUse::submain, breaker("fd" + std::to_string(b), model::BreakerCurve::c, 40), "ms0");
        feed.feeds_board_id = id;
        installation.boards[0].circuits.push_back(feed);
        std::vector<model::Circuit> circuits;
        for (int c = 0; c < 24; ++c) {
            const std::string cid = id + "c" + std::to_string(c);
            auto item = circuit(cid, c % 2 ? model::CircuitUse::sockets : model::CircuitUse::lighting,
                                breaker(cid + "d", model::BreakerCurve::b, c % 2 ? 32 : 6), c < 12 ? std::optional<std::string>(id + "r1") : id + "r2");
            item.standing_leakage_ma = 1.0;
            item.measured_zs_ohms = 160.0;
            item.rcd_trip_ms_at_5idn = 25.0;
            circuits.push_back(item);
        }
        installation.boards.push_back(board(id, {rcd(id + "r1", 0.03), rcd(id + "r2", 0.03)}, circuits));
    }
    const auto start = std::chrono::steady_clock::now();
    std::size_t total = 0;
    for (int run = 0; run < 10; ++run) total += assess_default(installation).size();
    const double per_run_ms =
        std::chrono::duration<double, std::milli>(std::chrono::steady_clock::now() - start).count() / 10.0;
    WARN("assess of 50 boards x 24 circuits: " << per_run_ms << " ms per run, " << total / 10 << " findings");
    CHECK(total > 0);
    // Generous bound so that a sanitizer build on a busy machine passes; a release build takes a few ms.
    CHECK(per_run_ms < 500.0);
}
