import QtQuick
import QtQuick.Shapes

// Mendwright's own line icons for the navigation rail, drawn on a 20 x 20 grid.
Shape {
    id: root
    required property string name
    property color colour: Theme.railText
    implicitWidth: 20
    implicitHeight: 20

    readonly property var paths: ({
        "jobs": "M3 4 H17 M3 10 H17 M3 16 H12",
        "findings": "M10 2 L18 17 H2 Z M10 8 V12 M10 14 V15",
        "options": "M10 18 V10 M10 10 L4 3 M10 10 L16 3",
        "plans": "M3 17 V9 M8 17 V4 M13 17 V11 M18 17 V6",
        "works": "M4 3 H16 V17 H4 Z M7 7 H13 M7 11 H13 M7 14 H10",
        "aftercare": "M3 10 L8 15 L17 4",
        "survey": "M5 4 H15 V18 H5 Z M8 2 H12 V5 H8 Z M8 10 H12 M8 14 H12",
        "pricebook": "M3 10 L10 3 H17 V10 L10 17 Z M13 7 V7.5",
        "settings": "M3 5 H17 M3 10 H17 M3 15 H17 M7 3 V7 M13 8 V12 M9 13 V17"
    })

    ShapePath {
        strokeColor: root.colour
        strokeWidth: 1.8
        fillColor: "transparent"
        capStyle: ShapePath.RoundCap
        joinStyle: ShapePath.RoundJoin
        PathSvg { path: root.paths[root.name] || "" }
    }
}
