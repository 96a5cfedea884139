#pragma once
// Edits of a survey as the desktop editor makes them: one field of the supply, the meter tails,
// the electrode, a board, a board's device or a circuit set from the text the user typed; boards,
// devices and circuits added and removed. Pure functions on a copy of the installation; the job
// session saves the copy as a new revision only when the survey reader accepts it as a whole.
//
//   model::Installation copy = installation;
//   std::string refused = edit_survey_field(copy, "device:rcd1", "idn", "30", today);  // 0.03 A
//
// Every function returns "" when the copy was changed, `unchanged` when the value was already
// there, else what was expected, naming the field (with its unit and range for numbers).

#include <string>
#include <string_view>

#include "planner/core/date.hpp"
#include "planner/model/installation.hpp"
#include "planner/pricing/price_book.hpp"

namespace mendwright::desktop {

inline constexpr std::string_view unchanged = "unchanged";

// target: "supply", "tails", "electrode", "board:<id>", "device:<id>" (a board's device) or
// "circuit:<id>". Fields (camelCase, as the QML editors name them):
//   supply:    earthing (tt|tn_s|tn_c_s), u0, phases (1|3), supplyFuseType, supplyFuse, pfc, ze
//   tails:     tailsLength, tailsCsa, tailsRoute, tailsProtected (true|false), tailsOrigin
//   electrode: electrodeKind, rods, layout, rodLength, rodDiameter, spacing, soil, ra, measuredOn,
//              remeasuredRa, remeasuredOn, resistivity
//   board:     name, location, enclosure, spareWays, acceptsRcbos, surge
//   device:    kind, rating, curve, breakingCapacity, idn, rcdType, delay, fuseStandard, label,
//              upstream (a device id of the same board, "" = the board's incoming supply)
//   circuit:   number, description, use, lineCsa, cpcCsa, length, concealed, outdoor, upstream,
//              the measured values (zs, r1r2, ir, leakage, tripIdn, trip5Idn) and the device
//              fields above, which set the circuit's own protective device.
// Words of choice fields are the survey format's (docs/survey-format.md).
std::string edit_survey_field(model::Installation& installation, std::string_view target, std::string_view field,
                              std::string_view text, const Date& today);

// A single rod, nothing measured yet; refused when one is recorded.
std::string add_electrode(model::Installation& installation);
std::string remove_electrode(model::Installation& installation);

// A board supplied from `parent_board_id` by a new submain circuit (32 A type B circuit-breaker,
// 6 mm², editable afterwards): the survey format allows one origin board only.
std::string add_board(model::Installation& installation, std::string_view parent_board_id);
// Removes a board and the submain feeding it; refused for the origin board, for a board that
// feeds others, and for a board or circuit an observation names (nothing is dropped unsaid).
std::string remove_board(model::Installation& installation, std::string_view board_id);

// kind: a device word ("main_switch", "rcd", "switch_fuse", ...) with the values that kind
// needs filled in (an RCD: 30 mA, general; a switch-fuse: BS 88-3); upstream "" = incoming.
std::string add_device(model::Installation& installation, std::string_view board_id, std::string_view kind,
                       std::string_view upstream_id);
// Devices and circuits below the removed device move up to the device above it.
std::string remove_device(model::Installation& installation, std::string_view device_id);

// A final circuit of "other" use on a 16 A type B circuit-breaker, 2.5/1.5 mm², numbered next.
std::string add_circuit(model::Installation& installation, std::string_view board_id);
std::string remove_circuit(model::Installation& installation, std::string_view circuit_id);

// One field of the recorded observation `observation_id`:
//   text          the inspector's words (required)
//   code          C1, C2, C3 or FI (any case)
//   board         a board id; "" = the installation as a whole (the circuit goes too); a circuit
//                 not on the new board is let go
//   circuit       a circuit id of the observation's board (with no board yet, the circuit's board
//                 is taken); "" = no particular circuit
//   itemCode      a code of `book` (the price book the session prices with), the item that makes
//                 the observation good: proposed as a priced line among the remedies; "" clears it
//   itemQuantity  how many of the item, in its unit: above 0, at most 100000
// Refusals name the field and what was given: `Price-book item: no item "XYZ" in the price book`.
std::string edit_observation(model::Installation& installation, std::string_view observation_id,
                             std::string_view field, std::string_view text, const pricing::PriceBook& book);

// After a device's kind changes: fills what the new kind needs and clears what it must not carry
// (docs/survey-format.md, "what each kind of device must and must not carry").
void fit_device_to_kind(model::Device& device);

}  // namespace mendwright::desktop
