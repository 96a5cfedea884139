import QtQuick
import QtTest
import Mendwright

// Buttons work from the keyboard: Tab reaches them and Enter or Space presses them.
Item {
    id: scene
    width: 400; height: 200

    ActionButton { id: first; text: "First" }
    ActionButton { id: second; text: "Export quote…"; hint: "Ctrl+E"; primary: true; x: 150 }
    SignalSpy { id: pressed; target: second; signalName: "clicked" }

    TestCase {
        name: "ActionButton"
        when: windowShown

        function test_enter_and_space_press_the_focused_button() {
            pressed.clear()
            second.forceActiveFocus()
            keyClick(Qt.Key_Return)
            keyClick(Qt.Key_Space)
            compare(pressed.count, 2)
        }
        function test_tab_moves_focus_between_buttons() {
            first.forceActiveFocus()
            keyClick(Qt.Key_Tab)
            verify(second.activeFocus)
        }
        function test_shortcut_is_shown_beside_the_text() {
            compare(second.contentItem.text, "Export quote…  Ctrl+E")
        }
    }
}
