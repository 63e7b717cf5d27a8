package model

import "testing"

// benchState keeps the benchmark's result alive, so that the compiler
// cannot drop the work.
var benchState State

// BenchmarkSpeciesState computes one species at one state, from an atom
// to a molecule with 27 vibrational modes. Goal: at most 0.5 µs.
func BenchmarkSpeciesState(b *testing.B) {
	for _, formula := range []string{"Ar", "N2", "CO2", "SF6", "C3H8"} {
		sp := mustSpecies(b, formula)
		b.Run(formula, func(b *testing.B) {
			var s State
			for b.Loop() {
				sp.Fill(&s, 812.5, 2.5e5, Treatment{})
			}
			benchState = s
		})
	}
}
