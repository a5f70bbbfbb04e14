package chart

// This file holds the plain-data types shared by every chart.

// Frame holds what every chart has around its data: the words and the size.
// The zero value draws a 720×360 chart with no visible title.
type Frame struct {
	// Title is shown above the chart and read first by screen readers.
	Title string
	// Desc is the description for screen readers; empty means one is
	// written from the data (series names, period range, value range).
	Desc string
	// XTitle and YTitle name the axes, for example "month" and "units".
	XTitle, YTitle string
	// Width and Height are the viewBox size in SVG user units (pixels at
	// 100%); 0 takes the chart's default. Values below 240×160 are raised.
	Width, Height int
	// FixedSize also writes width and height attributes; by default the SVG
	// has only a viewBox and scales to its container.
	FixedSize bool
}

// Role says what a series is, which decides how it is drawn.
type Role int

const (
	// Actual is observed data: a thin solid line in the text colour.
	Actual Role = iota
	// Smoothed is a smoothed line for display (a centred moving average):
	// a thick line in a palette colour.
	Smoothed
	// Forecast is a method's fitted values or forecasts: a palette colour
	// with its own dash pattern and markers.
	Forecast
)

// Series is one named line (or set of bars) over the chart's positions.
// Values[i] belongs to position i; NaN or a missing position is a gap.
type Series struct {
	Name   string
	Values []float64
	Role   Role
	// Bands are prediction intervals around this series, drawn in its
	// colour, wider levels lighter. Used by [Line] only.
	Bands []Band
}

// Band is a prediction interval: Lower[i] and Upper[i] bound position i.
// Positions where either bound is NaN or missing are not shaded.
type Band struct {
	// Level is the nominal coverage in percent, for example 80 or 95.
	Level float64
	Lower []float64
	Upper []float64
}

// Frequency says how often periods come, which decides where the period
// axis puts its ticks. The zero value [Inferred] reads it from the labels.
type Frequency int

const (
	// Inferred reads the frequency from the shape of the labels:
	// "2024" yearly, "2024-Q1" quarterly, "2024-03" monthly, "2024-W05"
	// weekly, "2024-03-15" daily; any other shape counts as [Unlabelled].
	Inferred Frequency = iota
	Yearly
	Quarterly
	Monthly
	Weekly
	Daily
	// Unlabelled thins the labels evenly (every 1, 2, 5, 10, … positions)
	// and shows them as given; used for horizons and lags.
	Unlabelled
)
