import QtQuick
import QtQuick.Layouts
import Mendwright.Models

// A free-text fact of the survey (a name, a location, a fuse standard as marked), saved through
// JobSession.editSurvey(target, key, text).
FieldEditor {
    id: root
    required property JobSession session
    required property string target
    required property string key
    Layout.preferredWidth: 200
    commit: (text) => root.session.editSurvey(root.target, root.key, text)
}
