import QtQuick
import QtQuick.Controls
import QtQuick.Layouts

// A line typed by hand into the works list (no price-book code).
Rectangle {
    id: root
    property string error: ""
    signal addRequested(string description, string unit, string quantity, string cost, string hours)
    function clear() { description.text = ""; quantity.text = "1"; cost.text = ""; hours.text = "" }

    color: Theme.surface
    border.color: Theme.line
    radius: Theme.radius
    implicitHeight: body.implicitHeight + Theme.step * 2

    ColumnLayout {
        id: body
        anchors.fill: parent
        anchors.margins: Theme.step
        spacing: 4
        BodyText { text: qsTr("Add a line"); font.bold: true }
        RowLayout {
            spacing: Theme.step
            TextField { id: description; placeholderText: qsTr("Description"); Layout.fillWidth: true; Accessible.name: qsTr("Description") }
            TextField { id: unit; text: "each"; Layout.preferredWidth: 60; Accessible.name: qsTr("Unit") }
            TextField { id: quantity; text: "1"; Layout.preferredWidth: 60; Accessible.name: qsTr("Quantity") }
            TextField { id: cost; placeholderText: qsTr("Unit cost"); Layout.preferredWidth: 90; Accessible.name: qsTr("Unit cost") }
            TextField { id: hours; placeholderText: qsTr("Hours"); Layout.preferredWidth: 70; Accessible.name: qsTr("Labour hours per unit") }
            ActionButton {
                text: qsTr("Add")
                onClicked: root.addRequested(description.text, unit.text, quantity.text, cost.text, hours.text)
            }
        }
        BodyText { visible: root.error !== ""; text: root.error; color: Theme.codeC1; Layout.fillWidth: true }
    }
}
