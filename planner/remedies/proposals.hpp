#pragma once
// Proposing options: one function per kind of remedy (propose_*.cpp), each reading the surveyed
// installation and the findings, and returning options whose `apply` makes the change on a copy.
// They never judge whether the change works; verify.hpp does, with the rules.

#include <map>
#include <string>
#include <vector>

#include "planner/model/installation.hpp"
#include "planner/remedies/catalogue.hpp"
#include "planner/remedies/option.hpp"
#include "planner/remedies/settings.hpp"
#include "planner/rules/finding.hpp"

namespace mendwright::remedies {

struct ProposalContext {
    const model::Installation& installation;
    const std::vector<rules::Finding>& findings;  // of the surveyed installation
    const Catalogue& catalogue;
    const RemedySettings& settings;
};

// Every kind, in catalogue order of presentation. Ids are unique.
std::vector<Option> propose_options(const ProposalContext& context);

// One per kind (issue list order).
std::vector<Option> propose_upstream_rcd(const ProposalContext& context);       // upstream-rcd-s100, upstream-rcd-30
std::vector<Option> propose_replacement_boards(const ProposalContext& context); // board-two-rcd, board-rcbo
std::vector<Option> propose_rcbo_swaps(const ProposalContext& context);         // rcbo-swap
std::vector<Option> propose_electrodes(const ProposalContext& context);         // electrodes-add-N
std::vector<Option> propose_tails(const ProposalContext& context);              // tails-move-board, tails-protect
std::vector<Option> propose_selectivity(const ProposalContext& context);        // rcd-s-type
std::vector<Option> propose_manual_lines(const ProposalContext& context);       // recorded-item

// The profile's worst-season factor for the month the electrode's RA was measured.
double season_factor_for(const model::Electrode& electrode, const RemedySettings& settings);

// A line typed by the contractor: a bill of price-book items with no change to the model.
Option make_free_line(const std::string& id, const std::string& title, std::vector<pricing::BillLine> bill);

// Shared helpers of the propose_* files.
namespace detail {

// Finding ids whose rule the entry targets and whose board is one of `boards` (all boards when
// `boards` is empty; installation-wide findings always count).
std::vector<std::string> targets_for(const CatalogueEntry& entry, const std::vector<rules::Finding>& findings,
                                     const std::vector<std::string>& boards);

// An option filled from its catalogue entry: title ({board}, {n}, {length} replaced), bill from
// the counts, assumptions, prerequisites, flags, hours off supply.
Option from_entry(const CatalogueEntry& entry, const std::string& id, const std::map<std::string, std::string>& words,
                  const std::map<std::string, double>& counts, int circuits_off);

// The boards below `board_id` (fed from it, at any depth), and the board itself first.
std::vector<std::string> board_and_below(const model::Installation& installation, const std::string& board_id);

std::string board_name(const model::Board& board);
std::string number_text(double value, int decimals);

}  // namespace detail

}  // namespace mendwright::remedies
