package mixtures

import (
	"reflect"
	"strings"
	"testing"

	"zmix/model"
)

// Cautions follow the hazard classes of the catalogue (from the safety
// data sheets) and the thresholds of cautions.go: 19.5 % and 23.5 % O2
// for breathing atmospheres and 0.5 bar gauge for stored pressure, both
// common practice.
func TestCautions(t *testing.T) {
	cases := []struct {
		name   string
		blend  string
		presPa float64
		want   []string // caution titles, in order
	}{
		{"dry air", dryAir, atmPa, nil},
		{"dry air just under 0.5 barg", dryAir, atmPa + 0.5e5, nil},
		{"dry air just over 0.5 barg", dryAir, atmPa + 0.5e5 + 1, []string{"Pressure"}},
		{"nitrogen", "N2 100%", atmPa, []string{"Asphyxiant"}},
		{"argon at 2 barg", "Ar bal", atmPa + 2e5, []string{"Asphyxiant", "Pressure"}},
		{"oxygen-deficient air", "O2 19%, N2 bal", atmPa, []string{"Asphyxiant"}},
		{"air at the deficiency limit", "O2 19.5%, N2 bal", atmPa, nil},
		{"enriched air", "O2 30%, N2 bal", atmPa, []string{"Oxidizer", "Oxygen-enriched"}},
		{"forming gas", "H2 5%, N2 bal", atmPa, []string{"Flammable", "Asphyxiant"}},
		{"hydrogen in air", "H2 2%, O2 20.9%, N2 bal", atmPa, []string{"Flammable", "Fuel with oxidizer"}},
		// No asphyxiant-class species, but no oxygen either: still a caution.
		{"ammonia alone", "NH3 100%", atmPa, []string{"Flammable", "Toxic", "Corrosive", "Asphyxiant"}},
		{"demo feed", DemoFile().BlendText(), 1.4e5, []string{"Pyrophoric", "Flammable", "Toxic", "Corrosive", "Asphyxiant"}},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			var got []string
			for _, ca := range Cautions(mustMixture(t, c.blend, c.presPa), c.presPa) {
				got = append(got, ca.Title)
				if ca.Text == "" {
					t.Errorf("%s caution has no text", ca.Title)
				}
			}
			if !reflect.DeepEqual(got, c.want) {
				t.Errorf("cautions %q, want %q", got, c.want)
			}
		})
	}
}

// The demo blend names the species behind each caution.
func TestDemoCautionSpecies(t *testing.T) {
	f := DemoFile()
	m := mustMixture(t, f.BlendText(), 1.4e5)
	bySpecies := map[string][]string{}
	for _, c := range Cautions(m, 1.4e5) {
		bySpecies[c.Title] = c.Species
	}
	for title, formula := range map[string]string{"Pyrophoric": "SiH4", "Flammable": "SiH4", "Toxic": "NH3", "Corrosive": "NH3", "Asphyxiant": "N2"} {
		found := false
		for _, f := range bySpecies[title] {
			found = found || f == formula
		}
		if !found {
			t.Errorf("%s caution lists %q, want %s among them", title, bySpecies[title], formula)
		}
	}
	// The demo's species come from the built-in catalogue, and its hazard
	// classes drive the cautions: check they are what the data sheets say.
	for formula, h := range map[string]model.Hazard{"SiH4": model.Pyrophoric | model.Flammable, "NH3": model.Toxic | model.Corrosive} {
		if sp := mustSpecies(t, formula); sp.Hazards&h != h {
			t.Errorf("%s hazards %v, want at least %v (safety data sheet, from memory)", formula, sp.Hazards, h)
		}
	}
}

// Callers close every caution block with DeferLine, which defers to site
// codes, the safety data sheets and licensed practice.
func TestDeferLineAndFormat(t *testing.T) {
	for _, want := range []string{"codes", "safety data sheet", "licensed"} {
		if !strings.Contains(DeferLine, want) {
			t.Errorf("DeferLine %q does not mention %q", DeferLine, want)
		}
	}
	cs := Cautions(mustMixture(t, "N2 bal", atmPa), 3e5)
	if len(cs) == 0 {
		t.Fatal("no cautions for nitrogen at 3 bar")
	}
	if got := FormatCaution(cs[0]); !strings.HasPrefix(got, "Asphyxiant (N2): ") {
		t.Errorf("first caution %q, want it to start \"Asphyxiant (N2): \"", got)
	}
	if got := FormatCaution(Caution{Title: "Pressure", Text: "x"}); got != "Pressure: x" {
		t.Errorf("caution without species: %q", got)
	}
}

// TestFlammableCautionCitesIgnition: the Flammable caution cites the
// autoignition screen of package safety, except where a pyrophoric
// component has its own caution. Forming gas takes hydrogen's 500 °C
// (773 K, NFPA 325, from memory): T1.
func TestFlammableCautionCitesIgnition(t *testing.T) {
	for _, c := range []struct {
		blend, want string
		cites       bool
	}{
		{"H2 5%, N2 bal", "Autoignition: lowest of the components 500 °C (773 K, H2): temperature class T1", true},
		{"SiH4 2%, N2 bal", "Autoignition", false},
	} {
		for _, ca := range Cautions(mustMixture(t, c.blend, atmPa), atmPa) {
			if ca.Title != "Flammable" {
				continue
			}
			if strings.Contains(ca.Text, c.want) != c.cites {
				t.Errorf("%s: Flammable caution %q; citing %q: want %v", c.blend, ca.Text, c.want, c.cites)
			}
		}
	}
}
