import QtQuick
import QtQuick.Controls
import QtQuick.Layouts
import Mendwright.Models

// The least-cost compliant plan, the ideal plan and the user's own side by side, each verified
// as a whole; a chart of cost and findings left, and for a job with an electrode the predicted
// RA month by month against the limits that matter.
FocusScope {
    id: root
    required property JobSession session
    signal worksRequested()
    // Brings the charts into view (the screenshot script's "charts" view).
    function scrollToCharts() { scroller.ScrollBar.vertical.position = 1.0 - scroller.ScrollBar.vertical.size }

    ScrollView {
        id: scroller
        anchors.fill: parent
        contentWidth: availableWidth
        focus: true

        ColumnLayout {
            width: scroller.availableWidth - Theme.step * 4
            x: Theme.step * 2
            y: Theme.step * 2
            spacing: Theme.step * 1.5

            RowLayout {
                Layout.fillWidth: true
                SectionTitle { text: qsTr("Plans side by side"); Layout.fillWidth: true }
                ActionButton {
                    text: qsTr("Use least cost")
                    hint: "Ctrl+L"
                    primary: true
                    onClicked: { root.session.usePlan("least-cost"); root.worksRequested() }
                }
            }
            CautionBanner { text: root.session.caution }

            RowLayout {
                Layout.fillWidth: true
                spacing: Theme.step * 1.5
                Repeater {
                    model: root.session.plans
                    delegate: PlanColumn {
                        Layout.fillWidth: true
                        Layout.preferredWidth: 1
                        Layout.alignment: Qt.AlignTop
                        onUseRequested: (name) => { root.session.usePlan(name); root.worksRequested() }
                    }
                }
            }

            RowLayout {
                Layout.fillWidth: true
                spacing: Theme.step * 1.5
                PlanCostChart {
                    Layout.fillWidth: true
                    Layout.preferredWidth: 1
                    Layout.alignment: Qt.AlignTop
                    plans: root.session.plans
                }
                ElectrodeChart {
                    visible: root.session.hasElectrode
                    Layout.fillWidth: true
                    Layout.preferredWidth: 1
                    Layout.alignment: Qt.AlignTop
                    series: root.session.electrodeSeries
                    ticks: root.session.electrodeTicks
                }
            }
            Item { implicitHeight: Theme.step * 2 }
        }
    }
}
