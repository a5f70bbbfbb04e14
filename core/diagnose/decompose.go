package diagnose

import "math"

// Kind is the form of a decomposition: how season and remainder combine with
// the trend.
type Kind int

// The kinds of decomposition.
const (
	// Additive: y = trend + seasonal + remainder; the seasonal swing keeps
	// the same size in units whatever the level.
	Additive Kind = iota + 1
	// Multiplicative: y = trend × seasonal × remainder; the seasonal swing
	// grows with the level. Needs values above zero.
	Multiplicative
)

// String returns the kind as written in steps: "additive" or
// "multiplicative".
func (k Kind) String() string {
	switch k {
	case Additive:
		return "additive"
	case Multiplicative:
		return "multiplicative"
	}
	return "unknown"
}

// Decomposition is a series split into trend, season and remainder.
// Every slice except Indices is aligned with the input series.
type Decomposition struct {
	Kind   Kind
	Season int // periods in one seasonal cycle
	// Trend is the centred moving average of width Season (the 2×m average
	// for even m); NaN for the first and last Season/2 periods (rounded down
	// for odd m), which are not extrapolated.
	Trend []float64
	// Seasonal repeats Indices: Seasonal[t] = Indices[t mod Season].
	Seasonal []float64
	// Remainder is y - trend - seasonal (additive) or y / (trend × seasonal)
	// (multiplicative); NaN where Trend is NaN.
	Remainder []float64
	// Adjusted is the seasonally adjusted series: y - seasonal or
	// y / seasonal. Defined at every period.
	Adjusted []float64
	// Indices holds one seasonal index per position in the cycle, counted
	// from the first observation (Indices[0] belongs to periods 0, m, 2m,
	// ...). Additive indices sum to 0; multiplicative ones average 1.
	Indices []float64
}

// Decompose splits y into trend, season and remainder by classical
// decomposition with the given season length.
//
// The trend is the centred moving average of width season. Each raw index
// is the mean of the detrended values (y - trend, or y / trend) at positions
// j, j+m, j+2m, ... where the trend is defined; the indices are then centred
// to sum to 0 (additive) or scaled to average 1 (multiplicative).
//
// It returns an [*InputError] when season is below 2, when y holds fewer
// than two full seasons, when a value is NaN or infinite, when kind is not
// one of the two kinds, for a multiplicative decomposition when a value is
// zero or negative, and when the values are so large (or, for a
// multiplicative one, so small) that a component cannot be held as a
// finite number.
//
// Reference: M. Kendall and A. Stuart, The Advanced Theory of Statistics,
// vol. 3, 3rd ed. (1976), Griffin, ch. 46; R. J. Hyndman and
// G. Athanasopoulos, Forecasting: Principles and Practice, 2nd ed. (2018),
// section 6.3 "Classical decomposition".
func Decompose(y []float64, season int, kind Kind) (*Decomposition, error) {
	if kind != Additive && kind != Multiplicative {
		return nil, inputErr(ErrBadSeason, 0, "a decomposition is either additive or multiplicative")
	}
	if err := checkSeason(len(y), season, "classical decomposition"); err != nil {
		return nil, err
	}
	if err := checkFinite(y); err != nil {
		return nil, err
	}
	if kind == Multiplicative {
		if err := checkPositive(y, "a multiplicative decomposition"); err != nil {
			return nil, err
		}
	}
	trend, err := CenteredMovingAverage(y, season)
	if err != nil {
		return nil, err
	}
	n := len(y)
	d := &Decomposition{
		Kind: kind, Season: season, Trend: trend,
		Seasonal:  make([]float64, n),
		Remainder: make([]float64, n),
		Adjusted:  make([]float64, n),
		Indices:   make([]float64, season),
	}
	combine, split := combiners(kind)
	sums := make([]float64, season)
	counts := make([]int, season)
	for t, v := range y {
		if math.IsNaN(trend[t]) {
			continue
		}
		sums[t%season] += split(v, trend[t])
		counts[t%season]++
	}
	var total float64
	for j := range d.Indices {
		d.Indices[j] = sums[j] / float64(counts[j])
		total += d.Indices[j]
	}
	centre := total / float64(season)
	for j := range d.Indices {
		if kind == Additive {
			d.Indices[j] -= centre
		} else {
			d.Indices[j] /= centre
		}
	}
	half := season / 2
	for t, v := range y {
		s := d.Indices[t%season]
		d.Seasonal[t] = s
		d.Adjusted[t] = split(v, s)
		if t < half || t >= n-half {
			d.Remainder[t] = math.NaN()
		} else {
			d.Remainder[t] = split(v, combine(trend[t], s))
		}
		inside := t >= half && t < n-half
		if !isFinite(s) || !isFinite(d.Adjusted[t]) || (inside && (!isFinite(trend[t]) || !isFinite(d.Remainder[t]))) {
			return nil, inputErr(ErrNotFinite, t+1,
				"the values are too large or too small to decompose (the trouble starts at period %d); rescale the series, for example to thousands", t+1)
		}
	}
	return d, nil
}

// combiners returns how two components are put together and how one is
// taken out, for the kind.
func combiners(kind Kind) (combine, split func(a, b float64) float64) {
	if kind == Multiplicative {
		return func(a, b float64) float64 { return a * b }, func(a, b float64) float64 { return a / b }
	}
	return func(a, b float64) float64 { return a + b }, func(a, b float64) float64 { return a - b }
}

// checkSeason requires a season of at least 2 and two full seasons of data.
func checkSeason(n, season int, what string) error {
	if season < 2 {
		return inputErr(ErrBadSeason, 0,
			"%s needs a season of at least 2 periods (4 for quarterly data, 12 for monthly); %d was given", what, season)
	}
	if n < 2*season {
		return inputErr(ErrTooShort, 0,
			"%s needs at least two full seasons (%d values for a season of %d); the series has %d",
			what, 2*season, season, n)
	}
	return nil
}
