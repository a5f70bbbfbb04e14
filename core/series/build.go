package series

import (
	"cmp"
	"fmt"
	"math"
	"slices"
)

// maxPerKind caps the problems listed one by one for each series and kind;
// the rest are counted in one closing problem.
const maxPerKind = 10

// builder places the rows of one series at their periods.
type builder struct {
	r    *reader
	name string    // series name
	freq Frequency // frequency of ords
	idx  []int32   // the series' rows, as indices into r.rows, in file order
	ords []int     // period ordinal per data row; nil to number rows 1, 2, 3, ...
	vals []float64 // value per data row
	col  int       // the value column

	s     *Series
	at    []int32          // at[slot] = 1 + position in idx of the first row at slot; 0 when none
	dups  map[int][]int32  // slot -> positions in idx of every row at slot, when more than one
	kinds map[error]int    // problems listed so far, by cause
	more  map[error][2]int // problems not listed: count and first line

	firstProblem int // index in r.ds.Problems of this series' first problem
}

// ord returns the period ordinal of the k-th row of the series.
func (b *builder) ord(k int) int {
	if b.ords == nil {
		return k + 1
	}
	return b.ords[b.idx[k]]
}

// line returns the file line of the k-th row of the series.
func (b *builder) line(k int) int { return b.r.lineOf(int(b.idx[k])) }

// build returns the series (nil when it has no value) and its labels.
func (b *builder) build(labelCols []int) (*Series, []Label) {
	r := b.r
	lo, hi, first := 0, 0, true
	for k := range b.idx {
		if math.IsNaN(b.vals[b.idx[k]]) {
			continue
		}
		o := b.ord(k)
		if first || o < lo {
			lo = o
		}
		if first || o > hi {
			hi = o
		}
		first = false
	}
	if first {
		r.decide("series %q has no values and is left out", b.name)
		return nil, nil
	}
	b.firstProblem = len(r.ds.Problems)
	n := hi - lo + 1
	if r.slots+n > maxSpan(len(r.rows)) {
		r.spanError(b.name, Period{b.freq, lo}, Period{b.freq, hi})
		return nil, nil
	}
	r.slots += n
	b.s = &Series{Name: b.name, Start: Period{b.freq, lo}, Values: make([]float64, n), Season: b.freq.DefaultSeason()}
	for i := range b.s.Values {
		b.s.Values[i] = math.NaN()
	}
	b.at = make([]int32, n)
	outside := 0
	var late [][2]int // out-of-order rows: position in idx, position of the latest row before it
	maxK, prevK, inRange := -1, -1, 0
	descending := true
	for k := range b.idx {
		o := b.ord(k)
		if o < lo || o > hi {
			outside++
			continue
		}
		inRange++
		if prevK >= 0 && o >= b.ord(prevK) {
			descending = false
		}
		prevK = k
		if maxK >= 0 && o < b.ord(maxK) {
			late = append(late, [2]int{k, maxK})
		} else {
			maxK = k
		}
		slot := o - lo
		if b.at[slot] == 0 {
			b.at[slot] = int32(k + 1)
			b.s.Values[slot] = b.vals[b.idx[k]]
			continue
		}
		if b.dups == nil {
			b.dups = map[int][]int32{}
		}
		if b.dups[slot] == nil {
			b.dups[slot] = []int32{b.at[slot] - 1}
		}
		b.dups[slot] = append(b.dups[slot], int32(k))
	}
	if outside > 0 {
		r.decide("series %q: %d %s without a value before its first value or after its last %s left out",
			b.name, outside, plural(outside, "row", "rows"), plural(outside, "is", "are"))
	}
	b.duplicates()
	if descending && inRange >= 3 {
		b.reversed(prevK)
	} else {
		b.order(late)
	}
	if f := r.opt.Fill; f != NoFill {
		changes, err := Fill(b.s, f)
		if err != nil {
			r.errs = append(r.errs, err.(*ParseError))
			return nil, nil
		}
		r.ds.Changes = append(r.ds.Changes, changes...)
	}
	b.missing()
	b.sortProblems()
	b.closeProblems()
	return b.s, b.labels(labelCols)
}

// sortProblems orders the problems listed for this series by period,
// then line.
func (b *builder) sortProblems() {
	slices.SortStableFunc(b.r.ds.Problems[b.firstProblem:], func(x, y Problem) int {
		if c := cmp.Compare(x.Period.Ordinal, y.Period.Ordinal); c != 0 {
			return c
		}
		return cmp.Compare(x.Line, y.Line)
	})
}

// duplicates combines or reports several rows for one period.
func (b *builder) duplicates() {
	if len(b.dups) == 0 {
		return
	}
	r := b.r
	slots := make([]int, 0, len(b.dups))
	for slot := range b.dups {
		slots = append(slots, slot)
	}
	slices.Sort(slots)
	for _, slot := range slots {
		ks := b.dups[slot]
		p := b.s.PeriodAt(slot)
		lines := make([]int, len(ks))
		old := make([]float64, len(ks))
		sum, count := 0.0, 0
		for i, k := range ks {
			lines[i] = b.line(int(k))
			old[i] = b.vals[b.idx[k]]
			if !math.IsNaN(old[i]) {
				sum += old[i]
				count++
			}
		}
		agg := r.opt.Duplicates
		if agg == KeepDuplicates {
			b.s.Values[slot] = math.NaN()
			b.problem(Problem{Err: ErrDuplicate, Line: lines[1], Column: b.col + 1, Name: r.names[b.col], Period: p, Count: 1, Blocking: true,
				Message: fmt.Sprintf("line %d: %s appears again in series %q (first on line %d); the values are %s", lines[1], p, b.name, lines[0], valueList(old)),
				Fix:     "delete the extra rows, or set duplicates to sum or mean"})
			continue
		}
		v := math.NaN()
		if count > 0 {
			v = sum
			if agg == Mean {
				v = sum / float64(count)
			}
		}
		b.s.Values[slot] = v
		r.ds.Changes = append(r.ds.Changes, Change{Kind: Combined, Series: b.name, Period: p, Lines: lines, Old: old, New: v, Agg: agg})
	}
}

// reversed reports or records a series whose rows run newest first, as one
// problem or change; last is the position in idx of its last row.
func (b *builder) reversed(last int) {
	r := b.r
	newest, oldest := Period{b.freq, b.ord(0)}, Period{b.freq, b.ord(last)}
	if r.opt.Sort {
		r.ds.Changes = append(r.ds.Changes, Change{Kind: Reversed, Series: b.name, Period: oldest, From: newest,
			Lines: []int{b.line(0), b.line(last)}, New: b.s.Values[0]})
		return
	}
	b.problem(Problem{Err: ErrOutOfOrder, Line: b.line(1), Period: oldest, Count: 1, Blocking: true,
		Message: fmt.Sprintf("line %d: series %q runs newest first, from %s on line %d down to %s on line %d", b.line(1), b.name, newest, b.line(0), oldest, b.line(last)),
		Fix:     "sort the rows by period, or set sort to read them oldest first"})
}

// order reports or records rows that come after a later period.
func (b *builder) order(late [][2]int) {
	r := b.r
	for _, pair := range late {
		k, before := pair[0], pair[1]
		p, q := Period{b.freq, b.ord(k)}, Period{b.freq, b.ord(before)}
		if r.opt.Sort {
			v := b.vals[b.idx[k]]
			r.ds.Changes = append(r.ds.Changes, Change{Kind: Placed, Series: b.name, Period: p, Lines: []int{b.line(k)}, Old: []float64{v}, New: v,
				From: q, Before: b.line(before)})
			continue
		}
		b.problem(Problem{Err: ErrOutOfOrder, Line: b.line(k), Period: p, Count: 1, Blocking: true,
			Message: fmt.Sprintf("line %d: %s comes after %s (line %d) in series %q", b.line(k), p, q, b.line(before), b.name),
			Fix:     "sort the rows by period, or set sort to place each row at its period"})
	}
}

// labels returns the text of the label columns at each period.
func (b *builder) labels(cols []int) []Label {
	if len(cols) == 0 {
		return nil
	}
	r := b.r
	out := make([]Label, len(cols))
	for j, c := range cols {
		intern := map[string]string{}
		text := make([]string, len(b.s.Values))
		for slot, at := range b.at {
			if at == 0 {
				continue
			}
			cell := trimCell(r.t.cell(int(r.rows[b.idx[at-1]]), c))
			s, ok := intern[string(cell)]
			if !ok {
				s = string(cell)
				if len(intern) < 256 {
					intern[s] = s
				}
			}
			text[slot] = s
		}
		out[j] = Label{Column: r.names[c], Text: text}
	}
	return out
}
