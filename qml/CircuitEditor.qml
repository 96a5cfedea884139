import QtQuick
import QtQuick.Layouts
import Mendwright.Models

// One circuit of the survey: what it is (number, description, use), where it hangs in the
// board, its own protective device, its cables, and its measured values. A row of
// JobSession.circuits.
Rectangle {
    id: root
    required property JobSession session
    required property string circuitId
    required property string board
    required property string number
    required property string description
    required property string use
    required property string upstream
    required property var upstreamChoices
    required property string lineCsa
    required property string cpcCsa
    required property string length
    required property bool concealed
    required property bool outdoor
    required property bool submain
    required property string kind
    required property string rating
    required property string curve
    required property string idn
    required property string rcdType
    required property string delay
    required property string fuseStandard
    required property bool hasCurve
    required property bool residualCurrent
    required property bool fused
    required property string summary
    required property string zs
    required property string r1r2
    required property string ir
    required property string leakage
    required property string tripIdn
    required property string trip5Idn
    readonly property string target: "circuit:" + circuitId

    color: Theme.surface
    border.color: Theme.line
    radius: Theme.radius
    implicitHeight: body.implicitHeight + Theme.step * 2

    ColumnLayout {
        id: body
        anchors.left: parent.left; anchors.right: parent.right; anchors.top: parent.top
        anchors.margins: Theme.step
        spacing: 4
        RowLayout {
            Layout.fillWidth: true
            BodyText {
                text: qsTr("%1 · circuit %2 · %3 · %4").arg(root.board).arg(root.number).arg(root.description).arg(root.summary)
                font.bold: true
                Layout.fillWidth: true
            }
            ActionButton {
                visible: !root.submain
                text: qsTr("Remove")
                Accessible.name: qsTr("Remove circuit %1").arg(root.number)
                onClicked: removeError.text = root.session.removeCircuit(root.circuitId)
            }
        }
        BodyText { id: removeError; visible: text !== ""; color: Theme.codeC1; Layout.fillWidth: true }
        Flow {
            Layout.fillWidth: true
            spacing: Theme.step
            SurveyTextEditor { width: 80; session: root.session; target: root.target; key: "number"; label: qsTr("Number"); value: root.number }
            SurveyTextEditor { width: 220; session: root.session; target: root.target; key: "description"; label: qsTr("Description"); value: root.description }
            ChoiceEditor {
                width: 160
                label: qsTr("Use")
                choices: root.session.choices("use")
                value: root.use
                commit: (value) => root.session.editSurvey(root.target, "use", value)
            }
            ChoiceEditor {
                width: 300
                label: qsTr("Placed under")
                choices: root.upstreamChoices
                value: root.upstream
                commit: (value) => root.session.editSurvey(root.target, "upstream", value)
            }
            SurveyNumberEditor { width: 110; session: root.session; target: root.target; key: "lineCsa"; label: qsTr("Line csa"); value: root.lineCsa }
            SurveyNumberEditor { width: 110; session: root.session; target: root.target; key: "cpcCsa"; label: qsTr("cpc csa"); value: root.cpcCsa }
            SurveyNumberEditor { width: 110; session: root.session; target: root.target; key: "length"; label: qsTr("Length"); value: root.length }
            FlagEditor { label: qsTr("Concealed in a wall"); checked: root.concealed; commit: (text) => root.session.editSurvey(root.target, "concealed", text) }
            FlagEditor { label: qsTr("Supplies outdoor equipment"); checked: root.outdoor; commit: (text) => root.session.editSurvey(root.target, "outdoor", text) }
        }
        DeviceFields {
            Layout.fillWidth: true
            session: root.session
            target: root.target
            kindChoices: root.submain ? "kind" : "circuitDeviceKind"
            device: ({kind: root.kind, rating: root.rating, curve: root.curve, idn: root.idn, rcdType: root.rcdType,
                      delay: root.delay, fuseStandard: root.fuseStandard, hasCurve: root.hasCurve,
                      residualCurrent: root.residualCurrent, fused: root.fused})
        }
        CircuitReadingsEditor {
            Layout.fillWidth: true
            session: root.session
            circuitId: root.circuitId
            zs: root.zs; r1r2: root.r1r2; ir: root.ir; leakage: root.leakage
            tripIdn: root.tripIdn; trip5Idn: root.trip5Idn
            residualCurrent: root.residualCurrent
        }
    }
}
