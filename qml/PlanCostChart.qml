import QtQuick
import QtQuick.Layouts

// Cost and findings left, plan by plan, as labelled bars (values written beside each bar).
Rectangle {
    id: root
    required property var plans
    color: Theme.surface
    radius: Theme.radius
    border.color: Theme.line
    implicitHeight: body.implicitHeight + Theme.step * 3

    ColumnLayout {
        id: body
        anchors.left: parent.left
        anchors.right: parent.right
        anchors.top: parent.top
        anchors.margins: Theme.step * 1.5
        spacing: Theme.step

        BodyText { text: qsTr("Cost and findings left"); font.bold: true; font.pixelSize: Theme.headingSize }
        Repeater {
            model: root.plans
            delegate: ColumnLayout {
                required property string label
                required property string cost
                required property real costFraction
                required property int residualCount
                required property real residualFraction
                Layout.fillWidth: true
                spacing: 2
                BodyText { text: parent.label; font.bold: true }
                RowLayout {
                    Layout.fillWidth: true
                    BodyText { text: qsTr("Cost"); Layout.preferredWidth: 90; font.pixelSize: Theme.smallSize }
                    Item {
                        Layout.fillWidth: true
                        implicitHeight: 16
                        Rectangle { width: parent.width * costFraction; height: parent.height; color: Theme.copper; radius: 2 }
                    }
                    BodyText { text: cost; Layout.preferredWidth: 100; font.pixelSize: Theme.smallSize }
                }
                RowLayout {
                    Layout.fillWidth: true
                    BodyText { text: qsTr("Left open"); Layout.preferredWidth: 90; font.pixelSize: Theme.smallSize }
                    Item {
                        Layout.fillWidth: true
                        implicitHeight: 16
                        // Hatched bar: findings left are told from cost by pattern as well as colour.
                        Rectangle {
                            width: Math.max(2, parent.width * residualFraction); height: parent.height
                            color: Theme.surface; border.color: Theme.rail; border.width: 2; radius: 2
                            Row {
                                anchors.fill: parent; anchors.margins: 3; spacing: 4; clip: true
                                Repeater { model: 60; Rectangle { width: 2; height: 10; color: Theme.rail } }
                            }
                        }
                    }
                    BodyText { text: qsTr("%1 findings").arg(residualCount); Layout.preferredWidth: 100; font.pixelSize: Theme.smallSize }
                }
            }
        }
    }
}
