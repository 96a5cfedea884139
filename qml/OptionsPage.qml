import QtQuick
import QtQuick.Controls
import QtQuick.Layouts
import Mendwright.Models

// The ranked remedy options of the selected finding: cost, what each clears and introduces
// (as re-verification found), hours off supply, notifiable work and certificate. Ticking an
// option puts it in the user's own plan.
FocusScope {
    id: root
    required property JobSession session
    signal plansRequested()
    readonly property var finding: root.session.selectedFinding

    ColumnLayout {
        anchors.fill: parent
        anchors.margins: Theme.step * 2
        spacing: Theme.step

        RowLayout {
            spacing: Theme.step
            Layout.fillWidth: true
            CodeBadge { code: root.finding.code || "note"; words: root.finding.codeWords || "" }
            SectionTitle {
                text: qsTr("Options for: %1").arg(root.finding.title || qsTr("no finding selected"))
                Layout.fillWidth: true
            }
            ActionButton { text: qsTr("Compare plans"); hint: "Ctrl+4"; onClicked: root.plansRequested() }
        }
        BodyText { text: root.finding.location || ""; muted: true }
        CautionBanner { text: root.session.caution }

        ListView {
            id: list
            Layout.fillWidth: true
            Layout.fillHeight: true
            clip: true
            focus: true
            spacing: Theme.step
            model: root.session.options
            keyNavigationEnabled: true
            highlightMoveDuration: 0
            ScrollBar.vertical: ScrollBar { }
            Keys.onSpacePressed: {
                const row = root.session.options.get(currentIndex)
                if (row.optionId !== undefined) root.session.setOptionChosen(row.optionId, !row.chosen)
            }
            Accessible.role: Accessible.List
            Accessible.name: qsTr("Remedy options")
            delegate: OptionCard {
                width: ListView.view.width
                selected: ListView.isCurrentItem
                onChooseToggled: (optionId, chosen) => root.session.setOptionChosen(optionId, chosen)
            }
            BodyText {
                anchors.centerIn: parent
                visible: list.count === 0
                text: qsTr("No option targets this finding.")
                muted: true
            }
        }
    }
}
