import QtQuick
import QtQuick.Controls
import QtQuick.Layouts
import Mendwright.Models

// Entering or correcting the survey: the electrode, each circuit's measured values and the
// recorded observations. Every accepted edit is saved as a new revision; Ctrl+Z and
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

            // Electrode.
            Rectangle {
                visible: root.session.hasElectrode
                Layout.fillWidth: true
                color: Theme.surface; border.color: Theme.line; radius: Theme.radius
                implicitHeight: electrodeRow.implicitHeight + Theme.step * 3
                ColumnLayout {
                    id: electrodeRow
                    anchors.left: parent.left; anchors.right: parent.right; anchors.top: parent.top
                    anchors.margins: Theme.step * 1.5
                    BodyText { text: qsTr("Earth electrode (%1 rods)").arg(root.session.electrode.rods || 0); font.bold: true }
                    RowLayout {
                        spacing: Theme.step * 2
                        FieldEditor {
                            id: raField
                            Layout.preferredWidth: 240
                            label: qsTr("RA measured")
                            unit: "Ω"
                            range: root.session.fieldSpec("ra").range
                            value: root.session.electrode.ra || ""
                            commit: (text) => root.session.editElectrode("ra", text)
                        }
                        FieldEditor {
                            Layout.preferredWidth: 200
                            label: qsTr("Measured on")
                            unit: qsTr("date")
                            range: qsTr("YYYY-MM-DD")
                            value: root.session.electrode.measuredOn || ""
                            commit: (text) => root.session.editElectrode("measuredOn", text)
                        }
                        FieldEditor {
                            Layout.preferredWidth: 260
                            label: qsTr("Soil resistivity")
                            unit: "Ω·m"
                            range: root.session.fieldSpec("resistivity").range
                            value: root.session.electrode.resistivity || ""
                            commit: (text) => root.session.editElectrode("resistivity", text)
                        }
                    }
                }
            }

            // Circuits.
            BodyText { text: qsTr("Circuits: measured values (empty = not measured)"); font.bold: true; font.pixelSize: Theme.headingSize }
            Repeater {
                model: root.session.circuits
                delegate: CircuitReadingsEditor {
                    Layout.fillWidth: true
                    session: root.session
                }
            }

            // Observations.
            BodyText { text: qsTr("Recorded observations"); font.bold: true; font.pixelSize: Theme.headingSize }
            Repeater {
                model: root.session.observations
                delegate: RowLayout {
                    required property string observationId
                    required property string code
                    required property string text
                    required property string location
                    Layout.fillWidth: true
                    spacing: Theme.step
                    CodeBadge { code: parent.code; compact: true }
                    BodyText { text: parent.text; Layout.fillWidth: true }
                    BodyText { text: parent.location; muted: true }
                    ActionButton {
                        text: qsTr("Remove")
                        Accessible.name: qsTr("Remove observation %1").arg(parent.text)
                        onClicked: root.session.removeObservation(parent.observationId)
                    }
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
