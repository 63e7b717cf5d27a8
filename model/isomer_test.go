package model

import (
	"strings"
	"testing"
)

// isomerFixture is a species file with the two butanes; their numbers are
// test fixtures (36 modes each, as 3N − 6 for 14 atoms), not data.
const isomerFixture = `[n-C4H10]
name    = n-butane
rotor   = nonlinear
rot_cm  = 0.85 0.13 0.12 | test fixture
vib_cm  = 3000x4 3000x4 1400x4 1400x4 1000x4 1000x4 800x4 400x4 200x4 | test fixture
dHf0_kJ = -99 | test fixture

[i-C4H10]
name    = isobutane
rotor   = nonlinear
rot_cm  = 0.26 0.26 0.15 | test fixture
sigma   = 3 | test fixture
vib_cm  = 3000x4 3000x4 1400x4 1400x4 1000x4 1000x4 800x4 400x4 200x4 | test fixture
dHf0_kJ = -106 | test fixture
`

func TestIsomerNames(t *testing.T) {
	list, err := ParseCatalogue("butanes.cat", strings.NewReader(isomerFixture))
	if err != nil {
		t.Fatal(err)
	}
	c := newCatalogue(append(append([]*Species(nil), Builtin().All()...), list...))
	for _, key := range []string{"n-C4H10", "i-C4H10", "isobutane", "N-C4H10"} {
		if _, ok := c.Lookup(key); !ok {
			t.Errorf("Lookup(%q) found nothing", key)
		}
	}
	n, _ := c.Lookup("n-C4H10")
	i, _ := c.Lookup("i-C4H10")
	if n == i {
		t.Error("the two isomers are one species")
	}
	// Same atoms, same molar mass: 4 × 12.011 + 10 × 1.008 g/mol (IUPAC
	// abridged atomic weights).
	if want := (4*12.011 + 10*1.008) / 1000; abs(n.MolarMassKgPerMol-want) > 1e-5 || n.MolarMassKgPerMol != i.MolarMassKgPerMol {
		t.Errorf("molar masses %g, %g; want %g", n.MolarMassKgPerMol, i.MolarMassKgPerMol, want)
	}
	// The bare formula names neither, and the suggestions offer both.
	if _, ok := c.Lookup("C4H10"); ok {
		t.Error("C4H10 alone should name neither isomer")
	}
	if got := strings.Join(c.Suggest("C4H10", 3), " "); !strings.Contains(got, "n-C4H10") || !strings.Contains(got, "i-C4H10") {
		t.Errorf("Suggest(C4H10) = %q, want both isomers", got)
	}
	for _, bad := range []string{"n-", "x-C4H10", "n-c4h10"} {
		if _, err := ParseFormula(bad); err == nil {
			t.Errorf("ParseFormula(%q) accepted", bad)
		}
	}
}

func abs(x float64) float64 {
	if x < 0 {
		return -x
	}
	return x
}
