package process

import (
	"math"

	"zmix/model"
)

// Path is a process path sampled for a plot: X increasing, and one or
// more curves over it, each in display units.
type Path struct {
	XLabel, YLabel string // "P in bar", "T in K"
	XLog           bool   // X is best read on a log axis
	X              []float64
	Curves         []Curve
}

// Curve is one named curve of a path.
type Curve struct {
	Name string
	Y    []float64
}

// Plotter is a result whose path can be plotted.
type Plotter interface {
	Path(points int) (Path, error)
}

// MaxPathPoints bounds a path's samples.
const MaxPathPoints = 2000

func pathPoints(n int) int { return max(2, min(n, MaxPathPoints)) }

// Path samples the compression in T against P: each stage's isentrope
// from its inlet, S(T, P) = S(T_in, P_in), and the polytropic path of the
// actual stage, T = T_in (P/P_in)^((n−1)/n), with n the exponent found;
// intercooling shows as the drop between stages.
func (r *CompressionResult) Path(points int) (Path, error) {
	points = pathPoints(points)
	p1, p2 := r.Stages[0].InletPresPa, r.Stages[len(r.Stages)-1].OutletPresPa
	lo, hi := min(p1, p2), max(p1, p2)
	path := Path{XLabel: "P in bar", YLabel: "T in K", XLog: hi/lo > 5, X: make([]float64, points)}
	isen := Curve{Name: "isentropic", Y: make([]float64, points)}
	poly := Curve{Name: "actual (polytropic)", Y: make([]float64, points)}
	var w stateWork
	for i := range points {
		f := float64(i) / float64(points-1)
		p := lo * math.Pow(hi/lo, f)
		if i == points-1 {
			p = hi
		}
		path.X[i] = p / 1e5
		st := r.stageAt(p)
		if err := w.eval(r.gas, st.InletTempK, st.InletPresPa); err != nil {
			return Path{}, err
		}
		s1, cp1 := w.sLast, w.cpLast
		t, err := solveT(func(tempK float64) (float64, float64, error) {
			if err := w.eval(r.gas, tempK, p); err != nil {
				return 0, 0, err
			}
			return w.sLast - s1, w.cpLast / tempK, nil
		}, st.InletTempK*math.Pow(p/st.InletPresPa, model.GasConstant/cp1))
		if err != nil {
			return Path{}, err
		}
		isen.Y[i] = t
		poly.Y[i] = st.InletTempK * math.Pow(p/st.InletPresPa, 1-1/st.PolytropicN)
	}
	path.Curves = []Curve{poly, isen}
	if r.Efficiency == 1 {
		path.Curves = []Curve{isen}
	}
	return path, nil
}

// stageAt is the stage whose pressure range holds p.
func (r *CompressionResult) stageAt(presPa float64) Stage {
	for _, s := range r.Stages {
		if presPa <= max(s.InletPresPa, s.OutletPresPa)*(1+1e-12) {
			return s
		}
	}
	return r.Stages[len(r.Stages)-1]
}

// Path samples H against T from the inlet to the outlet temperature at
// the heating's pressure.
func (r *HeatingResult) Path(points int) (Path, error) {
	points = pathPoints(points)
	lo, hi := min(r.t1, r.t2), max(r.t1, r.t2)
	if lo == hi {
		return Path{}, model.Errorf("process", "the inlet and outlet temperatures are the same: no path to plot")
	}
	path := Path{XLabel: "T in K", YLabel: "H in kJ/mol", X: make([]float64, points)}
	h := Curve{Name: "H at " + trimFloat(r.presPa/1e5) + " bar", Y: make([]float64, points)}
	var w stateWork
	for i := range points {
		t := lo + (hi-lo)*float64(i)/float64(points-1)
		if err := w.eval(r.gas, t, r.presPa); err != nil {
			return Path{}, err
		}
		path.X[i], h.Y[i] = t, w.hLast/1e3
	}
	path.Curves = []Curve{h}
	return path, nil
}
