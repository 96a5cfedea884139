#include "app/desktop/survey_rows.hpp"

#include <QCoreApplication>
#include <set>

#include "app/desktop/survey_fields.hpp"
#include "planner/io/survey_enums.hpp"
#include "planner/model/navigation.hpp"
#include "planner/rules/text.hpp"

namespace mendwright::desktop {

namespace {

QString tr(const char* text) { return QCoreApplication::translate("SurveyRows", text); }
QString qtext(const std::string& text) { return QString::fromStdString(text); }

QString entry(const char* key, const std::optional<double>& model_value) {
    return qtext(entry_text(*survey_field(key), model_value));
}

QVariantMap choice(const char* value, const QString& text) {
    return {{QStringLiteral("value"), QString::fromUtf8(value)}, {QStringLiteral("text"), text}};
}

template <class Enum>
QString word(const io::WordTable<Enum>& table, Enum value) {
    return qtext(io::word_of(table, value));
}

// The label of a choice field's word, from field_choices.
QString label_of(const QString& field, const QString& value) {
    for (const QVariant& item : field_choices(field)) {
        const QVariantMap map = item.toMap();
        if (map.value(QStringLiteral("value")).toString() == value) return map.value(QStringLiteral("text")).toString();
    }
    return value;
}

// "Incoming supply" and every device of the board, for a device's or circuit's `upstream`.
QVariantList upstream_choices(const model::Board& board) {
    QVariantList list{choice("", tr("Incoming supply (no device above)"))};
    for (const auto& device : board.devices) {
        QVariantMap item = choice("", device_summary(device) + QStringLiteral(" · ") + qtext(device.id));
        item.insert(QStringLiteral("value"), qtext(device.id));
        list.push_back(item);
    }
    return list;
}

QVariantMap device_fields(const model::Device& device) {
    return {{"deviceId", qtext(device.id)},
            {"kind", word(io::device_kind_words(), device.kind)},
            {"kindText", label_of(QStringLiteral("kind"), word(io::device_kind_words(), device.kind))},
            {"rating", qtext(rules::number_text(device.rating_amps, 3))},
            {"curve", device.curve ? word(io::breaker_curve_words(), *device.curve) : QString()},
            {"breakingCapacity", entry("breakingCapacity", device.breaking_capacity_ka)},
            {"idn", entry("idn", device.residual_current_amps)},
            {"rcdType", device.rcd_type ? word(io::rcd_type_words(), *device.rcd_type) : QString()},
            {"delay", word(io::rcd_delay_words(), device.delay)},
            {"fuseStandard", qtext(device.fuse_standard)},
            {"label", qtext(device.label)},
            {"residualCurrent", model::is_residual_current_device(device)},
            {"hasCurve", device.kind == model::DeviceKind::circuit_breaker || device.kind == model::DeviceKind::rcbo},
            {"fused", device.kind == model::DeviceKind::fuse || device.kind == model::DeviceKind::switch_fuse},
            {"summary", device_summary(device)}};
}

// The board's devices in tree order: each device followed by the devices below it.
void add_tree(const model::Board& board, const std::optional<std::string>& parent, int depth,
              std::set<std::string>& placed, QVariantList& out) {
    for (const auto& device : board.devices) {
        if (device.upstream_id != parent || placed.count(device.id)) continue;
        placed.insert(device.id);
        QVariantMap row = device_fields(device);
        row.insert(QStringLiteral("depth"), depth);
        row.insert(QStringLiteral("upstream"), qtext(device.upstream_id.value_or("")));
        out.push_back(row);
        add_tree(board, device.id, depth + 1, placed, out);
    }
}

}  // namespace

QString device_summary(const model::Device& device) {
    QString text = label_of(QStringLiteral("kind"), word(io::device_kind_words(), device.kind));
    if (device.curve) text += QStringLiteral(" ") + tr("type %1").arg(word(io::breaker_curve_words(), *device.curve).toUpper());
    text += QStringLiteral(" ") + qtext(rules::number_text(device.rating_amps, 3)) + QStringLiteral(" A");
    if (device.residual_current_amps) text += QStringLiteral(", ") + entry("idn", device.residual_current_amps) + QStringLiteral(" mA");
    if (device.rcd_type) text += QStringLiteral(", ") + tr("type %1").arg(word(io::rcd_type_words(), *device.rcd_type).toUpper());
    if (device.delay == model::RcdDelay::time_delayed) text += QStringLiteral(", ") + tr("S-type");
    if (!device.fuse_standard.empty()) text += QStringLiteral(", ") + qtext(device.fuse_standard);
    return text;
}

QVariantMap supply_row(const model::Supply& supply) {
    return {{"earthing", word(io::earthing_words(), supply.earthing)},
            {"u0", qtext(rules::number_text(supply.u0_volts, 3))},
            {"phases", QString::number(supply.phases)},
            {"supplyFuseType", qtext(supply.supply_fuse_type)},
            {"supplyFuse", qtext(rules::number_text(supply.supply_fuse_rating_amps, 3))},
            {"pfc", entry("pfc", supply.prospective_fault_current_ka)},
            {"ze", entry("ze", supply.ze_ohms)}};
}

QVariantMap tails_row(const model::MeterTails& tails) {
    return {{"tailsLength", qtext(rules::number_text(tails.length_m, 3))},
            {"tailsCsa", qtext(rules::number_text(tails.csa_mm2, 3))},
            {"tailsRoute", word(io::tails_route_words(), tails.route)},
            {"tailsProtected", tails.mechanically_protected},
            {"tailsOrigin", word(io::tails_origin_protection_words(), tails.origin_protection)}};
}

QVariantMap electrode_construction_row(const model::Electrode& electrode) {
    return {{"electrodeKind", word(io::electrode_kind_words(), electrode.kind)},
            {"rodCount", QString::number(electrode.count)},
            {"layout", word(io::electrode_layout_words(), electrode.layout)},
            {"rodLength", entry("rodLength", electrode.rod_length_m)},
            {"rodDiameter", entry("rodDiameter", electrode.rod_diameter_m)},
            {"spacing", entry("spacing", electrode.spacing_m)},
            {"soil", qtext(electrode.soil_description)}};
}

QList<QVariantMap> board_rows(const model::Installation& installation) {
    QList<QVariantMap> rows;
    const model::Board* origin = model::origin_board(installation);
    for (const auto& board : installation.boards) {
        QString supplied = tr("Origin: the meter tails land here");
        if (&board != origin) {
            const auto feeding = model::feeding_circuit(installation, board);
            supplied = feeding.circuit ? tr("Supplied by circuit %1 of %2")
                                             .arg(qtext(feeding.circuit->number),
                                                  qtext(feeding.board->name.empty() ? feeding.board->id : feeding.board->name))
                                       : tr("Not supplied by any circuit");
        }
        rows.push_back({{"boardId", qtext(board.id)},
                        {"name", qtext(board.name)},
                        {"location", qtext(board.location)},
                        {"enclosure", word(io::enclosure_material_words(), board.enclosure)},
                        {"spareWays", QString::number(board.spare_ways)},
                        {"acceptsRcbos", board.accepts_rcbos},
                        {"surge", board.surge_protection_fitted},
                        {"origin", &board == origin},
                        {"supplied", supplied},
                        {"deviceCount", static_cast<int>(board.devices.size())},
                        {"upstreamChoices", upstream_choices(board)},
                        {"circuitCount", static_cast<int>(board.circuits.size())}});
    }
    return rows;
}

QList<QVariantMap> device_rows(const model::Installation& installation) {
    QList<QVariantMap> rows;
    for (const auto& board : installation.boards) {
        QVariantList devices;
        std::set<std::string> placed;
        add_tree(board, std::nullopt, 0, placed, devices);
        for (const auto& device : board.devices)  // devices whose upstream is not in the board
            if (!placed.count(device.id)) {
                QVariantMap row = device_fields(device);
                row.insert(QStringLiteral("depth"), 0);
                row.insert(QStringLiteral("upstream"), qtext(device.upstream_id.value_or("")));
                devices.push_back(row);
            }
        const QVariantList choices = upstream_choices(board);
        for (const QVariant& device : devices) {
            QVariantMap row = device.toMap();
            row.insert(QStringLiteral("boardId"), qtext(board.id));
            row.insert(QStringLiteral("upstreamChoices"), choices);
            rows.push_back(row);
        }
    }
    return rows;
}

QList<QVariantMap> circuit_rows(const model::Installation& installation) {
    QList<QVariantMap> rows;
    for (const auto& board : installation.boards)
        for (const auto& circuit : board.circuits) {
            QVariantMap row = device_fields(circuit.device);
            row.insert(QVariantMap{{"circuitId", qtext(circuit.id)},
                        {"boardId", qtext(board.id)},
                        {"board", qtext(board.name.empty() ? board.id : board.name)},
                        {"number", qtext(circuit.number)},
                        {"description", qtext(circuit.description)},
                        {"use", word(io::circuit_use_words(), circuit.use)},
                        {"upstream", qtext(circuit.upstream_id.value_or(""))},
                        {"upstreamChoices", upstream_choices(board)},
                        {"lineCsa", qtext(rules::number_text(circuit.line_csa_mm2, 3))},
                        {"cpcCsa", qtext(rules::number_text(circuit.cpc_csa_mm2, 3))},
                        {"length", entry("length", circuit.length_m)},
                        {"concealed", circuit.concealed_in_wall},
                        {"outdoor", circuit.supplies_outdoor_equipment},
                        {"submain", circuit.feeds_board_id.has_value()},
                        {"zs", qtext(reading_text(circuit.measured_zs_ohms))},
                        {"r1r2", qtext(reading_text(circuit.r1_plus_r2_ohms))},
                        {"ir", qtext(reading_text(circuit.insulation_resistance_megohms))},
                        {"leakage", qtext(reading_text(circuit.standing_leakage_ma))},
                        {"tripIdn", qtext(reading_text(circuit.rcd_trip_ms_at_idn))},
                        {"trip5Idn", qtext(reading_text(circuit.rcd_trip_ms_at_5idn))}});
            rows.push_back(row);
        }
    return rows;
}

QVariantList field_choices(const QString& field) {
    if (field == QLatin1String("earthing"))
        return {choice("tt", tr("TT")), choice("tn_s", tr("TN-S")), choice("tn_c_s", tr("TN-C-S"))};
    if (field == QLatin1String("phases")) return {choice("1", tr("Single-phase")), choice("3", tr("Three-phase"))};
    if (field == QLatin1String("tailsRoute"))
        return {choice("surface", tr("On the surface")), choice("concealed_in_wall", tr("Concealed in a wall")),
                choice("buried", tr("Buried"))};
    if (field == QLatin1String("tailsOrigin"))
        return {choice("none", tr("None")), choice("switch_fuse", tr("Switch-fuse at the meter"))};
    if (field == QLatin1String("electrodeKind"))
        return {choice("rod", tr("Rod")), choice("tape", tr("Tape")), choice("plate", tr("Plate"))};
    if (field == QLatin1String("layout"))
        return {choice("single", tr("Single rod")), choice("line", tr("Rods in a line")),
                choice("hollow_square", tr("Rods in a hollow square"))};
    if (field == QLatin1String("enclosure"))
        return {choice("metal", tr("Metal")), choice("non_combustible_other", tr("Other non-combustible")),
                choice("combustible", tr("Combustible"))};
    if (field == QLatin1String("kind"))
        return {choice("main_switch", tr("Main switch")), choice("rcd", tr("RCD")),
                choice("circuit_breaker", tr("MCB")), choice("rcbo", tr("RCBO")), choice("fuse", tr("Fuse")),
                choice("switch_fuse", tr("Switch-fuse"))};
    if (field == QLatin1String("boardDeviceKind"))
        return {choice("main_switch", tr("Main switch")), choice("rcd", tr("RCD")),
                choice("switch_fuse", tr("Switch-fuse"))};
    if (field == QLatin1String("circuitDeviceKind"))
        return {choice("circuit_breaker", tr("MCB")), choice("rcbo", tr("RCBO")), choice("fuse", tr("Fuse"))};
    if (field == QLatin1String("observationCode"))
        return {choice("C1", tr("C1 · Danger present")), choice("C2", tr("C2 · Potentially dangerous")),
                choice("C3", tr("C3 · Improvement recommended")), choice("FI", tr("FI · Further investigation"))};
    if (field == QLatin1String("curve"))
        return {choice("b", tr("Type B")), choice("c", tr("Type C")), choice("d", tr("Type D"))};
    if (field == QLatin1String("rcdType"))
        return {choice("", tr("Not recorded")), choice("ac", tr("Type AC")), choice("a", tr("Type A")),
                choice("f", tr("Type F")), choice("b", tr("Type B"))};
    if (field == QLatin1String("delay"))
        return {choice("general", tr("General")), choice("time_delayed", tr("S-type (time-delayed)"))};
    if (field == QLatin1String("use"))
        return {choice("sockets", tr("Socket-outlets")), choice("lighting", tr("Lighting")),
                choice("cooker", tr("Cooker")), choice("shower", tr("Shower")),
                choice("immersion", tr("Immersion heater")), choice("outdoor", tr("Outdoor")),
                choice("submain", tr("Submain")), choice("other", tr("Other"))};
    return {};
}

namespace {

QString board_name(const model::Board& board) { return qtext(board.name.empty() ? board.id : board.name); }

QString circuit_words(const model::Circuit& circuit) {
    return circuit.description.empty() ? tr("circuit %1").arg(qtext(circuit.number))
                                       : tr("circuit %1 %2").arg(qtext(circuit.number), qtext(circuit.description));
}

QVariantMap id_choice(const std::string& id, const QString& text) {
    return {{QStringLiteral("value"), qtext(id)}, {QStringLiteral("text"), text}};
}

}  // namespace

QList<QVariantMap> observation_rows(const model::Installation& installation, const pricing::PriceBook& book) {
    QVariantList board_choices{id_choice("", tr("The installation as a whole"))};
    for (const auto& board : installation.boards)
        board_choices.push_back(id_choice(board.id, board.location.empty()
                                                        ? board_name(board)
                                                        : tr("%1 (%2)").arg(board_name(board), qtext(board.location))));
    QList<QVariantMap> rows;
    for (const auto& observation : installation.observations) {
        const model::Board* board = observation.board_id ? model::find_board(installation, *observation.board_id) : nullptr;
        const auto circuit = observation.circuit_id ? model::find_circuit(installation, *observation.circuit_id)
                                                    : model::CircuitRef{};
        QString place = tr("The installation as a whole");
        if (board && circuit.circuit) place = tr("%1, %2").arg(board_name(*board), circuit_words(*circuit.circuit));
        else if (board) place = board_name(*board);
        QVariantList circuit_choices{id_choice("", tr("No particular circuit"))};
        if (board)
            for (const auto& c : board->circuits) circuit_choices.push_back(id_choice(c.id, circuit_words(c)));
        const pricing::PriceItem* item = observation.item_code ? book.find(*observation.item_code) : nullptr;
        rows.push_back({{"observationId", qtext(observation.id)},
                        {"code", qtext(io::word_of(io::observation_code_words(), observation.code)).toUpper()},
                        {"text", qtext(observation.text)},
                        {"location", place},
                        {"boardId", qtext(observation.board_id.value_or(""))},
                        {"circuitId", qtext(observation.circuit_id.value_or(""))},
                        {"boardChoices", board_choices},
                        {"circuitChoices", circuit_choices},
                        {"itemCode", qtext(observation.item_code.value_or(""))},
                        {"itemQuantity", qtext(rules::number_text(observation.item_quantity, 6))},
                        {"itemUnit", item ? qtext(item->unit) : QString()},
                        {"itemDescription", item ? qtext(item->description) : QString()}});
    }
    return rows;
}

QVariantList price_item_choices(const pricing::PriceBook& book) {
    QVariantList choices{id_choice("", tr("No item: not priced"))};
    for (const auto& item : book.items)
        choices.push_back(id_choice(item.code, tr("%1: %2 (%3)").arg(qtext(item.code), qtext(item.description),
                                                                     qtext(item.unit))));
    return choices;
}

}  // namespace mendwright::desktop
