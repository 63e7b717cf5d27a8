package safety

import (
	"math"
	"testing"
)

// TestReleaseClosedForms checks the well-mixed model against its closed
// forms (issue 10; the forms are the model's own algebra).
func TestReleaseClosedForms(t *testing.T) {
	n2 := blend(t, "N2", 1.0)
	cases := []struct {
		name         string
		room, amount float64
	}{
		{"small", 100, 1},
		{"equal", 50, 50},
		{"large", 30, 120},
	}
	for _, c := range cases {
		r := Release{Parts: n2, RoomM3: c.room, AmountM3: c.amount}
		res := r.Solve()
		closed := 20.9 * c.room / (c.room + c.amount)  // 20.9 % × V/(V+Q)
		displaced := 20.9 * math.Exp(-c.amount/c.room) // 20.9 % × exp(−Q/V)
		if !near(res.O2ClosedPct, closed, 1e-12) || !near(res.O2DisplacedPct, displaced, 1e-12) {
			t.Errorf("%s: closed %g, displaced %g; want %g, %g", c.name, res.O2ClosedPct, res.O2DisplacedPct, closed, displaced)
		}
		if !near(res.O2Pct, math.Min(closed, displaced), 1e-12) || res.O2Pct != res.O2DisplacedPct {
			t.Errorf("%s: worst %g, want the lower, %g", c.name, res.O2Pct, math.Min(closed, displaced))
		}
	}
}

func TestReleaseSteadyState(t *testing.T) {
	// 10 m³/h of N2 into a 60 m³ room at 6 air changes an hour (360 m³/h):
	// steady O2 = 20.9 × 360/370 = 20.335 %, time constant 60/370 h.
	r := Release{Parts: blend(t, "N2", 1.0), RoomM3: 60, RateM3PerS: 10.0 / 3600, VentM3PerS: 360.0 / 3600}
	res := r.Solve()
	if !near(res.O2SteadyPct, 20.9*360/370, 1e-12) || !near(res.TauS, 60.0/370*3600, 1e-12) {
		t.Errorf("steady %g, tau %g; want %g, %g", res.O2SteadyPct, res.TauS, 20.9*360/370, 60.0/370*3600)
	}
	if res.O2Pct != res.O2SteadyPct || res.TimeToDeficientS >= 0 {
		t.Errorf("worst %g, time to 19.5 %% %g; want the steady state and never", res.O2Pct, res.TimeToDeficientS)
	}
	// The time course starts at air and follows the exponential.
	for _, p := range res.TimeCourse {
		want := res.O2SteadyPct + (20.9-res.O2SteadyPct)*math.Exp(-p.TimeS/res.TauS)
		if !near(p.O2Pct, want, 1e-12) {
			t.Errorf("t = %g s: O2 %g, want %g", p.TimeS, p.O2Pct, want)
		}
	}
	// No ventilation: the room tends to the blend, and 19.5 % comes at
	// t = −τ ln(1 − (20.9−19.5)/20.9), τ = V/q.
	r = Release{Parts: blend(t, "N2", 1.0), RoomM3: 60, RateM3PerS: 10.0 / 3600}
	res = r.Solve()
	tau := 60 / (10.0 / 3600)
	if want := -tau * math.Log(1-1.4/20.9); !near(res.TimeToDeficientS, want, 1e-12) {
		t.Errorf("time to 19.5 %% = %g s, want %g", res.TimeToDeficientS, want)
	}
	// A limited amount ends the release: 20 m³ at 10 m³/h lasts 2 h.
	r.AmountM3 = 20
	res = r.Solve()
	if want := 20.9 * math.Exp(-7200/tau); !near(res.O2Pct, want, 1e-12) || res.DurationS != 7200 {
		t.Errorf("limited release: O2 %g after %g s; want %g after 7200 s", res.O2Pct, res.DurationS, want)
	}
}

func TestReleaseSpecies(t *testing.T) {
	// 2 m³ of 5 % H2 in N2 into a 100 m³ room: displaced peak share
	// 1 − e^(−0.02) = 0.019801; H2 at 990.07 ppm, 2.475 % of its 4 % LFL.
	r := Release{Parts: blend(t, "H2", 0.05, "N2", 0.95), RoomM3: 100, AmountM3: 2}
	res := r.Solve()
	f := -math.Expm1(-0.02)
	if len(res.Species) != 1 || !near(res.Species[0].PeakPPM, 0.05*f*1e6, 1e-12) || !near(res.Species[0].PctOfLFL, 0.05*f*100/4*100, 1e-12) {
		t.Fatalf("species %+v", res.Species)
	}
	if !near(res.MixPctOfLFL, res.Species[0].PctOfLFL, 1e-12) || !res.Recalled {
		t.Errorf("mix %% LFL %g, recalled %v", res.MixPctOfLFL, res.Recalled)
	}
	// A toxic species carries its 4 h LC50 and category: PH3 20 ppm 1 h → 10 ppm, Category 1.
	res = (&Release{Parts: blend(t, "PH3", 0.01, "N2", 0.99), RoomM3: 100, AmountM3: 1}).Solve()
	if res.Species[0].LC50PPM4h != 10 || res.Species[0].Category != 1 {
		t.Errorf("PH3: %+v", res.Species[0])
	}
}
