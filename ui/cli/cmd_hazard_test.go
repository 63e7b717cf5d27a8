package cli

import (
	"encoding/json"
	"strings"
	"testing"
)

func hazardJSONOf(t *testing.T, blend string) map[string]any {
	t.Helper()
	code, stdout, stderr := zmix(t, "hazard", "--blend", blend, "--json")
	if code != 0 {
		t.Fatalf("zmix hazard %q: exit %d, %s", blend, code, stderr)
	}
	var obj map[string]any
	if err := json.Unmarshal([]byte(stdout), &obj); err != nil {
		t.Fatalf("zmix hazard --json: %v\n%s", err, stdout)
	}
	return obj
}

// TestHazardJSON checks the keys issue 10 asks for, and the answers that
// are not in doubt: 2 % H2 in N2 is not flammable in air, 10 % is; 30 %
// O2 in N2 is more oxidizing than air, 21 % is not.
func TestHazardJSON(t *testing.T) {
	for _, key := range []string{"lfl_percent", "ufl_percent", "flammable_in_air", "flammability_sum", "oxidizing", "oxidizing_sum", "lc50_ppm", "ghs_inhalation_category", "sources"} {
		if _, ok := hazardJSONOf(t, "N2 100%")[key]; !ok {
			t.Errorf("key %q missing", key)
		}
	}
	cases := []struct {
		blend, key string
		want       any
	}{
		{"H2 2%, N2 bal", "flammable_in_air", false},
		{"H2 10%, N2 bal", "flammable_in_air", true},
		{"O2 30%, N2 bal", "oxidizing", true},
		{"O2 21%, N2 bal", "oxidizing", false},
		{"N2 100%", "lfl_percent", nil}, // nothing flammable
		{"N2 100%", "lc50_ppm", nil},    // nothing toxic
		{"N2 100%", "ghs_inhalation_category", nil},
		{"SiH4 2%, N2 bal", "flammable_in_air", nil},   // no Tci for SiH4, and 2/LFL > 1: not known
		{"SiH4 1%, N2 bal", "flammable_in_air", false}, // at most 1/LFL = 1/1.37 <= 1
		{"SiH4 1%, N2 bal", "flammability_sum_at_most", 1 / 1.37},
		{"SiH4 1%, N2 bal", "flammability_sum", nil},
		{"SiH4 2%, N2 bal", "flammability_sum_at_least", 0.02}, // A'/100: no Tci reaches 100 %
		{"SiH4 100%", "flammable_in_air", true},                // above 100/100 = 1: a flammable gas burns undiluted
		{"PH3 1%, HCl 5%, N2 bal", "ghs_inhalation_category", 3.0},
		{"CH4 85%, C2H6 10%, C3H8 5%", "ufl_percent", 14.28689},
		// The lowest autoignition figure, propane's 450 °C (NFPA 325, from
		// memory), not above T1's 450 °C: T2.
		{"CH4 85%, C2H6 10%, C3H8 5%", "autoignition_lowest_K", 723.0},
		{"CH4 85%, C2H6 10%, C3H8 5%", "autoignition_lowest_species", "C3H8"},
		{"CH4 85%, C2H6 10%, C3H8 5%", "temperature_class", "T2"},
		{"CH4 90%, D2 10%", "temperature_class", nil},     // no figure for D2: undecided
		{"SiH4 2%, N2 bal", "autoignition_lowest_K", nil}, // pyrophoric
	}
	for _, c := range cases {
		got := hazardJSONOf(t, c.blend)[c.key]
		if f, ok := c.want.(float64); ok {
			g, _ := got.(float64)
			if g < f*0.9999 || g > f*1.0001 {
				t.Errorf("%s: %s = %v, want %v", c.blend, c.key, got, c.want)
			}
			continue
		}
		if got != c.want {
			t.Errorf("%s: %s = %v, want %v", c.blend, c.key, got, c.want)
		}
	}
}

// TestHazardSpeciesJSON checks each component's figures in the JSON: in
// the blend's order, null where a figure does not apply, the LC50 on its
// 4 h basis.
func TestHazardSpeciesJSON(t *testing.T) {
	obj := hazardJSONOf(t, "NH3 5%, N2 bal")
	list, ok := obj["species"].([]any)
	if !ok || len(list) != 2 {
		t.Fatalf("species = %v, want two entries", obj["species"])
	}
	nh3, n2 := list[0].(map[string]any), list[1].(map[string]any)
	if nh3["formula"] != "NH3" || nh3["mole_fraction"] != 0.05 || nh3["flammable"] != true || nh3["toxic"] != true {
		t.Errorf("NH3 entry %v", nh3)
	}
	// The 4 h LC50 is the one the blend's own figure rests on: with one
	// toxic component, LC50_mix = LC50_i/x_i (GHS additivity).
	lc50, _ := nh3["lc50_ppm_4h"].(float64)
	mix, _ := obj["lc50_ppm"].(float64)
	if lc50 <= 0 || mix < lc50/0.05*0.9999 || mix > lc50/0.05*1.0001 {
		t.Errorf("NH3 lc50_ppm_4h %v with the blend's lc50_ppm %v; want the blend's = x⁻¹ × the species'", nh3["lc50_ppm_4h"], obj["lc50_ppm"])
	}
	if nh3["ki"] != nil || nh3["ci"] != nil {
		t.Errorf("NH3: ki %v, ci %v; want null, a fuel is neither diluent nor oxidizer", nh3["ki"], nh3["ci"])
	}
	if n2["ki"] != 1.0 || n2["lfl_percent"] != nil || n2["autoignition_K"] != nil {
		t.Errorf("N2 entry %v; want ki 1 (ISO 10156's reference inert) and no flammability figures", n2)
	}
}

func TestHazardText(t *testing.T) {
	code, stdout, stderr := zmix(t, "hazard", "--blend", "H2 10%, N2 bal")
	if code != 0 {
		t.Fatalf("exit %d: %s", code, stderr)
	}
	for _, want := range []string{"FLAMMABLE IN AIR, sum of A'i/Tci = 1.82 > 1", "Le Chatelier", "H2 tci_pct: ISO 10156, from memory", "do not replace the safety data sheet"} {
		if !strings.Contains(stdout, want) {
			t.Errorf("hazard text lacks %q:\n%s", want, stdout)
		}
	}
	// Bad input: one line, exit 2.
	for _, args := range [][]string{
		{"hazard"},
		{"hazard", "--blend", "Qq 5%, N2 bal"},
		{"hazard", "--blend", "Ar 0.5bar, He 0.5bar", "--pres", "cold"},
		{"hazard", "--blend", "N2 bal", "extra"},
	} {
		code, stdout, stderr := zmix(t, args...)
		if code != 2 || stdout != "" {
			t.Errorf("zmix %q: exit %d, stdout %q", args, code, stdout)
		}
		checkOneLineError(t, stderr)
	}
}

// zmix catalog shows a species' safety figures with their sources, and
// says "not known" for a figure its classes call for.
func TestCatalogSafetyFigures(t *testing.T) {
	_, stdout, _ := zmix(t, "catalog", "CO")
	for _, want := range []string{"Safety figures", "12.5-74 % by volume  [BuM627, from memory]", "3760 ppm (1 h)  [ISO 10298, from memory]"} {
		if !strings.Contains(stdout, want) {
			t.Errorf("catalog CO lacks %q:\n%s", want, stdout)
		}
	}
	_, stdout, _ = zmix(t, "catalog", "SiH4")
	if !strings.Contains(stdout, "ISO 10156 Tci            not known") {
		t.Errorf("catalog SiH4 does not say its Tci is not known:\n%s", stdout)
	}
}
