package runner

import (
	"fmt"
)

// pick chooses the forecast with the best validation score.
func (x *exec) pick() error {
	by := x.measure("mase")
	var among []*fcast
	if v, ok := x.option("among"); ok {
		for _, l := range v.Words {
			if f := x.st.forecastNamed(l); f != nil {
				among = append(among, f)
			}
		}
	} else {
		among = x.st.forecasts
	}
	var rows []scored
	for _, f := range among {
		rows = append(rows, x.score(f, false))
	}
	best := bestRow(rows, by)
	if best == "" {
		return fmt.Errorf("no forecast has a defined %s on the validation period; pick by another measure, such as by=rmse", measureHeader(by))
	}
	var bv float64
	for _, r := range rows {
		if r.label == best {
			bv = r.valid[by.String()]
		}
	}
	bench := x.benchmarks()
	all := rows
	for _, b := range bench {
		all = append(all, x.score(b, true))
	}
	// Figures are written as a comparison table of these rows shows them.
	cell := func(v float64) string { return validCell(all, by.String(), v) }
	why := fmt.Sprintf("%s has the best %s on the validation period (%s) among %s.", best, measureHeader(by), cell(bv), count(len(rows), "forecast", "forecasts"))
	for _, r := range all[len(rows):] {
		if v, ok := r.valid[by.String()]; ok {
			if by.Better(v, bv) {
				why += fmt.Sprintf(" The %s benchmark did better (%s): the chosen method does not beat it.", r.method, cell(v))
			} else {
				why += fmt.Sprintf(" The %s benchmark scored %s.", r.method, cell(v))
			}
		}
	}
	x.st.pick = &choice{step: x.s.N, label: best, by: by.String(), value: bv, why: why}
	x.message(Info, "Recommended: %s", why)
	return nil
}
