#pragma once
// One job open in the application: its survey (latest revision), the findings, the ranked
// remedy options per finding, the three plans side by side, the works list of the plan in use,
// the export of the quote, the urgent items after the works, and survey edits (each saved as a
// new revision, with undo and redo; job_session_survey.cpp, edits in survey_edits.hpp). QML shows what this object has worked out and calls its
// invokables; it decides nothing itself.
//
//   JobSession { id: session; jobId: 42 }      // loads, assesses, proposes, plans
//   session.useplan("least-cost"); session.exportQuote("/tmp/q.xlsx")

#include <QObject>
#include <functional>
#include <QString>
#include <QStringList>
#include <QtQml/qqmlregistration.h>
#include <memory>
#include <optional>
#include <string>
#include <vector>

#include "app/desktop/money_figures.hpp"
#include "app/desktop/record_list_model.hpp"
#include "app/store/records.hpp"
#include "planner/model/installation.hpp"
#include "planner/pricing/works.hpp"
#include "planner/remedies/analysis.hpp"
#include "planner/remedies/plans.hpp"
#include "planner/rules/finding.hpp"

namespace mendwright::desktop {

class Workspace;

class JobSession : public QObject {
    Q_OBJECT
    QML_ELEMENT
    Q_PROPERTY(qint64 jobId READ jobId WRITE setJobId NOTIFY jobIdChanged)
    Q_PROPERTY(bool loaded READ loaded NOTIFY changed)
    Q_PROPERTY(QString reference READ reference NOTIFY changed)
    Q_PROPERTY(QString client READ client NOTIFY changed)
    Q_PROPERTY(QString site READ site NOTIFY changed)
    Q_PROPERTY(QString status READ status NOTIFY changed)
    Q_PROPERTY(int revision READ revision NOTIFY changed)
    Q_PROPERTY(QString inspectionDate READ inspectionDate NOTIFY changed)
    Q_PROPERTY(QString findingSummary READ findingSummary NOTIFY changed)
    Q_PROPERTY(QString errorText READ errorText NOTIFY errorTextChanged)
    Q_PROPERTY(QString caution READ caution CONSTANT)
    Q_PROPERTY(mendwright::desktop::RecordListModel* findings READ findings CONSTANT)
    Q_PROPERTY(QString selectedFindingId READ selectedFindingId WRITE selectFinding NOTIFY selectedFindingChanged)
    Q_PROPERTY(QVariantMap selectedFinding READ selectedFinding NOTIFY selectedFindingChanged)
    Q_PROPERTY(mendwright::desktop::RecordListModel* options READ options CONSTANT)
    Q_PROPERTY(mendwright::desktop::RecordListModel* plans READ plans CONSTANT)
    Q_PROPERTY(bool hasElectrode READ hasElectrode NOTIFY changed)
    Q_PROPERTY(mendwright::desktop::RecordListModel* electrodeSeries READ electrodeSeries CONSTANT)
    Q_PROPERTY(mendwright::desktop::RecordListModel* electrodeTicks READ electrodeTicks CONSTANT)
    Q_PROPERTY(QString worksPlan READ worksPlan NOTIFY worksChanged)
    Q_PROPERTY(mendwright::desktop::RecordListModel* works READ works CONSTANT)
    Q_PROPERTY(mendwright::desktop::MoneyFigures worksTotals READ worksTotals NOTIFY worksChanged)
    Q_PROPERTY(QString lastExport READ lastExport NOTIFY exported)
    Q_PROPERTY(mendwright::desktop::RecordListModel* urgentItems READ urgentItems CONSTANT)
    Q_PROPERTY(mendwright::desktop::RecordListModel* circuits READ circuits CONSTANT)
    Q_PROPERTY(mendwright::desktop::RecordListModel* observations READ observations CONSTANT)
    Q_PROPERTY(QVariantMap electrode READ electrode NOTIFY changed)
    Q_PROPERTY(QVariantMap supply READ supply NOTIFY changed)
    // The survey reader's warnings on the saved survey ("path: what to check"): possible values
    // worth a second look; they never stop an edit.
    Q_PROPERTY(QStringList surveyWarnings READ surveyWarnings NOTIFY changed)
    Q_PROPERTY(QVariantMap tails READ tails NOTIFY changed)
    Q_PROPERTY(mendwright::desktop::RecordListModel* boards READ boards CONSTANT)
    Q_PROPERTY(mendwright::desktop::RecordListModel* devices READ devices CONSTANT)
    Q_PROPERTY(bool canUndo READ canUndo NOTIFY changed)
    Q_PROPERTY(bool canRedo READ canRedo NOTIFY changed)

public:
    explicit JobSession(QObject* parent = nullptr);
    ~JobSession() override;

    [[nodiscard]] qint64 jobId() const { return job_; }
    void setJobId(qint64 id);
    [[nodiscard]] bool loaded() const { return installation_ != nullptr; }
    [[nodiscard]] QString reference() const;
    [[nodiscard]] QString client() const;
    [[nodiscard]] QString site() const;
    [[nodiscard]] QString status() const;
    [[nodiscard]] int revision() const { return detail_.latest_revision; }
    [[nodiscard]] QString inspectionDate() const;
    [[nodiscard]] QString findingSummary() const;
    [[nodiscard]] QString errorText() const { return error_text_; }
    [[nodiscard]] static QString caution();
    [[nodiscard]] RecordListModel* findings() const { return findings_model_; }
    [[nodiscard]] QString selectedFindingId() const { return selected_finding_; }
    [[nodiscard]] QVariantMap selectedFinding() const;
    [[nodiscard]] RecordListModel* options() const { return options_model_; }
    [[nodiscard]] RecordListModel* plans() const { return plans_model_; }
    [[nodiscard]] bool hasElectrode() const;
    [[nodiscard]] RecordListModel* electrodeSeries() const { return electrode_series_; }
    [[nodiscard]] RecordListModel* electrodeTicks() const { return electrode_ticks_; }
    [[nodiscard]] QString worksPlan() const { return works_plan_; }
    [[nodiscard]] RecordListModel* works() const { return works_model_; }
    [[nodiscard]] MoneyFigures worksTotals() const;
    [[nodiscard]] QString lastExport() const { return last_export_; }
    [[nodiscard]] RecordListModel* urgentItems() const { return urgent_model_; }
    [[nodiscard]] RecordListModel* circuits() const { return circuits_model_; }
    [[nodiscard]] RecordListModel* observations() const { return observations_model_; }
    [[nodiscard]] QVariantMap electrode() const { return electrode_info_; }
    [[nodiscard]] QVariantMap supply() const { return supply_info_; }
    [[nodiscard]] QStringList surveyWarnings() const { return survey_warnings_; }
    [[nodiscard]] QVariantMap tails() const { return tails_info_; }
    [[nodiscard]] RecordListModel* boards() const { return boards_model_; }
    [[nodiscard]] RecordListModel* devices() const { return devices_model_; }
    [[nodiscard]] bool canUndo() const { return !undo_.empty(); }
    [[nodiscard]] bool canRedo() const { return !redo_.empty(); }

    // Findings and options.
    Q_INVOKABLE void selectFinding(const QString& finding_id);
    // Adds an option to (or takes it out of) the user's own plan; options that exclude it leave.
    Q_INVOKABLE void setOptionChosen(const QString& option_id, bool chosen);
    // The works list from a plan: "least-cost", "ideal" or "custom".
    Q_INVOKABLE bool usePlan(const QString& plan_name);
    // Works list edits; "" when taken, else what was expected.
    Q_INVOKABLE QString setWorksQuantity(int row, const QString& quantity);
    Q_INVOKABLE QString addWorksLine(const QString& description, const QString& unit, const QString& quantity,
                                     const QString& unit_cost, const QString& labour_hours);
    // Writes the quote workbook (path or file: URL; ".xlsx" added when missing), records the quote
    // in the store and moves a surveyed job to "quoted". False and errorText on failure.
    Q_INVOKABLE bool exportQuote(const QString& file);
    // After the works.
    Q_INVOKABLE bool markRemedied(const QString& finding_id);
    Q_INVOKABLE bool markRetested(const QString& finding_id);
    // Survey edits: each one valid edit is a new revision. "" when saved, else what was expected
    // (with the unit and the range).
    Q_INVOKABLE QString editCircuit(const QString& circuit_id, const QString& field, const QString& text);
    // field: "ra", "measuredOn", "remeasuredRa", "remeasuredOn", "resistivity"
    Q_INVOKABLE QString editElectrode(const QString& field, const QString& text);
    // Any survey field (app/desktop/survey_edits.hpp lists targets and fields): "supply", "tails",
    // "electrode", "board:<id>", "device:<id>", "circuit:<id>". The survey reader's checks run on
    // the result; a refusal names the field's path.
    Q_INVOKABLE QString editSurvey(const QString& target, const QString& field, const QString& text);
    Q_INVOKABLE QString addElectrode();
    Q_INVOKABLE QString removeElectrode();
    // A board supplied by a new submain circuit of `parent_board_id`.
    Q_INVOKABLE QString addBoard(const QString& parent_board_id);
    Q_INVOKABLE QString removeBoard(const QString& board_id);
    // kind: "main_switch", "rcd", "switch_fuse"; upstream_id "" = below the incoming supply.
    Q_INVOKABLE QString addDevice(const QString& board_id, const QString& kind, const QString& upstream_id);
    Q_INVOKABLE QString removeDevice(const QString& device_id);
    Q_INVOKABLE QString addCircuit(const QString& board_id);
    Q_INVOKABLE QString removeCircuit(const QString& circuit_id);
    // [{value, text}] of a choice field ("earthing", "kind", "curve", "use", ...).
    Q_INVOKABLE static QVariantList choices(const QString& field);
    Q_INVOKABLE QString addObservation(const QString& text, const QString& code);
    Q_INVOKABLE QString removeObservation(const QString& observation_id);
    // One field of an observation: "text", "code", "board", "circuit", "itemCode" (checked against
    // the price book in use; "" clears it) or "itemQuantity" (survey_edits.hpp, edit_observation).
    Q_INVOKABLE QString editObservation(const QString& observation_id, const QString& field, const QString& text);
    // [{value: code, text}] of the price book in use, for the observations' item drop-down.
    Q_INVOKABLE QVariantList priceItemChoices() const;
    Q_INVOKABLE void undo();
    Q_INVOKABLE void redo();
    // Unit and range of an editable field, for the editor's hints: {label, unit, range}.
    Q_INVOKABLE static QVariantMap fieldSpec(const QString& field);

Q_SIGNALS:
    void jobIdChanged();
    void changed();
    void errorTextChanged();
    void selectedFindingChanged();
    void worksChanged();
    void exported(const QString& path);

private:
    void load();
    void recompute();
    void refreshFindingRows();
    void refreshOptionRows();
    void refreshPlanRows();
    void refreshElectrodeChart();
    void refreshWorksRows();
    void refreshUrgentRows();
    void refreshSurveyRows();
    bool rebuildOwnPlan();
    bool reloadDetail();
    QString saveDocument(const std::string& document, bool record_undo);
    // Runs `edit` on a copy; "" from it saves the copy as a new revision, "unchanged" saves
    // nothing and is no refusal; anything else is the refusal.
    QString applyEdit(const std::function<std::string(model::Installation&)>& edit);
    void setErrorText(const QString& text);
    void followStatus();
    bool afterUrgentItemChange();
    [[nodiscard]] const remedies::Plan* plan(const std::string& name) const;
    [[nodiscard]] QString findingTitle(const std::string& id) const;
    [[nodiscard]] std::optional<double> predictedElectrodeOhms() const;
    [[nodiscard]] QVariantMap computeElectrodeInfo() const;

    Workspace* workspace_ = nullptr;
    qint64 job_ = -1;
    store::JobDetail detail_;
    std::string document_;
    std::unique_ptr<model::Installation> installation_;  // stable: the verifier refers to it
    std::vector<rules::Finding> findings_list_;
    std::unique_ptr<remedies::Analysis> analysis_;
    std::vector<remedies::Plan> plans_;  // least-cost, ideal, custom
    std::vector<std::string> own_choice_;
    std::optional<pricing::WorksList> works_list_;
    QString works_plan_;
    QString selected_finding_;
    QString error_text_;
    QString last_export_;
    std::vector<std::string> undo_, redo_;
    QVariantMap electrode_info_;
    QVariantMap supply_info_;
    QStringList survey_warnings_;
    QVariantMap tails_info_;

    RecordListModel* findings_model_;
    RecordListModel* options_model_;
    RecordListModel* plans_model_;
    RecordListModel* electrode_series_;
    RecordListModel* electrode_ticks_;
    RecordListModel* works_model_;
    RecordListModel* urgent_model_;
    RecordListModel* circuits_model_;
    RecordListModel* observations_model_;
    RecordListModel* boards_model_;
    RecordListModel* devices_model_;
};

}  // namespace mendwright::desktop
