#pragma once
// model::Installation -> JSON in the canonical field order of docs/survey-format.md.

#include "planner/io/json_fields.hpp"
#include "planner/model/installation.hpp"

namespace mendwright::io {

Json installation_json(const model::Installation& installation);

}  // namespace mendwright::io
