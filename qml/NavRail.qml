import QtQuick
import QtQuick.Controls
import QtQuick.Layouts
import Mendwright.Models

// The navigation rail: the product's name, one entry per step with its shortcut, and where the
// store lives.
Rectangle {
    id: root
    required property var views
    required property string current
    required property bool jobOpen
    signal chosen(string name)

    color: Theme.rail
    implicitWidth: 236

    ColumnLayout {
        anchors.fill: parent
        anchors.margins: Theme.step * 1.5
        spacing: Theme.step / 2

        Text {
            text: "Mendwright"
            font.family: Theme.family
            font.pixelSize: Theme.headingSize
            font.bold: true
            color: Theme.railText
            Layout.bottomMargin: Theme.step * 2
        }
        Repeater {
            model: root.views
            delegate: ItemDelegate {
                id: entry
                required property var modelData
                required property int index
                Layout.fillWidth: true
                enabled: !modelData.needsJob || root.jobOpen
                focusPolicy: Qt.TabFocus
                onClicked: root.chosen(modelData.name)
                Keys.onReturnPressed: root.chosen(modelData.name)
                Accessible.name: modelData.label
                contentItem: RowLayout {
                    spacing: Theme.step
                    NavGlyph {
                        name: entry.modelData.name
                        colour: entry.modelData.name === root.current ? Theme.rail : Theme.railText
                        opacity: entry.enabled ? 1 : 0.45
                    }
                    Text {
                        text: entry.modelData.label
                        Layout.fillWidth: true
                        font.family: Theme.family
                        font.pixelSize: Theme.textSize
                        font.bold: entry.modelData.name === root.current
                        color: entry.modelData.name === root.current ? Theme.rail : Theme.railText
                        opacity: entry.enabled ? 1 : 0.45
                    }
                    Text {
                        text: qsTr("Ctrl %1").arg(entry.index + 1)
                        font.family: Theme.family
                        font.pixelSize: Theme.smallSize
                        color: entry.modelData.name === root.current ? Theme.rail : Theme.railText
                        opacity: 0.7
                    }
                }
                background: Rectangle {
                    radius: Theme.radius
                    color: entry.modelData.name === root.current ? Theme.railText : "transparent"
                    border.color: entry.visualFocus ? Theme.copperSoft : "transparent"
                    border.width: 2
                }
            }
        }
        Item { Layout.fillHeight: true }
        Text {
            text: qsTr("Store: %1").arg(Workspace.storeText)
            wrapMode: Text.WrapAnywhere
            Layout.fillWidth: true
            font.family: Theme.family
            font.pixelSize: Theme.smallSize - 1
            color: Theme.railText
            opacity: 0.75
        }
        Text {
            text: qsTr("Rules: %1").arg(Workspace.profileName)
            wrapMode: Text.WordWrap
            Layout.fillWidth: true
            font.family: Theme.family
            font.pixelSize: Theme.smallSize - 1
            color: Theme.railText
            opacity: 0.75
        }
    }
}
