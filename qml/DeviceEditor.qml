import QtQuick
import QtQuick.Layouts
import Mendwright.Models

// One device of a board's tree, indented under the device above it, with its fields, where it
// is placed and a remove button. The tree is read from the words and the indent, not colour.
// A row of JobSession.devices.
RowLayout {
    id: root
    required property JobSession session
    required property string boardId
    required property string deviceId
    required property int depth
    required property string upstream
    required property var upstreamChoices
    required property string kind
    required property string rating
    required property string curve
    required property string idn
    required property string rcdType
    required property string delay
    required property string fuseStandard
    required property bool residualCurrent
    required property bool hasCurve
    required property bool fused
    required property string summary
    readonly property string target: "device:" + deviceId
    spacing: Theme.step

    Item { implicitWidth: root.depth * Theme.step * 3 }
    Rectangle {
        Layout.fillWidth: true
        color: Theme.surfaceAlt
        radius: Theme.radius
        implicitHeight: body.implicitHeight + Theme.step * 2
        ColumnLayout {
            id: body
            anchors.left: parent.left; anchors.right: parent.right; anchors.top: parent.top
            anchors.margins: Theme.step
            spacing: 4
            RowLayout {
                Layout.fillWidth: true
                BodyText {
                    text: (root.depth > 0 ? qsTr("below: ") : "") + root.summary + " · " + root.deviceId
                    font.bold: true
                    Layout.fillWidth: true
                }
                ActionButton {
                    text: qsTr("Remove")
                    Accessible.name: qsTr("Remove device %1").arg(root.deviceId)
                    onClicked: removeError.text = root.session.removeDevice(root.deviceId)
                }
            }
            Flow {
                Layout.fillWidth: true
                spacing: Theme.step
                DeviceFields {
                    width: parent.width - placed.width - Theme.step
                    session: root.session
                    target: root.target
                    device: ({kind: root.kind, rating: root.rating, curve: root.curve, idn: root.idn, rcdType: root.rcdType,
                              delay: root.delay, fuseStandard: root.fuseStandard, hasCurve: root.hasCurve,
                              residualCurrent: root.residualCurrent, fused: root.fused})
                }
                ChoiceEditor {
                    id: placed
                    width: 300
                    label: qsTr("Placed under")
                    choices: root.upstreamChoices
                    value: root.upstream
                    commit: (value) => root.session.editSurvey(root.target, "upstream", value)
                }
            }
            BodyText { id: removeError; visible: text !== ""; color: Theme.codeC1; Layout.fillWidth: true }
        }
    }
}
