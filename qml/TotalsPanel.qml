import QtQuick
import QtQuick.Layouts
import Mendwright.Models

// The works list's figures, worked out by the pricing module and shown as they come.
Rectangle {
    id: root
    property moneyFigures figures
    color: Theme.surface
    border.color: Theme.line
    radius: Theme.radius
    implicitHeight: grid.implicitHeight + Theme.step * 3

    GridLayout {
        id: grid
        anchors.left: parent.left; anchors.right: parent.right; anchors.top: parent.top
        anchors.margins: Theme.step * 1.5
        columns: 2
        rowSpacing: 4
        BodyText { text: qsTr("Materials"); Layout.fillWidth: true }
        BodyText { text: root.figures.materials }
        BodyText { text: qsTr("Labour (%1 h on site)").arg(root.figures.hoursOnSite); Layout.fillWidth: true }
        BodyText { text: root.figures.labour }
        BodyText { text: qsTr("Subtotal"); font.bold: true }
        BodyText { text: root.figures.subtotal; font.bold: true }
        BodyText { text: qsTr("Contingency") }
        BodyText { text: root.figures.contingency }
        BodyText { text: qsTr("Markup on materials") }
        BodyText { text: root.figures.markup }
        BodyText { text: qsTr("Net") }
        BodyText { text: root.figures.net }
        BodyText { text: qsTr("VAT") }
        BodyText { text: root.figures.vat }
        Rectangle { Layout.columnSpan: 2; Layout.fillWidth: true; height: 2; color: Theme.ink }
        BodyText { text: qsTr("Total"); font.bold: true; font.pixelSize: Theme.headingSize }
        Text {
            text: root.figures.total
            font.family: Theme.family; font.pixelSize: Theme.titleSize; font.bold: true
            color: Theme.copper
        }
    }
}
