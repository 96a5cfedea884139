import QtQuick
import QtQuick.Controls
import QtQuick.Layouts

// One remedy option as a card: rank, title, cost, and the verdict of re-verification.
Rectangle {
    id: root
    required property int rank
    required property string optionId
    required property string title
    required property string description
    required property string cost
    required property string clears
    required property string introduces
    required property bool introducesUrgent
    required property string stillOpen
    required property string hoursOff
    required property bool notifiable
    required property string certificate
    required property bool chosen
    required property bool rankedLast
    required property string reason
    required property string assumptions
    property bool selected: false
    signal chooseToggled(string optionId, bool chosen)

    color: Theme.surface
    radius: Theme.radius
    border.color: root.selected ? Theme.focus : Theme.line
    border.width: root.selected ? 2 : 1
    implicitHeight: body.implicitHeight + Theme.step * 3

    ColumnLayout {
        id: body
        anchors.left: parent.left
        anchors.right: parent.right
        anchors.top: parent.top
        anchors.margins: Theme.step * 1.5
        spacing: Theme.step / 2

        RowLayout {
            spacing: Theme.step
            Layout.fillWidth: true
            Text {
                text: "#" + root.rank
                font.family: Theme.family; font.pixelSize: Theme.headingSize; font.bold: true
                color: Theme.copper
            }
            BodyText { text: root.title; font.bold: true; Layout.fillWidth: true }
            BodyText { text: root.cost; font.bold: true; font.pixelSize: Theme.headingSize }
            CheckBox {
                text: qsTr("In my plan")
                checked: root.chosen
                font.family: Theme.family
                onToggled: root.chooseToggled(root.optionId, checked)
                Accessible.name: qsTr("Put %1 in my plan").arg(root.title)
            }
        }
        BodyText { text: root.description; muted: true; Layout.fillWidth: true }
        GridLayout {
            columns: 2
            columnSpacing: Theme.step * 2
            rowSpacing: 2
            Layout.fillWidth: true
            BodyText { text: qsTr("Clears"); font.bold: true; Layout.alignment: Qt.AlignTop }
            BodyText { text: root.clears === "" ? qsTr("nothing (re-verified)") : root.clears; Layout.fillWidth: true }
            BodyText { text: qsTr("Introduces"); font.bold: true; Layout.alignment: Qt.AlignTop }
            BodyText {
                text: root.introduces === "" ? qsTr("nothing new") : root.introduces
                color: root.introducesUrgent ? Theme.codeC1 : Theme.ink
                font.bold: root.introducesUrgent
                Layout.fillWidth: true
            }
            BodyText { visible: root.stillOpen !== ""; text: qsTr("Still open"); font.bold: true; Layout.alignment: Qt.AlignTop }
            BodyText { visible: root.stillOpen !== ""; text: root.stillOpen; Layout.fillWidth: true }
            BodyText { text: qsTr("Supply off"); font.bold: true }
            BodyText { text: root.hoursOff }
            BodyText { text: qsTr("Notifiable"); font.bold: true }
            BodyText { text: root.notifiable ? qsTr("yes: building control notification") : qsTr("no") }
            BodyText { text: qsTr("Certificate"); font.bold: true }
            BodyText { text: root.certificate === "" ? "—" : root.certificate; Layout.fillWidth: true }
            BodyText { visible: root.assumptions !== ""; text: qsTr("Assumes"); font.bold: true; Layout.alignment: Qt.AlignTop }
            BodyText { visible: root.assumptions !== ""; text: root.assumptions; muted: true; Layout.fillWidth: true }
        }
        BodyText {
            text: (root.rankedLast ? qsTr("Ranked last: ") : qsTr("Why this rank: ")) + root.reason
            font.pixelSize: Theme.smallSize
            muted: !root.rankedLast
            color: root.rankedLast ? Theme.codeC1 : Theme.inkMuted
            Layout.fillWidth: true
        }
    }
}
