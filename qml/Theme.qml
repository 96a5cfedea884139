pragma Singleton
import QtQuick

// Mendwright's look: warm paper, slate ink, a copper accent and an earth green; one type scale
// and one spacing step. Codes never rely on colour: every badge carries its letters and words
// and a shape of its own (CodeBadge.qml).
QtObject {
    readonly property color paper: "#f5f1ea"
    readonly property color surface: "#ffffff"
    readonly property color surfaceAlt: "#ece6dc"
    readonly property color rail: "#24343b"
    readonly property color railText: "#e9e4da"
    readonly property color ink: "#1c262b"
    readonly property color inkMuted: "#4d5a60"
    readonly property color line: "#c9c0b2"
    readonly property color copper: "#a4481f"
    readonly property color copperSoft: "#f3dfd2"
    readonly property color earth: "#2c6455"
    readonly property color earthSoft: "#dcebe5"
    readonly property color focus: "#1f5fa8"
    readonly property color warning: "#8a5a00"
    readonly property color warningSoft: "#fbefd0"

    // Code colours support the words and shapes, never replace them.
    readonly property color codeC1: "#8e1b1b"
    readonly property color codeC2: "#b4461a"
    readonly property color codeC3: "#5c6b2e"
    readonly property color codeFI: "#2d4f8a"
    readonly property color codeNote: "#5b6166"

    readonly property string family: "DejaVu Sans"
    readonly property int textSize: 14
    readonly property int smallSize: 12
    readonly property int headingSize: 20
    readonly property int titleSize: 26
    readonly property int step: 8
    readonly property int radius: 3

    function codeColour(code) {
        switch (code) {
        case "C1": return codeC1
        case "C2": return codeC2
        case "C3": return codeC3
        case "FI": return codeFI
        default: return codeNote
        }
    }
}
