package chart

// This file is the one place that defines how charts look: the palette, the
// dash patterns and marker shapes that stand beside each colour, and the
// style sheet embedded in every SVG.
//
// The six series colours are our own: a harbour blue, an amber, a plum, a
// sea green, a rose and an olive, chosen to differ in lightness as well as
// hue, with brighter twins for dark page schemes. Each slot also has its own
// dash pattern and marker so that a reader who cannot tell the hues apart
// still can tell the lines apart.

// slots is the number of series styles before they repeat.
const slots = 6

// dashes holds each slot's stroke-dasharray; "" is a solid line.
var dashes = [slots]string{"", "7 3", "2 3", "9 3 2 3", "4 4", "12 3 2 3 2 3"}

// markerShape is the marker drawn at points of a series in a slot.
type markerShape int

const (
	markCircle markerShape = iota
	markSquare
	markTriangle
	markDiamond
	markTriangleDown
	markPlus
)

// holdoutSlot is the palette colour whose light tint marks the holdout.
const holdoutSlot = 3

// StyleSheet is the text of the <style> element embedded in every chart,
// byte for byte, so a host page can allow it by hash in its
// Content-Security-Policy without drawing a chart. Class names start with
// "qc-" so that several inline charts and the host page do not clash; the
// rules are the same in every chart, so repeating them inline is harmless.
const StyleSheet = `.qc{font-family:system-ui,-apple-system,"Segoe UI",sans-serif;font-size:12px}` +
	`.qc-bg{fill:#fcfbf7}` +
	`.qc-ink{stroke:#22262e;fill:none}.qc-inkf{fill:#22262e}` +
	`.qc-text{fill:#22262e}.qc-muted{fill:#5d6470}.qc-title{fill:#22262e;font-size:15px;font-weight:600}` +
	`.qc-axis{stroke:#5d6470;stroke-width:1;fill:none}.qc-grid{stroke:#e4e1d8;stroke-width:1;fill:none}` +
	`.qc-zero{stroke:#5d6470;stroke-width:1.2;fill:none}` +
	`.qc-c0{stroke:#1d5f99}.qc-f0{fill:#1d5f99}` +
	`.qc-c1{stroke:#c77c0e}.qc-f1{fill:#c77c0e}` +
	`.qc-c2{stroke:#86449a}.qc-f2{fill:#86449a}` +
	`.qc-c3{stroke:#1f8a75}.qc-f3{fill:#1f8a75}` +
	`.qc-c4{stroke:#b84e6f}.qc-f4{fill:#b84e6f}` +
	`.qc-c5{stroke:#6b7a1f}.qc-f5{fill:#6b7a1f}` +
	`.qc-line{fill:none;stroke-width:1.8;stroke-linejoin:round;stroke-linecap:round}` +
	`.qc-actual{stroke-width:1.4}.qc-smooth{stroke-width:3}` +
	`.qc-band80{fill-opacity:.28;stroke:none}.qc-band95{fill-opacity:.14;stroke:none}` +
	`.qc-bar{stroke:none}.qc-holdout{fill-opacity:.1;stroke:none}` +
	`.qc-divider{stroke-width:1.5;stroke-dasharray:5 3;fill:none}` +
	`.qc-region{fill:#5d6470;fill-opacity:.07;stroke:none}` +
	`.qc-best{stroke-width:2;fill:none}` +
	`@media (prefers-color-scheme:dark){` +
	`.qc-bg{fill:#1b1d22}` +
	`.qc-ink{stroke:#e6e4de}.qc-inkf{fill:#e6e4de}` +
	`.qc-text{fill:#e6e4de}.qc-muted{fill:#a9afb9}.qc-title{fill:#e6e4de}` +
	`.qc-axis{stroke:#a9afb9}.qc-grid{stroke:#343842}.qc-zero{stroke:#a9afb9}` +
	`.qc-c0{stroke:#7cb6ec}.qc-f0{fill:#7cb6ec}` +
	`.qc-c1{stroke:#f0b256}.qc-f1{fill:#f0b256}` +
	`.qc-c2{stroke:#c99be0}.qc-f2{fill:#c99be0}` +
	`.qc-c3{stroke:#5fcfb5}.qc-f3{fill:#5fcfb5}` +
	`.qc-c4{stroke:#ec8fac}.qc-f4{fill:#ec8fac}` +
	`.qc-c5{stroke:#bccb63}.qc-f5{fill:#bccb63}` +
	`.qc-region{fill:#a9afb9}` +
	`}`

// stroke and fill return the CSS classes giving slot's colour.
func stroke(slot int) string { return strokeClasses[slot%slots] }
func fill(slot int) string   { return fillClasses[slot%slots] }

var (
	strokeClasses = [slots]string{"qc-c0", "qc-c1", "qc-c2", "qc-c3", "qc-c4", "qc-c5"}
	fillClasses   = [slots]string{"qc-f0", "qc-f1", "qc-f2", "qc-f3", "qc-f4", "qc-f5"}
)
