import QtQuick
import QtQuick.Layouts
import Mendwright.Models

// The supply and earthing (earthing arrangement, U0, phases, supply fuse, PFC, Ze) and the meter
// tails (length, csa, route, protection, device at the meter), each field with its unit and
// accepted range.
Rectangle {
    id: root
    required property JobSession session
    readonly property var supply: session.supply
    readonly property var tails: session.tails

    color: Theme.surface
    border.color: Theme.line
    radius: Theme.radius
    implicitHeight: body.implicitHeight + Theme.step * 3

    ColumnLayout {
        id: body
        anchors.left: parent.left; anchors.right: parent.right; anchors.top: parent.top
        anchors.margins: Theme.step * 1.5
        spacing: Theme.step

        BodyText { text: qsTr("Supply and earthing"); font.bold: true }
        Flow {
            Layout.fillWidth: true
            spacing: Theme.step * 1.5
            ChoiceEditor {
                id: earthingChoice
                width: 140
                label: qsTr("Earthing")
                choices: root.session.choices("earthing")
                value: root.supply.earthing || ""
                commit: (value) => root.session.editSurvey("supply", "earthing", value)
            }
            SurveyNumberEditor { width: 120; session: root.session; target: "supply"; key: "u0"; label: qsTr("U0"); value: root.supply.u0 || "" }
            ChoiceEditor {
                width: 150
                label: qsTr("Phases")
                choices: root.session.choices("phases")
                value: root.supply.phases || ""
                commit: (value) => root.session.editSurvey("supply", "phases", value)
            }
            SurveyTextEditor { width: 140; session: root.session; target: "supply"; key: "supplyFuseType"; label: qsTr("Supply fuse type"); value: root.supply.supplyFuseType || "" }
            SurveyNumberEditor { width: 150; session: root.session; target: "supply"; key: "supplyFuse"; label: qsTr("Supply fuse rating"); value: root.supply.supplyFuse || "" }
            SurveyNumberEditor { width: 210; session: root.session; target: "supply"; key: "pfc"; label: qsTr("Prospective fault current"); value: root.supply.pfc || "" }
            SurveyNumberEditor { width: 170; session: root.session; target: "supply"; key: "ze"; label: qsTr("Ze"); value: root.supply.ze || "" }
        }

        BodyText { text: qsTr("Meter tails"); font.bold: true }
        Flow {
            Layout.fillWidth: true
            spacing: Theme.step * 1.5
            SurveyNumberEditor { width: 130; session: root.session; target: "tails"; key: "tailsLength"; label: qsTr("Length"); value: root.tails.tailsLength || "" }
            SurveyNumberEditor { width: 130; session: root.session; target: "tails"; key: "tailsCsa"; label: qsTr("Csa"); value: root.tails.tailsCsa || "" }
            ChoiceEditor {
                width: 190
                label: qsTr("Route")
                choices: root.session.choices("tailsRoute")
                value: root.tails.tailsRoute || ""
                commit: (value) => root.session.editSurvey("tails", "tailsRoute", value)
            }
            ChoiceEditor {
                width: 220
                label: qsTr("Device at the meter")
                choices: root.session.choices("tailsOrigin")
                value: root.tails.tailsOrigin || ""
                commit: (value) => root.session.editSurvey("tails", "tailsOrigin", value)
            }
            FlagEditor {
                label: qsTr("Mechanically protected")
                checked: root.tails.tailsProtected || false
                commit: (text) => root.session.editSurvey("tails", "tailsProtected", text)
            }
        }
    }
}
