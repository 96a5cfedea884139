import QtQuick
import QtQuick.Layouts

// The caution that goes wherever findings, options or quotes show.
Rectangle {
    id: root
    required property string text
    color: Theme.warningSoft
    border.color: Theme.warning
    border.width: 1
    radius: Theme.radius
    implicitHeight: row.implicitHeight + Theme.step * 1.5
    Layout.fillWidth: true

    RowLayout {
        id: row
        anchors.fill: parent
        anchors.margins: Theme.step * 0.75
        spacing: Theme.step
        Text {
            text: qsTr("Caution")
            font.family: Theme.family
            font.pixelSize: Theme.smallSize
            font.bold: true
            color: Theme.warning
            Layout.alignment: Qt.AlignTop
        }
        Text {
            text: root.text
            wrapMode: Text.WordWrap
            font.family: Theme.family
            font.pixelSize: Theme.smallSize
            color: Theme.ink
            Layout.fillWidth: true
        }
    }
}
