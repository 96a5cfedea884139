import QtQuick

// Running text in the page's ink.
Text {
    property bool muted: false
    font.family: Theme.family
    font.pixelSize: Theme.textSize
    color: muted ? Theme.inkMuted : Theme.ink
    wrapMode: Text.WordWrap
}
