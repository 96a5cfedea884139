import QtQuick
import QtTest
import Mendwright
import Mendwright.Models

// The survey's editors on a new job of the test store (its survey starts with one empty
// consumer unit): the earthing chosen from the keyboard, a refused tails length shown with its
// unit and range, a device and a circuit added with the buttons, an RCD's IΔn typed in mA.
Item {
    id: scene
    width: 1200; height: 900

    JobSession { id: jobSession }

    Column {
        width: parent.width
        SupplyEditor { id: supply; width: parent.width; session: jobSession }
        Repeater {
            id: boards
            model: jobSession.boards
            delegate: BoardEditor { width: scene.width; session: jobSession }
        }
        Repeater {
            id: circuits
            model: jobSession.circuits
            delegate: CircuitEditor { width: scene.width; session: jobSession }
        }
    }

    TestCase {
        name: "SurveyEditors"
        when: windowShown

        function initTestCase() {
            const id = Workspace.createJob("QML-SURVEY", "Invented client", "2 Invented Lane")
            verify(id >= 0, Workspace.errorText)
            jobSession.jobId = id
            verify(jobSession.loaded)
        }

        // The first item under `item` for which `match` holds.
        function find(item, match) {
            if (match(item)) return item
            for (let i = 0; i < item.children.length; ++i) {
                const found = find(item.children[i], match)
                if (found) return found
            }
            return null
        }
        function editorLabelled(root, label) {
            return find(root, (i) => i.label === label && i.field !== undefined && i.visible)
        }
        function button(root, text) {
            return find(root, (i) => i.text === text && i.clicked !== undefined && i.visible)
        }
        function type(editor, text) {
            editor.field.forceActiveFocus()
            editor.field.selectAll()
            for (let i = 0; i < text.length; ++i) keyClick(text[i])
            keyClick(Qt.Key_Tab)
        }

        function test_1_earthing_is_chosen_from_the_keyboard_and_saved_as_a_revision() {
            const choice = find(supply, (i) => i.label === "Earthing" && i.box !== undefined)
            verify(choice)
            compare(jobSession.supply.earthing, "tt")
            const before = jobSession.revision
            choice.box.forceActiveFocus()
            keyClick(Qt.Key_Down)   // TT -> TN-S
            tryVerify(() => jobSession.supply.earthing === "tn_s")
            compare(jobSession.revision, before + 1)
            compare(choice.box.currentText, "TN-S")
        }

        function test_2_a_refused_tails_length_shows_its_unit_and_range() {
            const length = editorLabelled(supply, "Length")
            verify(length)
            compare(length.unit, "m")
            const before = jobSession.revision
            type(length, "1000")
            compare(length.error, "Meter tails length: expected 0.1 to 100 m, got 1000")
            compare(jobSession.revision, before)
            type(length, "3")
            compare(length.error, "")
            compare(jobSession.tails.tailsLength, "3")
        }

        function test_3_a_device_and_a_circuit_are_added_with_the_buttons() {
            const board = boards.itemAt(0)
            verify(board)
            compare(jobSession.devices.count, 1)   // the new job's main switch
            const add = button(board, "Add device")
            verify(add)
            add.forceActiveFocus()
            keyClick(Qt.Key_Return)             // the first kind offered: a main switch
            tryCompare(jobSession.devices, "count", 2)
            const addCircuit = button(boards.itemAt(0), "Add circuit")
            addCircuit.forceActiveFocus()
            keyClick(Qt.Key_Space)
            tryCompare(circuits, "count", 1)
            compare(circuits.itemAt(0).kind, "circuit_breaker")
            compare(circuits.itemAt(0).curve, "b")
            // A drop-down made with its value already set shows it (it once showed nothing when
            // the value came before the choices).
            const curve = find(circuits.itemAt(0), (i) => i.label === "Curve" && i.box !== undefined)
            verify(curve)
            compare(curve.box.currentText, "Type B")
        }

        function test_4_an_rcd_idn_is_typed_in_milliamperes() {
            verify(jobSession.addDevice(jobSession.boards.get(0).boardId, "rcd", "") === "")
            const board = boards.itemAt(0)
            const idn = editorLabelled(board, "IΔn")
            verify(idn)
            compare(idn.unit, "mA")
            compare(idn.value, "30")
            type(idn, "100")
            compare(idn.error, "")   // the same editor, kept through the saved edit (rows update in place)
            verify(find(boards.itemAt(0), (i) => i.text !== undefined && typeof i.text === "string"
                                                 && i.text.indexOf("RCD 63 A, 100 mA") >= 0))
        }
    }
}
