package forecast

import "fmt"

// This file sets the initial states of exponential smoothing when the user
// gives none, by the heuristics of the NIST/SEMATECH e-Handbook of
// Statistical Methods (2012), sections 6.4.3.3 and 6.4.3.6, written as
// states at time 0:
//
//   - no trend, no season: level0 = y[0] (the handbook's S_2 = y_1; the first
//     one-step error is then 0);
//   - trend, no season: trend0 = the mean of the first three differences
//     (fewer on a very short series), level0 = y[0] - trend0 (the handbook's
//     S_1 = y_1 with b_1 = trend0);
//   - season of m periods: level0 = mean of the first m values,
//     trend0 = mean over i < m of (y[m+i] - y[i]) / m, and
//     season0[i] = y[i] - level0 (additive) or y[i] / level0
//     (multiplicative), the state used for observation i.

// heuristicStates returns the initial states for form f from y and a
// sentence saying how they were set. y has at least 2 values, and at least
// 2m under a season.
func (f esForm) heuristicStates(y []float64) (esStates, string) {
	st := esStates{season: []float64{0}}
	if f.season == Multiplicative {
		st.season = []float64{1}
	}
	switch {
	case f.season != NoSeason:
		m := f.m
		st.level = mean(y[:m])
		if f.trend {
			for i := range m {
				st.trend += (y[m+i] - y[i]) / float64(m)
			}
			st.trend /= float64(m)
		}
		st.season = make([]float64, m)
		for i := range m {
			if f.season == Additive {
				st.season[i] = y[i] - st.level
			} else {
				st.season[i] = y[i] / st.level
			}
		}
		how := fmt.Sprintf("level0 is the mean of the first season (%d periods)", m)
		if f.trend {
			how += ", trend0 the mean change per period from the first to the second season"
		}
		if f.season == Additive {
			return st, how + ", and each season0 the first season's value minus that level"
		}
		return st, how + ", and each season0 the first season's value divided by that level"
	case f.trend:
		k := min(3, len(y)-1)
		st.trend = (y[k] - y[0]) / float64(k)
		st.level = y[0] - st.trend
		return st, fmt.Sprintf("trend0 is the mean of the first %d changes and level0 the first value minus trend0", k)
	default:
		st.level = y[0]
		return st, "level0 is the first value, so the first one-step error is 0"
	}
}
