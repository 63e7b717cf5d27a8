package mixtures

import (
	"context"
	"errors"
	"math"

	"zmix/model"
)

// SweepVar is the variable a sweep moves. It is the one representation
// of that choice in the engine, the commands and the workbench; its text
// form is the key "T" or "P".
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

// Key is the variable's short name, "T" or "P", as settings and
// messages write it.
func (v SweepVar) Key() string {
	if v == SweepPressure {
		return "P"
	}
	return "T"
}

// Unit is the SI unit of the variable's values: "K" or "Pa".
func (v SweepVar) Unit() string {
	if v == SweepPressure {
		return "Pa"
	}
	return "K"
}

// Other is the variable the sweep holds fixed.
func (v SweepVar) Other() SweepVar { return 1 - v }

// MarshalText writes the key, so that saved settings read "T" or "P".
func (v SweepVar) MarshalText() ([]byte, error) { return []byte(v.Key()), nil }

// UnmarshalText reads "T" or "P" (or the long names, any case).
func (v *SweepVar) UnmarshalText(b []byte) error {
	got, err := ParseSweepVar(string(b))
	if err != nil {
		return err
	}
	*v = got
	return nil
}

// ParseSweepVar reads a sweep variable: "T" or "temperature", "P" or
// "pressure", in any case.
func ParseSweepVar(s string) (SweepVar, error) {
	switch s {
	case "T", "t", "temperature", "Temperature", "TEMPERATURE":
		return SweepTemperature, nil
	case "P", "p", "pressure", "Pressure", "PRESSURE":
		return SweepPressure, nil
	}
	return 0, model.KindErrorf("mixtures", ErrSweep, "sweep variable %s; want T (temperature) or P (pressure)", model.Quote(s))
}

// Sweep describes a grid over T or P. Steps is the number of points, end
// points included. Pressure sweeps always use a log grid.
type Sweep struct {
	Var      SweepVar
	From, To float64 // K or Pa
	Steps    int
	Log      bool
}

// MaxSweepSteps bounds a sweep so that a typing slip cannot run for
// minutes. Streaming keeps no point, and a SweepTable keeps only the
// columns asked for, so memory is not what sets it.
const MaxSweepSteps = 200_000

// ErrSweep is the kind of every sweep error.
var ErrSweep = errors.New("bad sweep")

// Check validates the sweep on its own: the number of points and the end
// points. Mixture.CheckSweep also checks every point against the mixture.
func (sw Sweep) Check() error {
	if sw.Steps < 2 || sw.Steps > MaxSweepSteps {
		return model.KindErrorf("mixtures", ErrSweep, "%d steps; want a whole number of points from 2 to %d", sw.Steps, MaxSweepSteps)
	}
	for _, v := range []float64{sw.From, sw.To} {
		if !(v > 0) || math.IsInf(v, 0) {
			return model.KindErrorf("mixtures", ErrSweep, "end point %g %s; want %s above zero", v, sw.Var.Unit(), sw.Var)
		}
	}
	if sw.From == sw.To {
		return model.KindErrorf("mixtures", ErrSweep, "the range starts and ends at %g %s; want two different end points", sw.From, sw.Var.Unit())
	}
	if sw.Var == SweepTemperature {
		// The model's own bounds, known before any blend: the workbench
		// shows them at the range as it is typed, not as a failed run.
		for _, v := range []float64{sw.From, sw.To} {
			if err := model.CheckConditions(v, model.StdPressureBarPa); err != nil {
				return err // the model's own kind, ErrTemperature
			}
		}
	}
	return nil
}

// IsLog reports whether the grid is spaced evenly in the logarithm:
// always for pressure, on request for temperature.
func (sw Sweep) IsLog() bool { return sw.Log || sw.Var == SweepPressure }

// Point returns grid point i (0 ≤ i < Steps) of a checked sweep. The end
// points are exactly From and To, which the user typed and would not want
// to see as 299.99999999999994, and every point lies between them, even
// where the rounding of exp(ln x) would step past an end that is close to
// the largest float.
func (sw Sweep) Point(i int) float64 { return sw.grid().point(i) }

// gridPoints computes the points of a sweep with its logarithms taken
// once, for loops over the whole grid.
type gridPoints struct {
	from, to, lo, hi float64
	n                int
	log              bool
}

func (sw Sweep) grid() gridPoints {
	g := gridPoints{from: sw.From, to: sw.To, lo: sw.From, hi: sw.To, n: sw.Steps, log: sw.IsLog()}
	if g.log {
		g.lo, g.hi = math.Log(sw.From), math.Log(sw.To)
	}
	return g
}

func (g gridPoints) point(i int) float64 {
	switch i {
	case 0:
		return g.from
	case g.n - 1:
		return g.to
	}
	f := float64(i) / float64(g.n-1)
	x := g.lo + (g.hi-g.lo)*f
	if g.log {
		x = math.Exp(x)
	}
	return min(max(x, min(g.from, g.to)), max(g.from, g.to))
}

// Grid returns every point of a checked sweep.
func (sw Sweep) Grid() []float64 {
	xs := make([]float64, sw.Steps)
	g := sw.grid()
	for i := range xs {
		xs[i] = g.point(i)
	}
	return xs
}

// Conditions returns the (T, P) of grid value x, with the variable not
// swept held at fixedTempK or fixedPresPa.
func (sw Sweep) Conditions(x, fixedTempK, fixedPresPa float64) (tempK, presPa float64) {
	if sw.Var == SweepPressure {
		return fixedTempK, x
	}
	return x, fixedPresPa
}

// CheckSweep reports whether the mixture can be computed at every point
// of the sweep, holding the other variable at fixedTempK or fixedPresPa.
// It walks the whole grid: a check of the two ends would miss a point
// that rounds out of range, and its cost is small beside a sweep's.
func (m *Mixture) CheckSweep(sw Sweep, fixedTempK, fixedPresPa float64) error {
	if err := sw.Check(); err != nil {
		return err
	}
	g := sw.grid()
	for i := range sw.Steps {
		x := g.point(i)
		t, p := sw.Conditions(x, fixedTempK, fixedPresPa)
		if err := m.CheckConditions(t, p); err != nil {
			if i == 0 || i == sw.Steps-1 {
				return err
			}
			return model.Errorf("mixtures", "at point %d of %d (%g %s): %w", i+1, sw.Steps, x, sw.Var.Unit(), err)
		}
	}
	return nil
}

// PointFunc receives point i of a sweep, its grid value x and the state
// there. The state is reused for the next point: keep its figures, not
// the pointer. A non-nil error stops the sweep and is returned as is.
type PointFunc func(i int, x float64, s *State) error

// progressEvery is how many points pass between checks of the context.
const progressEvery = 4096

// Stream computes the mixture at every point of the sweep, in order,
// into one reused State, and hands each to fn; nothing grows with the
// number of points. The variable not swept is held at fixedTempK or
// fixedPresPa. The whole grid is checked before the first point, so a
// sweep either fails at once or runs to the end (unless fn or ctx stops
// it).
func (m *Mixture) Stream(ctx context.Context, sw Sweep, fixedTempK, fixedPresPa float64, opts Options, fn PointFunc) error {
	if err := m.CheckSweep(sw, fixedTempK, fixedPresPa); err != nil {
		return err
	}
	return m.StreamSpan(ctx, sw, 0, sw.Steps, fixedTempK, fixedPresPa, opts, nil, fn)
}

// StreamSpan is Stream over the points [from, to) of a sweep that
// CheckSweep has passed, so that a caller can compute a long sweep in
// chunks (the workbench does, to show progress between them). s, when
// not nil, is the State to reuse.
func (m *Mixture) StreamSpan(ctx context.Context, sw Sweep, from, to int, fixedTempK, fixedPresPa float64, opts Options, s *State, fn PointFunc) error {
	if s == nil {
		s = new(State)
	}
	g := sw.grid()
	for i := from; i < to; i++ {
		if (i-from)%progressEvery == 0 && i > from {
			if err := ctx.Err(); err != nil {
				return err
			}
		}
		x := g.point(i)
		t, p := sw.Conditions(x, fixedTempK, fixedPresPa)
		m.Fill(s, t, p, opts)
		s.RealGasResult() // each point is the whole state, as State gives it
		if err := fn(i, x, s); err != nil {
			return err
		}
	}
	return ctx.Err()
}
