// Survey edits of a job session: each accepted edit is saved as a new revision (the survey
// reader's checks run on the whole document first), with undo and redo.
#include <algorithm>

#include "app/desktop/job_session.hpp"
#include "app/store/survey_snapshot.hpp"
#include "app/desktop/survey_edits.hpp"
#include "app/desktop/survey_fields.hpp"
#include "app/desktop/survey_rows.hpp"
#include "app/desktop/workspace.hpp"
#include "planner/io/survey_document.hpp"

namespace mendwright::desktop {

namespace {

QString qtext(const std::string& text) { return QString::fromStdString(text); }

std::string first_error(const io::SurveyLoad& load) {
    const auto errors = load.errors();
    return errors.empty() ? std::string() : errors.front().to_string();
}

}  // namespace

QString JobSession::saveDocument(const std::string& document, bool record_undo) {
    const io::SurveyLoad survey = io::read_survey(document);
    if (!survey.ok()) return qtext(first_error(survey));
    auto saved = workspace_->store().save_revision(job_, detail_.latest_revision,
                                                   store::survey_snapshot(*survey.installation, document, workspace_->profile()));
    if (!saved) return qtext(saved.error().to_string());
    if (record_undo) {
        undo_.push_back(document_);
        redo_.clear();
    }
    load();
    workspace_->notifyJobsChanged();
    return {};
}

QString JobSession::applyEdit(const std::function<std::string(model::Installation&)>& edit) {
    if (!installation_) return tr("no job open");
    model::Installation copy = *installation_;
    const std::string refused = edit(copy);
    if (refused == unchanged) return {};
    if (!refused.empty()) return qtext(refused);
    return saveDocument(io::write_survey(copy), true);
}

QString JobSession::editSurvey(const QString& target, const QString& field, const QString& text) {
    const Date today = workspace_ ? workspace_->todayDate() : Date{};
    return applyEdit([&](model::Installation& installation) {
        return edit_survey_field(installation, target.toStdString(), field.toStdString(), text.toStdString(), today);
    });
}

QString JobSession::editCircuit(const QString& circuit_id, const QString& field, const QString& text) {
    return editSurvey(QStringLiteral("circuit:") + circuit_id, field, text);
}

QString JobSession::editElectrode(const QString& field, const QString& text) {
    return editSurvey(QStringLiteral("electrode"), field, text);
}

QString JobSession::addElectrode() {
    return applyEdit([](model::Installation& installation) { return add_electrode(installation); });
}

QString JobSession::removeElectrode() {
    return applyEdit([](model::Installation& installation) { return remove_electrode(installation); });
}

QString JobSession::addBoard(const QString& parent_board_id) {
    return applyEdit([&](model::Installation& installation) { return add_board(installation, parent_board_id.toStdString()); });
}

QString JobSession::removeBoard(const QString& board_id) {
    return applyEdit([&](model::Installation& installation) { return remove_board(installation, board_id.toStdString()); });
}

QString JobSession::addDevice(const QString& board_id, const QString& kind, const QString& upstream_id) {
    return applyEdit([&](model::Installation& installation) {
        return add_device(installation, board_id.toStdString(), kind.toStdString(), upstream_id.toStdString());
    });
}

QString JobSession::removeDevice(const QString& device_id) {
    return applyEdit([&](model::Installation& installation) { return remove_device(installation, device_id.toStdString()); });
}

QString JobSession::addCircuit(const QString& board_id) {
    return applyEdit([&](model::Installation& installation) { return add_circuit(installation, board_id.toStdString()); });
}

QString JobSession::removeCircuit(const QString& circuit_id) {
    return applyEdit([&](model::Installation& installation) { return remove_circuit(installation, circuit_id.toStdString()); });
}

QVariantList JobSession::choices(const QString& field) { return field_choices(field); }

QString JobSession::addObservation(const QString& text, const QString& code) {
    return applyEdit([&](model::Installation& installation) -> std::string {
        model::Observation observation;
        observation.text = text.trimmed().toStdString();
        if (observation.text.empty()) return "observation: expected the inspector's words, got nothing";
        const std::string code_text = code.trimmed().toLower().toStdString();
        if (code_text == "c1") observation.code = model::ObservationCode::c1;
        else if (code_text == "c2") observation.code = model::ObservationCode::c2;
        else if (code_text == "c3") observation.code = model::ObservationCode::c3;
        else if (code_text == "fi") observation.code = model::ObservationCode::fi;
        else return "code: expected C1, C2, C3 or FI, got \"" + code.toStdString() + "\"";
        int n = static_cast<int>(installation.observations.size()) + 1;
        auto taken = [&](const std::string& id) {
            for (const auto& o : installation.observations)
                if (o.id == id) return true;
            return false;
        };
        do observation.id = "o" + std::to_string(n++);
        while (taken(observation.id));
        installation.observations.push_back(std::move(observation));
        return {};
    });
}

QString JobSession::removeObservation(const QString& observation_id) {
    return applyEdit([&](model::Installation& installation) -> std::string {
        const auto before = installation.observations.size();
        std::erase_if(installation.observations,
                      [&](const model::Observation& o) { return o.id == observation_id.toStdString(); });
        return before == installation.observations.size() ? "no observation " + observation_id.toStdString()
                                                           : std::string();
    });
}

QString JobSession::editObservation(const QString& observation_id, const QString& field, const QString& text) {
    if (!workspace_) return tr("no job open");
    const pricing::PriceBook& book = workspace_->book();
    return applyEdit([&](model::Installation& installation) {
        return edit_observation(installation, observation_id.toStdString(), field.toStdString(), text.toStdString(), book);
    });
}

QVariantList JobSession::priceItemChoices() const {
    return workspace_ ? price_item_choices(workspace_->book()) : QVariantList();
}

void JobSession::undo() {
    if (undo_.empty()) return;
    const std::string previous = undo_.back();
    const std::string current = document_;
    if (QString refused = saveDocument(previous, false); !refused.isEmpty()) {
        setErrorText(refused);
        return;
    }
    undo_.pop_back();
    redo_.push_back(current);
    Q_EMIT changed();
}

void JobSession::redo() {
    if (redo_.empty()) return;
    const std::string next = redo_.back();
    const std::string current = document_;
    if (QString refused = saveDocument(next, false); !refused.isEmpty()) {
        setErrorText(refused);
        return;
    }
    redo_.pop_back();
    undo_.push_back(current);
    Q_EMIT changed();
}

QVariantMap JobSession::fieldSpec(const QString& field) {
    const SurveyField* spec = survey_field(field.toStdString());
    if (!spec) return {};
    return {{QStringLiteral("label"), QString::fromUtf8(spec->label)},
            {QStringLiteral("unit"), QString::fromUtf8(spec->unit)},
            {QStringLiteral("range"), qtext(range_text(*spec))}};
}

// The survey's rows for the editor: supply, tails, electrode construction, boards, circuits and
// observations.
void JobSession::refreshSurveyRows() {
    supply_info_ = supply_row(installation_->supply);
    tails_info_ = tails_row(installation_->tails);
    boards_model_->setRows(board_rows(*installation_));
    devices_model_->setRows(device_rows(*installation_));
    circuits_model_->setRows(circuit_rows(*installation_));
    observations_model_->setRows(observation_rows(*installation_, workspace_->book()));
}

}  // namespace mendwright::desktop
