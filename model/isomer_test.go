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

// TestBuiltinIsomers: the built-in butanes are addressed by their prefixed
// formulas or their names, and the bare formula is refused with a hint
// that names each accepted isomer.
func TestBuiltinIsomers(t *testing.T) {
	c := Builtin()
	for key, want := range map[string]string{
		"n-C4H10": "n-C4H10", "i-C4H10": "i-C4H10", "isobutane": "i-C4H10", "n-butane": "n-C4H10", "I-C4H10": "i-C4H10",
	} {
		if sp, ok := c.Lookup(key); !ok || sp.Formula != want {
			t.Errorf("Lookup(%q) = %v, %v; want %s", key, sp, ok, want)
		}
	}
	for _, bare := range []string{"C4H10", "c4h10", " C4H10 "} {
		if _, ok := c.Lookup(bare); ok {
			t.Errorf("Lookup(%q) found a species; a bare formula names no isomer", bare)
		}
		hint, ok := c.IsomerHint(bare)
		if !ok || !strings.Contains(hint, "n-C4H10 (n-butane)") || !strings.Contains(hint, "i-C4H10 (isobutane)") || strings.Contains(hint, "\n") {
			t.Errorf("IsomerHint(%q) = %q, %v; want one line naming both butanes", bare, hint, ok)
		}
	}
	for _, notIsomer := range []string{"CH4", "n-C4H10", "C3H8", "", "n-", "xyz"} {
		if hint, ok := c.IsomerHint(notIsomer); ok {
			t.Errorf("IsomerHint(%q) = %q; want none", notIsomer, hint)
		}
	}
	// One isomer in the catalogue still needs its prefix.
	list, err := ParseCatalogue("ring.cat", strings.NewReader("[c-C4F8]\nname = octafluorocyclobutane\nrotor = nonlinear\nrot_cm = 0.04 0.03 0.02 | test fixture\n"+
		"vib_cm = 1000x5 900x5 500x5 400x5 200x5 100x5 | test fixture\ndHf0_kJ = -1500 | test fixture\n"))
	if err != nil {
		t.Fatal(err)
	}
	ring := newCatalogue(append(append([]*Species(nil), c.All()...), list...))
	if hint, ok := ring.IsomerHint("C4F8"); !ok || !strings.Contains(hint, "c-C4F8 (octafluorocyclobutane)") {
		t.Errorf("IsomerHint(C4F8) = %q, %v; want the ring named", hint, ok)
	}
}
