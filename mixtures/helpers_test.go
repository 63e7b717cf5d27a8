package mixtures

import (
	"math"
	"testing"

	"gonum.org/v1/gonum/unit/constant"

	"zmix/model"
)

// rGas is R = N_A·k from gonum's CODATA 2018 exact constants, computed
// here rather than taken from package model so that the tests do not
// check the package against itself.
var rGas = float64(constant.Avogadro) * float64(constant.Boltzmann)

// testCatalogue returns the catalogue the tests resolve blends against:
// the built-in one, which holds every species these tests use.
func testCatalogue(tb testing.TB) *model.Catalogue {
	tb.Helper()
	return model.Builtin()
}

// mustSpecies looks a formula up in the test catalogue.
func mustSpecies(tb testing.TB, formula string) *model.Species {
	tb.Helper()
	sp, ok := testCatalogue(tb).Lookup(formula)
	if !ok {
		tb.Fatalf("species %s not in the test catalogue", formula)
	}
	return sp
}

// mustMixture parses and resolves blend text against the test catalogue.
func mustMixture(tb testing.TB, text string, presPa float64) *Mixture {
	tb.Helper()
	b, err := ParseBlend(text)
	if err != nil {
		tb.Fatalf("ParseBlend(%q): %v", text, err)
	}
	m, err := b.Resolve(testCatalogue(tb), presPa)
	if err != nil {
		tb.Fatalf("Resolve(%q): %v", text, err)
	}
	return m
}

// mustState computes a mixture state or fails the test.
func mustState(tb testing.TB, m *Mixture, tempK, presPa float64) State {
	tb.Helper()
	s, err := m.State(tempK, presPa, Options{})
	if err != nil {
		tb.Fatalf("State(%g K, %g Pa): %v", tempK, presPa, err)
	}
	return s
}

// fractionOf returns the mole fraction of formula in m (0 if absent).
func fractionOf(m *Mixture, formula string) float64 {
	for _, c := range m.Components {
		if c.Species.Formula == formula {
			return c.X
		}
	}
	return 0
}

// relClose reports whether got is within relTol of want, relative to the
// larger magnitude, or within absTol absolutely.
func relClose(got, want, relTol, absTol float64) bool {
	d := math.Abs(got - want)
	return d <= absTol || d <= relTol*math.Max(math.Abs(got), math.Abs(want))
}
