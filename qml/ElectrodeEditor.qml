import QtQuick
import QtQuick.Layouts
import Mendwright.Models

// The earth electrode: how it is built (kind, rods, layout, length, diameter, spacing, soil) and
// what was measured (RA and its date, soil resistivity); or a button to record one.
Rectangle {
    id: root
    required property JobSession session
    readonly property var electrode: session.electrode

    color: Theme.surface
    border.color: Theme.line
    radius: Theme.radius
    implicitHeight: body.implicitHeight + Theme.step * 3

    ColumnLayout {
        id: body
        anchors.left: parent.left; anchors.right: parent.right; anchors.top: parent.top
        anchors.margins: Theme.step * 1.5
        spacing: Theme.step

        RowLayout {
            Layout.fillWidth: true
            BodyText {
                text: root.session.hasElectrode ? qsTr("Earth electrode, rods in the system: %1").arg(root.electrode.rods || 0)
                                                : qsTr("Earth electrode: none recorded")
                font.bold: true
                Layout.fillWidth: true
            }
            ActionButton {
                text: root.session.hasElectrode ? qsTr("Remove electrode") : qsTr("Add electrode")
                onClicked: electrodeError.text = root.session.hasElectrode ? root.session.removeElectrode() : root.session.addElectrode()
            }
        }
        Flow {
            visible: root.session.hasElectrode
            Layout.fillWidth: true
            spacing: Theme.step * 1.5
            ChoiceEditor {
                width: 120
                label: qsTr("Kind")
                choices: root.session.choices("electrodeKind")
                value: root.electrode.electrodeKind || ""
                commit: (value) => root.session.editSurvey("electrode", "electrodeKind", value)
            }
            SurveyNumberEditor { width: 100; session: root.session; target: "electrode"; key: "rods"; label: qsTr("Rods"); value: root.electrode.rodCount || "" }
            ChoiceEditor {
                width: 210
                label: qsTr("Layout")
                choices: root.session.choices("layout")
                value: root.electrode.layout || ""
                commit: (value) => root.session.editSurvey("electrode", "layout", value)
            }
            SurveyNumberEditor { width: 120; session: root.session; target: "electrode"; key: "rodLength"; label: qsTr("Rod length"); value: root.electrode.rodLength || "" }
            SurveyNumberEditor { width: 150; session: root.session; target: "electrode"; key: "rodDiameter"; label: qsTr("Rod diameter"); value: root.electrode.rodDiameter || "" }
            SurveyNumberEditor { width: 130; session: root.session; target: "electrode"; key: "spacing"; label: qsTr("Rod spacing"); value: root.electrode.spacing || "" }
            SurveyTextEditor { width: 220; session: root.session; target: "electrode"; key: "soil"; label: qsTr("Soil"); value: root.electrode.soil || "" }
        }
        Flow {
            visible: root.session.hasElectrode
            Layout.fillWidth: true
            spacing: Theme.step * 1.5
            SurveyNumberEditor { id: raField; width: 200; session: root.session; target: "electrode"; key: "ra"; label: qsTr("RA measured"); value: root.electrode.ra || "" }
            FieldEditor {
                width: 160
                label: qsTr("Measured on")
                unit: qsTr("date")
                range: qsTr("YYYY-MM-DD")
                value: root.electrode.measuredOn || ""
                commit: (text) => root.session.editSurvey("electrode", "measuredOn", text)
            }
            SurveyNumberEditor { width: 220; session: root.session; target: "electrode"; key: "resistivity"; label: qsTr("Soil resistivity"); value: root.electrode.resistivity || "" }
        }
        BodyText { id: electrodeError; visible: text !== ""; color: Theme.codeC1; Layout.fillWidth: true }
    }
}
