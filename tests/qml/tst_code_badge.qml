import QtQuick
import QtTest
import Mendwright

// A code is never shown by colour alone: its letters and words are in the text, and each code
// has a frame of its own.
Item {
    id: scene
    width: 400; height: 200

    CodeBadge { id: c1; code: "C1"; words: "Danger present" }
    CodeBadge { id: c2; code: "C2"; words: "Potentially dangerous"; y: 40 }
    CodeBadge { id: fi; code: "FI"; words: "Further investigation"; y: 80; compact: true }

    TestCase {
        name: "CodeBadge"
        when: windowShown

        function textOf(badge) {
            for (let i = 0; i < badge.children.length; ++i)
                if (badge.children[i].text !== undefined) return badge.children[i].text
            return ""
        }

        function test_letters_and_words_are_in_the_text() {
            compare(textOf(c1), "C1 · Danger present")
            compare(textOf(c2), "C2 · Potentially dangerous")
            compare(c1.Accessible.name, "C1 Danger present")
        }
        function test_compact_badge_keeps_the_letters() {
            compare(textOf(fi), "FI")
        }
        function test_codes_differ_in_shape_not_only_colour() {
            verify(c1.solid)
            verify(!c2.solid)
            verify(c1.tone !== c2.tone)
        }
    }
}
