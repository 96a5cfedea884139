import QtQuick
import QtQuick.Controls
import QtQuick.Layouts
import Mendwright.Models

// The findings grouped by code (C1, C2, FI, C3, notes), and the one selected with its clause,
// its inputs and the arithmetic behind it.
FocusScope {
    id: root
    required property JobSession session
    signal optionsRequested()
    readonly property var finding: root.session.selectedFinding

    RowLayout {
        anchors.fill: parent
        anchors.margins: Theme.step * 2
        spacing: Theme.step * 2

        ColumnLayout {
            Layout.preferredWidth: 470
            Layout.fillWidth: false
            Layout.fillHeight: true
            spacing: Theme.step
            SectionTitle { text: qsTr("Findings") }
            ListView {
                id: list
                Layout.fillWidth: true
                Layout.fillHeight: true
                clip: true
                focus: true
                model: root.session.findings
                highlightMoveDuration: 0
                keyNavigationEnabled: true
                currentIndex: root.session.findings.indexOf("findingId", root.session.selectedFindingId)
                onCurrentIndexChanged: if (currentIndex >= 0) root.session.selectFinding(root.session.findings.get(currentIndex).findingId)
                Keys.onReturnPressed: root.optionsRequested()
                Keys.onEnterPressed: root.optionsRequested()
                ScrollBar.vertical: ScrollBar { }
                Accessible.role: Accessible.List
                Accessible.name: qsTr("Findings")
                section.property: "section"
                section.delegate: Rectangle {
                    required property string section
                    width: ListView.view.width
                    height: 30
                    color: Theme.paper
                    Text {
                        anchors.verticalCenter: parent.verticalCenter
                        text: parent.section
                        font.family: Theme.family
                        font.pixelSize: Theme.smallSize
                        font.bold: true
                        font.capitalization: Font.AllUppercase
                        color: Theme.inkMuted
                    }
                }
                delegate: FindingDelegate {
                    width: ListView.view.width
                    selected: ListView.isCurrentItem
                    onPicked: (i) => list.currentIndex = i
                }
            }
        }

        ColumnLayout {
            Layout.fillWidth: true
            Layout.preferredWidth: 560
            Layout.fillHeight: true
            spacing: Theme.step

            CautionBanner { text: root.session.caution }
            Rectangle {
                Layout.fillWidth: true
                Layout.fillHeight: true
                color: Theme.surface
                border.color: Theme.line
                radius: Theme.radius
                ScrollView {
                    anchors.fill: parent
                    anchors.margins: Theme.step * 2
                    contentWidth: availableWidth
                    ColumnLayout {
                        width: parent.width
                        spacing: Theme.step
                        visible: root.finding.findingId !== undefined
                        RowLayout {
                            spacing: Theme.step
                            CodeBadge { code: root.finding.code || ""; words: root.finding.codeWords || "" }
                            BodyText { text: root.finding.due ? qsTr("Due: %1").arg(root.finding.due) : ""; font.bold: true }
                        }
                        SectionTitle { text: root.finding.title || ""; Layout.fillWidth: true; wrapMode: Text.WordWrap }
                        BodyText { text: root.finding.location || ""; muted: true; Layout.fillWidth: true }
                        BodyText { text: qsTr("Clause: %1").arg(root.finding.clause || ""); Layout.fillWidth: true }
                        BodyText { text: qsTr("Readings: %1").arg(root.finding.inputs || "—"); Layout.fillWidth: true }
                        Rectangle {
                            Layout.fillWidth: true
                            color: Theme.earthSoft
                            radius: Theme.radius
                            implicitHeight: arithmetic.implicitHeight + Theme.step * 2
                            BodyText {
                                id: arithmetic
                                anchors.fill: parent
                                anchors.margins: Theme.step
                                text: root.finding.explanation || ""
                                font.family: "DejaVu Sans Mono"
                            }
                        }
                        BodyText {
                            text: (root.finding.optionCount || 0) > 0
                                  ? qsTr("%1 remedy options, ranked. Press Enter or Ctrl+3 to compare them.").arg(root.finding.optionCount)
                                  : qsTr("No remedy option targets this finding; it needs a line in the works list or the inspector's judgement.")
                            muted: true
                            Layout.fillWidth: true
                        }
                        ActionButton {
                            text: qsTr("Compare options")
                            hint: "Ctrl+3"
                            primary: true
                            enabled: (root.finding.optionCount || 0) > 0
                            onClicked: root.optionsRequested()
                        }
                    }
                }
            }
        }
    }
}
