package mixtures

import (
	"math"
	"math/rand/v2"
	"testing"

	"zmix/model"
)

// No NaN or infinity anywhere in the export, for any state the mixture
// accepts: random blends with fractions down to 1e-20, over the model's
// whole temperature range and pressures from 1e-320 Pa (where partial
// pressures underflow to 0) to 1e120 Pa. Every export reads the quantity
// table, so FirstNonFinite over the table is the check.
func TestExportFinite(t *testing.T) {
	rng := rand.New(rand.NewPCG(1, 1))
	all := model.Builtin().All()
	accepted := 0
	for n := 0; n < 500; n++ {
		k := 1 + rng.IntN(8)
		comps := make([]Component, k)
		for i, j := range rng.Perm(len(all))[:k] {
			comps[i] = Component{Species: all[j], X: math.Pow(10, -20*rng.Float64())}
		}
		m, err := NewMixture(comps)
		if err != nil {
			t.Fatal(err)
		}
		tempK := model.MinTempK * math.Pow(model.MaxTempK/model.MinTempK, rng.Float64())
		presPa := math.Pow(10, -320+440*rng.Float64())
		s, err := m.State(tempK, presPa, Options{})
		if err != nil {
			continue // refused states are checked in TestStateErrors
		}
		accepted++
		if what := FirstNonFinite(&s); what != "" {
			t.Errorf("%s at %g K, %g Pa: %s is not finite", blendName(m), tempK, presPa, what)
		}
	}
	if accepted < 400 {
		t.Errorf("only %d of 500 random states accepted; the check covers too little", accepted)
	}
}
