import QtQuick
import QtQuick.Controls
import QtQuick.Layouts
import QtQuick.Dialogs
import Mendwright.Models

// The works list of the plan in use: quantities to edit, lines to add, totals that follow at
// once, and the export of the quote workbook.
FocusScope {
    id: root
    required property JobSession session

    // Export: straight to the preset path when the program was given one, else ask for a file.
    function exportNow() {
        if (Workspace.presetQuotePath !== "") {
            root.session.exportQuote(Workspace.presetQuotePath)
            return
        }
        saveDialog.currentFile = "file://" + Workspace.defaultQuotePath(root.session.reference)
        saveDialog.open()
    }

    FileDialog {
        id: saveDialog
        title: qsTr("Export the quote workbook")
        fileMode: FileDialog.SaveFile
        defaultSuffix: "xlsx"
        nameFilters: [qsTr("Spreadsheet workbooks (*.xlsx)")]
        onAccepted: root.session.exportQuote(selectedFile.toString())
    }

    RowLayout {
        anchors.fill: parent
        anchors.margins: Theme.step * 2
        spacing: Theme.step * 2

        ColumnLayout {
            Layout.fillWidth: true
            Layout.fillHeight: true
            spacing: Theme.step

            RowLayout {
                Layout.fillWidth: true
                spacing: Theme.step
                SectionTitle {
                    text: root.session.worksPlan === "" ? qsTr("Works list: choose a plan")
                                                        : qsTr("Works list: %1").arg(root.session.plans.get(root.session.plans.indexOf("name", root.session.worksPlan)).label)
                    Layout.fillWidth: true
                }
                ActionButton { text: qsTr("Least cost"); onClicked: root.session.usePlan("least-cost") }
                ActionButton { text: qsTr("Ideal"); onClicked: root.session.usePlan("ideal") }
                ActionButton { text: qsTr("Own choice"); onClicked: root.session.usePlan("custom") }
            }

            ListView {
                id: list
                Layout.fillWidth: true
                Layout.fillHeight: true
                clip: true
                focus: true
                model: root.session.works
                spacing: 2
                ScrollBar.vertical: ScrollBar { }
                Accessible.role: Accessible.List
                Accessible.name: qsTr("Works list")
                delegate: WorksLineDelegate {
                    width: ListView.view.width
                    onQuantityEdited: (row, text) => root.session.setWorksQuantity(row, text)
                }
                BodyText {
                    anchors.centerIn: parent
                    visible: list.count === 0
                    width: parent.width * 0.7
                    horizontalAlignment: Text.AlignHCenter
                    text: qsTr("Choose a plan above (or Ctrl+L for the least-cost one) to fill the works list.")
                    muted: true
                }
            }

            AddLineForm {
                Layout.fillWidth: true
                enabled: root.session.worksPlan !== ""
                onAddRequested: (description, unit, quantity, cost, hours) => {
                    error = root.session.addWorksLine(description, unit, quantity, cost, hours)
                    if (error === "") clear()
                }
            }
        }

        ColumnLayout {
            Layout.preferredWidth: 330
            Layout.fillWidth: false
            Layout.fillHeight: true
            spacing: Theme.step

            TotalsPanel { Layout.fillWidth: true; figures: root.session.worksTotals }
            ActionButton {
                text: qsTr("Export quote…")
                hint: "Ctrl+E"
                primary: true
                Layout.fillWidth: true
                enabled: root.session.loaded
                onClicked: root.exportNow()
            }
            BodyText {
                visible: root.session.lastExport !== ""
                text: qsTr("Quote written to %1. The job is now “%2”.").arg(root.session.lastExport).arg(root.session.status.replace("_", " "))
                Layout.fillWidth: true
                wrapMode: Text.WrapAnywhere
                color: Theme.earth
            }
            CautionBanner { text: root.session.caution }
            Item { Layout.fillHeight: true }
        }
    }
}
