import QtQuick
import QtQuick.Controls
import QtQuick.Layouts
import Mendwright.Models

// The main window: a navigation rail on the left (one entry per step, Ctrl+1 .. Ctrl+9), the
// open job's header, and the page of the current step.
ApplicationWindow {
    id: root
    width: 1280
    height: 800
    visible: true
    title: session.loaded ? qsTr("Mendwright — %1 · %2").arg(session.reference).arg(session.client) : qsTr("Mendwright")
    color: Theme.paper
    font.family: Theme.family

    property string currentView: "jobs"
    readonly property var views: [
        { name: "jobs", label: qsTr("Jobs"), needsJob: false },
        { name: "findings", label: qsTr("Findings"), needsJob: true },
        { name: "options", label: qsTr("Options"), needsJob: true },
        { name: "plans", label: qsTr("Plans"), needsJob: true },
        { name: "works", label: qsTr("Works & quote"), needsJob: true },
        { name: "aftercare", label: qsTr("After the works"), needsJob: true },
        { name: "survey", label: qsTr("Survey"), needsJob: true },
        { name: "pricebook", label: qsTr("Price book"), needsJob: false },
        { name: "settings", label: qsTr("Settings"), needsJob: false }
    ]

    // Shows a step by name; the shortcuts and the screenshot script call it. A step of a job
    // opens the first job of the list when none is open yet.
    function showView(name) {
        if (name === "charts") {
            showView("plans")
            plansPage.scrollToCharts()
            return true
        }
        for (let i = 0; i < views.length; ++i) {
            if (views[i].name !== name) continue
            if (views[i].needsJob && !session.loaded)
                jobsPage.openFirst()
            currentView = name
            pages.currentIndex = i
            pages.children[i].forceActiveFocus()
            return true
        }
        return false
    }

    function openJob(jobId) {
        session.jobId = jobId
        showView("findings")
    }

    JobSession {
        id: session
    }

    Repeater {
        model: root.views
        delegate: Item {
            required property var modelData
            required property int index
            Shortcut {
                sequence: "Ctrl+" + (index + 1)
                onActivated: root.showView(modelData.name)
            }
        }
    }
    Shortcut { sequences: [StandardKey.Undo]; enabled: session.canUndo; onActivated: session.undo() }
    Shortcut { sequences: [StandardKey.Redo]; enabled: session.canRedo; onActivated: session.redo() }
    Shortcut { sequence: "Ctrl+E"; enabled: session.loaded; onActivated: { root.showView("works"); worksPage.exportNow() } }
    Shortcut { sequence: "Ctrl+L"; enabled: session.loaded; onActivated: { session.usePlan("least-cost"); root.showView("works") } }
    Shortcut { sequence: "Ctrl+N"; onActivated: { root.showView("jobs"); jobsPage.newJob() } }
    Shortcut { sequence: "Ctrl+I"; onActivated: { root.showView("jobs"); jobsPage.importSurvey() } }
    Shortcut { sequence: "Ctrl+F"; onActivated: { root.showView("jobs"); jobsPage.focusSearch() } }

    RowLayout {
        anchors.fill: parent
        spacing: 0

        NavRail {
            id: rail
            Layout.fillHeight: true
            views: root.views
            current: root.currentView
            jobOpen: session.loaded
            onChosen: (name) => root.showView(name)
        }

        ColumnLayout {
            Layout.fillWidth: true
            Layout.fillHeight: true
            spacing: 0

            JobHeader {
                Layout.fillWidth: true
                session: session
                visible: session.loaded && root.currentView !== "jobs" && root.currentView !== "pricebook"
                         && root.currentView !== "settings"
            }
            ErrorBar {
                Layout.fillWidth: true
                text: session.errorText !== "" ? session.errorText : Workspace.errorText
            }
            StackLayout {
                id: pages
                Layout.fillWidth: true
                Layout.fillHeight: true
                currentIndex: 0
                JobsPage { id: jobsPage; focus: true; onOpenRequested: (jobId) => root.openJob(jobId) }
                FindingsPage { session: session; onOptionsRequested: root.showView("options") }
                OptionsPage { session: session; onPlansRequested: root.showView("plans") }
                PlansPage { id: plansPage; session: session; onWorksRequested: root.showView("works") }
                WorksPage { id: worksPage; session: session }
                AftercarePage { session: session }
                SurveyPage { session: session }
                PriceBookPage { }
                SettingsPage { }
            }
        }
    }
}
