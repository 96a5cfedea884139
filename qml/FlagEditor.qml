import QtQuick
import QtQuick.Controls
import QtQuick.Layouts

// A yes/no fact of the survey ("buried", "surge protection fitted") as a check box, with the
// reason when the change is refused. `commit` gets "true" or "false".
ColumnLayout {
    id: root
    property string label: ""
    property bool checked: false
    property var commit: function(text) { return "" }
    property string error: ""
    property alias box: check
    spacing: 2

    CheckBox {
        id: check
        text: root.label
        checked: root.checked
        font.family: Theme.family
        font.pixelSize: Theme.textSize
        focusPolicy: Qt.StrongFocus
        Accessible.name: root.label
        onToggled: {
            root.error = root.commit(check.checked ? "true" : "false")
            check.checked = Qt.binding(() => root.checked)
        }
    }
    Text {
        visible: root.error !== ""
        text: root.error
        wrapMode: Text.WordWrap
        Layout.fillWidth: true
        font.family: Theme.family
        font.pixelSize: Theme.smallSize
        color: Theme.codeC1
    }
}
