// tails.origin_protection: common practice (network operators' rule of about 3 m before a
// switch-fuse; shorter, here 1 m and 0 m, where concealed or buried; BS 7671 434.2.1 from memory).
#include <catch2/catch.hpp>

#include "fixture_findings.hpp"
#include "fixture_installation.hpp"

using namespace mendwright;
using namespace mendwright::test;

namespace {

std::vector<rules::Finding> tails_findings(double length_m, model::TailsRoute route, bool mechanically_protected = false,
                                           model::TailsOriginProtection origin = model::TailsOriginProtection::none) {
    auto installation = tt_dwelling_with_rcd(50.0);
    installation.tails.length_m = length_m;
    installation.tails.route = route;
    installation.tails.mechanically_protected = mechanically_protected;
    installation.tails.origin_protection = origin;
    return findings_of_rule(assess_default(installation), "tails.origin_protection");
}

}  // namespace

TEST_CASE("rules tails.origin_protection: 3 m on the surface is within, 3.5 m is C3", "[rules][tails]") {
    CHECK(tails_findings(3.0, model::TailsRoute::surface).empty());
    const auto long_tails = tails_findings(3.5, model::TailsRoute::surface);
    REQUIRE(long_tails.size() == 1);
    CHECK(long_tails[0].id == "tails.origin_protection@installation");
    CHECK(long_tails[0].code == rules::Code::c3);
    CHECK(long_tails[0].explanation.find("Tails 3.5 m on the surface (not mechanically protected) > 3 m") != std::string::npos);
}

TEST_CASE("rules tails.origin_protection: 1.5 m concealed is C2, unless mechanically protected", "[rules][tails]") {
    const auto concealed = tails_findings(1.5, model::TailsRoute::concealed_in_wall);
    REQUIRE(concealed.size() == 1);
    CHECK(concealed[0].code == rules::Code::c2);
    CHECK(tails_findings(1.0, model::TailsRoute::concealed_in_wall).empty());
    CHECK(tails_findings(1.5, model::TailsRoute::concealed_in_wall, true).empty());
}

TEST_CASE("rules tails.origin_protection: any buried length without protection is C2; a switch-fuse at the meter clears it", "[rules][tails]") {
    const auto buried = tails_findings(0.5, model::TailsRoute::buried);
    REQUIRE(buried.size() == 1);
    CHECK(buried[0].code == rules::Code::c2);
    // The 0 m limit is said in words, not as "> 0 m".
    CHECK(buried[0].explanation.find("Tails 0.5 m buried (not mechanically protected): no length buried is accepted unprotected") !=
          std::string::npos);
    CHECK(buried[0].explanation.find("> 0 m") == std::string::npos);
    CHECK(tails_findings(12.0, model::TailsRoute::buried, false, model::TailsOriginProtection::switch_fuse).empty());
}
