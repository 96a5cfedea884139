import QtQuick
import QtQuick.Controls
import QtQuick.Layouts

// One editable reading: its label, unit and accepted range beside the box, and the reason
// when a value is refused. `commit` saves the text and returns "" or what was expected.
ColumnLayout {
    id: root
    property string label: ""
    property string unit: ""
    property string range: ""
    property string value: ""
    property var commit: function(text) { return "" }
    property string error: ""
    property alias field: input
    spacing: 2

    Text {
        text: root.label + (root.unit === "" ? "" : " (" + root.unit + ")")
        Layout.fillWidth: true
        elide: Text.ElideRight
        font.family: Theme.family
        font.pixelSize: Theme.smallSize
        font.bold: true
        color: Theme.ink
    }
    TextField {
        id: input
        text: root.value
        font.family: Theme.family
        font.pixelSize: Theme.textSize
        Layout.fillWidth: true
        Layout.minimumWidth: 90
        color: Theme.ink
        selectByMouse: true
        autoScroll: activeFocus
        Accessible.name: root.label + " " + root.unit
        Accessible.description: root.range
        background: Rectangle {
            radius: Theme.radius
            color: Theme.surface
            border.color: root.error !== "" ? Theme.codeC1 : (input.activeFocus ? Theme.focus : Theme.line)
            border.width: input.activeFocus || root.error !== "" ? 2 : 1
        }
        onEditingFinished: {
            if (input.text === root.value) {
                root.error = ""
                return
            }
            root.error = root.commit(input.text)
        }
    }
    Text {
        visible: root.range !== "" && root.error === ""
        text: qsTr("accepts %1").arg(root.range)
        Layout.fillWidth: true
        elide: Text.ElideRight
        font.family: Theme.family
        font.pixelSize: Theme.smallSize - 1
        color: Theme.inkMuted
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
