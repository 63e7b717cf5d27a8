package process

import (
	"zmix/mixtures"
)

// Model gives the state function of a gas of any composition. The
// calculations ask it for every state they need, so that a real-gas model
// can replace the ideal one without touching them.
type Model interface {
	// Gas returns the state function of the mixture mix.
	Gas(mix *mixtures.Mixture) Gas
	// Name says which model it is, for the assumptions line: "ideal gas".
	Name() string
}

// Gas is the state function of one composition: H, S and Cp at (T, P),
// with the rest of the state beside them.
type Gas interface {
	// State computes the gas at (T, P) into s, reusing s's storage. It
	// fails when the state is outside what the model can compute.
	State(s *mixtures.State, tempK, presPa float64) error
	// Mixture is the gas's composition.
	Mixture() *mixtures.Mixture
}

// Ideal is the ideal-gas model: the engine's own partition-function
// mixture, with its H(T), S(T, P) and Cp(T). The zero value uses the
// engine's default options.
type Ideal struct {
	Options mixtures.Options
}

// Gas returns the ideal-gas state function of mix.
func (m Ideal) Gas(mix *mixtures.Mixture) Gas { return idealGas{mix: mix, opts: m.Options} }

// Name is "ideal gas".
func (Ideal) Name() string { return "ideal gas" }

type idealGas struct {
	mix  *mixtures.Mixture
	opts mixtures.Options
}

func (g idealGas) State(s *mixtures.State, tempK, presPa float64) error {
	if err := g.mix.CheckConditions(tempK, presPa); err != nil {
		return err
	}
	g.mix.Fill(s, tempK, presPa, g.opts)
	return nil
}

func (g idealGas) Mixture() *mixtures.Mixture { return g.mix }

// modelOr returns m, or the ideal gas when m is nil.
func modelOr(m Model) Model {
	if m == nil {
		return Ideal{}
	}
	return m
}
