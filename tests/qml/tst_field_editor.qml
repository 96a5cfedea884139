import QtQuick
import QtTest
import Mendwright

// The field editor shows the unit and range, commits when editing finishes and shows the
// refusal it is given.
Item {
    id: scene
    width: 400; height: 200

    property var committed: []

    FieldEditor {
        id: editor
        width: 300
        label: "Zs"
        unit: "Ω"
        range: "0 to 2000 Ω"
        value: "0.35"
        commit: function(text) {
            scene.committed.push(text)
            return text === "5000" ? "Zs: expected 0 to 2000 Ω, got 5000" : ""
        }
    }

    TestCase {
        name: "FieldEditor"
        when: windowShown

        function type(text) {
            editor.field.forceActiveFocus()
            editor.field.selectAll()
            for (let i = 0; i < text.length; ++i) keyClick(text[i])
            keyClick(Qt.Key_Return)
        }

        function test_refused_value_shows_the_reason() {
            scene.committed = []
            type("5000")
            compare(scene.committed, ["5000"])
            compare(editor.error, "Zs: expected 0 to 2000 Ω, got 5000")
        }
        function test_accepted_value_clears_the_reason() {
            type("0.4")
            compare(editor.error, "")
        }
        function test_unchanged_value_is_not_committed() {
            scene.committed = []
            editor.field.text = editor.value
            editor.field.forceActiveFocus()
            keyClick(Qt.Key_Return)
            compare(scene.committed, [])
        }
    }
}
