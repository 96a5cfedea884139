import QtQuick
import QtQuick.Controls
import QtQuick.Layouts
import Mendwright.Models

// The price book: labour rate, markup, VAT and contingency, and the items, each value checked
// as it is typed; saved to the book's two files.
FocusScope {
    id: root
    readonly property var book: Workspace.priceBook

    ColumnLayout {
        anchors.fill: parent
        anchors.margins: Theme.step * 2
        spacing: Theme.step

        RowLayout {
            Layout.fillWidth: true
            spacing: Theme.step
            SectionTitle { text: qsTr("Price book"); Layout.fillWidth: true }
            BodyText { text: root.book.modified ? qsTr("Not saved yet") : qsTr("Saved in %1").arg(Workspace.priceBookFolder); muted: !root.book.modified }
            ActionButton { text: qsTr("Add item"); onClicked: { const row = root.book.addItem(); items.positionViewAtIndex(row, ListView.End) } }
            ActionButton {
                text: qsTr("Save")
                hint: "Ctrl+S"
                primary: true
                enabled: root.book.modified
                onClicked: saveError.text = root.book.save()
            }
        }
        Shortcut { sequence: StandardKey.Save; enabled: root.visible && root.book.modified; onActivated: saveError.text = root.book.save() }
        BodyText { id: saveError; visible: text !== ""; color: Theme.codeC1; Layout.fillWidth: true }

        RowLayout {
            spacing: Theme.step * 2
            FieldEditor {
                focus: true
                Layout.preferredWidth: 180
                label: qsTr("Labour rate")
                unit: root.book.currencySymbol + qsTr(" per hour")
                value: root.book.labourRate
                commit: (text) => root.book.setSetting("labourRate", text)
            }
            FieldEditor {
                Layout.preferredWidth: 180
                label: qsTr("Markup on materials")
                unit: "%"
                value: root.book.markupPercent
                commit: (text) => root.book.setSetting("markupPercent", text)
            }
            FieldEditor {
                Layout.preferredWidth: 140
                label: qsTr("VAT")
                unit: "%"
                value: root.book.vatPercent
                commit: (text) => root.book.setSetting("vatPercent", text)
            }
            FieldEditor {
                Layout.preferredWidth: 240
                label: qsTr("Contingency")
                unit: qsTr("% of works, or %1 fixed").arg(root.book.currencySymbol)
                value: root.book.contingency
                commit: (text) => root.book.setSetting("contingency", text)
            }
        }
        BodyText { text: qsTr("Invented demo prices until you replace them with your own."); muted: true; font.pixelSize: Theme.smallSize }

        ListView {
            id: items
            Layout.fillWidth: true
            Layout.fillHeight: true
            clip: true
            spacing: 2
            model: root.book
            ScrollBar.vertical: ScrollBar { }
            Accessible.role: Accessible.List
            Accessible.name: qsTr("Price-book items")
            header: RowLayout {
                width: ListView.view.width
                spacing: Theme.step
                Repeater {
                    model: [[qsTr("Code"), 170], [qsTr("Description"), -1], [qsTr("Unit"), 70], [qsTr("Material cost"), 110],
                            [qsTr("Labour hours"), 100], [qsTr("Category"), 110], ["", 96]]
                    delegate: BodyText {
                        required property var modelData
                        text: modelData[0]
                        font.bold: true; font.pixelSize: Theme.smallSize; muted: true
                        Layout.preferredWidth: modelData[1] > 0 ? modelData[1] : -1
                        Layout.fillWidth: modelData[1] < 0
                    }
                }
            }
            delegate: PriceItemDelegate {
                width: ListView.view.width
                book: root.book
            }
        }
    }
}
