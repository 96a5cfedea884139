// Kind 6, the remedies for long meter tails other than the RCD at the meter (which is
// upstream-rcd-s100): moving the board nearer the meter to shorten the tails, and re-running the
// tails in mechanically protected cable.
#include <algorithm>

#include "planner/model/navigation.hpp"
#include "planner/remedies/proposals.hpp"

namespace mendwright::remedies {

std::vector<Option> propose_tails(const ProposalContext& context) {
    std::vector<Option> options;
    const auto& installation = context.installation;
    const model::Board* origin = model::origin_board(installation);
    if (!origin) return options;
    int origin_circuits = 0;
    for (const auto& circuit : origin->circuits) origin_circuits += circuit.feeds_board_id ? 0 : 1;
    const double length = installation.tails.length_m;

    if (const CatalogueEntry* entry = context.catalogue.find("tails-move-board")) {
        auto targets = detail::targets_for(*entry, context.findings, {});
        const double new_length = entry->parameter("new_tails_length_m", 2.0);
        const double max_move = entry->parameter("max_move_m", 2.0);
        if (!targets.empty() && length > new_length && length - new_length <= max_move) {
            Option option = detail::from_entry(
                *entry, "tails-move-board@tails",
                {{"board", detail::board_name(*origin)}, {"length", detail::number_text(new_length, 1)},
                 {"old_length", detail::number_text(length, 1)}},
                {{"circuit", origin_circuits}, {"metre", new_length}}, origin_circuits);
            option.targets = std::move(targets);
            option.slots = {"tails", "origin"};
            option.whole_installation = true;
            option.apply = [new_length](model::Installation& copy) {
                copy.tails.length_m = new_length;
                copy.tails.route = model::TailsRoute::surface;
            };
            options.push_back(std::move(option));
        }
    }
    if (const CatalogueEntry* entry = context.catalogue.find("tails-protect")) {
        auto targets = detail::targets_for(*entry, context.findings, {});
        if (!targets.empty() && !installation.tails.mechanically_protected) {
            Option option = detail::from_entry(*entry, "tails-protect@tails",
                                               {{"board", detail::board_name(*origin)},
                                                {"length", detail::number_text(length, 1)}},
                                               {{"metre", length}}, 0);
            option.targets = std::move(targets);
            option.slots = {"tails"};
            option.whole_installation = true;
            option.apply = [](model::Installation& copy) { copy.tails.mechanically_protected = true; };
            options.push_back(std::move(option));
        }
    }
    return options;
}

}  // namespace mendwright::remedies
