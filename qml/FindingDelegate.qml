import QtQuick
import QtQuick.Controls
import QtQuick.Layouts

// One finding in the list: its code badge, title and place.
ItemDelegate {
    id: root
    required property int index
    required property string code
    required property string codeWords
    required property string title
    required property string location
    required property string due
    property bool selected: false
    signal picked(int index)

    focusPolicy: Qt.NoFocus
    onClicked: root.picked(root.index)
    Accessible.name: root.code + " " + root.codeWords + ": " + root.title

    background: Rectangle {
        color: root.selected ? Theme.earthSoft : Theme.surface
        border.color: root.selected ? Theme.earth : Theme.line
        border.width: root.selected ? 2 : 1
        radius: Theme.radius
    }
    contentItem: RowLayout {
        spacing: Theme.step
        CodeBadge { code: root.code; compact: true; Layout.alignment: Qt.AlignTop }
        ColumnLayout {
            spacing: 2
            Layout.fillWidth: true
            BodyText { text: root.title; font.bold: true; Layout.fillWidth: true }
            BodyText { text: root.location; muted: true; font.pixelSize: Theme.smallSize; Layout.fillWidth: true }
            BodyText { visible: root.due !== ""; text: qsTr("Due %1").arg(root.due); font.pixelSize: Theme.smallSize }
        }
    }
}
