package process

import (
	"testing"

	"zmix/mixtures"
)

// countingModel is the ideal gas, counting the states computed.
type countingModel struct{ n *int }

func (c countingModel) Gas(m *mixtures.Mixture) Gas { return countingGas{Ideal{}.Gas(m), c.n} }
func (countingModel) Name() string                  { return "ideal gas, counted" }

type countingGas struct {
	Gas
	n *int
}

func (g countingGas) State(s *mixtures.State, tempK, presPa float64) error {
	*g.n++
	return g.Gas.State(s, tempK, presPa)
}

// A one-stage compression at η < 1 needs the inlet state and a few
// Newton steps for each of the two balances; more states than that
// means the solver or its start went wrong. It also shows that every
// state goes through the Model, so a real-gas model sees them all.
func TestCompressionStateCount(t *testing.T) {
	n := 0
	_, err := Compression{Mixture: mixOf(t, blend10), InletTempK: 300, InletPresPa: 1e5, OutletPresPa: 8e5, Efficiency: 0.8, RateMolPerSec: 1, Model: countingModel{&n}}.Solve()
	if err != nil {
		t.Fatal(err)
	}
	if n == 0 || n > 8 {
		t.Errorf("the compression computed %d states, want 1 to 8", n)
	}
}
