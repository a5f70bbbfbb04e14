package series

import (
	"fmt"
)

// maxSpan returns the most periods the series of a file with rows data
// rows may hold together: 100,000 plus 100 per row, at most twenty million.
// Far beyond any business data, it keeps a mistyped date from filling
// memory with missing periods.
func maxSpan(rows int) int {
	return min(20_000_000, 100_000+100*rows)
}

// assemble reads the periods and values and builds the series.
func (r *reader) assemble(ro roles, st []colStats) {
	var freq Frequency
	var ords []int
	switch {
	case ro.year >= 0:
		freq, ords = r.combined(ro)
	case ro.date >= 0:
		freq, ords = r.dateColumn(ro.date)
		r.ds.DateColumn = r.names[ro.date]
	default:
		freq = Index
		r.decide("no column holds periods, so the values are numbered 1, 2, 3, ... in row order")
	}
	if r.failed() {
		return
	}
	r.ds.Frequency = freq
	ro.key = r.chooseKey(ro, st, ords)
	if r.failed() {
		return
	}
	r.chooseValues(&ro, st)
	if r.failed() {
		return
	}
	cols := make([][]float64, len(ro.values))
	for j, c := range ro.values {
		cols[j] = r.valueColumn(c)
	}
	if r.failed() {
		return
	}
	keys, groups := r.groupRows(ro.key)
	if ro.key >= 0 {
		r.ds.Layout = Long
		r.ds.SeriesKey = r.names[ro.key]
		r.decide("the file is in the long layout: column %q names the series (%d found) and %s the values",
			r.names[ro.key], len(keys), quotedList(namesOf(r.names, ro.values), 4))
	} else {
		r.ds.Layout = Wide
		r.decide("each value column is one series: %s", quotedList(namesOf(r.names, ro.values), 12))
	}
	for g, key := range keys {
		for j, c := range ro.values {
			b := builder{r: r, name: r.seriesName(ro, key, c), freq: freq, idx: groups[g], ords: ords, vals: cols[j], col: c}
			s, labels := b.build(ro.labels)
			if r.failed() {
				return
			}
			if s == nil {
				continue
			}
			r.ds.Series = append(r.ds.Series, s)
			if ro.key >= 0 {
				r.ds.Labels = append(r.ds.Labels, labels)
			}
		}
	}
	if len(r.ds.Series) == 0 {
		r.fail(-1, -1, "", ErrNoValues, "no series holds a single value; check that the value columns are filled")
	}
}

// namesOf returns the names of columns cols.
func namesOf(names []string, cols []int) []string {
	out := make([]string, len(cols))
	for i, c := range cols {
		out[i] = names[c]
	}
	return out
}

// groupRows splits the data rows by the text of column key, in order of
// first appearance; each group lists indices into r.rows in file order.
// Without a key column there is one group holding every row.
func (r *reader) groupRows(key int) ([]string, [][]int32) {
	if key < 0 {
		all := make([]int32, len(r.rows))
		for i := range all {
			all[i] = int32(i)
		}
		return []string{""}, [][]int32{all}
	}
	index := map[string]int32{}
	var keys []string
	of := make([]int32, len(r.rows))
	for i, row := range r.rows {
		b := trimCell(r.t.cell(int(row), key))
		k, ok := index[string(b)]
		if !ok {
			k = int32(len(keys))
			keys = append(keys, string(b))
			index[keys[k]] = k
		}
		of[i] = k
	}
	counts := make([]int, len(keys)+1)
	for _, k := range of {
		counts[k+1]++
	}
	for k := 1; k < len(counts); k++ {
		counts[k] += counts[k-1]
	}
	flat := make([]int32, len(of))
	next := counts[:len(keys)]
	groups := make([][]int32, len(keys))
	for k := range groups {
		groups[k] = flat[counts[k]:counts[k+1]:counts[k+1]]
	}
	fill := append([]int(nil), next...)
	for i, k := range of {
		flat[fill[k]] = int32(i)
		fill[k]++
	}
	return keys, groups
}

// spanError reports periods spread too far for the rows read.
func (r *reader) spanError(name string, lo, hi Period) {
	msg := fmt.Sprintf("series %q runs from %s to %s, %d %s for %d rows of data; check the first and last dates, or set a coarser frequency",
		name, lo, hi, hi.Sub(lo)+1, lo.Freq.Plural(), len(r.rows))
	if r.slots > 0 {
		msg = fmt.Sprintf("series %q runs from %s to %s, and with the series before it that makes %d %s for %d rows of data; check the first and last dates, or set a coarser frequency",
			name, lo, hi, r.slots+hi.Sub(lo)+1, lo.Freq.Plural(), len(r.rows))
	}
	r.fail(-1, -1, "", ErrSpan, msg)
}
