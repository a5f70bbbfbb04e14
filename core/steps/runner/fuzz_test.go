package runner

import (
	"fmt"
	"math"
	"math/rand/v2"
	"strings"
	"testing"
)

// stepPool holds step lines, sound and unsound, for the runner fuzz.
var stepPool = []string{
	"split last=6", "split last=1", "split from=2021-01", "split last=40",
	"smooth centered width=4", "smooth trailing width=12", "smooth centered width=1",
	"forecast naive", "forecast seasonal-naive", "forecast drift", "forecast mean",
	"forecast moving-average width=3", "forecast moving-average", "forecast ses as=s",
	"forecast holt as=h", "forecast damped as=d", "forecast holt-winters as=hw",
	"forecast holt-winters season=multiplicative as=hwm", "forecast theta as=th",
	"forecast regression as=reg", "forecast naive horizon=5 as=n5", "forecast ses difference=1 as=sd",
	"forecast naive difference=12 as=nd", "forecast naive interval=50,99 as=ni",
	"combine of=s,h as=c", "evaluate", "evaluate by=mape", "evaluate by=me",
	"sweep moving-average width=1..8", "sweep ses alpha=0.1..0.9 step=0.4", "sweep holt beta=0..1 step=0.5",
	"backtest origins=3 horizon=2", "backtest origins=2 horizon=6 by=smape", "difference", "difference lag=12,1",
	"decompose", "decompose multiplicative", "check", "check s", "check hw", "pick", "pick by=rmse",
	"bakeoff last=3", "load other.csv",
}

// fuzzSeries writes a monthly CSV from the generator: constant, trend and
// season, a random walk, or values around zero.
func fuzzSeries(r *rand.Rand) []byte {
	n := 1 + r.IntN(60)
	kind := r.IntN(4)
	var b strings.Builder
	b.WriteString("month,units\n")
	level := 0.0
	for i := range n {
		var v float64
		switch kind {
		case 0:
			v = 7
		case 1:
			v = 100 + float64(i) + 20*math.Sin(float64(i)*math.Pi/6) + r.NormFloat64()
		case 2:
			level += r.NormFloat64() * 1e6
			v = level
		default:
			v = float64(r.IntN(3) - 1)
		}
		fmt.Fprintf(&b, "%d-%02d,%g\n", 2020+i/12, i%12+1, v)
	}
	return []byte(b.String())
}

// FuzzRun runs random steps on random series: nothing may fault, and no
// rendered number may be NaN or infinite.
func FuzzRun(f *testing.F) {
	f.Add(uint64(1), uint64(2), uint8(8))
	f.Add(uint64(7), uint64(7), uint8(12))
	f.Add(uint64(42), uint64(0), uint8(3))
	f.Add(uint64(3), uint64(99), uint8(15))
	f.Fuzz(func(t *testing.T, s1, s2 uint64, count uint8) {
		r := rand.New(rand.NewPCG(s1, s2))
		lines := []string{"load data.csv"}
		for range int(count%14) + 1 {
			lines = append(lines, stepPool[r.IntN(len(stepPool))])
		}
		data := Data{Files: map[string][]byte{"data.csv": fuzzSeries(r), "other.csv": fuzzSeries(r)}}
		res := run(strings.Join(lines, "\n"), data)
		for _, o := range res.Outputs {
			if o.Error != nil && strings.Contains(o.Error.Msg, "internal fault") {
				t.Fatalf("step %q faulted: %v\nsteps:\n%s", o.Text, o.Error, strings.Join(lines, "\n"))
			}
			for _, b := range o.Blocks {
				if bad := nonFinite(b); bad != "" {
					t.Fatalf("step %q shows %q\nsteps:\n%s", o.Text, bad, strings.Join(lines, "\n"))
				}
			}
		}
		if err := res.Memo("fuzz").Check(); err != nil {
			t.Fatal(err)
		}
	})
}

// nonFinite returns the text of a block that shows NaN or an infinity.
func nonFinite(b Block) string {
	texts := []string{b.Text, b.Title}
	if b.Table != nil {
		for _, r := range b.Table.Rows {
			texts = append(texts, r...)
		}
	}
	if b.SVG != "" {
		texts = append(texts, b.SVG)
	}
	for _, s := range texts {
		for _, bad := range []string{"NaN", "Inf", "∞"} {
			if strings.Contains(s, bad) {
				return s
			}
		}
	}
	return ""
}
