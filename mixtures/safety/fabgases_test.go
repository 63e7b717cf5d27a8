package safety

import (
	"slices"
	"testing"
)

// TestFabGasClassification runs the classification over the fab gases
// added for issue 10 §5, against hand calculations from the catalogue's
// figures (ISO 10298 LC50s, 1 h, halved to 4 h as the GHS notes say).
func TestFabGasClassification(t *testing.T) {
	// GHS additivity, two toxic components: B2H6 80 ppm (1 h) → 40 ppm
	// (4 h), SiH2Cl2 314 ppm (1 h) → 157 ppm (4 h). By hand:
	// 100/LC50 = 0.5/40 + 2/157 = 0.0252389, LC50 = 3962.1 ppm, which is
	// Category 4 (above 2500, at most 20 000 ppmV).
	r := Classify(blend(t, "B2H6", 0.005, "SiH2Cl2", 0.02, "N2", 0.975))
	if !r.LC50Known || !near(r.LC50PPM, 3962.1, close) || r.Category != 4 {
		t.Errorf("B2H6 0.5 %% + SiH2Cl2 2 %%: LC50 %.1f ppm (known %v), category %d; want 3962.1, 4", r.LC50PPM, r.LC50Known, r.Category)
	}
	if !slices.Contains(r.Converted, "B2H6") || !slices.Contains(r.Converted, "SiH2Cl2") {
		t.Errorf("converted from 1 h: %v, want both", r.Converted)
	}
	if !slices.Contains(r.Pyrophorics, "B2H6") || !slices.Contains(r.Corrosives, "SiH2Cl2") {
		t.Errorf("pyrophoric %v, corrosive %v", r.Pyrophorics, r.Corrosives)
	}
	// Le Chatelier over the butanes, both 1.8-8.4 % (BuM627): the fuel
	// part has the same limits whatever the split.
	r = Classify(blend(t, "n-C4H10", 0.02, "i-C4H10", 0.01, "N2", 0.97))
	if !r.LimitsKnown || !near(r.FuelLFLPct, 1.8, close) || !near(r.FuelUFLPct, 8.4, close) {
		t.Errorf("butanes: fuel limits %.3f-%.3f (known %v), want 1.8-8.4", r.FuelLFLPct, r.FuelUFLPct, r.LimitsKnown)
	}
	if r.FlamKnown {
		t.Errorf("butanes: ISO 10156 answer given (sum %g) though no Tci is known for either", r.FlamSum)
	}
	// Germane has no flammable limits and no LC50 in the catalogue, and
	// WF6 no LC50: the results say not known instead of guessing.
	r = Classify(blend(t, "GeH4", 0.01, "WF6", 0.001, "H2", 0.989))
	if r.LimitsKnown || !slices.Contains(r.FlammableNoLimits, "GeH4") {
		t.Errorf("GeH4: limits known %v, no-limits %v", r.LimitsKnown, r.FlammableNoLimits)
	}
	if r.LC50Known || !slices.Contains(r.NoLC50, "GeH4") || !slices.Contains(r.NoLC50, "WF6") || !near(r.UnknownToxPct, 1.1, close) {
		t.Errorf("GeH4, WF6: LC50 known %v, no LC50 %v, unknown %.3f %%; want not known, both, 1.1 %%", r.LC50Known, r.NoLC50, r.UnknownToxPct)
	}
}
