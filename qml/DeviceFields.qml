import QtQuick
import QtQuick.Layouts
import Mendwright.Models

// The fields of one protective or switching device (a board's, or a circuit's own): kind,
// rating, and what that kind carries: the curve of an MCB or RCBO, IΔn, type and delay of an
// RCD or RCBO, the standard of a fuse. `device` is a row of the session's boards or circuits.
Flow {
    id: root
    required property JobSession session
    required property string target      // "device:rcd1" or "circuit:c3"
    required property var device
    property string kindChoices: "boardDeviceKind"
    spacing: Theme.step

    ChoiceEditor {
        width: 160
        label: qsTr("Device")
        choices: root.session.choices(root.kindChoices)
        value: root.device.kind
        commit: (value) => root.session.editSurvey(root.target, "kind", value)
    }
    SurveyNumberEditor {
        width: 130
        session: root.session; target: root.target; key: "rating"
        label: qsTr("Rating In")
        value: root.device.rating
    }
    ChoiceEditor {
        visible: root.device.hasCurve
        width: 110
        label: qsTr("Curve")
        choices: root.session.choices("curve")
        value: root.device.curve
        commit: (value) => root.session.editSurvey(root.target, "curve", value)
    }
    SurveyNumberEditor {
        visible: root.device.residualCurrent
        width: 130
        session: root.session; target: root.target; key: "idn"
        label: qsTr("IΔn")
        value: root.device.idn
    }
    ChoiceEditor {
        visible: root.device.residualCurrent
        width: 130
        label: qsTr("RCD type")
        choices: root.session.choices("rcdType")
        value: root.device.rcdType
        commit: (value) => root.session.editSurvey(root.target, "rcdType", value)
    }
    ChoiceEditor {
        visible: root.device.residualCurrent
        width: 190
        label: qsTr("Delay")
        choices: root.session.choices("delay")
        value: root.device.delay
        commit: (value) => root.session.editSurvey(root.target, "delay", value)
    }
    SurveyTextEditor {
        visible: root.device.fused
        width: 130
        session: root.session; target: root.target; key: "fuseStandard"
        label: qsTr("Fuse standard")
        value: root.device.fuseStandard
    }
}
