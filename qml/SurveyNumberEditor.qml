import QtQuick
import QtQuick.Layouts
import Mendwright.Models

// A number of the survey, typed in the unit shown and checked against the range the session
// gives for `key`; saved through JobSession.editSurvey(target, key, text).
FieldEditor {
    id: root
    required property JobSession session
    required property string target   // "supply", "tails", "electrode", "board:db1", "device:rcd1", "circuit:c2"
    required property string key      // "u0", "rating", "idn", ...
    readonly property var spec: session.fieldSpec(key)
    Layout.preferredWidth: 150
    unit: spec.unit || ""
    range: spec.range || ""
    commit: (text) => root.session.editSurvey(root.target, root.key, text)
}
