import QtQuick
import QtQuick.Controls

// A push button in Mendwright's own dress: copper when it is the page's main step, outlined
// otherwise, with a visible focus ring for keyboard users.
Button {
    id: root
    property bool primary: false
    property string hint: ""   // the shortcut, shown after the text: "Ctrl+E"

    font.family: Theme.family
    font.pixelSize: Theme.textSize
    padding: Theme.step
    leftPadding: Theme.step * 1.5
    rightPadding: Theme.step * 1.5
    focusPolicy: Qt.StrongFocus

    contentItem: Text {
        text: root.hint === "" ? root.text : root.text + "  " + root.hint
        font: root.font
        color: !root.enabled ? Theme.inkMuted : (root.primary ? "#ffffff" : Theme.ink)
        horizontalAlignment: Text.AlignHCenter
        verticalAlignment: Text.AlignVCenter
        elide: Text.ElideRight
    }
    background: Rectangle {
        implicitHeight: 34
        implicitWidth: 80
        radius: Theme.radius
        color: !root.enabled ? Theme.surfaceAlt
             : root.primary ? (root.down ? Qt.darker(Theme.copper, 1.2) : Theme.copper)
             : (root.down ? Theme.surfaceAlt : Theme.surface)
        border.color: root.visualFocus ? Theme.focus : (root.primary ? Theme.copper : Theme.line)
        border.width: root.visualFocus ? 3 : 1
    }
    Keys.onReturnPressed: root.clicked()
    Keys.onEnterPressed: root.clicked()
}
