import QtQuick
import QtQuick.Controls
import QtQuick.Layouts

// One choice of the survey (earthing, device kind, curve, ...): its label over a drop-down of
// the choices the session offers, and the reason when the choice is refused. `commit` saves
// the chosen word and returns "" or what was expected.
ColumnLayout {
    id: root
    property string label: ""
    property var choices: []      // [{value, text}]
    property string value: ""
    property var commit: function(value) { return "" }
    property string error: ""
    property alias box: combo
    spacing: 2

    // The row of `value` among `choices` (-1 when absent), from the two properties alone so that
    // it holds whichever of them arrives first.
    function indexOf(value) {
        for (let i = 0; i < root.choices.length; ++i)
            if (root.choices[i].value === value) return i
        return -1
    }

    Text {
        text: root.label
        Layout.fillWidth: true
        elide: Text.ElideRight
        font.family: Theme.family
        font.pixelSize: Theme.smallSize
        font.bold: true
        color: Theme.ink
    }
    ComboBox {
        id: combo
        Layout.fillWidth: true
        Layout.minimumWidth: 110
        model: root.choices
        textRole: "text"
        valueRole: "value"
        currentIndex: root.indexOf(root.value)
        font.family: Theme.family
        font.pixelSize: Theme.textSize
        focusPolicy: Qt.StrongFocus
        Accessible.name: root.label
        onActivated: {
            if (currentValue === root.value) return
            root.error = root.commit(currentValue)
            currentIndex = Qt.binding(() => root.indexOf(root.value))
        }
    }
    Text {
        visible: root.error !== ""
        text: root.error
        wrapMode: Text.WordWrap
        Layout.fillWidth: true
        font.family: Theme.family
        font.pixelSize: Theme.smallSize
        color: Theme.codeC1
    }
}
