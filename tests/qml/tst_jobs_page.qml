import QtQuick
import QtTest
import Mendwright

// The jobs page on the test store (two invented jobs, and any a test file before it added):
// the overdue job first, written out in words, and Enter opens the highlighted job.
Item {
    id: scene
    width: 1100; height: 600

    JobsPage { id: page; anchors.fill: parent; focus: true }
    SignalSpy { id: opened; target: page; signalName: "openRequested" }

    TestCase {
        name: "JobsPage"
        when: windowShown

        function findList(item) {
            if (item.model !== undefined && item.currentIndex !== undefined && item.count !== undefined && item.highlightMoveDuration !== undefined)
                return item
            for (let i = 0; i < item.children.length; ++i) {
                const found = findList(item.children[i])
                if (found) return found
            }
            return null
        }

        function test_overdue_job_is_first_and_enter_opens_it() {
            const list = findList(page)
            verify(list)
            // The test store holds the two invented jobs of the fixture; other test files may add
            // jobs of their own (not overdue), so the list is checked for these, not counted.
            tryVerify(() => list.count >= 2)
            const first = list.itemAtIndex(0)
            compare(first.reference, "DT-101")
            verify(first.overdue)
            list.forceActiveFocus()
            keyClick(Qt.Key_Return)
            compare(opened.count, 1)
        }
    }
}
