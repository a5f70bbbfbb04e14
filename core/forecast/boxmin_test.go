package forecast

import (
	"math"
	"testing"
)

// TestBoxMin checks the bounded minimiser on small problems with optima
// known by hand.
func TestBoxMin(t *testing.T) {
	tests := []struct {
		name   string
		fg     func(x, g []float64) float64
		lo, hi []float64
		x0     []float64
		want   []float64
	}{
		{
			// (x-0.3)^2 + 10(y-0.7)^2: interior optimum (0.3, 0.7).
			"interior", func(x, g []float64) float64 {
				g[0], g[1] = 2*(x[0]-0.3), 20*(x[1]-0.7)
				return (x[0]-0.3)*(x[0]-0.3) + 10*(x[1]-0.7)*(x[1]-0.7)
			}, []float64{0, 0}, []float64{1, 1}, []float64{0.9, 0.1}, []float64{0.3, 0.7},
		},
		{
			// (x-2)^2 + 5(y-x/2)^2 on [0,1]^2: x held at its upper bound 1
			// (df/dx = -2 there), then y = 1/2 (hand calculation).
			"coupled bound", func(x, g []float64) float64 {
				r := x[1] - x[0]/2
				g[0], g[1] = 2*(x[0]-2)-5*r, 10*r
				return (x[0]-2)*(x[0]-2) + 5*r*r
			}, []float64{0, 0}, []float64{1, 1}, []float64{0.1, 0.9}, []float64{1, 0.5},
		},
		{
			// Rosenbrock on [-2, 0.5]^2: the optimum on x = 0.5 is y = 0.25.
			"rosenbrock", func(x, g []float64) float64 {
				a, b := 1-x[0], x[1]-x[0]*x[0]
				g[0], g[1] = -2*a-400*x[0]*b, 200*b
				return a*a + 100*b*b
			}, []float64{-2, -2}, []float64{0.5, 0.5}, []float64{-1.2, 1}, []float64{0.5, 0.25},
		},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			res := boxMin{lo: tt.lo, hi: tt.hi, tol: 1e-9, maxEvals: 500}.run(tt.fg, tt.x0)
			if !res.converged {
				t.Errorf("not converged after %d evaluations", res.evals)
			}
			for i := range tt.want {
				if math.Abs(res.x[i]-tt.want[i]) > 1e-6 {
					t.Errorf("x = %v, want %v", res.x, tt.want)
					break
				}
			}
		})
	}
}
