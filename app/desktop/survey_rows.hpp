#pragma once
// The survey as rows for the editor's views: the supply, the meter tails, the electrode's
// construction, each board, the boards' devices (in tree order, with depth), each circuit with
// its own device, and the choices of every choice field with their words in the survey format
// and their labels for people. Worked out here so that QML only lays them out.

#include <QString>
#include <QVariantList>
#include <QVariantMap>

#include "planner/model/installation.hpp"
#include "planner/pricing/price_book.hpp"

namespace mendwright::desktop {

QVariantMap supply_row(const model::Supply& supply);
QVariantMap tails_row(const model::MeterTails& tails);
// The construction of the electrode (the readings are in the session's electrode map).
QVariantMap electrode_construction_row(const model::Electrode& electrode);
QList<QVariantMap> board_rows(const model::Installation& installation);
// Every board's devices, board by board, each board's in tree order (a device, then the devices
// below it) with its depth and its board's id.
QList<QVariantMap> device_rows(const model::Installation& installation);
QList<QVariantMap> circuit_rows(const model::Installation& installation);

// Each recorded observation: its words and code, its place in words ("Consumer unit, circuit 1
// Downstairs sockets") with the drop-down choices of boards and of that board's circuits, and
// its price-book item with the quantity, the item's unit and description from `book`.
QList<QVariantMap> observation_rows(const model::Installation& installation, const pricing::PriceBook& book);

// [{value: code, text: "code: description (unit)"}] of every item of the book, in its order,
// after {value: "", text: "No item: not priced"}.
QVariantList price_item_choices(const pricing::PriceBook& book);

// [{value: "tt", text: "TT"}, ...] for a choice field (see survey_edits.hpp); empty for others.
// "boardDeviceKind" and "circuitDeviceKind" are the kinds a board's or a circuit's device may be.
QVariantList field_choices(const QString& field);

// "RCD 63 A, 30 mA, type A, S-type": a device in words, for lists and screen readers.
QString device_summary(const model::Device& device);

}  // namespace mendwright::desktop
