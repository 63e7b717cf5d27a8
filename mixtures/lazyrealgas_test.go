package mixtures

import (
	"math"
	"reflect"
	"testing"
)

// Fill leaves the real-gas figures for later; asked for, they are the
// ones State computes at once, from the conditions of that Fill: not
// moved by a caller that changed the state's public figures meanwhile
// (as the process real-gas model does), nor left over from the state the
// storage held before.
func TestFillRealGasOnRequest(t *testing.T) {
	m := mustMixture(t, "N2 70%, CO2 20%, H2 10%", 50e5)
	var s State
	m.Fill(&s, 250, 200e5, Options{}) // a dense state first: Peng–Robinson
	if _, ok := s.RealGasResult(); !ok {
		t.Fatal("no real-gas figures for a blend with critical constants")
	}
	for _, c := range []struct{ tempK, presPa float64 }{{300, 50e5}, {900, 1e5}, {250, 200e5}} {
		want := mustState(t, m, c.tempK, c.presPa)
		m.Fill(&s, c.tempK, c.presPa, Options{})
		s.CpJPerMolK, s.TempK, s.PresPa = math.NaN(), 1, 1 // a caller's edits
		got, ok := s.RealGasResult()
		if !ok || !reflect.DeepEqual(*got, want.RealGas) {
			t.Errorf("%g K, %g Pa: real gas after Fill %+v (known %v); State gives %+v", c.tempK, c.presPa, *got, ok, want.RealGas)
		}
		if z := s.Z(); z != want.RealGas.Z {
			t.Errorf("%g K, %g Pa: Z() = %g after the figures were made, want %g", c.tempK, c.presPa, z, want.RealGas.Z)
		}
	}
	// A blend with no critical constants has none to give, and a state
	// that had them before does not keep them.
	ideal := mustMixture(t, "OH 100%", 1e5) // a radical: no Tc, Pc, ω
	ideal.Fill(&s, 300, 1e5, Options{})
	if _, ok := s.RealGasResult(); ok || s.RealGasKnown || !math.IsNaN(s.Z()) {
		t.Error("real-gas figures known for a blend whose species lack critical constants")
	}
}

// A mixture keeps ln xᵢ and takes ln T and ln P once: each species' state
// in a blend is its own state at (T, pᵢ) to rounding.
func TestFillSpeciesAtPartialPressure(t *testing.T) {
	m := mustMixture(t, blend10, 1e5)
	s := mustState(t, m, 812.5, 3.7e5)
	for i := range s.Species {
		tr := &s.Species[i]
		want, err := tr.Species.State(812.5, tr.PartialPresPa)
		if err != nil {
			t.Fatal(err)
		}
		const tol = 1e-13 // relative: ln xᵢ + ln P against ln(xᵢP)
		if d := math.Abs(tr.State.GJPerMol - want.GJPerMol); d > tol*math.Abs(want.GJPerMol)+1e-9 {
			t.Errorf("%s: G in the blend %.17g, alone at pᵢ %.17g", tr.Species.Formula, tr.State.GJPerMol, want.GJPerMol)
		}
		if d := math.Abs(tr.State.SJPerMolK - want.SJPerMolK); d > tol*math.Abs(want.SJPerMolK) {
			t.Errorf("%s: S in the blend %.17g, alone at pᵢ %.17g", tr.Species.Formula, tr.State.SJPerMolK, want.SJPerMolK)
		}
		if tr.State.CpJPerMolK != want.CpJPerMolK || tr.State.HJPerMol != want.HJPerMol {
			t.Errorf("%s: Cp, H in the blend %g, %g; alone %g, %g", tr.Species.Formula, tr.State.CpJPerMolK, tr.State.HJPerMol, want.CpJPerMolK, want.HJPerMol)
		}
	}
}
