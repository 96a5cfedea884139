import QtQuick
import QtQuick.Layouts
import Mendwright.Models

// One recorded observation: its code (letters and shape, not colour alone), the inspector's
// words, its place (a board and optionally one of that board's circuits, chosen by name), and
// the price-book item that puts it right with its quantity in the item's unit. An observation
// with an item is offered as a priced line among the remedies. Every accepted change is a new
// revision; a refusal is shown at its field. A row of JobSession.observations.
Rectangle {
    id: root
    required property JobSession session
    required property string observationId
    required property string code
    required property string text
    required property string location
    required property string boardId
    required property string circuitId
    required property var boardChoices
    required property var circuitChoices
    required property string itemCode
    required property string itemQuantity
    required property string itemUnit
    required property string itemDescription

    function commit(field, value) { return root.session.editObservation(root.observationId, field, value) }

    color: Theme.surface
    border.color: Theme.line
    radius: Theme.radius
    implicitHeight: body.implicitHeight + Theme.step * 2
    Accessible.role: Accessible.Grouping
    Accessible.name: qsTr("Observation %1, %2: %3").arg(root.code).arg(root.location).arg(root.text)

    ColumnLayout {
        id: body
        anchors.left: parent.left; anchors.right: parent.right; anchors.top: parent.top
        anchors.margins: Theme.step
        spacing: 4
        RowLayout {
            Layout.fillWidth: true
            spacing: Theme.step
            CodeBadge { code: root.code; compact: true }
            BodyText { text: root.location; font.bold: true; Layout.fillWidth: true }
            ActionButton {
                text: qsTr("Remove")
                Accessible.name: qsTr("Remove observation %1").arg(root.text)
                onClicked: removeError.text = root.session.removeObservation(root.observationId)
            }
        }
        BodyText { id: removeError; visible: text !== ""; color: Theme.codeC1; Layout.fillWidth: true }
        Flow {
            Layout.fillWidth: true
            spacing: Theme.step
            ChoiceEditor {
                width: 230
                label: qsTr("Code")
                choices: root.session.choices("observationCode")
                value: root.code
                commit: (value) => root.commit("code", value)
            }
            FieldEditor {
                width: 420
                label: qsTr("The inspector's words")
                value: root.text
                commit: (text) => root.commit("text", text)
            }
            ChoiceEditor {
                width: 230
                label: qsTr("Board")
                choices: root.boardChoices
                value: root.boardId
                commit: (value) => root.commit("board", value)
            }
            ChoiceEditor {
                width: 230
                label: qsTr("Circuit of that board")
                enabled: root.boardId !== ""
                choices: root.circuitChoices
                value: root.circuitId
                commit: (value) => root.commit("circuit", value)
            }
        }
        Flow {
            Layout.fillWidth: true
            spacing: Theme.step
            ChoiceEditor {
                width: 420
                label: qsTr("Price-book item that puts it right")
                choices: root.session.priceItemChoices()
                value: root.itemCode
                commit: (value) => root.commit("itemCode", value)
            }
            FieldEditor {
                width: 180
                label: qsTr("or type its code")
                value: root.itemCode
                commit: (text) => root.commit("itemCode", text)
            }
            FieldEditor {
                width: 130
                visible: root.itemCode !== ""
                label: qsTr("Quantity")
                unit: root.itemUnit
                range: qsTr("above 0")
                value: root.itemQuantity
                commit: (text) => root.commit("itemQuantity", text)
            }
        }
        BodyText {
            visible: root.itemCode !== ""
            text: qsTr("Offered among the remedies as a priced line: %1 (%2 %3)").arg(root.itemDescription).arg(root.itemQuantity).arg(root.itemUnit)
            muted: true
            Layout.fillWidth: true
        }
    }
}
