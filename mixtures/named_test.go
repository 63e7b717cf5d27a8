package mixtures

import (
	"math"
	"strings"
	"testing"
)

// xOf is the mole fraction of formula in m, 0 when absent.
func xOf(m *Mixture, formula string) float64 {
	for _, c := range m.Components {
		if c.Species.Formula == formula {
			return c.X
		}
	}
	return 0
}

// TestNamedAir: "air" in blend text is dry air's components, at their
// shares of the item's amount, merged with the same species given alone.
func TestNamedAir(t *testing.T) {
	air := mustMixture(t, "air", 1e5)
	if len(air.Components) != 4 {
		t.Fatalf("air has %d components, want N2, O2, Ar, CO2", len(air.Components))
	}
	// The parts as the catalogue of named mixtures states them.
	for _, c := range []struct {
		formula string
		x       float64
	}{{"O2", 0.20946}, {"Ar", 0.00934}, {"CO2", 0.0004}, {"N2", 0.78080}} {
		if got := xOf(air, c.formula); math.Abs(got-c.x) > 1e-12 {
			t.Errorf("air: x(%s) = %.6f, want %.5f", c.formula, got, c.x)
		}
	}
	// ISO 2533 standard atmosphere: M = 28.964 420 g/mol for dry air (from
	// memory); our CO2 of 0.04 % for the standard's 0.0314 % adds about
	// 0.0014 g/mol, so within 0.003.
	if got := air.MolarMassKgPerMol * 1000; math.Abs(got-28.96442) > 0.003 {
		t.Errorf("M(air) = %.5f g/mol, want 28.964 ± 0.003 (ISO 2533)", got)
	}
	for _, text := range []string{"AIR", " air 100%", "Air 1", "air bal", "dry air bal", "Dry  Air 1"} {
		if m := mustMixture(t, text, 1e5); math.Abs(xOf(m, "O2")-0.20946) > 1e-12 {
			t.Errorf("%q: x(O2) = %g, want air's 0.20946", text, xOf(m, "O2"))
		}
	}

	// By hand: 5 % CO2 in air is 5 % + 95 % × 0.04 % CO2, and the
	// items keep their own shares.
	m := mustMixture(t, "CO2 5%, air bal", 1e5)
	if got, want := xOf(m, "CO2"), 0.05+0.95*0.0004; math.Abs(got-want) > 1e-12 {
		t.Errorf("CO2 5%% in air: x(CO2) = %.8f, want %.8f", got, want)
	}
	if got, want := xOf(m, "O2"), 0.95*0.20946; math.Abs(got-want) > 1e-12 {
		t.Errorf("CO2 5%% in air: x(O2) = %.8f, want %.8f", got, want)
	}
	if x, ok := m.ItemFraction("air"); !ok || math.Abs(x-0.95) > 1e-12 {
		t.Errorf("ItemFraction(air) = %g, %v; want 0.95", x, ok)
	}
	if x, ok := m.ItemFraction("co2"); !ok || math.Abs(x-0.05) > 1e-12 {
		t.Errorf("ItemFraction(co2) = %g, %v; want the item's own 0.05", x, ok)
	}

	// O2 given alone and in air is one component.
	m = mustMixture(t, "O2 10%, air bal", 1e5)
	n := 0
	for _, c := range m.Components {
		if c.Species.Formula == "O2" {
			n++
		}
	}
	if got, want := xOf(m, "O2"), 0.10+0.90*0.20946; n != 1 || math.Abs(got-want) > 1e-12 {
		t.Errorf("O2 10%% in air: %d O2 components, x = %.6f; want one at %.6f", n, got, want)
	}

	// By mass: 10 wt% CO2 in air holds 10 % + 90 % × air's own CO2 by
	// mass.
	m = mustMixture(t, "CO2 10 wt%, air bal", 1e5)
	co2, _ := testCatalogue(t).Lookup("CO2")
	wCO2 := xOf(m, "CO2") * co2.MolarMassKgPerMol / m.MolarMassKgPerMol
	if want := 0.10 + 0.90*0.0004*co2.MolarMassKgPerMol/air.MolarMassKgPerMol; math.Abs(wCO2-want) > 1e-12 {
		t.Errorf("CO2 10 wt%% in air: w(CO2) = %.8f, want %.8f", wCO2, want)
	}

	// Partial pressures: 1 bar of air and 0.5 bar of CO2 in 1.5 bar.
	m = mustMixture(t, "air 1 bar, CO2 0.5 bar", 1.5e5)
	if got, want := xOf(m, "N2"), 0.78080/1.5; math.Abs(got-want) > 1e-12 {
		t.Errorf("air 1 bar with CO2 0.5 bar: x(N2) = %.6f, want %.6f", got, want)
	}
}

// A blend names the named mixtures it holds once each, for the readouts'
// note.
func TestNamedMixtureNote(t *testing.T) {
	b, err := ParseBlend("CO2 5%, air 50%, AIR bal")
	if err != nil {
		t.Fatal(err)
	}
	if got := b.NamedMixtures(); len(got) != 1 || got[0].Name != "air" {
		t.Errorf("NamedMixtures = %+v, want air once", got)
	}
	if note := b.NamedNote(); !strings.HasPrefix(note, "air = dry air: O2 20.946 %") || !strings.Contains(note, "from memory") {
		t.Errorf("NamedNote = %q, want air's composition and its source", note)
	}
	if b, _ := ParseBlend("N2 79%, O2 21%"); b.NamedNote() != "" {
		t.Errorf("a blend without air has the note %q", b.NamedNote())
	}
}
