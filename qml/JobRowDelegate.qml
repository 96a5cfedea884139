import QtQuick
import QtQuick.Controls
import QtQuick.Layouts

// One job in the list. Overdue is written out, not only coloured.
ItemDelegate {
    id: root
    required property var jobId
    required property string reference
    required property string client
    required property string site
    required property string statusLabel
    required property int urgentOpen
    required property string nextDue
    required property bool overdue
    property bool selected: false
    signal activated(var jobId)

    height: 44
    focusPolicy: Qt.NoFocus
    onClicked: root.activated(root.jobId)
    Accessible.name: qsTr("%1, %2, %3 open urgent items").arg(root.reference).arg(root.client).arg(root.urgentOpen)

    background: Rectangle {
        color: root.selected ? Theme.earthSoft : (root.hovered ? Theme.surfaceAlt : Theme.surface)
        border.color: root.selected ? Theme.earth : "transparent"
        border.width: root.selected ? 2 : 0
        Rectangle { anchors.bottom: parent.bottom; width: parent.width; height: 1; color: Theme.line }
    }
    contentItem: RowLayout {
        spacing: Theme.step
        BodyText { text: root.reference; font.bold: true; color: Theme.copper; Layout.preferredWidth: 170; elide: Text.ElideRight; wrapMode: Text.NoWrap }
        BodyText { text: root.client; Layout.preferredWidth: 220; elide: Text.ElideRight; wrapMode: Text.NoWrap }
        BodyText { text: root.site; muted: true; Layout.fillWidth: true; elide: Text.ElideRight; wrapMode: Text.NoWrap }
        BodyText { text: root.statusLabel; Layout.preferredWidth: 110; wrapMode: Text.NoWrap }
        BodyText {
            text: root.urgentOpen > 0 ? qsTr("%1 urgent").arg(root.urgentOpen) : qsTr("none")
            font.bold: root.urgentOpen > 0
            muted: root.urgentOpen === 0
            Layout.preferredWidth: 110
            wrapMode: Text.NoWrap
        }
        RowLayout {
            Layout.preferredWidth: 150
            spacing: 4
            BodyText { text: root.nextDue === "" ? "—" : root.nextDue; wrapMode: Text.NoWrap }
            Rectangle {
                visible: root.overdue
                color: Theme.codeC1
                radius: Theme.radius
                implicitWidth: overdueText.implicitWidth + 8
                implicitHeight: overdueText.implicitHeight + 2
                Text {
                    id: overdueText
                    anchors.centerIn: parent
                    text: qsTr("OVERDUE")
                    font.family: Theme.family
                    font.pixelSize: Theme.smallSize - 1
                    font.bold: true
                    color: "#ffffff"
                }
            }
        }
    }
}
