package mixtures

import (
	"errors"
	"math"
	"strings"
	"testing"
)

// iupacGPerMol holds molar masses summed by hand from the IUPAC standard
// atomic weights (CIAAW 2021, abridged conventional values, from memory:
// H 1.008, He 4.002602, C 12.011, N 14.007, O 15.999, Si 28.085,
// Ar 39.95). The mass-basis tests use these, not package model's sums.
var iupacGPerMol = map[string]float64{
	"H2":   2 * 1.008,
	"He":   4.002602,
	"N2":   2 * 14.007,
	"O2":   2 * 15.999,
	"Ar":   39.95,
	"CO2":  12.011 + 2*15.999,
	"CH4":  12.011 + 4*1.008,
	"NH3":  14.007 + 3*1.008,
	"SiH4": 28.085 + 4*1.008,
}

func TestMolarMassesMatchIUPAC(t *testing.T) {
	for formula, want := range iupacGPerMol {
		got := mustSpecies(t, formula).MolarMassKgPerMol * 1000
		// IUPAC CIAAW 2021 standard atomic weights (see iupacGPerMol).
		if !relClose(got, want, 1e-9, 0) {
			t.Errorf("%s: M = %.6f g/mol, want %.6f", formula, got, want)
		}
	}
}

// The three blends the issue names must parse and resolve to the mole
// fractions as typed (the amounts are definitions, so the tolerance is
// rounding only).
func TestRequiredBlendExamples(t *testing.T) {
	cases := []struct {
		name string
		text string
		want map[string]float64
		tol  float64
	}{
		{"dry air in mol %", "N2 78.08%, O2 20.95%, Ar 0.93%, CO2 0.04%",
			map[string]float64{"N2": 0.7808, "O2": 0.2095, "Ar": 0.0093, "CO2": 0.0004}, 1e-12},
		{"silane with ppm and balance", "SiH4 2%, H2 500ppm, N2 bal",
			map[string]float64{"SiH4": 0.02, "H2": 500e-6, "N2": 1 - 0.02 - 500e-6}, 1e-12},
		{"bare mole fractions", "N2 0.79, O2 0.21",
			map[string]float64{"N2": 0.79, "O2": 0.21}, 1e-12},
		// A species alone is the pure gas, as a person writes it.
		{"a species alone", "N2", map[string]float64{"N2": 1}, 0},
		{"a species alone with separators", " ;N2,\n", map[string]float64{"N2": 1}, 0},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			m := mustMixture(t, c.text, 101325)
			if len(m.Components) != len(c.want) {
				t.Fatalf("%d components, want %d", len(m.Components), len(c.want))
			}
			for f, want := range c.want {
				if got := fractionOf(m, f); math.Abs(got-want) > c.tol {
					t.Errorf("x(%s) = %.15g, want %.15g", f, got, want)
				}
			}
		})
	}
}

// Every amount form; the conversions are definitions (percent = 1/100,
// ppm = 1e-6, ppb = 1e-9) or the pressure units tested in units_test.go.
func TestParseAmountForms(t *testing.T) {
	cases := []struct {
		text  string
		basis Basis
		value float64
	}{
		{"0.21", MoleFraction, 0.21},
		{"0.21 mol/mol", MoleFraction, 0.21},
		{"21%", MoleFraction, 0.21},
		{"21 %", MoleFraction, 0.21},
		{"21 mol%", MoleFraction, 0.21},
		{"21 mol %", MoleFraction, 0.21},
		{"21 %mol", MoleFraction, 0.21},
		{"500ppm", MoleFraction, 500e-6},
		{"500 ppm", MoleFraction, 500e-6},
		{"500 ppmv", MoleFraction, 500e-6},
		{"500 PPM", MoleFraction, 500e-6},
		{"20ppb", MoleFraction, 20e-9},
		{"20 ppbv", MoleFraction, 20e-9},
		{"1e-3", MoleFraction, 1e-3},
		{"0", MoleFraction, 0},
		{"1", MoleFraction, 1},
		{"0.3 kg/kg", MassFraction, 0.3},
		{"30 wt%", MassFraction, 0.3},
		{"30wt%", MassFraction, 0.3},
		{"30 mass%", MassFraction, 0.3},
		{"30 mass %", MassFraction, 0.3},
		{"0.2 bar", PartialPres, 0.2e5},
		{"150 Pa", PartialPres, 150},
		{"2 kPa", PartialPres, 2000},
		{"0.1 MPa", PartialPres, 1e5},
		{"10 mbar", PartialPres, 1000},
		{"1 atm", PartialPres, 101325},
		{"760 Torr", PartialPres, 101325},
		{"1 psia", PartialPres, 6894.757293168361},
		{"bal", Balance, 0},
		{"balance", Balance, 0},
		{"BAL", Balance, 0},
	}
	for _, c := range cases {
		a, err := ParseAmount(c.text)
		if err != nil {
			t.Errorf("ParseAmount(%q): %v", c.text, err)
			continue
		}
		if a.Basis != c.basis || !relClose(a.Value, c.value, 1e-12, 0) {
			t.Errorf("ParseAmount(%q) = %+v, want {%v %g}", c.text, a, c.basis, c.value)
		}
	}
}

// Mixed bases: mole amounts must come out as typed, mass amounts must
// give back their mass fraction when the mass fractions are recomputed by
// hand from the resolved mole fractions and the IUPAC molar masses, and
// partial pressures must give xᵢ = pᵢ/P.
func TestResolveMixedBases(t *testing.T) {
	cases := []struct {
		name    string
		text    string
		presPa  float64
		mole    map[string]float64 // x as typed
		mass    map[string]float64 // w as typed
		partial map[string]float64 // pᵢ in Pa as typed
		moleTol float64            // renormalising within the 0.05 % sum tolerance moves x
	}{
		{"mass and mole with balance", "CO2 10 wt%, Ar 5%, N2 bal", 1e5,
			map[string]float64{"Ar": 0.05}, map[string]float64{"CO2": 0.10}, nil, 0},
		{"mass fraction and ppm with balance", "SiH4 0.02 kg/kg, H2 500 ppm, N2 bal", 1e5,
			map[string]float64{"H2": 500e-6}, map[string]float64{"SiH4": 0.02}, nil, 0},
		{"mass only", "He 50 wt%, Ar 50 wt%", 1e5,
			nil, map[string]float64{"He": 0.5, "Ar": 0.5}, nil, 0},
		{"mass balance gas", "CH4 1 mass%, He bal", 1e5,
			nil, map[string]float64{"CH4": 0.01}, nil, 0},
		// x_CO2 = 0.3 makes w_CO2 = 0.3·44.009/(0.3·44.009 + 0.5·28.014
		// + 0.2·31.998) = 0.392829 (by hand, IUPAC weights); 39.2829 wt%
		// rounds it, so the mole fractions move by ~1e-6 on renormalising
		// while the mass fraction stays exact.
		{"mass and mole without balance", "CO2 39.2829 wt%, N2 0.5, O2 0.2", 1e5,
			map[string]float64{"N2": 0.5, "O2": 0.2}, map[string]float64{"CO2": 0.392829}, nil, 1e-5},
		{"partial pressure and balance", "O2 0.2 bar, N2 bal", 2e5,
			nil, nil, map[string]float64{"O2": 0.2e5}, 0},
		{"partial pressures only", "N2 0.79 bar, O2 0.21 bar", 1e5,
			nil, nil, map[string]float64{"N2": 0.79e5, "O2": 0.21e5}, 0},
		{"every basis", "O2 150 Torr, CO2 5 wt%, Ar 1%, N2 bal", 101325,
			map[string]float64{"Ar": 0.01}, map[string]float64{"CO2": 0.05}, map[string]float64{"O2": 150 * 101325.0 / 760}, 0},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			m := mustMixture(t, c.text, c.presPa)
			var sumX, meanM float64
			for _, comp := range m.Components {
				sumX += comp.X
				meanM += comp.X * iupacGPerMol[comp.Species.Formula]
			}
			if math.Abs(sumX-1) > 1e-12 {
				t.Errorf("Σx = %.15g, want 1", sumX)
			}
			for f, want := range c.mole {
				if got := fractionOf(m, f); math.Abs(got-want) > max(c.moleTol, 1e-12) {
					t.Errorf("x(%s) = %.12g, want %.12g", f, got, want)
				}
			}
			for f, want := range c.mass {
				w := fractionOf(m, f) * iupacGPerMol[f] / meanM
				if math.Abs(w-want) > 1e-9 {
					t.Errorf("w(%s) recomputed = %.12g, want %.12g", f, w, want)
				}
			}
			for f, pa := range c.partial {
				if got, want := fractionOf(m, f), pa/c.presPa; math.Abs(got-want) > 1e-12 {
					t.Errorf("x(%s) = %.12g, want p/P = %.12g", f, got, want)
				}
			}
			// The MassFrac the package reports must agree with the
			// hand computation too.
			for _, comp := range m.Components {
				w := comp.X * iupacGPerMol[comp.Species.Formula] / meanM
				if math.Abs(comp.MassFrac-w) > 1e-9 {
					t.Errorf("MassFrac(%s) = %.12g, want %.12g", comp.Species.Formula, comp.MassFrac, w)
				}
			}
		})
	}
}

// A worked number for the mass-only case, so that the hand computation
// above is anchored to an explicit value: equal masses of He and Ar give
// x_He = (1/M_He)/(1/M_He + 1/M_Ar) with the IUPAC weights.
func TestEqualMassHeliumArgon(t *testing.T) {
	m := mustMixture(t, "He 50 wt%, Ar 50 wt%", 1e5)
	want := (1 / 4.002602) / (1/4.002602 + 1/39.95) // = 0.9089337 (by hand)
	if got := fractionOf(m, "He"); math.Abs(got-want) > 1e-12 || math.Abs(got-0.9089337) > 1e-7 {
		t.Errorf("x(He) = %.9f, want %.9f", got, want)
	}
}

func TestBlendErrors(t *testing.T) {
	cases := []struct {
		name   string
		text   string
		presPa float64
		want   error
		token  string // "" means the blend as a whole (Offset −1)
		detail string // a piece the message must hold
	}{
		{"negative mol %", "N2 -5%, O2 bal", 1e5, ErrNegative, "N2 -5%", "-5%"},
		{"negative fraction", "N2 0.8, O2 -0.2", 1e5, ErrNegative, "O2 -0.2", "-0.2"},
		{"negative partial pressure", "N2 bal, O2 -1 kPa", 1e5, ErrNegative, "O2 -1 kPa", "-1 kPa"},
		{"total over 100 %", "N2 80%, O2 30%", 1e5, ErrOver100, "", "110"},
		{"one amount over 100 %", "N2 120%", 1e5, ErrOver100, "N2 120%", "120%"},
		{"mass over 100 %", "CO2 60 wt%, Ar 50 wt%", 1e5, ErrOver100, "", "110"},
		{"partial pressures over total", "N2 0.8 bar, O2 0.3 bar", 1e5, ErrOver100, "", "110"},
		{"nothing left for balance", "CO2 60 wt%, Ar 45%, N2 bal", 1e5, ErrOver100, "", "N2"},
		{"under 100 % without balance", "N2 78%, O2 21%", 1e5, ErrUnder100, "", "99"},
		{"mass under 100 % without balance", "CO2 50 wt%, Ar 40 wt%", 1e5, ErrUnder100, "", "90"},
		{"empty", "", 1e5, ErrEmptyBlend, "", "N2 79%"},
		{"only separators", " , ;\n ", 1e5, ErrEmptyBlend, "", ""},
		{"two balances", "N2 bal, Ar 1%, O2 bal", 1e5, ErrTwoBalances, "O2 bal", "one"},
		{"unknown species", "N2 79%, Oxy2 21%", 1e5, ErrUnknownSpecies, "Oxy2", "O2"},
		{"misspelt species", "Nx2 79%, O2 21%", 1e5, ErrUnknownSpecies, "Nx2", "did you mean N2"},
		{"gauge as partial pressure", "N2 bal, O2 2 barg", 1e5, ErrSyntax, "O2 2 barg", "gauge"},
		{"psig as partial pressure", "N2 bal, O2 2 psig", 1e5, ErrSyntax, "O2 2 psig", "gauge"},
		{"unknown unit", "N2 79 furlongs, O2 bal", 1e5, ErrSyntax, "N2 79 furlongs", "furlongs"},
		{"no amount", "N2, O2 21%", 1e5, ErrSyntax, "N2", "SPECIES AMOUNT"},
		{"two species alone", "N2, O2", 1e5, ErrSyntax, "N2", "whole blend"},
		{"amount not a number", "N2 lots, O2 21%", 1e5, ErrSyntax, "N2 lots", "lots"},
		{"partial pressure without total", "O2 0.2 bar, N2 bal", 0, ErrSyntax, "", "total pressure"},
		// As certificates and European keyboards write amounts.
		{"decimal comma", "N2 79,0 %; O2 21,0 %", 1e5, ErrSyntax, "79,0", "decimals with a point"},
		{"thousands separator", "CO 1,000 ppm, N2 bal", 1e5, ErrSyntax, "1,000", "without thousands separators"},
		{"bare percentage", "N2 79, O2 21", 1e5, ErrOver100, "N2 79", "write 79% for a percentage"},
		{"detection limit", "O2 <5ppm, N2 bal", 1e5, ErrSyntax, "O2 <5ppm", `e.g. "5ppm" for the most there can be`},
		{"uncertainty", "O2 5ppm ±1ppm, N2 bal", 1e5, ErrSyntax, "O2 5ppm ±1ppm", `give the value alone ("5ppm")`},
		{"ASCII uncertainty", "O2 5 ppm +/- 1 ppm, N2 bal", 1e5, ErrSyntax, "O2 5 ppm +/- 1 ppm", `give the value alone ("5 ppm")`},
		// ppt: per trillion in a purity specification, per thousand
		// elsewhere; not guessed.
		{"ppt", "H2O 100 ppt, N2 bal", 1e5, ErrSyntax, "H2O 100 ppt", "1 ppt = 0.001 ppb"},
		{"pptv", "H2O 100pptv, N2 bal", 1e5, ErrSyntax, "H2O 100pptv", "parts per trillion or per thousand"},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			b, err := ParseBlend(c.text)
			if err == nil {
				_, err = b.Resolve(testCatalogue(t), c.presPa)
			}
			if err == nil {
				t.Fatalf("no error, want %v", c.want)
			}
			if !errors.Is(err, c.want) {
				t.Fatalf("error %q, want one wrapping %q", err, c.want)
			}
			var be *BlendError
			if !errors.As(err, &be) {
				t.Fatalf("error %T, want *BlendError", err)
			}
			if c.token == "" {
				if be.Offset != -1 {
					t.Errorf("Offset = %d (token %q), want −1 for the blend as a whole", be.Offset, be.Token)
				}
			} else {
				if be.Token != c.token {
					t.Errorf("Token = %q, want %q", be.Token, c.token)
				}
				if be.Offset < 0 || be.Offset+len(be.Token) > len(c.text) || c.text[be.Offset:be.Offset+len(be.Token)] != be.Token {
					t.Errorf("Offset %d does not index token %q in %q", be.Offset, be.Token, c.text)
				}
			}
			msg := err.Error()
			if !strings.Contains(msg, c.detail) {
				t.Errorf("message %q does not mention %q", msg, c.detail)
			}
			if strings.Contains(msg, "\n") {
				t.Errorf("message %q spans lines", msg)
			}
		})
	}
}

// A species named in words runs up to the first word an amount starts
// with, whatever the spacing; the same blend by formula resolves the same.
func TestSpeciesNamedInWords(t *testing.T) {
	for _, c := range []struct{ words, formulas string }{
		{"nitrous oxide 5%, N2 bal", "N2O 5%, N2 bal"},
		{"sulfur  hexafluoride 1 ppm, nitrogen bal", "SF6 1ppm, N2 bal"},
		{"water vapour dew 10C, N2 bal", "H2O dew 10C, N2 bal"},
		{"hydrogen chloride 0.2 bar, N2 balance", "HCl 0.2 bar, N2 bal"},
	} {
		a, b := mustMixture(t, c.words, 1e5), mustMixture(t, c.formulas, 1e5)
		if len(a.Components) != len(b.Components) {
			t.Fatalf("%q: %d components, %q: %d", c.words, len(a.Components), c.formulas, len(b.Components))
		}
		for i := range a.Components {
			if a.Components[i].Species != b.Components[i].Species || math.Abs(a.Components[i].X-b.Components[i].X) > 1e-15 {
				t.Errorf("%q: component %d %s %g, want %s %g", c.words, i, a.Components[i].Species.Formula, a.Components[i].X, b.Components[i].Species.Formula, b.Components[i].X)
			}
		}
	}
}

// A species listed twice is one species: the merged blend equals the one
// written with the sum, and mixing a gas with itself adds no entropy.
func TestDuplicatesMerge(t *testing.T) {
	cases := []struct {
		name, dup, merged string
	}{
		{"twice N2", "N2 40%, N2 40%, O2 20%", "N2 80%, O2 20%"},
		{"by name and formula", "nitrogen 40%, N2 40%, O2 20%", "N2 80%, O2 20%"},
		{"balance listed again", "N2 bal, O2 20%, N2 10%", "N2 80%, O2 20%"},
		{"mass amounts", "CO2 10 wt%, CO2 10 wt%, N2 bal", "CO2 20 wt%, N2 bal"},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			md, mm := mustMixture(t, c.dup, 1e5), mustMixture(t, c.merged, 1e5)
			if len(md.Components) != len(mm.Components) {
				t.Fatalf("%d components, want %d", len(md.Components), len(mm.Components))
			}
			for _, comp := range mm.Components {
				if got := fractionOf(md, comp.Species.Formula); math.Abs(got-comp.X) > 1e-12 {
					t.Errorf("x(%s) = %.15g, want %.15g", comp.Species.Formula, got, comp.X)
				}
			}
			sd, sm := mustState(t, md, 300, 1e5), mustState(t, mm, 300, 1e5)
			// R Σ x ln x of the merged fractions (definition).
			if !relClose(sd.SMixJPerMolK, sm.SMixJPerMolK, 1e-12, 1e-12) || !relClose(sd.SJPerMolK, sm.SJPerMolK, 1e-12, 0) {
				t.Errorf("S_mix = %g, S = %g; want %g, %g", sd.SMixJPerMolK, sd.SJPerMolK, sm.SMixJPerMolK, sm.SJPerMolK)
			}
		})
	}
	m := mustMixture(t, "N2 50%, N2 50%", 1e5)
	if s := mustState(t, m, 300, 1e5); len(m.Components) != 1 || s.SMixJPerMolK != 0 {
		t.Errorf("N2 with itself: %d components, S_mix = %g; want 1 and 0", len(m.Components), s.SMixJPerMolK)
	}
}

// NewMixture is exported, so callers that build components by hand must
// get the same merge as blend text.
func TestNewMixtureMergesDuplicates(t *testing.T) {
	n2, o2 := mustSpecies(t, "N2"), mustSpecies(t, "O2")
	m, err := NewMixture([]Component{{Species: n2, X: 0.4}, {Species: o2, X: 0.2}, {Species: n2, X: 0.4}})
	if err != nil {
		t.Fatal(err)
	}
	if len(m.Components) != 2 || math.Abs(fractionOf(m, "N2")-0.8) > 1e-15 {
		t.Fatalf("components %+v, want N2 0.8 and O2 0.2", m.Components)
	}
	same, err := NewMixture([]Component{{Species: n2, X: 1}, {Species: n2, X: 3}})
	if err != nil {
		t.Fatal(err)
	}
	if s := mustState(t, same, 300, 1e5); s.SMixJPerMolK != 0 {
		t.Errorf("N2 mixed with N2: S_mix = %g, want 0", s.SMixJPerMolK)
	}
}

func TestNewMixtureErrors(t *testing.T) {
	n2 := mustSpecies(t, "N2")
	cases := []struct {
		name  string
		comps []Component
		want  error
	}{
		{"none", nil, ErrEmptyBlend},
		{"all zero", []Component{{Species: n2, X: 0}}, ErrEmptyBlend},
		{"negative", []Component{{Species: n2, X: -1}}, ErrNegative},
		{"NaN", []Component{{Species: n2, X: math.NaN()}}, ErrNotFinite},
		{"infinite", []Component{{Species: n2, X: math.Inf(1)}}, ErrNotFinite},
		{"overflowing sum", []Component{{Species: n2, X: math.MaxFloat64}, {Species: n2, X: math.MaxFloat64}}, ErrNotFinite},
	}
	for _, c := range cases {
		if _, err := NewMixture(c.comps); !errors.Is(err, c.want) {
			t.Errorf("%s: error %v, want %v", c.name, err, c.want)
		}
	}
}

// Item offsets index the items in the text, whatever the separators and
// spacing, and the amount text is kept as typed.
func TestParseBlendItems(t *testing.T) {
	text := "  N2 78.08 %;O2 20.95%,\n  Ar  0.97%  "
	b, err := ParseBlend(text)
	if err != nil {
		t.Fatal(err)
	}
	want := []struct{ key, amount, item string }{
		{"N2", "78.08 %", "N2 78.08 %"},
		{"O2", "20.95%", "O2 20.95%"},
		{"Ar", "0.97%", "Ar  0.97%"},
	}
	if len(b.Items) != len(want) {
		t.Fatalf("%d items, want %d", len(b.Items), len(want))
	}
	for i, w := range want {
		it := b.Items[i]
		if it.Key != w.key || it.Text != w.amount || text[it.Offset:it.Offset+it.Length] != w.item {
			t.Errorf("item %d = key %q amount %q at %q; want %q %q %q", i, it.Key, it.Text, text[it.Offset:it.Offset+it.Length], w.key, w.amount, w.item)
		}
	}
}
