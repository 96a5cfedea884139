import QtQuick
import QtQuick.Controls
import QtQuick.Layouts

// One plan in a column: price before markup and VAT, what it leaves open by code, hours off,
// notification, certificates and the options it is made of.
Rectangle {
    id: root
    required property string name
    required property string label
    required property string cost
    required property int residualC1
    required property int residualC2
    required property int residualC3
    required property int residualFi
    required property int urgentLeft
    required property string optionTitles
    required property string hoursOff
    required property bool notifiable
    required property string certificates
    required property string touchText
    required property int circuitsLost
    required property int introducedCount
    required property string notes
    required property bool inUse
    signal useRequested(string name)

    color: Theme.surface
    radius: Theme.radius
    border.color: root.inUse ? Theme.earth : Theme.line
    border.width: root.inUse ? 3 : 1
    implicitHeight: body.implicitHeight + Theme.step * 3

    ColumnLayout {
        id: body
        anchors.left: parent.left
        anchors.right: parent.right
        anchors.top: parent.top
        anchors.margins: Theme.step * 1.5
        spacing: Theme.step / 2

        BodyText { text: root.label; font.bold: true; font.pixelSize: Theme.headingSize; Layout.fillWidth: true }
        BodyText { visible: root.inUse; text: qsTr("In the works list"); color: Theme.earth; font.bold: true }
        Text {
            text: root.cost
            font.family: Theme.family; font.pixelSize: Theme.titleSize; font.bold: true
            color: Theme.copper
        }
        BodyText { text: qsTr("before markup, contingency and VAT"); muted: true; font.pixelSize: Theme.smallSize }
        BodyText {
            text: root.urgentLeft === 0 ? qsTr("Clears every C1, C2 and FI") : qsTr("Leaves %1 urgent open").arg(root.urgentLeft)
            font.bold: true
            color: root.urgentLeft === 0 ? Theme.earth : Theme.codeC1
        }
        BodyText {
            text: qsTr("Left open: C1 %1 · C2 %2 · FI %3 · C3 %4").arg(root.residualC1).arg(root.residualC2).arg(root.residualFi).arg(root.residualC3)
            Layout.fillWidth: true
        }
        BodyText { text: qsTr("New findings it brings: %1").arg(root.introducedCount); Layout.fillWidth: true }
        BodyText { text: qsTr("Supply off: %1").arg(root.hoursOff) }
        BodyText { text: qsTr("Circuits lost on one earth fault: %1").arg(root.circuitsLost) }
        BodyText { text: qsTr("Touch voltage: %1").arg(root.touchText); Layout.fillWidth: true }
        BodyText { text: root.notifiable ? qsTr("Notifiable to building control") : qsTr("Not notifiable") }
        BodyText { text: qsTr("Certificates: %1").arg(root.certificates === "" ? "—" : root.certificates.replace(/\n/g, ", ")); Layout.fillWidth: true }
        Rectangle { Layout.fillWidth: true; height: 1; color: Theme.line }
        BodyText { text: qsTr("Work"); font.bold: true }
        BodyText { text: root.optionTitles === "" ? qsTr("nothing") : "• " + root.optionTitles.replace(/\n/g, "\n• "); Layout.fillWidth: true }
        BodyText { visible: root.notes !== ""; text: root.notes; muted: true; font.pixelSize: Theme.smallSize; Layout.fillWidth: true }
        ActionButton {
            text: root.inUse ? qsTr("Rebuild works list") : qsTr("Use this plan")
            primary: !root.inUse
            Accessible.name: qsTr("Use the plan %1").arg(root.label)
            onClicked: root.useRequested(root.name)
        }
    }
}
