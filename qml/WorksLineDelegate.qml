import QtQuick
import QtQuick.Controls
import QtQuick.Layouts

// A row of the works list: an option's heading (what it clears, its total) or a priced line
// with its quantity to edit.
Rectangle {
    id: root
    required property int index
    required property string kind
    required property string title
    required property string code
    required property string description
    required property string quantity
    required property string unit
    required property string unitCost
    required property string total
    required property string clears
    signal quantityEdited(int row, string text)

    readonly property bool heading: root.kind === "group"
    color: root.heading ? Theme.surfaceAlt : Theme.surface
    implicitHeight: (root.heading ? head.implicitHeight : line.implicitHeight) + Theme.step

    ColumnLayout {
        id: head
        visible: root.heading
        anchors.left: parent.left; anchors.right: parent.right
        anchors.verticalCenter: parent.verticalCenter
        anchors.leftMargin: Theme.step; anchors.rightMargin: Theme.step
        spacing: 0
        RowLayout {
            Layout.fillWidth: true
            BodyText { text: root.title; font.bold: true; Layout.fillWidth: true }
            BodyText { text: root.total; font.bold: true }
        }
        BodyText { visible: root.clears !== ""; text: qsTr("Clears: %1").arg(root.clears); muted: true; font.pixelSize: Theme.smallSize; Layout.fillWidth: true }
    }
    RowLayout {
        id: line
        visible: !root.heading
        anchors.left: parent.left; anchors.right: parent.right
        anchors.verticalCenter: parent.verticalCenter
        anchors.leftMargin: Theme.step * 2; anchors.rightMargin: Theme.step
        spacing: Theme.step
        BodyText { text: root.code === "" ? qsTr("added") : root.code; muted: true; font.pixelSize: Theme.smallSize; Layout.preferredWidth: 130; elide: Text.ElideRight; wrapMode: Text.NoWrap }
        BodyText { text: root.description; Layout.fillWidth: true; elide: Text.ElideRight; wrapMode: Text.NoWrap }
        TextField {
            id: quantityField
            text: root.quantity
            Layout.preferredWidth: 70
            horizontalAlignment: Text.AlignRight
            font.family: Theme.family
            selectByMouse: true
            Accessible.name: qsTr("Quantity of %1").arg(root.description)
            onEditingFinished: if (text !== root.quantity) root.quantityEdited(root.index, text)
        }
        BodyText { text: root.unit; muted: true; Layout.preferredWidth: 50 }
        BodyText { text: root.unitCost; muted: true; Layout.preferredWidth: 80; horizontalAlignment: Text.AlignRight }
        BodyText { text: root.total; Layout.preferredWidth: 90; horizontalAlignment: Text.AlignRight }
    }
}
