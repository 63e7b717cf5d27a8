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

// TestDissociationVsJANAF checks the dissociated fraction of O2 and H2,
// pure at 1 bar, against the equilibrium constant of X2 ⇌ 2X formed from
// the NIST-JANAF log Kf columns (4th ed.; the reference-state molecule
// has log Kf = 0 at every T):
//
//	log10 Kp = 2 log Kf(X) − log Kf(X2)
//
// For n mol of X2 of which a fraction α splits, the moles are X2 1 − α and
// X 2α, total 1 + α, so at P = P° = 1 bar
//
//	Kp = (2α/(1+α))² / ((1−α)/(1+α)) = 4α²/(1 − α²),  α = √(Kp/(4 + Kp)).
//
// The drift from the spectroscopic tables is logged. O2 and H2 have
// their rovibrational levels summed from Dunham constants and agree
// within 0.1 %; they are held to 0.5 % (the tables' log Kf carry three
// decimals, ±0.1 % in α). A rigid rotor and harmonic oscillator drifts by
// 3 % for H2 at 3000 K, and a wrong energy zero (ΔfH° of the atom off by
// 5 kJ/mol) moves α by about 20 %: either fails.
func TestDissociationVsJANAF(t *testing.T) {
	const summed = 0.005 // levels summed
	for _, tt := range []struct {
		molecule, atom string
		tempK          float64
		logKfAtom      float64 // log Kf of the atom at tempK
		logKfMolecule  float64 // log Kf of the molecule (reference state)
		relTol         float64
	}{
		// NIST-JANAF 4th ed., table O-001 (O), row 3000 K:
		//   3000  20.937  209.704  190.846  56.574  256.741  54.327  -0.946
		// table O-029 (O2, ref), row 3000 K:
		//   3000  39.864  284.466  251.795  98.013  0.  0.  0.
		{"O2", "O", 3000, -0.946, 0, summed},
		// table O-001, row 4000 K:
		//   4000  21.302  215.772  196.353  77.675  257.496  -13.270  0.173
		// table O-029, row 4000 K:
		//   4000  41.421  296.162  261.485  138.705  0.  0.  0.
		{"O2", "O", 4000, 0.173, 0, summed},
		// table H-001 (H), row 3000 K:
		//   3000  20.786  162.706  143.986  56.161  229.790  46.007  -0.801
		// table H-050 (H2, ref), row 3000 K:
		//   3000  37.087  202.891  173.311  88.740  0.  0.  0.
		{"H2", "H", 3000, -0.801, 0, summed},
		// table H-001, row 4000 K:
		//   4000  20.786  168.686  149.450  76.947  231.509  -15.541  0.203
		// table H-050, row 4000 K:
		//   4000  39.116  213.848  182.129  126.874  0.  0.  0.
		{"H2", "H", 4000, 0.203, 0, summed},
	} {
		kp := math.Pow(10, 2*tt.logKfAtom-tt.logKfMolecule)
		want := math.Sqrt(kp / (4 + kp))
		s := mustState(t, mustMixture(t, tt.molecule+" 100%", 1e5), tt.tempK, 1e5)
		got := -1.0
		for _, h := range HotEstimates(&s) {
			if h.Species == tt.molecule && !h.Ionised && h.Products == "2 "+tt.atom {
				got = h.Fraction
			}
		}
		if got < 0 {
			t.Errorf("%s at %g K: no dissociation to 2 %s estimated: %+v", tt.molecule, tt.tempK, tt.atom, HotEstimates(&s))
			continue
		}
		t.Logf("%s ⇌ 2 %s at %g K, 1 bar: α = %.4f, JANAF log Kf gives %.4f (%+.1f %%)", tt.molecule, tt.atom, tt.tempK, got, want, 100*(got/want-1))
		if math.Abs(got/want-1) > tt.relTol {
			t.Errorf("α(%s ⇌ 2 %s, %g K, 1 bar) = %.4f, want %.4f ± %g %% (JANAF log Kf)", tt.molecule, tt.atom, tt.tempK, got, want, 100*tt.relTol)
		}
	}
}
