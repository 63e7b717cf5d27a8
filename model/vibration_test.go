package model

import (
	"math"
	"math/rand/v2"
	"testing"
)

// vibrationOneLoop is the harmonic sum taken mode by mode in one loop,
// exp and arithmetic together: the definition vibrationOf's two passes
// must reproduce bit for bit.
func vibrationOneLoop(modes []vibTerm, invT float64) Terms {
	var lnQ, u, cv float64
	prod := 1.0
	for _, m := range modes {
		x := m.thetaK * invT
		if x > 700 {
			continue
		}
		var em, om float64
		if x < expm1Below {
			om = -math.Expm1(-x)
			em = 1 - om
		} else {
			em = math.Exp(-x)
			om = 1 - em
		}
		prod *= powInt(om, m.nDeg)
		if prod < 1e-250 {
			lnQ -= math.Log(prod)
			prod = 1
		}
		r := x / om
		xe := r * em
		u += m.deg * xe
		cv += m.deg * xe * r
	}
	if prod != 1 {
		lnQ -= math.Log(prod)
	}
	return Terms{LnQ: lnQ, U: u, Cv: cv}
}

// vibrationOf gives the one-loop sum exactly, for every catalogue species
// from 1 K to 10⁶ K (frozen modes, the expm1 branch, degeneracies), and
// for seeded random lists longer than one pass's buffer.
func TestVibrationTwoPasses(t *testing.T) {
	temps := []float64{1, 30, 298.15, 812.5, 5000, 1e6}
	for _, sp := range Builtin().All() {
		for _, tempK := range temps {
			if got, want := vibrationOf(sp.vibModes, 1/tempK), vibrationOneLoop(sp.vibModes, 1/tempK); got != want {
				t.Errorf("%s at %g K: vibrationOf = %v, want %v", sp.Formula, tempK, got, want)
			}
		}
	}
	rng := rand.New(rand.NewPCG(1, 1))
	for _, n := range []int{3, vibChunk, vibChunk + 1, 3*vibChunk + 5} {
		modes := make([]vibTerm, n)
		for i := range modes {
			d := 1 + rng.IntN(4)
			modes[i] = vibTerm{thetaK: math.Exp(rng.Float64() * 10), deg: float64(d), nDeg: d} // 1 K to 22 000 K
		}
		for _, tempK := range temps {
			if got, want := vibrationOf(modes, 1/tempK), vibrationOneLoop(modes, 1/tempK); got != want {
				t.Errorf("%d random modes at %g K: vibrationOf = %v, want %v", n, tempK, got, want)
			}
		}
	}
}
