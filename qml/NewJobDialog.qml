import QtQuick
import QtQuick.Controls
import QtQuick.Layouts
import Mendwright.Models

// A new job: reference, client and site; the survey is filled in afterwards.
Dialog {
    id: root
    signal created(var jobId)
    title: qsTr("New job")
    modal: true
    anchors.centerIn: Overlay.overlay
    standardButtons: Dialog.Ok | Dialog.Cancel
    onOpened: reference.forceActiveFocus()
    onAccepted: {
        const id = Workspace.createJob(reference.text, client.text, site.text)
        if (id >= 0) {
            reference.text = ""; client.text = ""; site.text = ""
            root.created(id)
        }
    }

    ColumnLayout {
        spacing: Theme.step
        BodyText { text: qsTr("Reference") }
        TextField { id: reference; Layout.preferredWidth: 360; Accessible.name: qsTr("Reference") }
        BodyText { text: qsTr("Client") }
        TextField { id: client; Layout.preferredWidth: 360; Accessible.name: qsTr("Client") }
        BodyText { text: qsTr("Site") }
        TextField { id: site; Layout.preferredWidth: 360; Accessible.name: qsTr("Site"); onAccepted: root.accept() }
    }
}
