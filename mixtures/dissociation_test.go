package mixtures

import (
	"math"
	"testing"

	"zmix/model"
)

// TestDissociationFraction: the fraction found satisfies the equilibrium
// constant formed from the catalogue's own μ°, Kp = exp(−ΔG°/RT), for
// O2 ⇌ 2O and H2 ⇌ 2H at 3000 and 4000 K, pure and diluted.
func TestDissociationFraction(t *testing.T) {
	for _, tt := range []struct {
		blend, formula, atom string
		tempK, presPa, x     float64
	}{
		{"O2 100%", "O2", "O", 3000, 1e5, 1},
		{"O2 100%", "O2", "O", 4000, 1e5, 1},
		{"H2 100%", "H2", "H", 3000, 1e5, 1},
		{"H2 100%", "H2", "H", 4000, 1e5, 1},
		{"O2 20%, Ar bal", "O2", "O", 4000, 10e5, 0.2},
	} {
		s := mustState(t, mustMixture(t, tt.blend, tt.presPa), tt.tempK, tt.presPa)
		var got *HotEstimate
		for _, h := range HotEstimates(&s) {
			if h.Species == tt.formula && !h.Ionised {
				got = &h
			}
		}
		if got == nil || got.Products != "2 "+tt.atom {
			t.Errorf("%s at %g K: no dissociation to 2 %s: %+v", tt.blend, tt.tempK, tt.atom, HotEstimates(&s))
			continue
		}
		mol, _ := model.Builtin().Lookup(tt.formula)
		atom, _ := model.Builtin().Lookup(tt.atom)
		sm, _ := mol.State(tt.tempK, 1e5)
		sa, _ := atom.State(tt.tempK, 1e5)
		kp := math.Exp(-(2*sa.GJPerMol - sm.GJPerMol) / (model.GasConstant * tt.tempK))
		// Moles: molecule x(1−α), atoms 2xα, the rest 1−x; total 1 + xα.
		a, x := got.Fraction, tt.x
		n := 1 + x*a
		q := (2 * x * a / n) * (2 * x * a / n) / (x * (1 - a) / n) * tt.presPa / 1e5
		if math.Abs(q/kp-1) > 1e-9 {
			t.Errorf("%s at %g K: α = %g gives Q = %g, Kp = %g", tt.blend, tt.tempK, a, q, kp)
		}
	}
	// The figure: O2 at 4000 K and 1 bar is about 60 %
	// dissociated by zmix's own μ°.
	s := mustState(t, mustMixture(t, "O2 100%", 1e5), 4000, 1e5)
	if h := HotEstimates(&s); len(h) == 0 || math.Abs(h[0].Fraction-0.6) > 0.03 {
		t.Errorf("O2 at 4000 K: %+v, want about 60 %%", h)
	}
}

// Cold gases and atoms below the threshold get no estimate; N2 at
// 20 000 K is mostly ionised (Saha).
func TestHotEstimatesEdges(t *testing.T) {
	s := mustState(t, mustMixture(t, dryAir, 1e5), 300, 1e5)
	if h := HotEstimates(&s); len(h) != 0 {
		t.Errorf("air at 300 K: %+v", h)
	}
	s = mustState(t, mustMixture(t, "N2 100%", 1e5), 20000, 1e5)
	ion := false
	for _, h := range HotEstimates(&s) {
		ion = ion || (h.Ionised && h.Species == "N2" && h.Fraction > 0.5)
	}
	if !ion {
		t.Errorf("N2 at 20 000 K: %+v, want mostly ionised", HotEstimates(&s))
	}
	if a := equilibriumFraction(0, 0.5, 1); a != 0 {
		t.Errorf("α(K = 0) = %g", a)
	}
	if a := equilibriumFraction(math.Inf(1), 0.5, 1); a != 1 {
		t.Errorf("α(K = ∞) = %g", a)
	}
}
