package safety

import (
	"math"
	"slices"
	"strings"
	"testing"

	"zmix/model"
)

func sp(t testing.TB, formula string) *model.Species {
	t.Helper()
	s, ok := model.Builtin().Lookup(formula)
	if !ok {
		t.Fatalf("species %s not in the catalogue", formula)
	}
	return s
}

func blend(t testing.TB, pairs ...any) []Part {
	t.Helper()
	var out []Part
	for i := 0; i < len(pairs); i += 2 {
		out = append(out, Part{sp(t, pairs[i].(string)), pairs[i+1].(float64)})
	}
	return out
}

// fixture is a species made for a test, with only the figures a case needs.
func fixture(formula string, h model.Hazard, sd model.SafetyData) *model.Species {
	return &model.Species{Formula: formula, Hazards: h, Safety: sd, Sources: map[string]string{"lfl_pct": "test fixture"}}
}

const close = 1e-3 // relative

func near(got, want, tol float64) bool { return math.Abs(got-want) <= tol*math.Abs(want) }

// TestLeChatelier checks the rule against worked examples.
func TestLeChatelier(t *testing.T) {
	// D. A. Crowl, J. F. Louvar, Chemical Process Safety (2nd ed., 2002),
	// worked example of Le Chatelier's rule (from memory): 0.8 % hexane,
	// 2.0 % methane and 0.5 % ethylene in air, with limits 1.2-7.5,
	// 5.3-15 and 3.1-32 %: LFL 2.75 %, UFL 12.9 % of the fuel part.
	hexane := fixture("C6H14", model.Flammable, model.SafetyData{LFLPct: 1.2, UFLPct: 7.5})
	methane := fixture("CH4", model.Flammable, model.SafetyData{LFLPct: 5.3, UFLPct: 15})
	ethylene := fixture("C2H4", model.Flammable, model.SafetyData{LFLPct: 3.1, UFLPct: 32})
	r := Classify([]Part{{hexane, 0.008}, {methane, 0.020}, {ethylene, 0.005}})
	if !near(r.FuelLFLPct, 2.75, 0.01) || !near(r.FuelUFLPct, 12.9, 0.01) {
		t.Errorf("Crowl-Louvar example: LFL %.4g, UFL %.4g; want 2.75, 12.9 (within 1 %%, the book's rounding)", r.FuelLFLPct, r.FuelUFLPct)
	}

	// A natural-gas-like blend, 85 % CH4, 10 % C2H6, 5 % C3H8, with the
	// catalogue's BuM627 limits (5.0-15.0, 3.0-12.4, 2.1-9.5 %); hand
	// calculation of the rule: LFL = 1/(0.85/5 + 0.10/3 + 0.05/2.1)
	// = 4.4025 %, UFL = 1/(0.85/15 + 0.10/12.4 + 0.05/9.5) = 14.287 %.
	r = Classify(blend(t, "CH4", 0.85, "C2H6", 0.10, "C3H8", 0.05))
	if !near(r.LFLPct, 4.4025, close) || !near(r.UFLPct, 14.287, close) {
		t.Errorf("natural gas: LFL %.5g, UFL %.5g; want 4.4025, 14.287 (hand calculation)", r.LFLPct, r.UFLPct)
	}
	if r.Stored != StoredNoOxidizer {
		t.Errorf("natural gas stored: %v", r.Stored)
	}
	// Air to reach the LFL: 100/4.4025 − 1 = 21.71 volumes per volume.
	if !near(r.AirToLFL, 100/4.4025-1, close) {
		t.Errorf("air to LFL = %g, want %g", r.AirToLFL, 100/4.4025-1)
	}
	if !r.Recalled {
		t.Error("the limits are recalled; Recalled should say so")
	}

	// 4 % H2 in N2: the fuel part has H2's limits, and the blend reaches
	// 4 % H2 only undiluted: LFL of the blend = 4/0.04 = 100 %.
	r = Classify(blend(t, "H2", 0.04, "N2", 0.96))
	if !r.ReachesLFL || !near(r.LFLPct, 100, 1e-9) {
		t.Errorf("4 %% H2: reaches %v, LFL %g; want true, 100", r.ReachesLFL, r.LFLPct)
	}
	r = Classify(blend(t, "H2", 0.02, "N2", 0.98))
	if r.ReachesLFL || r.AirToLFL != 0 {
		t.Errorf("2 %% H2: reaches %v, air %g; want false, 0", r.ReachesLFL, r.AirToLFL)
	}
}

func TestStoredInsideRange(t *testing.T) {
	cases := []struct {
		name  string
		parts []any
		want  Stored
	}{
		{"10 % H2 in air, inside 4-75 %", []any{"H2", 0.10, "O2", 0.19, "N2", 0.71}, StoredInside},
		{"2 % H2 in air, below 4 %", []any{"H2", 0.02, "O2", 0.20, "N2", 0.78}, StoredBelow},
		{"90 % H2 with O2, above 75 % in air terms", []any{"H2", 0.90, "O2", 0.10}, StoredAbove},
		{"methane in nitrogen, no oxidizer", []any{"CH4", 0.10, "N2", 0.90}, StoredNoOxidizer},
		{"nitrogen alone", []any{"N2", 1.0}, StoredNoFuel},
	}
	for _, c := range cases {
		if got := Classify(blend(t, c.parts...)).Stored; got != c.want {
			t.Errorf("%s: %v, want %v", c.name, got, c.want)
		}
	}
}

// TestISO10156 checks mixtures whose answer is not in doubt, and the
// sums by hand from the formula with the catalogue's coefficients.
func TestISO10156(t *testing.T) {
	cases := []struct {
		name      string
		parts     []any
		flam      bool
		flamSum   float64
		oxidizing bool
		oxSum     float64
		source    string
	}{
		// Tci(H2) = 5.5 % (ISO 10156, from memory): 2/5.5 and 10/5.5.
		{"2 % H2 in N2", []any{"H2", 0.02, "N2", 0.98}, false, 2 / 5.5, false, 0, "not flammable (issue 10, not in doubt)"},
		{"10 % H2 in N2", []any{"H2", 0.10, "N2", 0.90}, true, 10 / 5.5, false, 0, "flammable (issue 10, not in doubt)"},
		// Argon dilutes less than nitrogen (Ki 0.55): 5 % H2 in Ar is
		// A' = 5/(5 + 0.55·95) = 8.73 %, 1.59 Tci: flammable.
		{"5 % H2 in Ar", []any{"H2", 0.05, "Ar", 0.95}, true, 5 / (5 + 0.55*95) * 100 / 5.5, false, 0, "hand calculation"},
		// CO2 dilutes more (Ki 1.5): 6 % H2 in CO2 is 6/(6+1.5·94)/5.5.
		{"6 % H2 in CO2", []any{"H2", 0.06, "CO2", 0.94}, false, 6 / (6 + 1.5*94) * 100 / 5.5, false, 0, "hand calculation"},
		{"30 % O2 in N2", []any{"O2", 0.30, "N2", 0.70}, false, 0, true, 0.30, "more oxidizing than air (issue 10, not in doubt)"},
		{"21 % O2 in N2", []any{"O2", 0.21, "N2", 0.79}, false, 0, false, 0.21, "not more oxidizing than air (issue 10, not in doubt)"},
		// N2O Ci 0.6, F2 Ci 40 (ISO 10156, from memory): 0.3·0.6 + 0.01·40.
		{"30 % N2O, 1 % F2", []any{"N2O", 0.30, "F2", 0.01, "N2", 0.69}, false, 0, true, 0.3*0.6 + 0.01*40, "hand calculation"},
	}
	for _, c := range cases {
		r := Classify(blend(t, c.parts...))
		if !r.FlamKnown || r.FlamInAir != c.flam || !near(r.FlamSum, c.flamSum, 1e-9) && c.flamSum != 0 || c.flamSum == 0 && r.FlamSum != 0 {
			t.Errorf("%s: flammable %v (known %v), sum %.6g; want %v, %.6g (%s)", c.name, r.FlamInAir, r.FlamKnown, r.FlamSum, c.flam, c.flamSum, c.source)
		}
		if !r.OxKnown || r.Oxidizing != c.oxidizing || !near(r.OxSum, c.oxSum, 1e-9) && c.oxSum != 0 || c.oxSum == 0 && r.OxSum != 0 {
			t.Errorf("%s: oxidizing %v (known %v), sum %.6g; want %v, %.6g (%s)", c.name, r.Oxidizing, r.OxKnown, r.OxSum, c.oxidizing, c.oxSum, c.source)
		}
	}
}

func TestISO10156NotKnown(t *testing.T) {
	// SiH4 has no Tci in the catalogue, and its LFL is 1.37 %: the sum
	// lies between A'/100 (no flammable gas's Tci reaches 100 %) and
	// A'/LFL. For 2 % SiH4 in N2 that is 0.02 to 2/1.37, which cannot be
	// decided.
	r := Classify(blend(t, "SiH4", 0.02, "N2", 0.98))
	if r.FlamKnown || !strings.Contains(r.FlamVerdict(), "not known") || !r.FlamSumMaxKnown || !near(r.FlamSumMax, 2/1.37, 1e-9) {
		t.Errorf("2 %% SiH4: known %v, at most %g, %q; want not known, at most %g (hand calculation)", r.FlamKnown, r.FlamSumMax, r.FlamVerdict(), 2/1.37)
	}
	// 1 % SiH4 in N2: at most 1/1.37 = 0.73, so not flammable in air,
	// however high its Tci (hand calculation).
	r = Classify(blend(t, "SiH4", 0.01, "N2", 0.99))
	if !r.FlamKnown || r.FlamInAir || !near(r.FlamSumMax, 1/1.37, 1e-9) || !strings.Contains(r.FlamVerdict(), "at most 0.73") || !slices.Contains(r.Sources, MethodTciBound) {
		t.Errorf("1 %% SiH4: known %v, flammable %v, at most %g, %q; want not flammable, at most %g, with the bound named", r.FlamKnown, r.FlamInAir, r.FlamSumMax, r.FlamVerdict(), 1/1.37)
	}
	// 2 % SiH4 and 20 % NH3 (LFL 15 %) in N2: between (2 + 20)/100 =
	// 0.22 and 2/1.37 + 20/15 = 2.79.
	r = Classify(blend(t, "SiH4", 0.02, "NH3", 0.20, "N2", 0.78))
	if want := 2/1.37 + 20/15.0; r.FlamKnown || !near(r.FlamSumMax, want, 1e-9) || !near(r.FlamSumMin, 0.22, 1e-12) || !strings.Contains(r.FlamVerdict(), "between 0.22 and 2.79") {
		t.Errorf("SiH4 + NH3: known %v, at least %g, at most %g, %q; want not known, between 0.22 and %g", r.FlamKnown, r.FlamSumMin, r.FlamSumMax, r.FlamVerdict(), want)
	}
	// Pure silane, and silane with ammonia alone, neither with a Tci:
	// each missing term A'i/Tci is above A'i/100, so the sum is above
	// 100/100 = 1 and the gas is flammable in air, as a gas with a
	// flammable range in air must be. Half silane in nitrogen is above
	// only 0.5, and stays undecided.
	for _, b := range [][]any{{"SiH4", 1.0}, {"SiH4", 0.5, "NH3", 0.5}} {
		r = Classify(blend(t, b...))
		if !r.FlamKnown || !r.FlamInAir || !strings.Contains(r.FlamVerdict(), "above 1 >= 1") || !slices.Contains(r.Sources, MethodTciBound) {
			t.Errorf("%v: known %v, flammable %v, %q; want flammable, the sum above 1, the bound named", b, r.FlamKnown, r.FlamInAir, r.FlamVerdict())
		}
	}
	r = Classify(blend(t, "SiH4", 0.5, "N2", 0.5))
	if r.FlamKnown || !strings.Contains(r.FlamVerdict(), "between 0.5 and") {
		t.Errorf("50 %% SiH4: known %v, %q; want undecided, between 0.5 and A'/LFL", r.FlamKnown, r.FlamVerdict())
	}
	// GeH4 has neither Tci nor LFL: no upper bound.
	r = Classify(blend(t, "GeH4", 0.001, "N2", 0.999))
	if r.FlamKnown || r.FlamSumMaxKnown {
		t.Errorf("GeH4: known %v, bounded %v; want neither", r.FlamKnown, r.FlamSumMaxKnown)
	}
	// With 10 % H2 beside it the known part already exceeds 1.
	r = Classify(blend(t, "SiH4", 0.01, "H2", 0.10, "N2", 0.89))
	if !r.FlamKnown || !r.FlamInAir || !strings.Contains(r.FlamVerdict(), "at least") {
		t.Errorf("SiH4 + 10 %% H2: known %v, flammable %v, %q", r.FlamKnown, r.FlamInAir, r.FlamVerdict())
	}
	// HCl is not an inert gas with a Ki: it is not counted as a diluent.
	r = Classify(blend(t, "H2", 0.05, "HCl", 0.50, "N2", 0.45))
	if want := 5 / (5 + 45.0) * 100 / 5.5; !near(r.FlamSum, want, 1e-9) || len(r.NotDiluents) != 1 {
		t.Errorf("H2 + HCl: sum %g, want %g; not diluents %v", r.FlamSum, want, r.NotDiluents)
	}
}

// TestGHSAdditivity checks the formula against hand calculations.
func TestGHSAdditivity(t *testing.T) {
	// 1 % PH3 and 5 % HCl in N2. LC50 1 h (ISO 10298, from memory): PH3 20,
	// HCl 2810 ppm, halved to 4 h: 10 and 1405. By hand:
	// 100/LC50 = 1/10 + 5/1405 = 0.1035587, LC50 = 965.64 ppm, Category 3.
	r := Classify(blend(t, "PH3", 0.01, "HCl", 0.05, "N2", 0.94))
	if !r.LC50Known || !near(r.LC50PPM, 965.64, 1e-4) || r.Category != 3 {
		t.Errorf("PH3 + HCl: LC50 %.6g, category %d; want 965.64, 3 (hand calculation)", r.LC50PPM, r.Category)
	}
	if len(r.Converted) != 2 || !strings.Contains(r.ToxVerdict(), "halved") {
		t.Errorf("the 1 h conversion is not said: %v, %q", r.Converted, r.ToxVerdict())
	}
	// 500 ppm H2S in N2: 100/LC50 = 0.05/356, LC50 = 712 000 ppm: not classified.
	r = Classify(blend(t, "H2S", 0.0005, "N2", 0.9995))
	if !near(r.LC50PPM, 712000, 1e-9) || r.Category != 0 {
		t.Errorf("500 ppm H2S: LC50 %g, category %d; want 712000, 0", r.LC50PPM, r.Category)
	}
	// 20 % NO (no LC50 in the catalogue) with 1 % Cl2: 20 % of unknown
	// toxicity, so GHS's corrected formula: (100 − 20)/LC50 = 1/146.5,
	// LC50 = 80 × 146.5 = 11 720 ppm.
	r = Classify(blend(t, "NO", 0.20, "Cl2", 0.01, "N2", 0.79))
	if !near(r.LC50PPM, 11720, 1e-9) || !near(r.UnknownToxPct, 20, 1e-9) || !strings.Contains(r.ToxVerdict(), "unknown acute toxicity") {
		t.Errorf("NO + Cl2: LC50 %g, unknown %g %%, %q", r.LC50PPM, r.UnknownToxPct, r.ToxVerdict())
	}
	// A trace so small that 100/Σ overflows: not classified, and the
	// verdict prints no infinite number.
	r = Classify(blend(t, "NH3", 1e-310, "N2", 1.0))
	if r.Category != 0 || strings.Contains(r.ToxVerdict(), "Inf") || !strings.Contains(r.ToxVerdict(), "above 1e12 ppm") {
		t.Errorf("a trace of NH3: category %d, %q", r.Category, r.ToxVerdict())
	}
	// No toxic component: nothing to classify.
	r = Classify(blend(t, "N2", 1.0))
	if r.LC50Known || r.Category != 0 || len(r.Sources) != 0 {
		t.Errorf("N2: %+v", r)
	}
}

func TestGHSCategory(t *testing.T) {
	// UN GHS Table 3.1.1, gases, ppmV (4 h).
	cases := []struct {
		ppm  float64
		want int
	}{{20, 1}, {100, 1}, {100.1, 2}, {500, 2}, {2500, 3}, {2501, 4}, {20000, 4}, {20001, 0}}
	for _, c := range cases {
		if got := GHSCategory(c.ppm); got != c.want {
			t.Errorf("GHSCategory(%g) = %d, want %d", c.ppm, got, c.want)
		}
	}
}

func TestClassifySourcesAndFlags(t *testing.T) {
	r := Classify(blend(t, "SiH4", 0.02, "PH3", 0.001, "HCl", 0.01, "N2", 0.969))
	if strings.Join(r.Pyrophorics, ",") != "SiH4,PH3" || strings.Join(r.Corrosives, ",") != "HCl" {
		t.Errorf("flags: pyrophoric %v, corrosive %v", r.Pyrophorics, r.Corrosives)
	}
	joined := strings.Join(r.Sources, "\n")
	for _, want := range []string{MethodLeChatelier, MethodISOFlam, MethodGHSTox, "PH3 lc50_ppm: ISO 10298, from memory", "N2 ki: ISO 10156"} {
		if !strings.Contains(joined, want) {
			t.Errorf("sources lack %q:\n%s", want, joined)
		}
	}
	for _, l := range r.Summary() {
		if strings.Contains(l, "NaN") || strings.Contains(l, "Inf") {
			t.Errorf("summary line %q", l)
		}
	}
}

// A lean fuel in an inert balance burns in air from its LFL up to the
// undiluted blend: Le Chatelier's UFL/F (75 %/0.10 = 750 % for 10 % H2,
// limits 4-75 % from the catalogue) lies past it, and the text says so
// rather than print a limit of 100 %.
func TestBlendRangeText(t *testing.T) {
	tests := []struct {
		name string
		r    Result
		want string
	}{
		{"beyond the blend", Result{LFLPct: 40, UFLPct: 100}, "from 40 % of blend in air up to the undiluted blend"},
		{"within", Result{LFLPct: 10, UFLPct: 30}, "10-30 % of blend in air"},
	}
	for _, tt := range tests {
		if got := tt.r.BlendRange(); got != tt.want {
			t.Errorf("%s: %q, want %q", tt.name, got, tt.want)
		}
	}
}
