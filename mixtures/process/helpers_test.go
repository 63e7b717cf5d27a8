package process

import (
	"testing"

	"zmix/mixtures"
	"zmix/model"
)

// mixOf resolves blend text against the built-in catalogue.
func mixOf(t testing.TB, text string) *mixtures.Mixture {
	t.Helper()
	b, err := mixtures.ParseBlend(text)
	if err != nil {
		t.Fatalf("ParseBlend(%q): %v", text, err)
	}
	m, err := b.Resolve(model.Builtin(), 1e5)
	if err != nil {
		t.Fatalf("Resolve(%q): %v", text, err)
	}
	return m
}

// dryAir is the dry air of the ideal-gas air tables: N2, O2, Ar and CO2
// by mole (common practice, the composition of the standard atmosphere).
const dryAir = "N2 78.084%, O2 20.946%, Ar 0.934%, CO2 0.036%"

func within(got, want, tol float64) bool {
	d := got - want
	if d < 0 {
		d = -d
	}
	return d <= tol
}
