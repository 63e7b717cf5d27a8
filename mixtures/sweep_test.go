package mixtures

import (
	"context"
	"errors"
	"math"
	"reflect"
	"testing"

	"zmix/model"
)

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
	m := mustMixture(t, dryAir, 1e5)
	for _, c := range cases {
		if err := c.sw.Check(); !errors.Is(err, ErrSweep) {
			t.Errorf("%s: Check() = %v, want ErrSweep", c.name, err)
		}
		if _, err := m.Run(c.sw, 300, 1e5, Options{}); !errors.Is(err, ErrSweep) {
			t.Errorf("%s: Run error %v, want ErrSweep", c.name, err)
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
			res, err := m.Run(c.sw, tFixed, pFixed, Options{})
			if err != nil {
				t.Fatal(err)
			}
			if len(res.Points) != c.sw.Steps || len(res.Grid) != c.sw.Steps || res.Sweep != c.sw {
				t.Fatalf("%d points, %d grid values; want %d", len(res.Points), len(res.Grid), c.sw.Steps)
			}
			for i, x := range res.Grid {
				tempK, presPa := x, pFixed
				if c.sw.Var == SweepPressure {
					tempK, presPa = tFixed, x
				}
				want := mustState(t, m, tempK, presPa)
				if !reflect.DeepEqual(res.Points[i], want) {
					t.Fatalf("point %d (%g) differs from State(%g K, %g Pa)", i, x, tempK, presPa)
				}
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
	if _, err := m.Run(tSweep, 0, 1e5, Options{}); err != nil {
		t.Errorf("T sweep with no fixed T: %v", err)
	}
	if _, err := m.Run(pSweep, 300, 0, Options{}); err != nil {
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
		if _, err := m.Run(c.sw, c.fixT, c.fixP, Options{}); !errors.Is(err, c.want) {
			t.Errorf("%s: error %v, want %v", c.name, err, c.want)
		}
	}
}

// A sweep allocates its result and nothing per point beyond it: the count
// of allocations is the same for 10 points and for 1000.
func TestSweepAllocations(t *testing.T) {
	m := mustMixture(t, dryAir, 1e5)
	count := func(steps int, v SweepVar) float64 {
		sw := Sweep{Var: v, From: 300, To: 1500, Steps: steps}
		if v == SweepPressure {
			sw.From, sw.To = 1e3, 1e7
		}
		return testing.AllocsPerRun(20, func() {
			if _, err := m.Run(sw, 300, 1e5, Options{}); err != nil {
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
			t.Errorf("%v sweep: %g allocations, want the result's few slices only", v, small)
		}
		t.Logf("%v sweep: %g allocations for 10 and for 1000 points", v, small)
	}
}

func TestSweepCancelAndProgress(t *testing.T) {
	m := mustMixture(t, "N2 0.79, O2 0.21", 1e5)
	sw := Sweep{Var: SweepTemperature, From: 300, To: 1500, Steps: 3 * progressEvery}
	var calls [][2]int
	res, err := m.RunContext(context.Background(), sw, 0, 1e5, Options{}, func(done, total int) {
		calls = append(calls, [2]int{done, total})
	})
	if err != nil || len(res.Points) != sw.Steps {
		t.Fatalf("RunContext: %v", err)
	}
	want := [][2]int{{progressEvery, sw.Steps}, {2 * progressEvery, sw.Steps}, {sw.Steps, sw.Steps}}
	if !reflect.DeepEqual(calls, want) {
		t.Errorf("progress calls %v, want %v", calls, want)
	}
	ctx, cancel := context.WithCancel(context.Background())
	cancel()
	if _, err := m.RunContext(ctx, sw, 0, 1e5, Options{}, nil); !errors.Is(err, context.Canceled) {
		t.Errorf("cancelled sweep: error %v, want context.Canceled", err)
	}
}

func TestSweepVarString(t *testing.T) {
	if SweepTemperature.String() != "temperature" || SweepPressure.String() != "pressure" {
		t.Errorf("names %q, %q", SweepTemperature, SweepPressure)
	}
}
