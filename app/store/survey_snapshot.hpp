#pragma once
// From a survey document to what the job store keeps of it: the facts of the job and the
// findings of the document under the rules profile (rules::Finding flattened into records).

#include <string>
#include <vector>

#include "app/store/records.hpp"
#include "planner/model/installation.hpp"
#include "planner/rules/finding.hpp"
#include "planner/rules/profile.hpp"

namespace mendwright::store {

FindingRecord finding_record(const rules::Finding& finding);
std::vector<FindingRecord> finding_records(const std::vector<rules::Finding>& findings);

// The snapshot the store saves for `installation`, with `document` (its survey JSON) verbatim.
SurveySnapshot survey_snapshot(const model::Installation& installation, const std::string& document,
                                      const rules::RulesProfile& profile);

}  // namespace mendwright::store
