package model

import (
	"math"
	"testing"
)

// benchState and benchFloor keep the benchmarks' results alive, so that
// the compiler cannot drop the work.
var (
	benchState State
	benchFloor float64
)

// benchCases are the states the species benchmarks time: an atom to a
// molecule with 27 vibrational modes at one hot state, and two linear
// rotors cold enough that their levels are summed one by one (T < 50 Θrot).
var benchCases = []struct {
	name          string
	formula       string
	tempK, presPa float64
}{
	{"Ar", "Ar", 812.5, 2.5e5},
	{"N2", "N2", 812.5, 2.5e5},
	{"CO2", "CO2", 812.5, 2.5e5},
	{"SF6", "SF6", 812.5, 2.5e5},
	{"C3H8", "C3H8", 812.5, 2.5e5},
	{"H2_300K", "H2", 300, 1e5},
	{"N2_60K", "N2", 60, 1e5},
}

// BenchmarkSpeciesState computes one species at one state. Goals: at most
// 0.5 µs, and at most 1.25 times BenchmarkSpeciesStateFloor of the same
// case.
func BenchmarkSpeciesState(b *testing.B) {
	for _, bc := range benchCases {
		sp := mustSpecies(b, bc.formula)
		b.Run(bc.name, func(b *testing.B) {
			var s State
			for b.Loop() {
				sp.Fill(&s, bc.tempK, bc.presPa, Treatment{})
			}
			benchState = s
		})
	}
}

// BenchmarkSpeciesStateFloor times only the exp and log calls one state
// cannot do without (see stateFloor), for the cases of
// BenchmarkSpeciesState: the ratio of the two is the engine's overhead.
func BenchmarkSpeciesStateFloor(b *testing.B) {
	for _, bc := range benchCases {
		sp := mustSpecies(b, bc.formula)
		b.Run(bc.name, func(b *testing.B) {
			var sum float64
			for b.Loop() {
				sum += stateFloor(sp, bc.tempK, bc.presPa)
			}
			benchFloor = sum
		})
	}
}

// stateFloor makes the exp and log calls a state of sp at (T, P) needs,
// on the state's own arguments, and nothing else:
//   - ln T and ln P (translation; ln T also serves rotation);
//   - a summed linear rotor: one exp, e^{−2Θ/T}, from which every level
//     follows by products, and one log of the sum; above 50 Θ, where the
//     rotor is a series in Θ/T, and for a nonlinear rotor: none;
//   - vibration: one exp per distinct mode not frozen out, and one log of
//     the product of the modes' factors;
//   - electronic levels: one exp per populated excited level, and one log
//     of the sum, when there is more than one level.
//
// The results are summed only so that no call can be dropped.
func stateFloor(sp *Species, tempK, presPa float64) float64 {
	invT := 1 / tempK
	acc := math.Log(tempK) + math.Log(presPa)
	if sp.Rotor == Linear {
		if theta := sp.rotThetaK[0]; tempK < rotorSumLimit*theta {
			acc += math.Log(1 + math.Exp(-2*theta*invT))
		}
	}
	prod := 1.0
	for _, m := range sp.vibModes {
		if x := m.thetaK * invT; x <= 700 {
			prod *= 1 - math.Exp(-x)
		}
	}
	if len(sp.vibModes) > 0 {
		acc += math.Log(prod)
	}
	if len(sp.elecThetaK) > 1 {
		z := 1.0
		for _, th := range sp.elecThetaK[1:] {
			if x := th * invT; x <= 700 {
				z += math.Exp(-x)
			}
		}
		acc += math.Log(z)
	}
	return acc
}

// BenchmarkSpeciesStateTreatments times the species with Dunham constants
// or torsions under both treatments side by side: the summed levels (read
// from the table built once, or summed directly below it) and the rigid
// rotor with harmonic vibration. Goal: N2 with the summed levels ≤ 1 µs.
func BenchmarkSpeciesStateTreatments(b *testing.B) {
	cases := []struct {
		name          string
		formula       string
		tempK, presPa float64
	}{
		{"N2", "N2", 812.5, 2.5e5},
		{"O2", "O2", 812.5, 2.5e5},
		{"N2_60K", "N2", 60, 1e5},
		{"N2_10K", "N2", 10, 1e5},
		{"C2H6", "C2H6", 812.5, 2.5e5}, // a hindered torsion
	}
	for _, bc := range cases {
		sp := mustSpecies(b, bc.formula)
		for _, tr := range []struct {
			name string
			tr   Treatment
		}{{"summed", Treatment{Levels: LevelsSummed}}, {"rigid", Treatment{Levels: LevelsRigidHarmonic}}} {
			sp.Fill(new(State), bc.tempK, bc.presPa, tr.tr) // the table is built once, not timed
			b.Run(bc.name+"/"+tr.name, func(b *testing.B) {
				var s State
				for b.Loop() {
					sp.Fill(&s, bc.tempK, bc.presPa, tr.tr)
				}
				benchState = s
			})
		}
	}
}
