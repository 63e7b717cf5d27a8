package mixtures

import (
	"context"
	"errors"
	"fmt"
	"math"
	"reflect"
	"testing"

	"zmix/model"
)

// nopPoint is a point function that keeps nothing.
func nopPoint(int, float64, *State) error { return nil }

func TestSweepGrid(t *testing.T) {
	cases := []struct {
		name string
		sw   Sweep
		want []float64
	}{
		{"linear T", Sweep{Var: SweepTemperature, From: 300, To: 1500, Steps: 5}, []float64{300, 600, 900, 1200, 1500}},
		{"linear T, falling", Sweep{Var: SweepTemperature, From: 1500, To: 300, Steps: 3}, []float64{1500, 900, 300}},
		{"linear T, two points", Sweep{Var: SweepTemperature, From: 20, To: 3000, Steps: 2}, []float64{20, 3000}},
		{"linear T, uneven step", Sweep{Var: SweepTemperature, From: 0.1, To: 0.7, Steps: 4}, []float64{0.1, 0.3, 0.5, 0.7}},
		{"log T", Sweep{Var: SweepTemperature, From: 100, To: 10000, Steps: 3, Log: true}, []float64{100, 1000, 10000}},
		{"log T, decades", Sweep{Var: SweepTemperature, From: 300, To: 3e5, Steps: 4, Log: true}, []float64{300, 3000, 3e4, 3e5}},
		// Pressure sweeps are always logarithmic, even without Log.
		{"P", Sweep{Var: SweepPressure, From: 1e5, To: 1e7, Steps: 3}, []float64{1e5, 1e6, 1e7}},
		{"P, falling", Sweep{Var: SweepPressure, From: 50e5, To: 0.5e5, Steps: 3, Log: true}, []float64{50e5, 5e5, 0.5e5}},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			if err := c.sw.Check(); err != nil {
				t.Fatal(err)
			}
			got := c.sw.Grid()
			if len(got) != c.sw.Steps {
				t.Fatalf("%d points, want %d", len(got), c.sw.Steps)
			}
			// End points exactly as given: they are what the user typed.
			if got[0] != c.sw.From || got[len(got)-1] != c.sw.To {
				t.Errorf("ends %.17g, %.17g; want exactly %g, %g", got[0], got[len(got)-1], c.sw.From, c.sw.To)
			}
			for i := range got {
				if !relClose(got[i], c.want[i], 1e-14, 0) {
					t.Errorf("point %d = %.17g, want %g", i, got[i], c.want[i])
				}
			}
		})
	}
}

func TestSweepCheck(t *testing.T) {
	cases := []struct {
		name string
		sw   Sweep
	}{
		{"one step", Sweep{From: 300, To: 400, Steps: 1}},
		{"no steps", Sweep{From: 300, To: 400, Steps: 0}},
		{"negative steps", Sweep{From: 300, To: 400, Steps: -5}},
		{"too many steps", Sweep{From: 300, To: 400, Steps: MaxSweepSteps + 1}},
		{"zero start", Sweep{From: 0, To: 400, Steps: 10}},
		{"negative end", Sweep{From: 300, To: -1, Steps: 10}},
		{"NaN end", Sweep{From: 300, To: math.NaN(), Steps: 10}},
		{"infinite end", Sweep{From: 300, To: math.Inf(1), Steps: 10}},
		{"zero pressure", Sweep{Var: SweepPressure, From: 0, To: 1e5, Steps: 10}},
		{"equal ends", Sweep{From: 300, To: 300, Steps: 10}},
		{"equal pressures", Sweep{Var: SweepPressure, From: 1e5, To: 1e5, Steps: 10}},
	}
	// The model's temperature bounds are checked with the range, before
	// any blend, with the model's own error (the workbench shows it at
	// the range as typed).
	for _, sw := range []Sweep{{From: 1e-300, To: 400, Steps: 10}, {From: 300, To: 2e6, Steps: 10}} {
		if err := sw.Check(); !errors.Is(err, model.ErrTemperature) {
			t.Errorf("%g..%g K: Check() = %v, want the model's ErrTemperature", sw.From, sw.To, err)
		}
	}
	m := mustMixture(t, dryAir, 1e5)
	for _, c := range cases {
		if err := c.sw.Check(); !errors.Is(err, ErrSweep) {
			t.Errorf("%s: Check() = %v, want ErrSweep", c.name, err)
		}
		if err := m.Stream(context.Background(), c.sw, 300, 1e5, Options{}, nopPoint); !errors.Is(err, ErrSweep) {
			t.Errorf("%s: Stream error %v, want ErrSweep", c.name, err)
		}
	}
}

// Every point of a sweep is the state a direct State call gives.
func TestSweepPointsEqualState(t *testing.T) {
	m := mustMixture(t, "SiH4 2%, H2 500ppm, N2 bal", 1e5)
	cases := []struct {
		name  string
		sw    Sweep
		fixed float64
	}{
		{"T linear", Sweep{Var: SweepTemperature, From: 20, To: 3000, Steps: 37}, 2e5},
		{"T log", Sweep{Var: SweepTemperature, From: 20, To: 3000, Steps: 25, Log: true}, 1},
		{"P", Sweep{Var: SweepPressure, From: 1, To: 1e7, Steps: 29}, 450},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			tFixed, pFixed := c.fixed, c.fixed
			grid := c.sw.Grid()
			n := 0
			err := m.Stream(context.Background(), c.sw, tFixed, pFixed, Options{}, func(i int, x float64, s *State) error {
				if i != n || x != grid[i] {
					t.Fatalf("point %d at %g, want point %d at %g", i, x, n, grid[n])
				}
				n++
				tempK, presPa := x, pFixed
				if c.sw.Var == SweepPressure {
					tempK, presPa = tFixed, x
				}
				want := mustState(t, m, tempK, presPa)
				if !reflect.DeepEqual(*s, want) {
					t.Fatalf("point %d (%g) differs from State(%g K, %g Pa)", i, x, tempK, presPa)
				}
				return nil
			})
			if err != nil {
				t.Fatal(err)
			}
			if n != c.sw.Steps || len(grid) != c.sw.Steps {
				t.Fatalf("%d points, %d grid values; want %d", n, len(grid), c.sw.Steps)
			}
		})
	}
}

// The variable the sweep moves needs no fixed value, and the one it holds
// must be valid; both ends of the swept one must be states the mixture
// can take.
func TestSweepConditions(t *testing.T) {
	m := mustMixture(t, dryAir, 1e5)
	tSweep := Sweep{Var: SweepTemperature, From: 300, To: 1500, Steps: 4}
	pSweep := Sweep{Var: SweepPressure, From: 1e5, To: 1e7, Steps: 4}
	if err := m.Stream(context.Background(), tSweep, 0, 1e5, Options{}, nopPoint); err != nil {
		t.Errorf("T sweep with no fixed T: %v", err)
	}
	if err := m.Stream(context.Background(), pSweep, 300, 0, Options{}, nopPoint); err != nil {
		t.Errorf("P sweep with no fixed P: %v", err)
	}
	bad := []struct {
		name       string
		sw         Sweep
		fixT, fixP float64
		want       error
	}{
		{"T sweep at 0 Pa", tSweep, 0, 0, model.ErrPressure},
		{"P sweep at 0 K", pSweep, 0, 1e5, model.ErrTemperature},
		{"T sweep below the model's range", Sweep{Var: SweepTemperature, From: model.MinTempK / 10, To: 300, Steps: 4}, 0, 1e5, model.ErrTemperature},
		{"T sweep above the model's range", Sweep{Var: SweepTemperature, From: 300, To: model.MaxTempK * 10, Steps: 4}, 0, 1e5, model.ErrTemperature},
		{"P sweep into underflow", Sweep{Var: SweepPressure, From: 1e-320, To: 1e5, Steps: 4}, 300, 0, model.ErrPressure},
	}
	for _, c := range bad {
		if err := m.Stream(context.Background(), c.sw, c.fixT, c.fixP, Options{}, nopPoint); !errors.Is(err, c.want) {
			t.Errorf("%s: error %v, want %v", c.name, err, c.want)
		}
	}
}

// A sweep allocates its one reused State and nothing per point: the count
// of allocations is the same for 10 points and for 1000.
func TestSweepAllocations(t *testing.T) {
	m := mustMixture(t, dryAir, 1e5)
	count := func(steps int, v SweepVar) float64 {
		sw := Sweep{Var: v, From: 300, To: 1500, Steps: steps}
		if v == SweepPressure {
			sw.From, sw.To = 1e3, 1e7
		}
		return testing.AllocsPerRun(20, func() {
			if err := m.Stream(context.Background(), sw, 300, 1e5, Options{}, nopPoint); err != nil {
				t.Fatal(err)
			}
		})
	}
	for _, v := range []SweepVar{SweepTemperature, SweepPressure} {
		small, large := count(10, v), count(1000, v)
		if small != large {
			t.Errorf("%v sweep: %g allocations for 10 points, %g for 1000; want the same", v, small, large)
		}
		if small > 6 {
			t.Errorf("%v sweep: %g allocations, want the State's few slices only", v, small)
		}
		t.Logf("%v sweep: %g allocations for 10 and for 1000 points", v, small)
	}
}

// A cancelled context stops a sweep between chunks of points.
func TestStreamCancel(t *testing.T) {
	m := mustMixture(t, "N2 0.79, O2 0.21", 1e5)
	sw := Sweep{Var: SweepTemperature, From: 300, To: 1500, Steps: 3 * progressEvery}
	n := 0
	if err := m.Stream(context.Background(), sw, 0, 1e5, Options{}, func(int, float64, *State) error { n++; return nil }); err != nil || n != sw.Steps {
		t.Fatalf("Stream: %v after %d of %d points", err, n, sw.Steps)
	}
	ctx, cancel := context.WithCancel(context.Background())
	cancel()
	if err := m.Stream(ctx, sw, 0, 1e5, Options{}, func(int, float64, *State) error { return nil }); !errors.Is(err, context.Canceled) {
		t.Errorf("cancelled sweep: error %v, want context.Canceled", err)
	}
}

func TestSweepVarString(t *testing.T) {
	if SweepTemperature.String() != "temperature" || SweepPressure.String() != "pressure" {
		t.Errorf("names %q, %q", SweepTemperature, SweepPressure)
	}
}

// Stream hands out, point by point, exactly the state a direct State call
// gives, in grid order, reusing one State.
func TestStreamEqualsState(t *testing.T) {
	m := mustMixture(t, "SiH4 2%, H2 500ppm, N2 bal", 1e5)
	for _, sw := range []Sweep{
		{Var: SweepTemperature, From: 20, To: 3000, Steps: 37},
		{Var: SweepTemperature, From: 3000, To: 20, Steps: 25, Log: true},
		{Var: SweepPressure, From: 1, To: 1e7, Steps: 29},
	} {
		var first *State
		next := 0
		err := m.Stream(context.Background(), sw, 450, 2e5, Options{}, func(i int, x float64, s *State) error {
			if i != next {
				t.Fatalf("point %d after %d", i, next-1)
			}
			next++
			if first == nil {
				first = s
			} else if s != first {
				t.Fatalf("%v sweep: point %d in a new State; want the one State reused", sw.Var, i)
			}
			if x != sw.Point(i) {
				t.Fatalf("point %d: x = %g, want %g", i, x, sw.Point(i))
			}
			tempK, presPa := sw.Conditions(x, 450, 2e5)
			if want := mustState(t, m, tempK, presPa); !reflect.DeepEqual(*s, want) {
				t.Fatalf("%v sweep: point %d (%g) differs from State(%g K, %g Pa)", sw.Var, i, x, tempK, presPa)
			}
			return nil
		})
		if err != nil || next != sw.Steps {
			t.Fatalf("%v sweep: %d points, error %v", sw.Var, next, err)
		}
	}
}

// A point function's error stops the sweep at once and comes back as is;
// a cancelled context stops it too.
func TestStreamStops(t *testing.T) {
	m := mustMixture(t, dryAir, 1e5)
	sw := Sweep{Var: SweepTemperature, From: 300, To: 1500, Steps: 3 * progressEvery}
	stop := errors.New("enough")
	n := 0
	err := m.Stream(context.Background(), sw, 0, 1e5, Options{}, func(i int, x float64, s *State) error {
		n++
		if i == 9 {
			return stop
		}
		return nil
	})
	if err != stop || n != 10 {
		t.Errorf("Stream stopped after %d points with %v; want 10 and the point function's error", n, err)
	}
	ctx, cancel := context.WithCancel(context.Background())
	n = 0
	err = m.Stream(ctx, sw, 0, 1e5, Options{}, func(i int, x float64, s *State) error {
		n++
		if i == 0 {
			cancel()
		}
		return nil
	})
	if !errors.Is(err, context.Canceled) || n > progressEvery {
		t.Errorf("cancelled Stream: %d points, error %v; want context.Canceled within %d points", n, err, progressEvery)
	}
}

// A log grid between two finite ends stays finite and between them, even
// where exp(ln x) rounds past an end near the largest float (issue 7,
// item 16: 1e-300..1.7e308 Pa once gave +Inf at point 199 959).
func TestSweepGridStaysBetweenEnds(t *testing.T) {
	cases := []Sweep{
		{Var: SweepPressure, From: 1e-300, To: 1.7e308, Steps: MaxSweepSteps},
		{Var: SweepPressure, From: 1.7e308, To: 1e-300, Steps: 1001},
		{Var: SweepPressure, From: math.SmallestNonzeroFloat64, To: math.MaxFloat64, Steps: 999},
		{Var: SweepTemperature, From: 1e-3, To: 1e6, Steps: 777, Log: true},
	}
	for _, sw := range cases {
		lo, hi := math.Min(sw.From, sw.To), math.Max(sw.From, sw.To)
		prev := sw.Point(0)
		for i := range sw.Steps {
			x := sw.Point(i)
			if !(x >= lo && x <= hi) {
				t.Fatalf("%g..%g: point %d = %g, outside the ends", sw.From, sw.To, i, x)
			}
			if (sw.To > sw.From && x < prev) || (sw.To < sw.From && x > prev) {
				t.Fatalf("%g..%g: point %d = %g steps back from %g", sw.From, sw.To, i, x, prev)
			}
			prev = x
		}
	}
}

// The whole grid is checked before the first point is computed: a sweep
// that cannot be computed calls the point function never.
func TestStreamChecksFirst(t *testing.T) {
	m := mustMixture(t, dryAir, 1e5)
	called := false
	fn := func(int, float64, *State) error { called = true; return nil }
	for _, c := range []struct {
		sw   Sweep
		want error
	}{
		{Sweep{Var: SweepPressure, From: 1e-320, To: 1e5, Steps: 4}, model.ErrPressure},
		{Sweep{Var: SweepPressure, From: 1e5, To: 1e-320, Steps: 4}, model.ErrPressure},
		{Sweep{Var: SweepTemperature, From: 300, To: 2 * model.MaxTempK, Steps: 4}, model.ErrTemperature},
		{Sweep{Var: SweepTemperature, From: 300, To: 300, Steps: 4}, ErrSweep},
	} {
		if err := m.Stream(context.Background(), c.sw, 300, 1e5, Options{}, fn); !errors.Is(err, c.want) || called {
			t.Errorf("%v %g..%g: error %v (point function called: %v); want %v before any point", c.sw.Var, c.sw.From, c.sw.To, err, called, c.want)
		}
	}
	// 1e-300..1.7e308 Pa of dry air: every partial pressure is a normal
	// float at every point, so the sweep runs to the end.
	sw := Sweep{Var: SweepPressure, From: 1e-300, To: 1.7e308, Steps: 20_000}
	n := 0
	err := m.Stream(context.Background(), sw, 300, 0, Options{}, func(i int, x float64, s *State) error {
		if name := FirstNonFinite(s); name != "" {
			return fmt.Errorf("point %d (%g Pa): %s not finite", i, x, name)
		}
		n++
		return nil
	})
	if err != nil || n != sw.Steps {
		t.Errorf("1e-300..1.7e308 Pa: %d points, error %v; want all %d", n, err, sw.Steps)
	}
}

func TestSweepVarText(t *testing.T) {
	for _, v := range []SweepVar{SweepTemperature, SweepPressure} {
		b, _ := v.MarshalText()
		var got SweepVar
		if err := got.UnmarshalText(b); err != nil || got != v {
			t.Errorf("%v: text %q reads back as %v, %v", v, b, got, err)
		}
	}
	if _, err := ParseSweepVar("X"); !errors.Is(err, ErrSweep) {
		t.Errorf("ParseSweepVar(X) = %v, want ErrSweep", err)
	}
}
