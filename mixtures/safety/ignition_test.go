package safety

import (
	"slices"
	"strings"
	"testing"

	"zmix/model"
)

// TestTemperatureClass checks the class bounds, each side of each bound:
// IEC 60079-20-1 temperature classes, from memory (T1 > 450 °C, T2 > 300,
// T3 > 200, T4 > 135, T5 > 100, T6 > 85). A gas whose autoignition
// temperature equals a bound belongs to the next, stricter class: the
// hottest surface of that class's equipment would reach it.
func TestTemperatureClass(t *testing.T) {
	tests := []struct {
		aitC  float64
		class string
		ok    bool
	}{
		{651, "T1", true}, // NH3 in the catalogue (NFPA 325, from memory)
		{450.5, "T1", true},
		{450, "T2", true},
		{300.5, "T2", true},
		{300, "T3", true},
		{200.5, "T3", true},
		{200, "T4", true},
		{135.5, "T4", true},
		{135, "T5", true},
		{100.5, "T5", true},
		{100, "T6", true},
		{85.5, "T6", true},
		{85, "", false},
		{38, "", false}, // B2H6's lower end (NFPA 325, from memory)
	}
	for _, tt := range tests {
		class, ok := TemperatureClass(tt.aitC)
		if class != tt.class || ok != tt.ok {
			t.Errorf("TemperatureClass(%g °C) = %q, %v; want %q, %v", tt.aitC, class, ok, tt.class, tt.ok)
		}
	}
}

// TestIgnitionScreen checks the blend's autoignition screen: the lowest
// figure among the flammable components present, whose it is, and when
// the class stays undecided.
func TestIgnitionScreen(t *testing.T) {
	hot := fixture("F1", model.Flammable, model.SafetyData{LFLPct: 5, UFLPct: 15, AutoIgnitionK: 800})
	warm := fixture("F2", model.Flammable, model.SafetyData{LFLPct: 2, UFLPct: 10, AutoIgnitionK: 560})
	blank := fixture("F3", model.Flammable, model.SafetyData{LFLPct: 3, UFLPct: 12})
	pyro := fixture("F4", model.Flammable|model.Pyrophoric, model.SafetyData{LFLPct: 1, UFLPct: 100, AutoIgnitionK: 311})
	inert := fixture("N0", 0, model.SafetyData{Ki: 1})
	tests := []struct {
		name       string
		parts      []Part
		lowestK    float64
		species    string
		class      string
		decided    bool
		inVerdict  string
		unknown    []string
		pyrophoric []string
	}{
		// 800 K is 526.85 °C: above 450, T1.
		{"one fuel", []Part{{hot, 0.1}, {inert, 0.9}}, 800, "F1", "T1", true, "T1 by that figure", nil, nil},
		// 560 K is 286.85 °C: above 200, not above 300, T3; the lower of
		// the two sets the class.
		{"lowest wins", []Part{{hot, 0.05}, {warm, 0.05}, {inert, 0.9}}, 560, "F2", "T3", true, "287 °C (560 K, F2)", nil, nil},
		// A fuel with no figure could be lower: the class is a floor only,
		// undecided.
		{"one unknown", []Part{{hot, 0.05}, {blank, 0.05}}, 800, "F1", "T1", false, "T1 or stricter", []string{"F3"}, nil},
		{"only unknown", []Part{{blank, 0.05}, {inert, 0.95}}, 0, "", "", false, "not known: no autoignition temperature for F3", []string{"F3"}, nil},
		// A pyrophoric fuel ignites at room temperature whatever its
		// tabulated figure.
		{"pyrophoric", []Part{{hot, 0.05}, {pyro, 0.01}, {inert, 0.94}}, 800, "F1", "", false, "ignites in air at room temperature", nil, []string{"F4"}},
		// A fuel at zero fraction is not in the blend.
		{"absent fuel", []Part{{hot, 0.1}, {warm, 0}, {inert, 0.9}}, 800, "F1", "T1", true, "T1 by that figure", nil, nil},
		{"no fuel", []Part{{inert, 1}}, 0, "", "", false, "", nil, nil},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			r := Classify(tt.parts)
			ig := r.Ignition
			if ig.LowestK != tt.lowestK || ig.Species != tt.species {
				t.Errorf("lowest %g K of %q; want %g K of %q", ig.LowestK, ig.Species, tt.lowestK, tt.species)
			}
			if class, decided := ig.Class(); class != tt.class || decided != tt.decided {
				t.Errorf("class %q, decided %v; want %q, %v", class, decided, tt.class, tt.decided)
			}
			if !slices.Equal(ig.Unknown, tt.unknown) || !slices.Equal(ig.Pyrophoric, tt.pyrophoric) {
				t.Errorf("unknown %v, pyrophoric %v; want %v, %v", ig.Unknown, ig.Pyrophoric, tt.unknown, tt.pyrophoric)
			}
			if v := ig.Verdict(); tt.inVerdict != "" && !strings.Contains(v, tt.inVerdict) {
				t.Errorf("verdict %q; want it to hold %q", v, tt.inVerdict)
			}
		})
	}
}

// TestIgnitionFromCatalogue runs the screen on the catalogue's figures:
// the natural-gas-like blend of TestLeChatelier takes propane's 723 K
// (450 °C, NFPA 325, from memory), which is not above 450 °C: T2.
func TestIgnitionFromCatalogue(t *testing.T) {
	r := Classify(blend(t, "CH4", 0.85, "C2H6", 0.10, "C3H8", 0.05))
	if r.Ignition.LowestK != 723 || r.Ignition.Species != "C3H8" {
		t.Errorf("natural gas: lowest %g K of %s; want 723 K of C3H8", r.Ignition.LowestK, r.Ignition.Species)
	}
	if class, ok := r.Ignition.Class(); class != "T2" || !ok {
		t.Errorf("natural gas: class %q (%v); want T2", class, ok)
	}
	for _, f := range []string{"CH4", "C2H6", "C3H8"} {
		if !slices.ContainsFunc(r.Sources, func(s string) bool { return strings.HasPrefix(s, f+" autoign_K: ") }) {
			t.Errorf("no source listed for %s's autoignition temperature: %v", f, r.Sources)
		}
	}
	if !slices.Contains(r.Sources, MethodLowestAIT) || !slices.Contains(r.Sources, MethodTClass) {
		t.Errorf("the ignition methods are not cited: %v", r.Sources)
	}
}

// TestSpeciesFigures checks that each component's figures come through
// in the blend's order, with the LC50 on its 4 h basis, and that every
// figure shown has its source listed.
func TestSpeciesFigures(t *testing.T) {
	parts := blend(t, "NH3", 0.05, "O2", 0.2, "N2", 0.75)
	r := Classify(parts)
	if len(r.Figures) != 3 {
		t.Fatalf("%d figures for 3 components", len(r.Figures))
	}
	for i, f := range r.Figures {
		if f.Formula != parts[i].Species.Formula || f.X != parts[i].X {
			t.Errorf("figures[%d] = %s at %g; want %s at %g", i, f.Formula, f.X, parts[i].Species.Formula, parts[i].X)
		}
	}
	nh3 := r.Figures[0]
	want, converted := sp(t, "NH3").Safety.LC50.FourHourPPM()
	if !nh3.Toxic || nh3.LC50FourHourPPM != want || nh3.LC50Converted != converted {
		t.Errorf("NH3 LC50 %g (converted %v); want %g (%v), as the GHS formula uses it", nh3.LC50FourHourPPM, nh3.LC50Converted, want, converted)
	}
	if !r.Figures[1].Oxidizer || r.Figures[1].Ci != 1 {
		t.Errorf("O2: oxidizer %v, Ci %g; want the reference oxidizer, Ci 1", r.Figures[1].Oxidizer, r.Figures[1].Ci)
	}
	for _, want := range []string{"NH3 autoign_K: ", "NH3 lc50_ppm: ", "O2 ci: ", "N2 ki: "} {
		if !slices.ContainsFunc(r.Sources, func(s string) bool { return strings.HasPrefix(s, want) }) {
			t.Errorf("no source line %q…: %v", want, r.Sources)
		}
	}
}
