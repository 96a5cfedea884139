import QtQuick
import QtQuick.Controls
import QtQuick.Layouts
import Mendwright.Models

// Entering or correcting the survey: supply and earthing, meter tails, the electrode, boards with
// their device trees, circuits with their devices, cables and measured values, and the recorded
// observations. Every accepted edit is saved as a new revision; Ctrl+Z and
// Ctrl+Shift+Z step back and forward (each step is itself a revision).
FocusScope {
    id: root
    required property JobSession session

    ScrollView {
        id: scroller
        anchors.fill: parent
        contentWidth: availableWidth
        focus: true

        ColumnLayout {
            x: Theme.step * 2
            y: Theme.step * 2
            width: scroller.availableWidth - Theme.step * 4
            spacing: Theme.step * 1.5

            RowLayout {
                Layout.fillWidth: true
                spacing: Theme.step
                SectionTitle { text: qsTr("Survey, revision %1").arg(root.session.revision); Layout.fillWidth: true }
                ActionButton { text: qsTr("Undo"); hint: "Ctrl+Z"; enabled: root.session.canUndo; onClicked: root.session.undo() }
                ActionButton { text: qsTr("Redo"); hint: "Ctrl+Shift+Z"; enabled: root.session.canRedo; onClicked: root.session.redo() }
            }

            BodyText {
                text: qsTr("Each accepted change is saved as a new revision and the findings, options and plans are worked out again. "
                           + "A refused value keeps the last saved one and says what was expected.")
                muted: true
                Layout.fillWidth: true
            }

            // The survey reader's warnings: possible values worth a second look.
            Rectangle {
                visible: root.session.surveyWarnings.length > 0
                Layout.fillWidth: true
                color: Theme.warningSoft
                border.color: Theme.warning
                radius: Theme.radius
                implicitHeight: warningList.implicitHeight + Theme.step * 2
                Column {
                    id: warningList
                    anchors.left: parent.left; anchors.right: parent.right; anchors.top: parent.top
                    anchors.margins: Theme.step
                    spacing: 2
                    BodyText { text: qsTr("To check (the survey is saved; these values are possible but unusual):"); font.bold: true; width: parent.width }
                    Repeater {
                        model: root.session.surveyWarnings
                        delegate: BodyText { required property string modelData; text: "• " + modelData; width: warningList.width }
                    }
                }
            }

            SupplyEditor { Layout.fillWidth: true; session: root.session }
            ElectrodeEditor { Layout.fillWidth: true; session: root.session }

            // Boards with their device trees.
            BodyText { text: qsTr("Boards and their devices"); font.bold: true; font.pixelSize: Theme.headingSize }
            Repeater {
                model: root.session.boards
                delegate: BoardEditor {
                    Layout.fillWidth: true
                    session: root.session
                }
            }

            // Circuits.
            BodyText { text: qsTr("Circuits: devices, cables and measured values (empty = not measured)"); font.bold: true; font.pixelSize: Theme.headingSize }
            BodyText { text: qsTr("No circuits yet: add one from its board above."); visible: root.session.circuits.count === 0; muted: true }
            Repeater {
                model: root.session.circuits
                delegate: CircuitEditor {
                    Layout.fillWidth: true
                    session: root.session
                }
            }

            // Observations.
            BodyText { text: qsTr("Recorded observations"); font.bold: true; font.pixelSize: Theme.headingSize }
            BodyText {
                text: qsTr("Place each observation on its board and, where it concerns one, a circuit of that board. "
                           + "Name the price-book item that puts it right to have it offered as a priced remedy.")
                muted: true
                Layout.fillWidth: true
            }
            Repeater {
                model: root.session.observations
                delegate: ObservationEditor {
                    Layout.fillWidth: true
                    session: root.session
                }
            }
            RowLayout {
                spacing: Theme.step
                Layout.fillWidth: true
                ComboBox { id: newCode; model: ["C1", "C2", "C3", "FI"]; currentIndex: 2; Accessible.name: qsTr("Code of the new observation") }
                TextField { id: newText; placeholderText: qsTr("The inspector's words"); Layout.fillWidth: true; Accessible.name: qsTr("New observation") }
                ActionButton {
                    text: qsTr("Add observation")
                    onClicked: {
                        observationError.text = root.session.addObservation(newText.text, newCode.currentText)
                        if (observationError.text === "") newText.text = ""
                    }
                }
            }
            BodyText { id: observationError; visible: text !== ""; color: Theme.codeC1; Layout.fillWidth: true }
            Item { implicitHeight: Theme.step * 2 }
        }
    }
}
