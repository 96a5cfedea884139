import QtQuick
import QtQuick.Layouts

// Predicted RA month by month (as surveyed, after each plan that changes the electrode, and
// re-measured) against the limits that matter: the touch-voltage limit of each residual current
// device present, the stability threshold and the ideal target. Series are told apart by marker
// shape and limits by dash length as well as by colour; the legend names each one with its value.
Rectangle {
    id: root
    required property var series
    required property var ticks
    color: Theme.surface
    radius: Theme.radius
    border.color: Theme.line
    implicitHeight: body.implicitHeight + Theme.step * 3

    readonly property var markers: ({ "reading": "●", "plan": "■", "remeasured": "▲" })
    readonly property var seriesColours: ({ "reading": Theme.ink, "plan": Theme.copper, "remeasured": Theme.earth })
    function limitColour(name) {
        return name === "touch" ? Theme.codeC1 : (name === "stability" ? Theme.warning : Theme.earth)
    }
    function dashOf(name) { return name === "touch" ? 10 : (name === "stability" ? 6 : 3) }

    Connections {
        target: root.series
        function onModelReset() { canvas.requestPaint() }
        function onDataChanged() { canvas.requestPaint() }
    }

    ColumnLayout {
        id: body
        anchors.left: parent.left
        anchors.right: parent.right
        anchors.top: parent.top
        anchors.margins: Theme.step * 1.5
        spacing: Theme.step

        BodyText { text: qsTr("Electrode: predicted RA through the year"); font.bold: true; font.pixelSize: Theme.headingSize }
        BodyText {
            text: qsTr("Seasonal factors of the rules profile, an assumption: re-measure after the works.")
            muted: true; font.pixelSize: Theme.smallSize; Layout.fillWidth: true
        }
        Canvas {
            id: canvas
            Layout.fillWidth: true
            implicitHeight: 240
            onWidthChanged: requestPaint()
            readonly property int axisLeft: 56
            readonly property int axisBottom: 22
            onPaint: {
                const ctx = getContext("2d")
                ctx.reset()
                const w = width - axisLeft - 8
                const h = height - axisBottom - 8
                const yOf = (f) => 8 + h * (1 - f)
                const xOf = (m) => axisLeft + w * (m + 0.5) / 12
                ctx.font = "11px 'DejaVu Sans'"
                // Grid and axis labels.
                ctx.strokeStyle = Theme.line
                ctx.fillStyle = Theme.inkMuted
                ctx.lineWidth = 1
                for (let t = 0; t < root.ticks.count; ++t) {
                    const tick = root.ticks.get(t)
                    const y = yOf(tick.fraction)
                    ctx.beginPath(); ctx.moveTo(axisLeft, y); ctx.lineTo(axisLeft + w, y); ctx.stroke()
                    ctx.fillText(tick.label, 2, y + 4)
                }
                const months = [qsTr("Jan"), qsTr("Feb"), qsTr("Mar"), qsTr("Apr"), qsTr("May"), qsTr("Jun"),
                                qsTr("Jul"), qsTr("Aug"), qsTr("Sep"), qsTr("Oct"), qsTr("Nov"), qsTr("Dec")]
                for (let m = 0; m < 12; ++m) ctx.fillText(months[m], xOf(m) - 10, height - 6)
                for (let i = 0; i < root.series.count; ++i) {
                    const s = root.series.get(i)
                    if (s.kind === "limit") {
                        if (s.aboveChart) continue
                        const y = yOf(s.fraction)
                        const dash = root.dashOf(s.name)
                        ctx.strokeStyle = root.limitColour(s.name)
                        ctx.lineWidth = 2
                        ctx.beginPath()
                        for (let x = axisLeft; x < axisLeft + w; x += dash * 2) {
                            ctx.moveTo(x, y); ctx.lineTo(Math.min(x + dash, axisLeft + w), y)
                        }
                        ctx.stroke()
                        continue
                    }
                    const colour = root.seriesColours[s.kind] || Theme.ink
                    ctx.strokeStyle = colour
                    ctx.fillStyle = colour
                    ctx.lineWidth = 2
                    ctx.beginPath()
                    for (let m = 0; m < s.values.length; ++m) {
                        const x = xOf(m), y = yOf(Math.min(1, s.values[m]))
                        if (m === 0) ctx.moveTo(x, y); else ctx.lineTo(x, y)
                    }
                    ctx.stroke()
                    for (let m = 0; m < s.values.length; ++m) {
                        const x = xOf(m), y = yOf(Math.min(1, s.values[m]))
                        ctx.beginPath()
                        if (s.kind === "plan") ctx.rect(x - 3.5, y - 3.5, 7, 7)
                        else if (s.kind === "remeasured") { ctx.moveTo(x, y - 5); ctx.lineTo(x + 5, y + 4); ctx.lineTo(x - 5, y + 4); ctx.closePath() }
                        else ctx.arc(x, y, 3.5, 0, 2 * Math.PI)
                        ctx.fill()
                    }
                }
            }
        }
        // Legend: every series and limit in words, with its marker or dash.
        Repeater {
            model: root.series
            delegate: RowLayout {
                required property string kind
                required property string name
                required property string label
                spacing: Theme.step
                Text {
                    text: kind === "limit" ? ("– ".repeat(root.dashOf(name) > 6 ? 1 : (root.dashOf(name) > 3 ? 2 : 3))).trim()
                                           : (root.markers[kind] || "●")
                    font.family: Theme.family; font.pixelSize: Theme.textSize; font.bold: true
                    color: kind === "limit" ? root.limitColour(name) : (root.seriesColours[kind] || Theme.ink)
                    Layout.preferredWidth: 28
                }
                BodyText { text: label; font.pixelSize: Theme.smallSize; Layout.fillWidth: true }
            }
        }
    }
}
