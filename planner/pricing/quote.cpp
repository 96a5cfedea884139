#include "planner/pricing/quote.hpp"

#include <map>
#include <set>

namespace mendwright::pricing {

std::vector<std::string> quote_cautions() {
    return {
        "This quote comes from a planning aid. The work must be designed, carried out, inspected, tested and "
        "certified by a competent person.",
        "Local regulations and the wiring rules in force where the installation is prevail over this document, "
        "and so do the installation's own measurements taken on the day.",
        "Where an earth electrode is installed or altered, its resistance must be re-measured after the work, and "
        "again in a dry season; the protective device must be chosen on the measured value.",
        "Faults found once work starts may need more than the contingency allowed here; any extra is agreed "
        "with the client before it is done.",
    };
}

std::vector<std::string> default_exclusions() {
    return {
        "Making good of decorations, plaster and floor finishes disturbed by the work.",
        "Work on the supplier's equipment (cut-out, meter, service cable); the network operator arranges it.",
        "Repair of faults found during the work beyond the contingency shown.",
        "Circuits and equipment not named in this quote.",
    };
}

Result<Quote> make_quote(QuoteRequest request) {
    auto blank = [](const std::string& text) { return text.find_first_not_of(" \t\r\n") == std::string::npos; };
    if (blank(request.number)) return problem("number", "expected a quote number, got nothing");
    if (blank(request.client_name)) return problem("client_name", "expected the client's name, got nothing");
    if (blank(request.site_address)) return problem("site_address", "expected the site address, got nothing");
    if (blank(request.chosen_plan.name)) return problem("chosen_plan.name", "expected a plan name, got nothing");
    if (request.works.groups.empty() && request.works.extra_lines.empty()) {
        return problem("works", "expected at least one line in the works list, got none");
    }
    if (request.alternative_plan && blank(request.alternative_plan->name)) {
        return problem("alternative_plan.name", "expected a plan name, got nothing");
    }

    static const std::set<std::string> codes = {"C1", "C2", "C3", "FI"};
    std::set<std::string> ids;
    for (std::size_t i = 0; i < request.findings.size(); ++i) {
        const auto& finding = request.findings[i];
        const std::string field = "findings[" + std::to_string(i) + "]";
        if (blank(finding.id)) return problem(field + ".id", "expected a finding id, got nothing");
        if (!ids.insert(finding.id).second) return problem(field + ".id", "finding " + finding.id + " appears twice");
        if (!codes.contains(finding.code)) {
            return problem(field + ".code", "expected C1, C2, C3 or FI, got \"" + finding.code + "\"");
        }
    }
    std::map<std::string, std::vector<std::string>> cleared_by;
    for (std::size_t g = 0; g < request.works.groups.size(); ++g) {
        const auto& group = request.works.groups[g];
        for (const auto& id : group.clears_findings) {
            if (!ids.contains(id)) {
                return problem("works.groups[" + std::to_string(g) + "].clears_findings",
                               "finding " + id + " is not in the findings schedule");
            }
            cleared_by[id].push_back(group.title);
        }
    }

    Quote quote;
    quote.number = std::move(request.number);
    quote.date = request.date;
    quote.valid_until = request.date.plus_days(request.works.settings.quote_validity_days);
    quote.client_name = std::move(request.client_name);
    quote.site_address = std::move(request.site_address);
    quote.totals = total_works(request.works);
    quote.works = std::move(request.works);
    quote.chosen_plan = std::move(request.chosen_plan);
    quote.chosen_plan.total_pence = quote.totals.total_pence;
    quote.alternative_plan = std::move(request.alternative_plan);
    for (auto& finding : request.findings) {
        auto it = cleared_by.find(finding.id);
        quote.findings.push_back(
            QuotedFinding{std::move(finding), it == cleared_by.end() ? std::vector<std::string>{} : it->second});
    }
    quote.exclusions = request.exclusions.empty() ? default_exclusions() : std::move(request.exclusions);
    quote.cautions = quote_cautions();
    return quote;
}

}  // namespace mendwright::pricing
