package mixtures

import (
	"context"
	"errors"
	"fmt"
	"math"

	"gonum.org/v1/gonum/floats"
)

// SweepVar is the variable a sweep moves.
type SweepVar int

const (
	SweepTemperature SweepVar = iota
	SweepPressure
)

func (v SweepVar) String() string {
	if v == SweepPressure {
		return "pressure"
	}
	return "temperature"
}

// Sweep describes a grid over T or P. Steps is the number of points, end
// points included. Pressure sweeps always use a log grid.
type Sweep struct {
	Var      SweepVar
	From, To float64 // K or Pa
	Steps    int
	Log      bool
}

// MaxSweepSteps bounds a sweep so that a typing slip cannot exhaust memory:
// every point holds each species' full state (about 260 B per species),
// so 200 000 points of a ten-species blend take about half a gigabyte.
const MaxSweepSteps = 200_000

// ErrSweep is wrapped by every sweep error.
var ErrSweep = errors.New("mixtures: bad sweep")

// Check validates the sweep.
func (sw Sweep) Check() error {
	if sw.Steps < 2 || sw.Steps > MaxSweepSteps {
		return fmt.Errorf("%w: %d steps; want a whole number of points from 2 to %d", ErrSweep, sw.Steps, MaxSweepSteps)
	}
	for _, v := range []float64{sw.From, sw.To} {
		if !(v > 0) || math.IsInf(v, 0) {
			unit := "K"
			if sw.Var == SweepPressure {
				unit = "Pa"
			}
			return fmt.Errorf("%w: end point %g %s; want %s above zero", ErrSweep, v, unit, sw.Var)
		}
	}
	if sw.From == sw.To {
		unit := "K"
		if sw.Var == SweepPressure {
			unit = "Pa"
		}
		return fmt.Errorf("%w: the range starts and ends at %g %s; want two different end points", ErrSweep, sw.From, unit)
	}
	return nil
}

// Grid returns the sweep's points, the end points exactly as given.
func (sw Sweep) Grid() []float64 {
	xs := make([]float64, sw.Steps)
	if sw.Log || sw.Var == SweepPressure {
		floats.LogSpan(xs, sw.From, sw.To)
	} else {
		floats.Span(xs, sw.From, sw.To)
	}
	// exp(ln x) and From + (n−1)·step round off; the ends are what the
	// user typed and would print as 299.99999999999994.
	xs[0], xs[len(xs)-1] = sw.From, sw.To
	return xs
}

// SweepResult holds one mixture state per grid point.
type SweepResult struct {
	Sweep  Sweep
	Grid   []float64
	Points []State
}

// Run computes the mixture at every point of the sweep, holding the other
// variable at fixedTempK or fixedPresPa; the fixed value of the variable
// being swept is not used.
func (m *Mixture) Run(sw Sweep, fixedTempK, fixedPresPa float64, opts Options) (*SweepResult, error) {
	return m.RunContext(context.Background(), sw, fixedTempK, fixedPresPa, opts, nil)
}

// progressEvery is how many points pass between progress reports.
const progressEvery = 4096

// RunContext is Run with cancellation and a progress callback, called
// with the number of points done every few thousand points.
func (m *Mixture) RunContext(ctx context.Context, sw Sweep, fixedTempK, fixedPresPa float64, opts Options, progress func(done, total int)) (*SweepResult, error) {
	if err := sw.Check(); err != nil {
		return nil, err
	}
	// The grid runs monotonically between its ends, so checking both ends
	// checks every point.
	for _, x := range []float64{sw.From, sw.To} {
		t, p := x, fixedPresPa
		if sw.Var == SweepPressure {
			t, p = fixedTempK, x
		}
		if err := m.CheckConditions(t, p); err != nil {
			return nil, err
		}
	}
	res := &SweepResult{Sweep: sw, Grid: sw.Grid(), Points: make([]State, sw.Steps)}
	// One backing array for every point's species terms: the result is
	// the only allocation that grows with the number of points.
	k := len(m.Components)
	terms := make([]SpeciesTerm, sw.Steps*k)
	for i, x := range res.Grid {
		if i%progressEvery == 0 && i > 0 {
			if err := ctx.Err(); err != nil {
				return nil, err
			}
			if progress != nil {
				progress(i, sw.Steps)
			}
		}
		t, p := x, fixedPresPa
		if sw.Var == SweepPressure {
			t, p = fixedTempK, x
		}
		pt := &res.Points[i]
		pt.Species = terms[i*k : (i+1)*k : (i+1)*k]
		m.Fill(pt, t, p, opts)
	}
	if progress != nil {
		progress(sw.Steps, sw.Steps)
	}
	return res, nil
}
