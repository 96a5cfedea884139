#include "app/store/survey_snapshot.hpp"

#include "planner/io/survey_enums.hpp"
#include "planner/rules/assess.hpp"

namespace mendwright::store {

FindingRecord finding_record(const rules::Finding& finding) {
    FindingRecord record;
    record.id = finding.id;
    record.rule = finding.rule;
    record.code = rules::code_text(finding.code);
    record.title = finding.title;
    record.location = finding.location;
    record.clause = finding.clause;
    record.explanation = finding.explanation;
    record.urgent = finding.urgent();
    record.due = finding.due;
    record.due_text = finding.due_text;
    return record;
}

std::vector<FindingRecord> finding_records(const std::vector<rules::Finding>& findings) {
    std::vector<FindingRecord> records;
    records.reserve(findings.size());
    for (const auto& finding : findings) records.push_back(finding_record(finding));
    return records;
}

SurveySnapshot survey_snapshot(const model::Installation& installation, const std::string& document,
                                      const rules::RulesProfile& profile) {
    SurveySnapshot snapshot;
    const model::JobFacts& job = installation.job;
    snapshot.facts.reference = job.reference;
    snapshot.facts.client = job.client;
    snapshot.facts.site = job.site;
    snapshot.facts.occupancy = io::word_of(io::occupancy_words(), job.occupancy);
    snapshot.facts.inspection_date = job.inspection_date;
    snapshot.facts.inspector = job.inspector;
    snapshot.document = document;
    snapshot.findings = finding_records(rules::assess(installation, profile));
    return snapshot;
}

}  // namespace mendwright::store
