import QtQuick
import QtQuick.Controls
import QtQuick.Layouts

// One urgent item with its state in words and the next step as a button (R, T on the keyboard).
Rectangle {
    id: root
    required property string findingId
    required property string code
    required property string codeWords
    required property string title
    required property string location
    required property string due
    required property string state
    required property string stateLabel
    required property string remediedOn
    required property string retestedOn
    required property bool overdue
    property bool selected: false
    signal remedied(string findingId)
    signal retested(string findingId)

    color: Theme.surface
    radius: Theme.radius
    border.color: root.selected ? Theme.focus : Theme.line
    border.width: root.selected ? 2 : 1
    implicitHeight: row.implicitHeight + Theme.step * 2

    RowLayout {
        id: row
        anchors.fill: parent
        anchors.margins: Theme.step
        spacing: Theme.step
        CodeBadge { code: root.code; words: root.codeWords; Layout.alignment: Qt.AlignTop }
        ColumnLayout {
            Layout.fillWidth: true
            spacing: 2
            BodyText { text: root.title; font.bold: true; Layout.fillWidth: true }
            BodyText { text: root.location; muted: true; font.pixelSize: Theme.smallSize; Layout.fillWidth: true }
            BodyText {
                text: qsTr("Due %1").arg(root.due) + (root.overdue ? qsTr(" — OVERDUE") : "")
                font.bold: root.overdue
                color: root.overdue ? Theme.codeC1 : Theme.ink
                font.pixelSize: Theme.smallSize
            }
        }
        ColumnLayout {
            spacing: 2
            BodyText { text: root.stateLabel; font.bold: true }
            BodyText { visible: root.remediedOn !== ""; text: qsTr("remedied %1").arg(root.remediedOn); muted: true; font.pixelSize: Theme.smallSize }
            BodyText { visible: root.retestedOn !== ""; text: qsTr("re-tested %1").arg(root.retestedOn); muted: true; font.pixelSize: Theme.smallSize }
        }
        ActionButton {
            visible: root.state === "open"
            text: qsTr("Remedied")
            hint: "R"
            onClicked: root.remedied(root.findingId)
        }
        ActionButton {
            visible: root.state === "remedied"
            text: qsTr("Re-tested")
            hint: "T"
            primary: true
            onClicked: root.retested(root.findingId)
        }
    }
}
