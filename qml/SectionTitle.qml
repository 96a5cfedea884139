import QtQuick

// A heading inside a page.
Text {
    id: root
    font.family: Theme.family
    font.pixelSize: Theme.headingSize
    font.bold: true
    color: Theme.ink
    elide: Text.ElideRight
}
