package model

import (
	"math"
	"testing"
)

// mustSpecies returns a species of the built-in catalogue.
func mustSpecies(tb testing.TB, formula string) *Species {
	tb.Helper()
	sp, ok := Builtin().Lookup(formula)
	if !ok || sp.Formula != formula {
		tb.Fatalf("species %s is not in the built-in catalogue", formula)
	}
	return sp
}

// relDiff is |a−b| / |b|, or |a−b| when b is 0.
func relDiff(a, b float64) float64 {
	if b == 0 {
		return math.Abs(a)
	}
	return math.Abs(a-b) / math.Abs(b)
}
