import QtQuick
import QtQuick.Controls
import QtQuick.Layouts
import Mendwright.Models

// One board of the survey: its name, place and enclosure, its device tree (main switch, RCDs,
// switch-fuses, each placed under another or under the incoming supply), and the buttons that
// add a device, a circuit or a board supplied from this one. A row of JobSession.boards.
Rectangle {
    id: root
    required property JobSession session
    required property string boardId
    required property string name
    required property string location
    required property string enclosure
    required property string spareWays
    required property bool acceptsRcbos
    required property bool surge
    required property bool origin
    required property string supplied
    required property int deviceCount
    required property var upstreamChoices
    readonly property string target: "board:" + boardId

    color: Theme.surface
    border.color: Theme.line
    radius: Theme.radius
    implicitHeight: body.implicitHeight + Theme.step * 3

    ColumnLayout {
        id: body
        anchors.left: parent.left; anchors.right: parent.right; anchors.top: parent.top
        anchors.margins: Theme.step * 1.5
        spacing: Theme.step

        RowLayout {
            Layout.fillWidth: true
            BodyText {
                text: qsTr("Board %1 · %2").arg(root.name === "" ? root.boardId : root.name).arg(root.supplied)
                font.bold: true
                font.pixelSize: Theme.headingSize - 2
                Layout.fillWidth: true
            }
            ActionButton {
                visible: !root.origin
                text: qsTr("Remove board")
                Accessible.name: qsTr("Remove board %1").arg(root.name)
                onClicked: boardError.text = root.session.removeBoard(root.boardId)
            }
        }
        Flow {
            Layout.fillWidth: true
            spacing: Theme.step * 1.5
            SurveyTextEditor { width: 200; session: root.session; target: root.target; key: "name"; label: qsTr("Name"); value: root.name }
            SurveyTextEditor { width: 220; session: root.session; target: root.target; key: "location"; label: qsTr("Location"); value: root.location }
            ChoiceEditor {
                width: 200
                label: qsTr("Enclosure")
                choices: root.session.choices("enclosure")
                value: root.enclosure
                commit: (value) => root.session.editSurvey(root.target, "enclosure", value)
            }
            SurveyNumberEditor { width: 120; session: root.session; target: root.target; key: "spareWays"; label: qsTr("Spare ways"); value: root.spareWays }
            FlagEditor {
                label: qsTr("Accepts RCBOs")
                checked: root.acceptsRcbos
                commit: (text) => root.session.editSurvey(root.target, "acceptsRcbos", text)
            }
            FlagEditor {
                label: qsTr("Surge protection fitted")
                checked: root.surge
                commit: (text) => root.session.editSurvey(root.target, "surge", text)
            }
        }

        BodyText { text: qsTr("Devices (none: every circuit is directly below the incoming supply)"); visible: root.deviceCount === 0; muted: true }
        // The session lists every board's devices; this board shows its own.
        Repeater {
            model: root.session.devices
            delegate: DeviceEditor {
                id: deviceRow
                visible: deviceRow.boardId === root.boardId
                Layout.fillWidth: true
                session: root.session
            }
        }

        Flow {
            Layout.fillWidth: true
            spacing: Theme.step
            ComboBox {
                id: newKind
                width: 160
                model: root.session.choices("boardDeviceKind")
                textRole: "text"; valueRole: "value"
                font.family: Theme.family
                Accessible.name: qsTr("Kind of the new device")
            }
            ComboBox {
                id: newParent
                width: 300
                model: root.upstreamChoices
                textRole: "text"; valueRole: "value"
                font.family: Theme.family
                Accessible.name: qsTr("Device above the new device")
            }
            ActionButton {
                text: qsTr("Add device")
                Accessible.name: qsTr("Add a device to board %1").arg(root.name)
                onClicked: boardError.text = root.session.addDevice(root.boardId, newKind.currentValue, newParent.currentValue)
            }
            ActionButton {
                text: qsTr("Add circuit")
                Accessible.name: qsTr("Add a circuit to board %1").arg(root.name)
                onClicked: boardError.text = root.session.addCircuit(root.boardId)
            }
            ActionButton {
                text: qsTr("Add a board supplied from here")
                onClicked: boardError.text = root.session.addBoard(root.boardId)
            }
        }
        BodyText { id: boardError; visible: text !== ""; color: Theme.codeC1; Layout.fillWidth: true }
    }
}
