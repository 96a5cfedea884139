// Kind 8: the inspector's own observations that name a price-book item. The option is that item;
// its change on the copy is that the observation has been made good (the inspector's judgement,
// stated as an assumption), so re-verification shows only that nothing else moves.
#include <algorithm>

#include "planner/remedies/proposals.hpp"

namespace mendwright::remedies {

std::vector<Option> propose_manual_lines(const ProposalContext& context) {
    std::vector<Option> options;
    const CatalogueEntry* entry = context.catalogue.find("recorded-item");
    if (!entry) return options;
    for (const auto& finding : context.findings) {
        if (finding.origin != rules::FindingOrigin::recorded || !finding.item_code) continue;
        // The observation behind the finding: its id is the finding's location key.
        std::string observation_id;
        for (const auto& observation : context.installation.observations) {
            if (finding.id.find(observation.id) != std::string::npos &&
                (observation_id.empty() || observation.id.size() > observation_id.size()))
                observation_id = observation.id;
        }
        const std::string place = finding.id.substr(finding.id.find('@') + 1);
        Option option = detail::from_entry(*entry, "recorded-item@" + place, {{"text", finding.title}}, {}, 0);
        option.bill.insert(option.bill.begin(), {*finding.item_code, finding.item_quantity, finding.title});
        option.targets = {finding.id};
        option.slots = {"recorded:" + place};
        if (!finding.board_id.empty()) option.touched_boards = {finding.board_id};
        else option.whole_installation = true;
        option.apply = [observation_id](model::Installation& copy) {
            auto& list = copy.observations;
            list.erase(std::remove_if(list.begin(), list.end(),
                                      [&](const model::Observation& o) { return o.id == observation_id; }),
                       list.end());
        };
        options.push_back(std::move(option));
    }
    return options;
}

}  // namespace mendwright::remedies
