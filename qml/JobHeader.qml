import QtQuick
import QtQuick.Layouts
import Mendwright.Models

// The open job in one line: reference, client, site, status, revision and its codes.
Rectangle {
    id: root
    required property JobSession session
    color: Theme.surface
    implicitHeight: row.implicitHeight + Theme.step * 2
    Rectangle { anchors.bottom: parent.bottom; width: parent.width; height: 1; color: Theme.line }

    RowLayout {
        id: row
        anchors.fill: parent
        anchors.margins: Theme.step
        anchors.leftMargin: Theme.step * 2
        spacing: Theme.step * 2
        Text {
            text: root.session.reference
            font.family: Theme.family; font.pixelSize: Theme.headingSize; font.bold: true
            color: Theme.copper
        }
        ColumnLayout {
            spacing: 0
            Layout.fillWidth: true
            BodyText { text: root.session.client; font.bold: true; elide: Text.ElideRight; Layout.fillWidth: true; wrapMode: Text.NoWrap }
            BodyText { text: root.session.site; muted: true; elide: Text.ElideRight; Layout.fillWidth: true; wrapMode: Text.NoWrap }
        }
        BodyText { text: qsTr("Status: %1").arg(root.session.status.replace("_", " ")) }
        BodyText { text: qsTr("Revision %1").arg(root.session.revision); muted: true }
        BodyText { text: root.session.findingSummary; font.bold: true }
    }
}
