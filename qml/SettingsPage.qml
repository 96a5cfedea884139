import QtQuick
import QtQuick.Controls
import QtQuick.Layouts
import Mendwright.Models

// Where the job store lives (the embedded SQLite file or a shared PostgreSQL database) and
// which rules profile applies; both take effect at the next start.
FocusScope {
    id: root

    ColumnLayout {
        anchors.fill: parent
        anchors.margins: Theme.step * 2
        spacing: Theme.step * 1.5

        SectionTitle { text: qsTr("Settings") }
        BodyText { text: qsTr("In use now: store %1; rules %2.").arg(Workspace.storeText).arg(Workspace.profileName); Layout.fillWidth: true }

        BodyText { text: qsTr("Job store"); font.bold: true }
        BodyText {
            text: qsTr("Leave empty for the embedded SQLite file. For a shared office database: postgresql://USER@HOST:PORT/NAME. A file elsewhere: sqlite:/path/jobs.sqlite.")
            muted: true; Layout.fillWidth: true
        }
        TextField {
            id: storeUrl
            focus: true
            text: Workspace.savedStoreUrl
            Layout.fillWidth: true
            Layout.maximumWidth: 700
            placeholderText: qsTr("embedded SQLite file")
            Accessible.name: qsTr("Job store URL")
        }
        BodyText { text: qsTr("Rules profile"); font.bold: true }
        BodyText { text: qsTr("Leave empty for the shipped profile (BS 7671:2018+A2 practice). Local rules prevail: a profile of your own can hold them."); muted: true; Layout.fillWidth: true }
        TextField {
            id: profileFile
            text: Workspace.savedProfileFile
            Layout.fillWidth: true
            Layout.maximumWidth: 700
            placeholderText: qsTr("shipped profile")
            Accessible.name: qsTr("Rules profile file")
        }
        RowLayout {
            spacing: Theme.step
            ActionButton {
                text: qsTr("Save settings")
                primary: true
                onClicked: saved.visible = Workspace.saveSettings(storeUrl.text, profileFile.text)
            }
            BodyText { id: saved; visible: false; text: qsTr("Saved: they apply from the next start."); color: Theme.earth }
        }
        CautionBanner { text: Workspace.caution; Layout.maximumWidth: 900 }
        Item { Layout.fillHeight: true }
    }
}
