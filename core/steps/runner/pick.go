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
	why := fmt.Sprintf("%s has the best %s on the validation period (%s) among %s.", best, measureHeader(by), num(bv), count(len(rows), "forecast", "forecasts"))
	bench := x.benchmarks()
	for _, b := range bench {
		r := x.score(b, true)
		if v, ok := r.valid[by.String()]; ok {
			if by.Better(v, bv) {
				why += fmt.Sprintf(" The %s benchmark did better (%s): the chosen method does not beat it.", b.method, num(v))
			} else {
				why += fmt.Sprintf(" The %s benchmark scored %s.", b.method, num(v))
			}
		}
	}
	x.st.pick = &choice{step: x.s.N, label: best, by: by.String(), value: bv, why: why}
	x.message(Info, "Recommended: %s", why)
	return nil
}
