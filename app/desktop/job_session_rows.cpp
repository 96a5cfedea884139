// The rows a job session hands to QML: findings, options, plans, the electrode chart, the works
// list and urgent items (the survey's rows: job_session_survey.cpp). Texts and fractions are worked out
// here so that QML only lays them out.
#include <algorithm>
#include <cmath>
#include <set>

#include "app/desktop/job_session.hpp"
#include "app/desktop/quote_assembly.hpp"
#include "app/desktop/survey_fields.hpp"
#include "app/desktop/survey_rows.hpp"
#include "app/desktop/workspace.hpp"
#include "planner/io/survey_document.hpp"
#include "planner/model/navigation.hpp"
#include "planner/remedies/ranking.hpp"
#include "planner/rules/assess.hpp"
#include "planner/rules/text.hpp"

namespace mendwright::desktop {

namespace {

QString qtext(const std::string& text) { return QString::fromStdString(text); }

QString money(pricing::Pence pence) { return qtext(remedies::money_text(pence)); }

QString code_words(const QString& code) {
    if (code == QLatin1String("C1")) return JobSession::tr("Danger present");
    if (code == QLatin1String("C2")) return JobSession::tr("Potentially dangerous");
    if (code == QLatin1String("C3")) return JobSession::tr("Improvement recommended");
    if (code == QLatin1String("FI")) return JobSession::tr("Further investigation");
    return JobSession::tr("Advice, no code");
}

QString joined(const std::vector<std::string>& items, const QString& separator) {
    QStringList list;
    for (const auto& item : items) list << qtext(item);
    return list.join(separator);
}

// The same finding at several places said once with its count: "C2 No RCD ... (× 5)", in the
// order of first mention.
QStringList counted(const QStringList& titles) {
    QStringList distinct;
    QList<int> counts;
    for (const auto& title : titles) {
        const auto at = distinct.indexOf(title);
        if (at < 0) {
            distinct << title;
            counts << 1;
        } else {
            ++counts[at];
        }
    }
    for (qsizetype i = 0; i < distinct.size(); ++i)
        if (counts[i] > 1) distinct[i] = JobSession::tr("%1 (× %2)").arg(distinct[i]).arg(counts[i]);
    return distinct;
}

QString hours_text(double hours) { return JobSession::tr("%1 h").arg(qtext(rules::number_text(hours, 1))); }

QString plan_label(const std::string& name) {
    if (name == "least-cost") return JobSession::tr("Least cost, compliant");
    if (name == "ideal") return JobSession::tr("Ideal");
    return JobSession::tr("Own choice");
}

}  // namespace

QString JobSession::findingTitle(const std::string& id) const {
    for (const auto& finding : findings_list_)
        if (finding.id == id) return qtext(rules::code_text(finding.code) + " " + finding.title);
    return qtext(id);
}

void JobSession::refreshFindingRows() {
    QList<QVariantMap> rows;
    for (const auto& finding : findings_list_) {
        int option_count = 0;
        for (const auto& ranking : analysis_->rankings)
            if (ranking.finding_id == finding.id) option_count = static_cast<int>(ranking.option_ids.size());
        QStringList inputs;
        for (const auto& input : finding.inputs)
            inputs << qtext(input.name + " " + input.value + (input.unit.empty() ? "" : " " + input.unit));
        const QString code = qtext(rules::code_text(finding.code));
        rows.push_back({{"findingId", qtext(finding.id)},
                        {"code", code},
                        {"codeWords", code_words(code)},
                        {"section", code + QStringLiteral(" · ") + code_words(code)},
                        {"title", qtext(finding.title)},
                        {"location", qtext(finding.location)},
                        {"clause", qtext(finding.clause)},
                        {"explanation", qtext(finding.explanation)},
                        {"inputs", inputs.join(QStringLiteral("; "))},
                        {"due", finding.urgent() ? qtext(finding.due_text) : QString()},
                        {"urgent", finding.urgent()},
                        {"optionCount", option_count},
                        {"recorded", finding.origin == rules::FindingOrigin::recorded}});
    }
    findings_model_->setRows(std::move(rows));
}

void JobSession::refreshOptionRows() {
    QList<QVariantMap> rows;
    const std::string finding_id = selected_finding_.toStdString();
    const remedies::FindingRanking* ranking = nullptr;
    if (analysis_)
        for (const auto& r : analysis_->rankings)
            if (r.finding_id == finding_id) ranking = &r;
    if (ranking) {
        for (std::size_t i = 0; i < ranking->option_ids.size(); ++i) {
            const remedies::Option* option = find_option(analysis_->options, ranking->option_ids[i]);
            if (!option) continue;
            QStringList clears, introduces, still_open;
            for (const auto& id : option->verification.cleared) clears << findingTitle(id);
            for (const auto& id : option->verification.introduced) introduces << findingTitle(id);
            for (const auto& id : option->verification.still_open) still_open << findingTitle(id);
            const bool chosen = std::find(own_choice_.begin(), own_choice_.end(), option->id) != own_choice_.end();
            rows.push_back({{"optionId", qtext(option->id)},
                            {"rank", static_cast<int>(i) + 1},
                            {"title", qtext(option->title)},
                            {"description", qtext(option->description)},
                            {"cost", option->cost.priced ? money(option->cost.total_pence) : tr("not priced")},
                            {"costPence", static_cast<qint64>(option->cost.total_pence)},
                            {"priced", option->cost.priced},
                            {"clears", counted(clears).join(QStringLiteral("\n"))},
                            {"clearsCount", static_cast<int>(clears.size())},
                            {"introduces", counted(introduces).join(QStringLiteral("\n"))},
                            {"introducesUrgent", !option->verification.introduced_urgent.empty()},
                            {"stillOpen", counted(still_open).join(QStringLiteral("\n"))},
                            {"hoursOff", hours_text(option->hours_off_supply)},
                            {"notifiable", option->notifiable},
                            {"certificate", qtext(option->certificate)},
                            {"chosen", chosen},
                            {"rankedLast", option->ranked_last},
                            {"reason", i < ranking->reasons.size() ? qtext(ranking->reasons[i]) : QString()},
                            {"assumptions", joined(option->assumptions, QStringLiteral("\n"))},
                            {"prerequisites", joined(option->prerequisites, QStringLiteral("\n"))},
                            {"leavesOpen", joined(option->leaves_open, QStringLiteral("\n"))}});
        }
    }
    options_model_->setRows(std::move(rows));
}

void JobSession::refreshPlanRows() {
    QList<QVariantMap> rows;
    pricing::Pence most = 1;
    int most_left = 1;
    for (const auto& p : plans_) {
        most = std::max(most, p.figures.total_pence);
        const auto& f = p.figures;
        most_left = std::max(most_left, f.residual_c1 + f.residual_c2 + f.residual_c3 + f.residual_fi);
    }
    for (const auto& p : plans_) {
        const auto& f = p.figures;
        QStringList titles;
        for (const auto& id : p.option_ids)
            if (const auto* option = find_option(analysis_->options, id)) titles << qtext(option->title);
        const int left = f.residual_c1 + f.residual_c2 + f.residual_c3 + f.residual_fi;
        QString touch = f.worst_touch_volts ? tr("%1 V worst season").arg(qtext(rules::number_text(*f.worst_touch_volts, 1)))
                                            : tr("not applicable");
        if (!f.touch_note.empty()) touch += QStringLiteral(" (") + qtext(f.touch_note) + QLatin1Char(')');
        rows.push_back({{"name", qtext(p.name)},
                        {"label", plan_label(p.name)},
                        {"cost", money(f.total_pence)},
                        {"costPence", static_cast<qint64>(f.total_pence)},
                        {"costFraction", static_cast<double>(f.total_pence) / static_cast<double>(most)},
                        {"residualC1", f.residual_c1},
                        {"residualC2", f.residual_c2},
                        {"residualC3", f.residual_c3},
                        {"residualFi", f.residual_fi},
                        {"residualCount", left},
                        {"residualFraction", static_cast<double>(left) / most_left},
                        {"urgentLeft", f.residual_c1 + f.residual_c2 + f.residual_fi},
                        {"optionTitles", titles.join(QStringLiteral("\n"))},
                        {"optionCount", static_cast<int>(titles.size())},
                        {"hoursOff", hours_text(f.hours_off_supply)},
                        {"notifiable", f.notifiable},
                        {"certificates", joined(f.certificates, QStringLiteral("\n"))},
                        {"touchText", touch},
                        {"circuitsLost", f.circuits_lost_on_one_trip},
                        {"introducedCount", static_cast<int>(f.introduced_ids.size())},
                        {"notes", joined(p.notes, QStringLiteral("\n"))},
                        {"inUse", qtext(p.name) == works_plan_}});
    }
    plans_model_->setRows(std::move(rows));
}

// Predicted RA month by month. The profile's seasonal factor f(m) turns a reading taken in
// month m into the worst-season estimate (RA x f(m)); the same factors read backwards give the
// expected reading in month k: worst / f(k). An assumption of the profile, shown as such.
void JobSession::refreshElectrodeChart() {
    QList<QVariantMap> series, ticks;
    if (!installation_ || !installation_->electrode || !installation_->electrode->measured_ra_ohms) {
        electrode_series_->setRows({});
        electrode_ticks_->setRows({});
        return;
    }
    const model::Electrode& electrode = *installation_->electrode;
    const auto& settings = analysis_->settings;
    auto factor_of = [&](const std::optional<Date>& on) {
        return on ? settings.season_factor_by_month.at(on->month - 1) : settings.season_factor_unknown_month;
    };
    struct Line {
        QString name, kind, label;
        std::vector<double> ohms;
    };
    std::vector<Line> lines;
    auto monthly = [&](double reading, const std::optional<Date>& on) {
        std::vector<double> values;
        const double worst = reading * factor_of(on);
        for (double f : settings.season_factor_by_month) values.push_back(worst / f);
        return values;
    };
    lines.push_back({QStringLiteral("surveyed"), QStringLiteral("reading"),
                     tr("As surveyed (%1 Ω measured)").arg(qtext(rules::number_text(*electrode.measured_ra_ohms, 1))),
                     monthly(*electrode.measured_ra_ohms, electrode.measured_on)});
    if (electrode.remeasured_ra_ohms)
        lines.push_back({QStringLiteral("remeasured"), QStringLiteral("remeasured"),
                         tr("Re-measured (%1 Ω)").arg(qtext(rules::number_text(*electrode.remeasured_ra_ohms, 1))),
                         monthly(*electrode.remeasured_ra_ohms, electrode.remeasured_on)});
    for (const auto& p : plans_) {
        std::vector<const remedies::Option*> options;
        for (const auto& id : p.option_ids)
            if (const auto* option = find_option(analysis_->options, id)) options.push_back(option);
        const model::Installation changed = analysis_->verifier->combined_copy(options);
        if (!changed.electrode || !changed.electrode->measured_ra_ohms) continue;
        if (changed.electrode->count == electrode.count && changed.electrode->measured_ra_ohms == electrode.measured_ra_ohms)
            continue;
        lines.push_back({qtext(p.name), QStringLiteral("plan"),
                         tr("%1: %2 Ω predicted").arg(plan_label(p.name), qtext(rules::number_text(*changed.electrode->measured_ra_ohms, 1))),
                         monthly(*changed.electrode->measured_ra_ohms, changed.electrode->measured_on)});
    }
    // The limits that matter: touch voltage of each residual current device present
    // (BS 7671 411.5.3: RA x IΔn <= UL), the stability threshold and the ideal target.
    struct Limit {
        QString name, label;
        double ohms;
    };
    std::vector<Limit> limits;
    std::set<double> idns;
    for (const auto& board : installation_->boards) {
        for (const auto& device : board.devices)
            if (device.residual_current_amps && model::is_residual_current_device(device)) idns.insert(*device.residual_current_amps);
        for (const auto& circuit : board.circuits)
            if (circuit.device.residual_current_amps && model::is_residual_current_device(circuit.device))
                idns.insert(*circuit.device.residual_current_amps);
    }
    for (double idn : idns)
        limits.push_back({QStringLiteral("touch"),
                          tr("Touch-voltage limit, IΔn %1 mA: %2 Ω")
                              .arg(qtext(rules::number_text(idn * 1000.0, 0)),
                                   qtext(rules::number_text(settings.touch_limit_volts / idn, 0))),
                          settings.touch_limit_volts / idn});
    limits.push_back({QStringLiteral("stability"),
                      tr("Stability threshold: %1 Ω").arg(qtext(rules::number_text(settings.electrode_stability_ohms, 0))),
                      settings.electrode_stability_ohms});
    limits.push_back({QStringLiteral("ideal"), tr("Ideal target: %1 Ω").arg(qtext(rules::number_text(settings.electrode_ideal_ohms, 0))),
                      settings.electrode_ideal_ohms});

    double top = settings.electrode_stability_ohms;
    for (const auto& line : lines) top = std::max(top, *std::max_element(line.ohms.begin(), line.ohms.end()));
    for (const auto& limit : limits) top = std::max(top, std::min(limit.ohms, 1.5 * top));
    // A round axis top: the next multiple of 50 Ω above 110 % of the highest value shown.
    top = std::ceil(top * 1.1 / 50.0) * 50.0;
    for (const auto& line : lines) {
        QVariantList values;
        for (double ohms : line.ohms) values << ohms / top;
        series.push_back({{"name", line.name}, {"kind", line.kind}, {"label", line.label}, {"values", values},
                          {"valueText", QString()}, {"aboveChart", false}, {"fraction", 0.0}});
    }
    for (const auto& limit : limits)
        series.push_back({{"name", limit.name}, {"kind", QStringLiteral("limit")},
                          {"label", limit.ohms > top ? limit.label + tr(" (above the chart)") : limit.label},
                          {"values", QVariantList()}, {"valueText", qtext(rules::number_text(limit.ohms, 0))},
                          {"aboveChart", limit.ohms > top}, {"fraction", std::min(1.0, limit.ohms / top)}});
    for (int i = 0; i <= 4; ++i)
        ticks.push_back({{"fraction", i / 4.0}, {"label", qtext(rules::number_text(top * i / 4.0, 0)) + QStringLiteral(" Ω")}});
    electrode_series_->setRows(std::move(series));
    electrode_ticks_->setRows(std::move(ticks));
}

void JobSession::refreshWorksRows() {
    QList<QVariantMap> rows;
    if (works_list_) {
        const pricing::WorksTotals totals = pricing::total_works(*works_list_);
        auto line_row = [&](const pricing::CostedLine& line, const QString& kind, int group, int index) {
            return QVariantMap{{"kind", kind},
                               {"title", QString()},
                               {"code", qtext(line.item_code)},
                               {"description", qtext(line.description)},
                               {"quantity", qtext(rules::number_text(line.quantity(), 3))},
                               {"unit", qtext(line.unit)},
                               {"unitCost", money(line.unit_material_pence)},
                               {"materials", money(line.materials_pence)},
                               {"labour", money(line.labour_pence)},
                               {"total", money(line.total_pence())},
                               {"note", qtext(line.note)},
                               {"clears", QString()},
                               {"groupIndex", group},
                               {"lineIndex", index}};
        };
        for (std::size_t g = 0; g < works_list_->groups.size(); ++g) {
            const auto& group = works_list_->groups[g];
            QStringList clears;
            for (const auto& id : group.clears_findings) clears << findingTitle(id);
            rows.push_back({{"kind", QStringLiteral("group")}, {"title", qtext(group.title)}, {"code", qtext(group.option_id)},
                            {"description", QString()}, {"quantity", QString()}, {"unit", QString()}, {"unitCost", QString()},
                            {"materials", QString()}, {"labour", QString()}, {"total", money(totals.group_pence.at(g))},
                            {"note", QString()}, {"clears", counted(clears).join(QStringLiteral("; "))},
                            {"groupIndex", static_cast<int>(g)}, {"lineIndex", -1}});
            for (std::size_t i = 0; i < group.lines.size(); ++i)
                rows.push_back(line_row(group.lines[i], QStringLiteral("line"), static_cast<int>(g), static_cast<int>(i)));
        }
        if (!works_list_->extra_lines.empty()) {
            rows.push_back({{"kind", QStringLiteral("group")}, {"title", tr("Added lines")}, {"code", QString()},
                            {"description", QString()}, {"quantity", QString()}, {"unit", QString()}, {"unitCost", QString()},
                            {"materials", QString()}, {"labour", QString()}, {"total", money(totals.extras_pence)},
                            {"note", QString()}, {"clears", QString()}, {"groupIndex", -1}, {"lineIndex", -1}});
            for (std::size_t i = 0; i < works_list_->extra_lines.size(); ++i)
                rows.push_back(line_row(works_list_->extra_lines[i], QStringLiteral("extra"), -1, static_cast<int>(i)));
        }
    }
    works_model_->setRows(std::move(rows));
}

void JobSession::refreshUrgentRows() {
    QList<QVariantMap> rows;
    const Date today = workspace_->todayDate();
    for (const auto& item : detail_.urgent_items) {
        const QString code = qtext(item.code);
        QString state_label = item.state == store::UrgentState::open       ? tr("Open")
                              : item.state == store::UrgentState::remedied ? tr("Remedied, awaiting re-test")
                                                                           : tr("Re-tested");
        rows.push_back({{"findingId", qtext(item.finding_id)},
                        {"code", code},
                        {"codeWords", code_words(code)},
                        {"title", qtext(item.title)},
                        {"location", qtext(item.location)},
                        {"due", qtext(item.due_text)},
                        {"state", qtext(store::urgent_state_text(item.state))},
                        {"stateLabel", state_label},
                        {"remediedOn", item.remedied_on ? qtext(item.remedied_on->to_iso()) : QString()},
                        {"retestedOn", item.retested_on ? qtext(item.retested_on->to_iso()) : QString()},
                        {"overdue", item.overdue(today)}});
    }
    urgent_model_->setRows(std::move(rows));
}

// The RA the plan of the last quote predicted (or, before any quote, the plan in use): that
// plan worked out again on the survey revision the quote priced, so the figure does not move
// when the re-measured value is entered.
std::optional<double> JobSession::predictedElectrodeOhms() const {
    if (!installation_ || !installation_->electrode) return std::nullopt;
    std::string plan_text = works_plan_.isEmpty() ? std::string("least-cost") : works_plan_.toStdString();
    model::Installation priced = *installation_;
    if (!detail_.quotes.empty()) {
        const store::QuoteRecord& quote = detail_.quotes.back();
        auto revision = workspace_->store().revision(job_, quote.revision);
        if (revision) {
            const io::SurveyLoad survey = io::read_survey(revision->document);
            if (survey.ok()) priced = *survey.installation;
        }
        plan_text = quote.plan;
    }
    if (!priced.electrode) return std::nullopt;
    // The prediction is from the readings before the re-test.
    priced.electrode->remeasured_ra_ohms.reset();
    priced.electrode->remeasured_on.reset();
    const rules::RulesProfile& profile = workspace_->profile();
    remedies::Assessor assess = [&profile](const model::Installation& installation, rules::FindingDetail detail) {
        return rules::assess(installation, profile, {detail});
    };
    auto analysis = remedies::analyse(priced, assess, workspace_->book(), remedies::settings_from_profile(profile));
    remedies::Plan chosen;
    if (plan_text.rfind("custom:", 0) == 0) {
        std::vector<std::string> ids;
        const QStringList parts = qtext(plan_text.substr(7)).split(QLatin1Char(','), Qt::SkipEmptyParts);
        for (const auto& part : parts) ids.push_back(part.toStdString());
        auto custom = remedies::custom_plan(*analysis.verifier, analysis.options, ids, analysis.settings);
        if (!custom) return std::nullopt;
        chosen = std::move(custom).value();
    } else if (plan_text == "ideal") {
        chosen = remedies::ideal_plan(*analysis.verifier, analysis.options, analysis.settings);
    } else {
        chosen = remedies::least_cost_plan(*analysis.verifier, analysis.options, analysis.settings);
    }
    std::vector<const remedies::Option*> options;
    for (const auto& id : chosen.option_ids)
        if (const auto* option = find_option(analysis.options, id)) options.push_back(option);
    const model::Installation changed = analysis.verifier->combined_copy(options);
    if (!changed.electrode || !changed.electrode->measured_ra_ohms) return std::nullopt;
    if (changed.electrode->count == priced.electrode->count) return std::nullopt;  // the plan adds no rods
    return changed.electrode->measured_ra_ohms;
}

QVariantMap JobSession::computeElectrodeInfo() const {
    QVariantMap map{{"present", hasElectrode()}};
    if (!hasElectrode()) return map;
    const model::Electrode& e = *installation_->electrode;
    map.insert("ra", qtext(reading_text(e.measured_ra_ohms)));
    map.insert("measuredOn", e.measured_on ? qtext(e.measured_on->to_iso()) : QString());
    map.insert("remeasuredRa", qtext(reading_text(e.remeasured_ra_ohms)));
    map.insert("remeasuredOn", e.remeasured_on ? qtext(e.remeasured_on->to_iso()) : QString());
    map.insert("resistivity", qtext(reading_text(e.soil_resistivity_ohm_m)));
    map.insert("rods", e.count);
    map.insert(electrode_construction_row(e));
    const auto predicted = predictedElectrodeOhms();
    map.insert("predicted", predicted ? qtext(rules::number_text(*predicted, 1)) : QString());
    QString comparison;
    if (predicted && e.remeasured_ra_ohms) {
        const double measured = *e.remeasured_ra_ohms;
        comparison = measured <= *predicted
                         ? tr("Re-measured %1 Ω, at or below the %2 Ω predicted: the prediction held.")
                         : tr("Re-measured %1 Ω, above the %2 Ω predicted: check the findings again before certifying.");
        comparison = comparison.arg(qtext(rules::number_text(measured, 1)), qtext(rules::number_text(*predicted, 1)));
    } else if (predicted) {
        comparison = tr("Predicted after the works: %1 Ω in the season of the first reading. Enter the re-measured value after the works.")
                         .arg(qtext(rules::number_text(*predicted, 1)));
    }
    map.insert("comparison", comparison);
    return map;
}

}  // namespace mendwright::desktop
