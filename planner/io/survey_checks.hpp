#pragma once
// Checks across fields of a read survey: duplicate ids, references that point nowhere, the
// board tree (one origin, no loops), what each kind of device must and must not carry, and
// warnings for values that are possible but unusual. Each Diagnostic names the JSON path of the
// field, by the array positions survey_reader keeps.

#include "planner/io/json_fields.hpp"
#include "planner/model/installation.hpp"

namespace mendwright::io {

void check_installation(const model::Installation& installation, Diagnostics& diagnostics);

}  // namespace mendwright::io
