// Loading a job, working out its findings, options and plans, and every action on it.
#include "app/desktop/job_session.hpp"

#include <algorithm>

#include "app/desktop/quote_assembly.hpp"
#include "app/desktop/workspace.hpp"
#include "planner/export/quote_workbook.hpp"
#include "planner/io/survey_document.hpp"
#include "planner/rules/assess.hpp"

namespace mendwright::desktop {

namespace {

QString qtext(const std::string& text) { return QString::fromStdString(text); }

std::string first_error(const io::SurveyLoad& load) {
    const auto errors = load.errors();
    return errors.empty() ? std::string() : errors.front().to_string();
}

}  // namespace

JobSession::JobSession(QObject* parent)
    : QObject(parent),
      workspace_(Workspace::instance()),
      findings_model_(new RecordListModel({"findingId", "code", "codeWords", "section", "title", "location", "clause",
                                           "explanation", "inputs", "due", "urgent", "optionCount", "recorded"},
                                          this)),
      options_model_(new RecordListModel({"optionId", "rank", "title", "description", "cost", "costPence", "priced",
                                          "clears", "clearsCount", "introduces", "introducesUrgent", "stillOpen",
                                          "hoursOff", "notifiable", "certificate", "chosen", "rankedLast", "reason",
                                          "assumptions", "prerequisites", "leavesOpen"},
                                         this)),
      plans_model_(new RecordListModel({"name", "label", "cost", "costPence", "costFraction", "residualC1", "residualC2",
                                        "residualC3", "residualFi", "residualCount", "residualFraction", "urgentLeft",
                                        "optionTitles", "optionCount", "hoursOff", "notifiable", "certificates",
                                        "touchText", "circuitsLost", "introducedCount", "notes", "inUse"},
                                       this)),
      electrode_series_(new RecordListModel({"name", "kind", "label", "values", "valueText", "aboveChart", "fraction"}, this)),
      electrode_ticks_(new RecordListModel({"fraction", "label"}, this)),
      works_model_(new RecordListModel({"kind", "title", "code", "description", "quantity", "unit", "unitCost", "materials",
                                        "labour", "total", "note", "clears", "groupIndex", "lineIndex"},
                                       this)),
      urgent_model_(new RecordListModel({"findingId", "code", "codeWords", "title", "location", "due", "state",
                                         "stateLabel", "remediedOn", "retestedOn", "overdue"},
                                        this)),
      circuits_model_(new RecordListModel({"circuitId", "boardId", "board", "number", "description", "use", "upstream",
                                           "upstreamChoices", "lineCsa", "cpcCsa", "length", "concealed", "outdoor",
                                           "submain", "zs", "r1r2", "ir", "leakage", "tripIdn", "trip5Idn", "deviceId",
                                           "kind", "kindText", "rating", "curve", "breakingCapacity", "idn", "rcdType",
                                           "delay", "fuseStandard", "label", "residualCurrent", "hasCurve", "fused",
                                           "summary"},
                                          this)),
      observations_model_(new RecordListModel({"observationId", "code", "text", "location", "boardId", "circuitId",
                                              "boardChoices", "circuitChoices", "itemCode", "itemQuantity", "itemUnit",
                                              "itemDescription"},
                                             this)),
      boards_model_(new RecordListModel({"boardId", "name", "location", "enclosure", "spareWays", "acceptsRcbos", "surge",
                                         "origin", "supplied", "deviceCount", "upstreamChoices", "circuitCount"},
                                        this)),
      devices_model_(new RecordListModel({"boardId", "deviceId", "depth", "upstream", "upstreamChoices", "kind", "kindText",
                                          "rating", "curve", "breakingCapacity", "idn", "rcdType", "delay", "fuseStandard",
                                          "label", "residualCurrent", "hasCurve", "fused", "summary"},
                                         this)) {}

JobSession::~JobSession() {
    analysis_.reset();  // before the installation it refers to
}

void JobSession::setJobId(qint64 id) {
    if (id == job_) return;
    job_ = id;
    undo_.clear();
    redo_.clear();
    own_choice_.clear();
    works_list_.reset();
    works_plan_.clear();
    selected_finding_.clear();
    last_export_.clear();
    Q_EMIT jobIdChanged();
    load();
}

void JobSession::setErrorText(const QString& text) {
    if (text == error_text_) return;
    error_text_ = text;
    Q_EMIT errorTextChanged();
}

bool JobSession::reloadDetail() {
    auto detail = workspace_->store().job(job_);
    if (!detail) {
        setErrorText(qtext(detail.error().to_string()));
        return false;
    }
    detail_ = std::move(*detail);
    return true;
}

void JobSession::load() {
    analysis_.reset();
    installation_.reset();
    electrode_info_.clear();
    if (!workspace_ || job_ < 0) {
        Q_EMIT changed();
        return;
    }
    if (!reloadDetail()) {
        Q_EMIT changed();
        return;
    }
    auto revision = workspace_->store().revision(job_, detail_.latest_revision);
    if (!revision) {
        setErrorText(qtext(revision.error().to_string()));
        Q_EMIT changed();
        return;
    }
    document_ = revision->document;
    const io::SurveyLoad survey = io::read_survey(document_);
    if (!survey.ok()) {
        setErrorText(tr("The saved survey of this job does not read: %1").arg(qtext(first_error(survey))));
        Q_EMIT changed();
        return;
    }
    installation_ = std::make_unique<model::Installation>(*survey.installation);
    survey_warnings_.clear();
    for (const auto& warning : survey.warnings()) survey_warnings_ << qtext(warning.to_string());
    setErrorText({});
    recompute();
}

void JobSession::recompute() {
    const rules::RulesProfile& profile = workspace_->profile();
    findings_list_ = rules::assess(*installation_, profile);
    remedies::Assessor assess = [&profile](const model::Installation& installation, rules::FindingDetail detail) {
        return rules::assess(installation, profile, {detail});
    };
    analysis_ = std::make_unique<remedies::Analysis>(remedies::analyse(
        *installation_, assess, workspace_->book(), remedies::settings_from_profile(profile)));
    if (!analysis_->pricing_problems.empty())
        setErrorText(tr("Price book: %1").arg(qtext(analysis_->pricing_problems.front().to_string())));

    plans_.clear();
    plans_.push_back(remedies::least_cost_plan(*analysis_->verifier, analysis_->options, analysis_->settings));
    plans_.push_back(remedies::ideal_plan(*analysis_->verifier, analysis_->options, analysis_->settings));
    // The user's own plan starts as the least-cost one; choices that no longer exist drop out.
    if (own_choice_.empty()) own_choice_ = plans_.front().option_ids;
    std::erase_if(own_choice_, [this](const std::string& id) { return !find_option(analysis_->options, id); });
    rebuildOwnPlan();

    if (selected_finding_.isEmpty() || findings_model_->indexOf(QStringLiteral("findingId"), selected_finding_) < 0) {
        selected_finding_.clear();
        for (const auto& finding : findings_list_)
            if (finding.urgent()) {
                selected_finding_ = qtext(finding.id);
                break;
            }
    }
    refreshFindingRows();
    refreshOptionRows();
    refreshPlanRows();
    refreshElectrodeChart();
    // The works list starts from the least-cost plan; the user may take another.
    if (!usePlan(works_plan_.isEmpty() ? QStringLiteral("least-cost") : works_plan_)) refreshWorksRows();
    refreshUrgentRows();
    refreshSurveyRows();
    electrode_info_ = computeElectrodeInfo();
    Q_EMIT selectedFindingChanged();
    Q_EMIT changed();
}

bool JobSession::rebuildOwnPlan() {
    auto custom = remedies::custom_plan(*analysis_->verifier, analysis_->options, own_choice_, analysis_->settings);
    if (plans_.size() > 2) plans_.resize(2);
    if (!custom) {
        setErrorText(qtext(custom.problem().to_string()));
        plans_.push_back(plans_.front());
        plans_.back().name = "custom";
        return false;
    }
    plans_.push_back(std::move(custom).value());
    return true;
}

const remedies::Plan* JobSession::plan(const std::string& name) const {
    for (const auto& p : plans_)
        if (p.name == name) return &p;
    return nullptr;
}

QString JobSession::reference() const { return qtext(detail_.facts.reference); }
QString JobSession::client() const { return qtext(detail_.facts.client); }
QString JobSession::site() const { return qtext(detail_.facts.site); }
QString JobSession::status() const { return qtext(store::status_text(detail_.status)); }
QString JobSession::inspectionDate() const { return qtext(detail_.facts.inspection_date.to_iso()); }

QString JobSession::findingSummary() const {
    const auto counts = rules::summarise(findings_list_);
    return tr("C1 %1 · C2 %2 · FI %3 · C3 %4").arg(counts.c1).arg(counts.c2).arg(counts.fi).arg(counts.c3);
}

QString JobSession::caution() {
    return Workspace::caution() +
           tr(" Options are checked by re-running the same rules on a changed copy of the survey, not by a site visit; "
              "predicted electrode resistances are estimates to be re-measured.");
}

QVariantMap JobSession::selectedFinding() const {
    return findings_model_->get(findings_model_->indexOf(QStringLiteral("findingId"), selected_finding_));
}

bool JobSession::hasElectrode() const { return installation_ && installation_->electrode.has_value(); }

MoneyFigures JobSession::worksTotals() const {
    if (!works_list_) return {};
    return MoneyFigures::of(pricing::total_works(*works_list_));
}

void JobSession::selectFinding(const QString& finding_id) {
    if (finding_id == selected_finding_) return;
    selected_finding_ = finding_id;
    refreshOptionRows();
    Q_EMIT selectedFindingChanged();
}

void JobSession::setOptionChosen(const QString& option_id, bool chosen) {
    if (!analysis_) return;
    const std::string id = option_id.toStdString();
    const remedies::Option* option = find_option(analysis_->options, id);
    if (!option) {
        setErrorText(tr("No option %1").arg(option_id));
        return;
    }
    std::erase(own_choice_, id);
    if (chosen) {
        // Options sharing a slot exclude each other: the new choice replaces them.
        std::erase_if(own_choice_, [&](const std::string& other_id) {
            const remedies::Option* other = find_option(analysis_->options, other_id);
            if (!other) return true;
            for (const auto& slot : other->slots)
                if (std::find(option->slots.begin(), option->slots.end(), slot) != option->slots.end()) return true;
            return false;
        });
        own_choice_.push_back(id);
    }
    if (rebuildOwnPlan()) setErrorText({});
    refreshOptionRows();
    refreshPlanRows();
    refreshElectrodeChart();
    if (works_plan_ == QLatin1String("custom")) usePlan(works_plan_);
}

bool JobSession::usePlan(const QString& plan_name) {
    const remedies::Plan* chosen = plan(plan_name.toStdString());
    if (!analysis_ || !chosen) {
        setErrorText(tr("No plan %1").arg(plan_name));
        return false;
    }
    auto works = plan_works(workspace_->book(), *chosen, analysis_->options, findings_list_);
    if (!works) {
        setErrorText(qtext(works.problem().to_string()));
        return false;
    }
    works_list_ = std::move(works).value();
    works_plan_ = plan_name;
    refreshWorksRows();
    refreshPlanRows();
    Q_EMIT worksChanged();
    return true;
}

QString JobSession::setWorksQuantity(int row, const QString& quantity) {
    if (!works_list_) return tr("no works list yet: choose a plan");
    const QVariantMap line = works_model_->get(row);
    bool number = false;
    const double value = quantity.trimmed().toDouble(&number);
    if (!number) return tr("expected a quantity like 2 or 4.5, got \"%1\"").arg(quantity);
    std::optional<Problem> refused;
    const auto kind = line.value(QStringLiteral("kind")).toString();
    const auto group = static_cast<std::size_t>(line.value(QStringLiteral("groupIndex")).toInt());
    const auto index = static_cast<std::size_t>(line.value(QStringLiteral("lineIndex")).toInt());
    if (kind == QLatin1String("line")) refused = pricing::set_quantity(*works_list_, group, index, value);
    else if (kind == QLatin1String("extra")) refused = pricing::set_extra_quantity(*works_list_, index, value);
    else return tr("this row has no quantity");
    if (refused) return qtext(refused->to_string());
    refreshWorksRows();
    Q_EMIT worksChanged();
    return {};
}

QString JobSession::addWorksLine(const QString& description, const QString& unit, const QString& quantity,
                                 const QString& unit_cost, const QString& labour_hours) {
    if (!works_list_) return tr("no works list yet: choose a plan");
    pricing::ExtraLine extra;
    extra.description = description.trimmed().toStdString();
    if (extra.description.empty()) return tr("description: expected what the line is for");
    extra.unit = unit.trimmed().isEmpty() ? std::string("each") : unit.trimmed().toStdString();
    bool number = false;
    extra.quantity = quantity.trimmed().toDouble(&number);
    if (!number) return tr("quantity: expected a number like 1 or 2.5, got \"%1\"").arg(quantity);
    auto cost = pricing::parse_amount_pence(unit_cost.trimmed().toStdString());
    if (!cost) return tr("unit cost: expected an amount like 12.50, got \"%1\"").arg(unit_cost);
    extra.unit_material_pence = *cost;
    const QString hours_text = labour_hours.trimmed().isEmpty() ? QStringLiteral("0") : labour_hours.trimmed();
    auto hours = pricing::parse_milli_hours(hours_text.toStdString());
    if (!hours) return tr("labour hours: expected hours like 0.5, got \"%1\"").arg(labour_hours);
    extra.labour_milli_hours_per_unit = *hours;
    if (auto refused = pricing::add_extra_line(*works_list_, extra)) return qtext(refused->to_string());
    refreshWorksRows();
    Q_EMIT worksChanged();
    return {};
}

bool JobSession::exportQuote(const QString& file) {
    if (!analysis_) return false;
    if (!works_list_ && !usePlan(QStringLiteral("least-cost"))) return false;
    QString path = Workspace::localPath(file);
    if (path.isEmpty()) {
        setErrorText(tr("Export: expected a file name"));
        return false;
    }
    if (!path.endsWith(QLatin1String(".xlsx"), Qt::CaseInsensitive)) path += QStringLiteral(".xlsx");

    const std::string plan_name = works_plan_.toStdString();
    const remedies::Plan* chosen = plan(plan_name);
    const remedies::Plan* alternative = plan(plan_name == "ideal" ? "least-cost" : "ideal");
    auto label = [](const std::string& name) {
        if (name == "least-cost") return tr("Least cost that clears every C1, C2 and FI").toStdString();
        if (name == "ideal") return tr("Ideal").toStdString();
        return tr("Own choice").toStdString();
    };
    const std::string reference = detail_.facts.reference.empty() ? "J" + std::to_string(job_) : detail_.facts.reference;
    pricing::QuoteRequest request;
    request.number = reference + "-Q" + std::to_string(detail_.quotes.size() + 1);
    request.date = workspace_->todayDate();
    request.client_name = detail_.facts.client;
    request.site_address = detail_.facts.site;
    request.works = *works_list_;
    request.chosen_plan = plan_summary(*chosen, label(plan_name), analysis_->options, 0);
    if (alternative && alternative != chosen) {
        auto alternative_works = plan_works(workspace_->book(), *alternative, analysis_->options, findings_list_);
        if (alternative_works)
            request.alternative_plan = plan_summary(*alternative, label(alternative->name), analysis_->options,
                                                    pricing::total_works(*alternative_works).total_pence);
    }
    request.findings = finding_schedule(findings_list_);
    auto quote = pricing::make_quote(std::move(request));
    if (!quote) {
        setErrorText(tr("Quote: %1").arg(qtext(quote.problem().to_string())));
        return false;
    }
    auto written = spreadsheet::write_quote_workbook(*quote, path.toStdString());
    if (!written) {
        setErrorText(tr("Export: %1").arg(qtext(written.problem().to_string())));
        return false;
    }
    std::string plan_record = plan_name;
    if (plan_name == "custom") {
        plan_record += ":";
        for (std::size_t i = 0; i < chosen->option_ids.size(); ++i) plan_record += (i ? "," : "") + chosen->option_ids[i];
    }
    store::QuoteRecord record{quote->number,          detail_.latest_revision, plan_record,
                              quote->totals.net_pence, quote->totals.vat_pence, quote->totals.total_pence,
                              workspace_->todayDate(), path.toStdString()};
    if (auto recorded = workspace_->store().record_quote(job_, record); !recorded) {
        setErrorText(tr("The workbook was written, but the store did not record the quote: %1")
                         .arg(qtext(recorded.error().to_string())));
        return false;
    }
    if (detail_.status == store::JobStatus::surveyed)
        (void)workspace_->store().set_status(job_, store::JobStatus::quoted, "quote " + quote->number);
    reloadDetail();
    electrode_info_ = computeElectrodeInfo();
    setErrorText({});
    last_export_ = path;
    Q_EMIT exported(path);
    Q_EMIT changed();
    workspace_->notifyJobsChanged();
    return true;
}

void JobSession::followStatus() {
    // The job follows its urgent items: work started once one is remedied, complete once every
    // one is re-tested.
    bool all_retested = !detail_.urgent_items.empty();
    bool any_remedied = false;
    for (const auto& item : detail_.urgent_items) {
        if (item.state != store::UrgentState::retested) all_retested = false;
        if (item.state != store::UrgentState::open) any_remedied = true;
    }
    const auto status = detail_.status;
    if (all_retested && status != store::JobStatus::completed && status != store::JobStatus::closed)
        (void)workspace_->store().set_status(job_, store::JobStatus::completed, "every urgent item re-tested");
    else if (any_remedied && (status == store::JobStatus::surveyed || status == store::JobStatus::quoted ||
                              status == store::JobStatus::accepted))
        (void)workspace_->store().set_status(job_, store::JobStatus::in_progress, "remedial work started");
}

// After an urgent item changed state: the job's status follows it, and every view is refreshed.
bool JobSession::afterUrgentItemChange() {
    reloadDetail();
    followStatus();
    reloadDetail();
    setErrorText({});
    refreshUrgentRows();
    Q_EMIT changed();
    workspace_->notifyJobsChanged();
    return true;
}

bool JobSession::markRemedied(const QString& finding_id) {
    auto done = workspace_->store().mark_remedied(job_, finding_id.toStdString());
    if (!done) {
        setErrorText(qtext(done.error().to_string()));
        return false;
    }
    return afterUrgentItemChange();
}

bool JobSession::markRetested(const QString& finding_id) {
    auto done = workspace_->store().mark_retested(job_, finding_id.toStdString());
    if (!done) {
        setErrorText(qtext(done.error().to_string()));
        return false;
    }
    return afterUrgentItemChange();
}

}  // namespace mendwright::desktop
