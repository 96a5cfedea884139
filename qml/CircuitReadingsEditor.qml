import QtQuick
import QtQuick.Layouts
import Mendwright.Models

// One circuit's measured values, each with its unit and accepted range (empty = not measured).
RowLayout {
    id: root
    required property JobSession session
    required property string circuitId
    required property string zs
    required property string r1r2
    required property string ir
    required property string leakage
    required property string tripIdn
    required property string trip5Idn
    required property bool residualCurrent
    spacing: Theme.step

    Repeater {
        model: [["zs", root.zs], ["r1r2", root.r1r2], ["ir", root.ir], ["leakage", root.leakage],
                ["tripIdn", root.tripIdn], ["trip5Idn", root.trip5Idn]]
        delegate: FieldEditor {
            required property var modelData
            readonly property var spec: root.session.fieldSpec(modelData[0])
            visible: root.residualCurrent || (modelData[0] !== "tripIdn" && modelData[0] !== "trip5Idn")
            Layout.fillWidth: true
            Layout.preferredWidth: 1
            label: spec.label
            unit: spec.unit
            range: spec.range
            value: modelData[1]
            commit: (text) => root.session.editCircuit(root.circuitId, modelData[0], text)
        }
    }
}
