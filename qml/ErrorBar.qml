import QtQuick
import QtQuick.Layouts

// What went wrong last, naming the field; hidden when nothing did.
Rectangle {
    id: root
    property string text: ""
    visible: root.text !== ""
    color: Theme.copperSoft
    implicitHeight: visible ? message.implicitHeight + Theme.step * 1.5 : 0
    Text {
        id: message
        anchors.fill: parent
        anchors.margins: Theme.step * 0.75
        text: qsTr("Problem: %1").arg(root.text)
        wrapMode: Text.WordWrap
        font.family: Theme.family
        font.pixelSize: Theme.textSize
        color: Theme.codeC1
    }
    Accessible.role: Accessible.AlertMessage
    Accessible.name: message.text
}
