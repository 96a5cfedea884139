import QtQuick
import QtQuick.Controls
import QtQuick.Layouts
import Mendwright.Models

// After the works: each urgent item marked remedied and then re-tested (the job's status
// follows), and the electrode re-measured against what the plan predicted.
FocusScope {
    id: root
    required property JobSession session

    // The first item not yet re-tested: where the keyboard goes next.
    function firstUnfinished() {
        for (let i = 0; i < root.session.urgentItems.count; ++i)
            if (root.session.urgentItems.get(i).state !== "retested") return i
        return Math.max(0, list.currentIndex)
    }

    ColumnLayout {
        anchors.fill: parent
        anchors.margins: Theme.step * 2
        spacing: Theme.step

        SectionTitle { text: qsTr("After the works") }
        BodyText {
            text: qsTr("Status: %1. Mark each urgent item remedied when the work is done, and re-tested when a competent person has tested it.")
                  .arg(root.session.status.replace("_", " "))
            Layout.fillWidth: true
        }

        ListView {
            id: list
            Layout.fillWidth: true
            Layout.fillHeight: true
            clip: true
            focus: true
            spacing: Theme.step / 2
            model: root.session.urgentItems
            keyNavigationEnabled: true
            ScrollBar.vertical: ScrollBar { }
            Accessible.role: Accessible.List
            Accessible.name: qsTr("Urgent items")
            delegate: UrgentItemDelegate {
                width: ListView.view.width
                selected: ListView.isCurrentItem
                onRemedied: (findingId) => root.session.markRemedied(findingId)
                onRetested: (findingId) => root.session.markRetested(findingId)
            }
            Keys.onPressed: (event) => {
                // A list filled after it was made has no current row yet: start at the first
                // item not re-tested.
                if (currentIndex < 0) currentIndex = root.firstUnfinished()
                const row = root.session.urgentItems.get(currentIndex)
                if (row.findingId === undefined) return
                if (event.key === Qt.Key_R && event.modifiers === Qt.NoModifier) { root.session.markRemedied(row.findingId); event.accepted = true }
                if (event.key === Qt.Key_T && event.modifiers === Qt.NoModifier) {
                    root.session.markRetested(row.findingId)
                    currentIndex = root.firstUnfinished()
                    event.accepted = true
                }
            }
            BodyText {
                anchors.centerIn: parent
                visible: list.count === 0
                text: qsTr("This job has no urgent items.")
                muted: true
            }
        }

        Rectangle {
            visible: root.session.hasElectrode
            Layout.fillWidth: true
            color: Theme.surface
            border.color: Theme.line
            radius: Theme.radius
            implicitHeight: electrodeBox.implicitHeight + Theme.step * 3
            ColumnLayout {
                id: electrodeBox
                anchors.left: parent.left; anchors.right: parent.right; anchors.top: parent.top
                anchors.margins: Theme.step * 1.5
                spacing: Theme.step
                BodyText { text: qsTr("Earth electrode after the works"); font.bold: true; font.pixelSize: Theme.headingSize }
                RowLayout {
                    spacing: Theme.step * 2
                    FieldEditor {
                        Layout.preferredWidth: 260
                        label: qsTr("RA re-measured")
                        unit: "Ω"
                        range: root.session.fieldSpec("remeasuredRa").range
                        value: root.session.electrode.remeasuredRa || ""
                        commit: (text) => root.session.editElectrode("remeasuredRa", text)
                    }
                    FieldEditor {
                        Layout.preferredWidth: 200
                        label: qsTr("Re-measured on")
                        unit: qsTr("date")
                        range: qsTr("YYYY-MM-DD")
                        value: root.session.electrode.remeasuredOn || ""
                        commit: (text) => root.session.editElectrode("remeasuredOn", text)
                    }
                    BodyText {
                        text: root.session.electrode.predicted ? qsTr("Predicted: %1 Ω").arg(root.session.electrode.predicted)
                                                                : qsTr("No plan in use adds rods.")
                        font.bold: true
                    }
                }
                BodyText { text: root.session.electrode.comparison || ""; Layout.fillWidth: true }
            }
        }
        CautionBanner { text: root.session.caution }
    }
}
