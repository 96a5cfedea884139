import QtQuick
import QtQuick.Controls
import QtQuick.Layouts

// One price-book item, every field editable; a refused value keeps the old one and says why.
Rectangle {
    id: root
    required property var book
    required property int index
    required property string code
    required property string description
    required property string unit
    required property string materialCost
    required property string labourHours
    required property string category
    property string error: ""

    color: Theme.surface
    implicitHeight: body.implicitHeight + 4

    function edit(field, text, shown) {
        if (text === shown) return
        root.error = root.book.setField(root.index, field, text)
    }

    ColumnLayout {
        id: body
        anchors.left: parent.left; anchors.right: parent.right
        spacing: 0
        RowLayout {
            Layout.fillWidth: true
            spacing: Theme.step
            TextField { text: root.code; autoScroll: activeFocus; Layout.preferredWidth: 170; Accessible.name: qsTr("Code"); onEditingFinished: root.edit("code", text, root.code) }
            TextField { text: root.description; autoScroll: activeFocus; Layout.fillWidth: true; Accessible.name: qsTr("Description"); onEditingFinished: root.edit("description", text, root.description) }
            TextField { text: root.unit; autoScroll: activeFocus; Layout.preferredWidth: 70; Accessible.name: qsTr("Unit"); onEditingFinished: root.edit("unit", text, root.unit) }
            TextField { text: root.materialCost; autoScroll: activeFocus; Layout.preferredWidth: 110; horizontalAlignment: Text.AlignRight; Accessible.name: qsTr("Material cost"); onEditingFinished: root.edit("materialCost", text, root.materialCost) }
            TextField { text: root.labourHours; autoScroll: activeFocus; Layout.preferredWidth: 100; horizontalAlignment: Text.AlignRight; Accessible.name: qsTr("Labour hours"); onEditingFinished: root.edit("labourHours", text, root.labourHours) }
            TextField { text: root.category; autoScroll: activeFocus; Layout.preferredWidth: 110; Accessible.name: qsTr("Category"); onEditingFinished: root.edit("category", text, root.category) }
            ActionButton { text: qsTr("Remove"); Layout.preferredWidth: 96; Accessible.name: qsTr("Remove %1").arg(root.code); onClicked: root.book.removeItem(root.index) }
        }
        BodyText { visible: root.error !== ""; text: root.error; color: Theme.codeC1; font.pixelSize: Theme.smallSize }
    }
}
