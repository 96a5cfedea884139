// Meter tails longer than the profile allows for their route with no protective device at the
// origin (a switch-fuse at the meter). Common practice: network operators limit tails to about
// 3 m before a switch-fuse is needed, and less where they are buried or concealed; BS 7671
// 434.2.1 (from memory) allows a fault-protective device along a conductor only within 3 m of
// its origin and where the run is installed to keep the risk of a fault low. Mechanically
// protected tails are held to the surface length whatever their route.
#include "planner/rules/checks/checks.hpp"
#include "planner/rules/text.hpp"

namespace mendwright::rules::checks {

std::vector<Finding> tails_origin_protection(const AssessContext& context) {
    std::vector<Finding> findings;
    const auto& tails = context.installation().tails;
    const auto& limits = context.profile().tails;
    if (tails.origin_protection != model::TailsOriginProtection::none) return findings;

    std::string case_name = "surface";
    std::string route = "on the surface";
    double max_length_m = limits.surface_max_length_m;
    if (tails.route == model::TailsRoute::concealed_in_wall) {
        case_name = "concealed_in_wall";
        route = "concealed in a wall";
        max_length_m = limits.concealed_in_wall_max_length_m;
    } else if (tails.route == model::TailsRoute::buried) {
        case_name = "buried";
        route = "buried";
        max_length_m = limits.buried_max_length_m;
    }
    std::string protection = "not mechanically protected";
    if (tails.mechanically_protected) {
        max_length_m = limits.surface_max_length_m;
        protection = "mechanically protected, so held to the surface length";
    }
    if (tails.length_m <= max_length_m) return findings;

    const model::Board* origin = model::origin_board(context.installation());
    Finding finding = context.new_finding("tails.origin_protection", case_name, "installation", origin, nullptr, nullptr);
    if (context.with_text()) {
        finding.location = "meter tails" + (origin ? " to " + AssessContext::board_text(*origin) : std::string());
        finding.title = "Long meter tails without protection at the origin";
        finding.inputs = {number_input("tails length", tails.length_m, "m"), text_input("route", route),
                          text_input("mechanical protection", tails.mechanically_protected ? "yes" : "no"),
                          text_input("device at the origin", "none"), number_input("longest allowed", max_length_m, "m")};
        // A limit of 0 m means any length on that route needs protection: say so in words, not "> 0 m".
        const std::string over_limit = max_length_m > 0.0 ? ") > " + number_text(max_length_m) + " m"
                                                          : "): no length " + route + " is accepted unprotected";
        finding.explanation = "Tails " + number_text(tails.length_m) + " m " + route + " (" + protection + over_limit +
                              ", with no switch-fuse or other device at the meter. " + limits.basis;
    }
    findings.push_back(std::move(finding));
    return findings;
}

}  // namespace mendwright::rules::checks
