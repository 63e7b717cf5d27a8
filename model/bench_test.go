package model

import (
	"math"
	"strings"
	"testing"
)

// benchState and benchFloor keep the benchmarks' results alive, so that
// the compiler cannot drop the work.
var (
	benchState State
	benchFloor float64
)

// benchCases are the states the species benchmarks time, with the
// default treatment: an atom; N2 and CO2 read from their tables of summed
// levels; SF6 and C3H8 with 15 and 27 harmonic modes; normal H2 (frozen
// spin modifications) and N2 cold, from their tables too. The "rigid"
// cases take the rigid rotor with harmonic vibration, where linear rotors
// cold enough (T < 50 Θrot) sum their levels one by one: normal H2 as two
// frozen modifications, N2 at 60 K, and CO at 30 K.
var benchCases = []struct {
	name          string
	formula       string
	tempK, presPa float64
	tr            Treatment
}{
	{"Ar", "Ar", 812.5, 2.5e5, Treatment{}},
	{"N2", "N2", 812.5, 2.5e5, Treatment{}},
	{"CO2", "CO2", 812.5, 2.5e5, Treatment{}},
	{"SF6", "SF6", 812.5, 2.5e5, Treatment{}},
	{"C3H8", "C3H8", 812.5, 2.5e5, Treatment{}},
	{"H2_300K", "H2", 300, 1e5, Treatment{}},
	{"N2_60K", "N2", 60, 1e5, Treatment{}},
	{"N2_rigid", "N2", 812.5, 2.5e5, rigidHarmonic},
	{"H2_300K_rigid", "H2", 300, 1e5, rigidHarmonic},
	{"N2_60K_rigid", "N2", 60, 1e5, rigidHarmonic},
	{"CO_30K_rigid", "CO", 30, 1e5, rigidHarmonic},
}

// rigidHarmonic is the rigid rotor with harmonic vibration.
var rigidHarmonic = Treatment{Levels: LevelsRigidHarmonic}

// BenchmarkSpeciesState computes one species at one state. Goals: at most
// 0.5 µs, and at most 1.25 times BenchmarkSpeciesStateFloor of the same
// case.
func BenchmarkSpeciesState(b *testing.B) {
	for _, bc := range benchCases {
		sp := mustSpecies(b, bc.formula)
		sp.Fill(new(State), bc.tempK, bc.presPa, bc.tr) // a table's interval is made once, not timed
		b.Run(bc.name, func(b *testing.B) {
			var s State
			for b.Loop() {
				sp.Fill(&s, bc.tempK, bc.presPa, bc.tr)
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
				sum += stateFloor(sp, bc.tempK, bc.presPa, bc.tr)
			}
			benchFloor = sum
		})
	}
}

// stateFloor makes the exp and log calls a state of sp at (T, P) under tr
// needs, on the state's own arguments, and nothing else:
//   - ln T and ln P (translation; ln T also serves rotation and the
//     tables);
//   - summed levels read from their table (above its first node): none
//     more, the table interpolates ln q, U and Cv in ln T; below the
//     table, one exp per level within 40 kT and one log per partial sum
//     (rotation, the ground state, all states);
//   - a linear rigid rotor summed level by level (below 20 Θ for a
//     homonuclear molecule, 10 Θ for a heteronuclear one): one exp,
//     e^{−2Θ/T}, from which every level follows by products, and one log
//     of the sum, or one log per spin modification of a frozen mixture;
//     above, where the sum is its Euler–Maclaurin expansion in Θ/T, above
//     50 Θ, where the rotor is a shorter series, and for a nonlinear
//     rotor: none;
//   - vibration: one exp per distinct harmonic mode not frozen out, and
//     one log of the product of the modes' factors; torsions and
//     anharmonic levels read from their tables: none;
//   - electronic levels: one exp per populated excited level, and one log
//     of the sum, when there is more than one level.
//
// The results are summed only so that no call can be dropped.
func stateFloor(sp *Species, tempK, presPa float64, tr Treatment) float64 {
	invT := 1 / tempK
	acc := math.Log(tempK) + math.Log(presPa)
	if sp.usesLevels(tr) {
		if lv := sp.levelList(); tempK < lv.tableMinK {
			var z [3]float64 // the nested partial sums of rovibLevels.sums
			for i, th := range lv.thetaK {
				x := th * invT
				if x > 40 {
					break
				}
				e := math.Exp(-x)
				for k := int(lv.class[i]); k < 3; k++ {
					z[k] += e
				}
			}
			acc += math.Log(z[0]) + math.Log(z[1]) + math.Log(z[2])
		}
		return acc
	}
	if sp.Rotor == Linear {
		if theta := sp.rotThetaK[0]; tr.Rotation != RotationClassical && (theta*invT > sp.expansionMaxY() || tr.Rotation == RotationSummed) {
			c := math.Exp(-2 * theta * invT)
			acc += math.Log(1 + c)
			if sp.SpinMod.Frozen && sp.SpinMod.EvenFraction > 0 && sp.SpinMod.EvenFraction < 1 {
				acc += math.Log(1 + c*c)
			}
		}
	}
	modes := sp.vibModes
	switch {
	case sp.torsionLevels != nil && sp.summedLevels(tr):
		modes = sp.vibModesHindered
	case sp.hasAnharmonic() && sp.summedLevels(tr):
		modes = nil
	}
	prod := 1.0
	for _, m := range modes {
		if x := m.thetaK * invT; x <= 700 {
			prod *= 1 - math.Exp(-x)
		}
	}
	if len(modes) > 0 {
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

// BenchmarkCatalogueLoad reads and prepares the built-in catalogue, which
// every command does once before its first state: goal ≤ 60 ms on the
// project's 2-core machine, so that a script calling zmix in a loop is
// not held up. (The curves of H2 and D2 are solved once per process and
// kept, so only the first load in a process pays for them.)
func BenchmarkCatalogueLoad(b *testing.B) {
	for i := 0; i < b.N; i++ {
		list, err := ParseCatalogue("species.cat", strings.NewReader(builtinText))
		if err != nil || len(list) == 0 {
			b.Fatal(err)
		}
	}
}
