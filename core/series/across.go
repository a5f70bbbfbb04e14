package series

import (
	"fmt"
	"math"
	"strings"
)

// This file reads the across layout, common in planning sheets: one row
// per series, a label in the first columns and one column per period,
// with the periods as column names:
//
//	shop,2024-01,2024-02,2024-03
//	Harbour Row,412,398,455
//	Old Mill,377,362,390

// acrossColumns returns the first and the end of the run of period column
// names that closes the first row, when the first row has at least one
// label column followed by at least two periods of one frequency; ok is
// false otherwise.
func (r *reader) acrossColumns() (first, end int, ok bool) {
	t := r.t
	end = t.width(0)
	for end > 0 && len(trimCell(t.cell(0, end-1))) == 0 {
		end--
	}
	first = end
	freq := NoFrequency
	for first > 0 {
		d := scanDate(trimCell(t.cell(0, first-1)))
		f := freqOfShape(d.shape)
		if f == NoFrequency || f == Index || freq != NoFrequency && f != freq {
			break
		}
		freq = f
		first--
	}
	if first < 1 || end-first < 2 {
		return first, end, false
	}
	// The first column names series; if it holds periods, the file is
	// wide with period-named value columns (month,2023,2024).
	periods, filled := 0, 0
	for row := 1; row < min(t.rows(), 21); row++ {
		b := trimCell(t.cell(row, 0))
		if len(b) == 0 {
			continue
		}
		filled++
		if f := freqOfShape(scanDate(b).shape); f != NoFrequency && f != Index {
			periods++
		}
	}
	return first, end, 2*periods <= filled
}

// readAcross reads a file in the across layout whose period columns are
// first..end-1.
func (r *reader) readAcross(first, end int) {
	r.nameColumns(true)
	if !r.dataRows(true) {
		return
	}
	r.ds.Columns = r.names
	r.ds.Layout = Across
	freq, ords := r.acrossPeriods(first, end)
	if r.failed() {
		return
	}
	r.ds.Frequency = freq
	cols := make([]int, end-first)
	for k := range cols {
		cols[k] = first + k
	}
	dec, ok := r.decideMark(cols, fmt.Sprintf("columns %q to %q", r.names[first], r.names[end-1]), r.names[first])
	if !ok {
		return
	}
	r.ds.SeriesKey = r.names[0]
	r.decide("the file is in the across layout: one series per row, named in column %q, with one column per %s from %s to %s",
		r.names[0], freq, Period{freq, ords[0]}, Period{freq, ords[len(ords)-1]})
	lo, n := ords[0], ords[len(ords)-1]-ords[0]+1
	seen := map[string]int{}
	for i := range r.rows {
		values := make([]float64, len(cols))
		for k, c := range cols {
			values[k] = r.number(i, c, dec)
		}
		if r.failed() {
			continue
		}
		name := string(trimCell(r.t.cell(int(r.rows[i]), 0)))
		if name == "" {
			name = fmt.Sprintf("line %d", r.lineOf(i))
		}
		if k := seen[strings.ToLower(name)]; k > 0 {
			seen[strings.ToLower(name)] = k + 1
			renamed := fmt.Sprintf("%s (%d)", name, k+1)
			r.decide("line %d repeats the name %q and its series is called %q", r.lineOf(i), name, renamed)
			name = renamed
		} else {
			seen[strings.ToLower(name)] = 1
		}
		r.acrossSeries(i, name, freq, lo, n, ords, cols, values, first)
	}
	if !r.failed() && len(r.ds.Series) == 0 {
		r.fail(-1, -1, "", ErrNoValues, "no row holds a single value; check that the period columns are filled")
	}
}

// acrossPeriods reads the period column names first..end-1 into ordinals
// of one frequency, which must run in time order without repeats.
func (r *reader) acrossPeriods(first, end int) (Frequency, []int) {
	t := r.t
	cells := make([]dateCell, end-first)
	dayFirst, monthFirst := false, false
	for k := range cells {
		cells[k] = scanDate(trimCell(t.cell(0, first+k)))
		dayFirst = dayFirst || cells[k].shape == shapeAB && cells[k].a > 12
		monthFirst = monthFirst || cells[k].shape == shapeAB && cells[k].b > 12
	}
	order := r.opt.DateOrder
	if order == DetectOrder {
		switch {
		case dayFirst && !monthFirst:
			order = DayFirst
		case monthFirst && !dayFirst:
			order = MonthFirst
		}
	}
	ords := make([]int, len(cells))
	for k, d := range cells {
		if d.shape == shapeAB && order == DetectOrder {
			r.failHeader(first+k, ErrDateOrder, fmt.Sprintf("the dates naming the period columns, such as %s, could be day-first or month-first; set the date order to day-first or month-first", quoteCell(r.names[first+k])))
			return NoFrequency, nil
		}
		ord, why := ordinalOf(d, order)
		if why != "" {
			r.failHeader(first+k, ErrNotDate, fmt.Sprintf("%s is not a date: %s", quoteCell(r.names[first+k]), why))
			return NoFrequency, nil
		}
		ords[k] = ord
	}
	freq := r.frequency(first, freqOfShape(cells[0].shape), ords)
	if r.failed() {
		return NoFrequency, nil
	}
	for k := 1; k < len(ords); k++ {
		if ords[k] <= ords[k-1] {
			cause, how := ErrOutOfOrder, "comes after"
			if ords[k] == ords[k-1] {
				cause, how = ErrDuplicate, "repeats"
			}
			r.failHeader(first+k, cause, fmt.Sprintf("this column (%s) %s column %q (%s); put the period columns in time order, one column per period",
				Period{freq, ords[k]}, how, r.names[first+k-1], Period{freq, ords[k-1]}))
			return NoFrequency, nil
		}
	}
	return freq, ords
}

// acrossSeries builds the series of data row i from its values, one per
// period column; first is the first period column.
func (r *reader) acrossSeries(i int, name string, freq Frequency, lo, n int, ords, cols []int, values []float64, first int) {
	a, z := 0, len(values)-1
	for a <= z && math.IsNaN(values[a]) {
		a++
	}
	for z >= a && math.IsNaN(values[z]) {
		z--
	}
	if a > z {
		r.decide("series %q (line %d) has no values and is left out", name, r.lineOf(i))
		return
	}
	start, span := ords[a], ords[z]-ords[a]+1
	if r.slots+span > maxSpan(len(r.rows)) {
		r.spanError(name, Period{freq, ords[a]}, Period{freq, ords[z]})
		return
	}
	r.slots += span
	s := &Series{Name: name, Start: Period{freq, start}, Values: make([]float64, span), Season: freq.DefaultSeason()}
	present := make([]bool, span)
	for k := range s.Values {
		s.Values[k] = math.NaN()
	}
	for k := a; k <= z; k++ {
		s.Values[ords[k]-start] = values[k]
		present[ords[k]-start] = true
	}
	if r.opt.Fill != NoFill {
		changes, err := Fill(s, r.opt.Fill)
		if err != nil {
			r.errs = append(r.errs, err.(*ParseError))
			return
		}
		r.ds.Changes = append(r.ds.Changes, changes...)
	}
	listed := 0
	for k := a; k <= z; k++ {
		slot := ords[k] - start
		if !math.IsNaN(s.Values[slot]) {
			continue
		}
		if listed++; listed > maxPerKind {
			continue
		}
		cell := string(trimCell(r.t.cell(int(r.rows[i]), cols[k])))
		r.ds.Problems = append(r.ds.Problems, Problem{Err: ErrMissing, Series: name, Line: r.lineOf(i), Column: cols[k] + 1, Name: r.names[cols[k]], Cell: cell,
			Period: s.PeriodAt(slot), Count: 1,
			Message: fmt.Sprintf("line %d, column %q: series %q has no value for %s (the cell holds %s)", r.lineOf(i), r.names[cols[k]], name, s.PeriodAt(slot), quoteCell(cell)),
			Fix:     "fill in the value, or set fill to carry forward, linear or seasonal"})
	}
	for slot := 0; slot < span; slot++ {
		if present[slot] || !math.IsNaN(s.Values[slot]) {
			continue
		}
		j := slot
		for j+1 < span && !present[j+1] && math.IsNaN(s.Values[j+1]) {
			j++
		}
		what := fmt.Sprintf("no column for %s", s.PeriodAt(slot))
		if j > slot {
			what = fmt.Sprintf("no columns for %s to %s (%d %s)", s.PeriodAt(slot), s.PeriodAt(j), j-slot+1, freq.Plural())
		}
		if listed++; listed <= maxPerKind {
			r.ds.Problems = append(r.ds.Problems, Problem{Err: ErrGap, Series: name, Period: s.PeriodAt(slot), Count: j - slot + 1,
				Message: fmt.Sprintf("series %q has %s", name, what),
				Fix:     "add the missing period columns, or set fill to carry forward, linear or seasonal"})
		}
		slot = j
	}
	if listed > maxPerKind {
		r.ds.Problems = append(r.ds.Problems, Problem{Err: ErrMissing, Series: name, Line: r.lineOf(i), Count: listed - maxPerKind,
			Message: fmt.Sprintf("series %q has %d more missing values after the %d listed", name, listed-maxPerKind, maxPerKind),
			Fix:     "see the values listed above for what to do"})
	}
	r.ds.Series = append(r.ds.Series, s)
	if first > 1 {
		labels := make([]Label, 0, first-1)
		for c := 1; c < first; c++ {
			text := make([]string, span)
			cell := string(trimCell(r.t.cell(int(r.rows[i]), c)))
			for k := range text {
				text[k] = cell
			}
			labels = append(labels, Label{Column: r.names[c], Text: text})
		}
		r.ds.Labels = append(r.ds.Labels, labels)
	} else {
		r.ds.Labels = append(r.ds.Labels, nil)
	}
}
