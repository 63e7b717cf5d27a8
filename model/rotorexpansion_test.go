package model

import (
	"math"
	"testing"
)

// The expansion a summed linear rotor takes from T = 20 Θ up, or 10 Θ
// for a heteronuclear molecule (its RotationAuto state), is the level sum to rounding: against
// linearRotorSum (RotationSummed) for heteronuclear CO, homonuclear N2
// with spin weights 6:3, O2 with its even J forbidden, and against the
// two modifications summed apart for normal, para and ortho hydrogen and
// deuterium. The sum itself carries about 1e-13 of rounding (see
// linearRotorSum), which sets the tolerance.
func TestLinearRotorExpansionIsTheSum(t *testing.T) {
	const tol = 1e-12 // absolute, in ln q, U/RT and Cv/R: the sum's rounding
	for _, f := range []string{"CO", "N2", "O2", "HCl", "nH2", "pH2", "nD2", "oD2"} {
		sp := mustSpecies(t, f)
		theta := sp.RotThetaK()[0]
		ys := []float64{rotorExpansionMaxY, 0.049, 0.04, 0.03, 0.021, 0.0201}
		if !sp.Homonuclear() {
			ys = append(ys, rotorExpansionMaxYHetero, 0.09, 0.07, 0.051)
		}
		for _, y := range ys {
			tempK := theta / y
			invT := 1 / tempK
			got := sp.linearRotor(tempK, invT, math.Log(tempK), RotationAuto)
			var want Terms
			if sp.SpinMod.Frozen {
				want = sp.frozenRotorSum(invT)
			} else {
				want = sp.linearRotorSum(invT)
			}
			if math.Abs(got.LnQ-want.LnQ) > tol || math.Abs(got.U-want.U) > tol || math.Abs(got.Cv-want.Cv) > tol {
				t.Errorf("%s at Θ/T = %g: expansion ln q, U, Cv = %.15g, %.15g, %.15g; level sum %.15g, %.15g, %.15g",
					f, y, got.LnQ, got.U, got.Cv, want.LnQ, want.U, want.Cv)
			}
		}
	}
}

// Just below the expansion's reach the levels are summed, so nothing
// jumps at 10 Θ (CO) or 20 Θ (N2): the two sides agree to the sum's
// rounding.
func TestLinearRotorExpansionEdge(t *testing.T) {
	for _, f := range []string{"CO", "N2"} {
		sp := mustSpecies(t, f)
		theta := sp.RotThetaK()[0]
		below := theta / math.Nextafter(sp.expansionMaxY(), 1) // summed
		at := theta / sp.expansionMaxY()                       // expanded
		a := sp.linearRotor(below, 1/below, math.Log(below), RotationAuto)
		b := sp.linearRotor(at, 1/at, math.Log(at), RotationAuto)
		if math.Abs(a.LnQ-b.LnQ) > 1e-12 || math.Abs(a.U-b.U) > 1e-12 || math.Abs(a.Cv-b.Cv) > 1e-12 {
			t.Errorf("%s at the expansion's edge: summed %v, expanded %v", f, a, b)
		}
	}
}
