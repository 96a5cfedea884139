import QtQuick
import QtQuick.Shapes

// A finding's code as letters, words and a shape of its own: C1 a solid notched block, C2 a
// thick outline, FI a dashed outline, C3 a thin outline, a note no frame. Readable without colour.
Item {
    id: root
    required property string code
    property string words: ""
    property bool compact: false

    implicitWidth: label.implicitWidth + 2 * Theme.step + (root.code === "C1" ? 6 : 0)
    implicitHeight: label.implicitHeight + Theme.step

    readonly property color tone: Theme.codeColour(root.code)
    readonly property bool solid: root.code === "C1"

    Rectangle {
        anchors.fill: parent
        radius: Theme.radius
        color: root.solid ? root.tone : Theme.surface
        border.color: root.tone
        border.width: root.code === "C2" ? 3 : (root.code === "C3" ? 1 : 0)
        visible: root.code !== "FI"
    }
    // C1: a notch cut in the left edge.
    Rectangle {
        visible: root.solid
        width: 6; height: 6; rotation: 45
        color: Theme.surface
        x: -3; anchors.verticalCenter: parent.verticalCenter
    }
    Shape {
        anchors.fill: parent
        visible: root.code === "FI"
        ShapePath {
            strokeColor: root.tone
            strokeWidth: 2
            strokeStyle: ShapePath.DashLine
            dashPattern: [3, 2]
            fillColor: Theme.surface
            startX: 1; startY: 1
            PathLine { x: root.width - 1; y: 1 }
            PathLine { x: root.width - 1; y: root.height - 1 }
            PathLine { x: 1; y: root.height - 1 }
            PathLine { x: 1; y: 1 }
        }
    }
    Text {
        id: label
        anchors.centerIn: parent
        anchors.horizontalCenterOffset: root.solid ? 3 : 0
        text: root.compact || root.words === "" ? root.code : root.code + " · " + root.words
        font.family: Theme.family
        font.pixelSize: Theme.smallSize
        font.bold: true
        color: root.solid ? "#ffffff" : root.tone
    }
    Accessible.role: Accessible.StaticText
    Accessible.name: root.code + " " + root.words
}
