import QtQuick
import QtQuick.Controls
import QtQuick.Layouts
import QtQuick.Dialogs
import Mendwright.Models

// Every job: client, site, status, open urgent items and the next due date, overdue first.
// Filters, search, a new job and a survey import. Rows load a page at a time as the list scrolls.
FocusScope {
    id: root
    signal openRequested(var jobId)

    function openFirst() {
        if (jobs.count > 0) root.openRequested(jobs.jobIdAt(0))
    }
    function focusSearch() { search.forceActiveFocus() }
    function newJob() { newJobDialog.open() }
    function importSurvey() { importDialog.open() }

    JobListModel {
        id: jobs
    }

    ColumnLayout {
        anchors.fill: parent
        anchors.margins: Theme.step * 2
        spacing: Theme.step

        RowLayout {
            spacing: Theme.step
            Layout.fillWidth: true
            SectionTitle { text: qsTr("Jobs"); Layout.fillWidth: true }
            ActionButton { text: qsTr("New job"); hint: "Ctrl+N"; onClicked: root.newJob() }
            ActionButton { text: qsTr("Import survey…"); hint: "Ctrl+I"; onClicked: root.importSurvey() }
        }

        RowLayout {
            spacing: Theme.step * 1.5
            Layout.fillWidth: true
            TextField {
                id: search
                placeholderText: qsTr("Search reference, client or site  (Ctrl+F)")
                Layout.preferredWidth: 340
                font.family: Theme.family
                font.pixelSize: Theme.textSize
                selectByMouse: true
                onTextChanged: searchDelay.restart()
                Keys.onDownPressed: list.forceActiveFocus()
                Accessible.name: qsTr("Search jobs")
                Timer { id: searchDelay; interval: 250; onTriggered: jobs.search = search.text }
            }
            CheckBox {
                id: urgentOnly
                text: qsTr("Open urgent items only")
                font.family: Theme.family
                onToggled: jobs.urgentOnly = checked
            }
            CheckBox {
                id: overdueOnly
                text: qsTr("Overdue only")
                font.family: Theme.family
                onToggled: jobs.overdueOnly = checked
            }
            ComboBox {
                id: statusFilter
                font.family: Theme.family
                model: [qsTr("Any status")].concat(jobs.statuses.map(s => s.replace("_", " ")))
                onActivated: (i) => jobs.status = i === 0 ? "" : jobs.statuses[i - 1]
                Accessible.name: qsTr("Status filter")
            }
            Item { Layout.fillWidth: true }
            BodyText {
                text: qsTr("%1 jobs").arg(jobs.totalCount)
                muted: true
            }
        }

        // Column heads.
        RowLayout {
            Layout.fillWidth: true
            Layout.leftMargin: Theme.step
            spacing: Theme.step
            Repeater {
                model: [[qsTr("Reference"), 170], [qsTr("Client"), 220], [qsTr("Site"), -1], [qsTr("Status"), 110],
                        [qsTr("Open urgent"), 110], [qsTr("Next due"), 150]]
                delegate: Text {
                    required property var modelData
                    text: modelData[0]
                    Layout.preferredWidth: modelData[1] > 0 ? modelData[1] : -1
                    Layout.fillWidth: modelData[1] < 0
                    font.family: Theme.family
                    font.pixelSize: Theme.smallSize
                    font.bold: true
                    color: Theme.inkMuted
                }
            }
        }

        ListView {
            id: list
            Layout.fillWidth: true
            Layout.fillHeight: true
            clip: true
            focus: true
            model: jobs
            keyNavigationEnabled: true
            highlightMoveDuration: 0
            currentIndex: 0
            ScrollBar.vertical: ScrollBar { }
            Keys.onReturnPressed: if (currentIndex >= 0) root.openRequested(jobs.jobIdAt(currentIndex))
            Keys.onEnterPressed: if (currentIndex >= 0) root.openRequested(jobs.jobIdAt(currentIndex))
            Accessible.role: Accessible.List
            Accessible.name: qsTr("Jobs")
            delegate: JobRowDelegate {
                width: ListView.view.width
                selected: ListView.isCurrentItem
                onActivated: (jobId) => root.openRequested(jobId)
            }
            BodyText {
                anchors.centerIn: parent
                visible: jobs.count === 0
                text: qsTr("No jobs match. Create one (Ctrl+N) or import a survey document (Ctrl+I).")
                muted: true
            }
        }
    }

    NewJobDialog {
        id: newJobDialog
        onCreated: (jobId) => root.openRequested(jobId)
    }

    FileDialog {
        id: importDialog
        title: qsTr("Import a survey document")
        nameFilters: [qsTr("Survey documents (*.json)")]
        onAccepted: {
            const id = Workspace.importSurvey(selectedFile.toString())
            if (id >= 0) root.openRequested(id)
        }
    }
}
