package accuracy

import (
	"fmt"
	"math"
)

// Scores holds every measure for one forecast scored against actual values.
type Scores struct {
	N       int // periods scored
	Skipped int // periods left out because the actual value or the forecast was NaN or infinite
	Scale   Scale
	results [numMeasures]Result
}

// Of returns the result of measure m. An invalid m gives an undefined
// result.
func (s Scores) Of(m Measure) Result {
	if !m.Valid() {
		return Result{Reason: fmt.Sprintf("%v is not an accuracy measure", m)}
	}
	return s.results[m]
}

// Evaluate scores forecast against actual, period by period (actual[i] and
// forecast[i] belong to the same period), with scale as the MASE
// denominator (see [NaiveScale]; the zero Scale leaves MASE undefined).
//
// A period where either value is NaN or infinite is left out and counted in
// Skipped. When the two slices differ in length, or no period is left,
// every measure is undefined with the reason.
func Evaluate(actual, forecast []float64, scale Scale) Scores {
	if len(actual) != len(forecast) {
		return failed(scale, 0, 0, fmt.Sprintf("the forecast covers %d %s but %d actual %s given",
			len(forecast), plural(len(forecast), "period", "periods"),
			len(actual), plural(len(actual), "value was", "values were")))
	}
	var t Tally
	for i := range actual {
		t.Add(actual[i], forecast[i])
	}
	return t.Scores(scale)
}

// Score returns one measure of forecast against actual; see [Evaluate].
func Score(m Measure, actual, forecast []float64, scale Scale) Result {
	return Evaluate(actual, forecast, scale).Of(m)
}

// Tally gathers errors one period at a time, for callers that score
// forecasts as they make them (rolling-origin evaluation by horizon, say).
// The zero Tally is empty and ready to use.
type Tally struct {
	n, skipped   int
	sumE, sumAbs float64
	sumSq        float64
	sumAPE       float64
	sumPE        float64
	zeroActual   int
	sumSAPE      float64
	zeroBoth     int
}

// Add records one period's actual value and forecast. A pair holding a NaN
// or infinite value is counted as skipped.
func (t *Tally) Add(actual, forecast float64) {
	if !finite(actual) || !finite(forecast) {
		t.skipped++
		return
	}
	e := actual - forecast
	ae := math.Abs(e)
	t.n++
	t.sumE += e
	t.sumAbs += ae
	t.sumSq += e * e
	if actual == 0 {
		t.zeroActual++
	} else {
		t.sumAPE += ae / math.Abs(actual)
		t.sumPE += e / actual
	}
	if d := math.Abs(actual) + math.Abs(forecast); d == 0 {
		t.zeroBoth++
	} else {
		t.sumSAPE += 2 * ae / d
	}
}

// N returns the number of periods recorded, skipped ones excluded.
func (t *Tally) N() int { return t.n }

// Scores returns the measures of the periods recorded so far.
func (t *Tally) Scores(scale Scale) Scores {
	if t.n == 0 {
		why := "there is no period to score"
		if t.skipped > 0 {
			why = fmt.Sprintf("no period has both an actual value and a forecast (%d %s a missing value)",
				t.skipped, plural(t.skipped, "period has", "periods have"))
		}
		return failed(scale, 0, t.skipped, why)
	}
	s := Scores{N: t.n, Skipped: t.skipped, Scale: scale}
	n := float64(t.n)
	mse := t.sumSq / n
	s.results[ME] = value(ME, t.sumE/n)
	s.results[MAE] = value(MAE, t.sumAbs/n)
	s.results[MSE] = value(MSE, mse)
	s.results[RMSE] = value(RMSE, math.Sqrt(mse))
	if t.zeroActual > 0 {
		why := fmt.Sprintf("%d actual %s zero", t.zeroActual, plural(t.zeroActual, "value is", "values are"))
		s.results[MAPE] = undefined(MAPE, why)
		s.results[MPE] = undefined(MPE, why)
	} else {
		s.results[MAPE] = value(MAPE, 100*t.sumAPE/n)
		s.results[MPE] = value(MPE, 100*t.sumPE/n)
	}
	if t.zeroBoth > 0 {
		s.results[SMAPE] = undefined(SMAPE, fmt.Sprintf("in %d %s the actual value and the forecast are both zero",
			t.zeroBoth, plural(t.zeroBoth, "period", "periods")))
	} else {
		s.results[SMAPE] = value(SMAPE, 100*t.sumSAPE/n)
	}
	switch {
	case scale.Defined && scale.Value > 0:
		s.results[MASE] = value(MASE, t.sumAbs/n/scale.Value)
	case scale.Reason != "":
		s.results[MASE] = Result{Reason: scale.Reason}
	default:
		s.results[MASE] = undefined(MASE, "no training series was given to scale it")
	}
	return s
}

// failed returns scores in which every measure is undefined for why.
func failed(scale Scale, n, skipped int, why string) Scores {
	s := Scores{N: n, Skipped: skipped, Scale: scale}
	for _, m := range Measures() {
		s.results[m] = undefined(m, why)
	}
	return s
}
