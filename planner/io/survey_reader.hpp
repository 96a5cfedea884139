#pragma once
// JSON -> model::Installation, field by field: types, enumerations, ranges of single values,
// unknown fields. Cross-field checks (references, duplicates, the board tree, warnings) are in
// survey_checks.hpp. Arrays keep their document positions: element i of a JSON array is element
// i of the model's vector (a default one when the element is unreadable), so the checks can
// name paths by index.

#include "planner/io/json_fields.hpp"
#include "planner/model/installation.hpp"

namespace mendwright::io {

// `root` has already passed the format and version check.
model::Installation read_installation(const Json& root, Diagnostics& diagnostics);

}  // namespace mendwright::io
