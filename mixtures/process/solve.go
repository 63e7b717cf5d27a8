package process

import (
	"math"

	"zmix/model"
)

// gonum v0.17 exports no scalar root finder (mathext's false position is
// internal, and package optimize minimises), and the balances here are
// one monotone equation in T whose derivative the state already holds
// (∂H/∂T = Cp, ∂S/∂T = Cp/T at constant P). So they are solved by Newton
// steps kept inside a bracket: a step that leaves the bracket bisects it.

// balance is one equation in T: value(T) − target, rising with T, and its
// slope.
type balance func(tempK float64) (value, slope float64, err error)

const (
	// solveRelTol ends the iteration when a Newton step is below it,
	// relative to T. Newton converges quadratically, so the step after
	// a 1e-7 step would be near 1e-14: the T returned is good to about
	// that, far below every displayed digit.
	solveRelTol = 1e-7
	// bracketRelTol ends a bisection, which gains only a bit a step.
	bracketRelTol = 1e-13
	solveMaxIt    = 200
)

// errOutOfRange is a balance whose root lies outside the model's range.
var errOutOfRange = model.Errorf("process", "no temperature from %g K to %g K meets the balance", model.MinTempK, model.MaxTempK)

// solveT finds T in [model.MinTempK, model.MaxTempK] with f(T) = 0,
// starting from guessK. f must rise with T.
func solveT(f balance, guessK float64) (float64, error) {
	lo, hi := model.MinTempK, model.MaxTempK
	t := math.Min(math.Max(guessK, lo), hi)
	below, above := false, false // a side of the root has been seen
	for range solveMaxIt {
		v, slope, err := f(t)
		if err != nil {
			return 0, err
		}
		if v == 0 {
			return t, nil
		}
		if v < 0 {
			lo, below = t, true
		} else {
			hi, above = t, true
		}
		next := t - v/slope
		newton := slope > 0 && next > lo && next < hi
		if newton && math.Abs(next-t) <= solveRelTol*t {
			return next, nil
		}
		if !newton {
			// Bisect in ln T: the bracket may span decades.
			next = math.Sqrt(lo * hi)
		}
		if hi-lo <= bracketRelTol*t {
			if !below || !above {
				return 0, errOutOfRange
			}
			return next, nil
		}
		t = next
	}
	return 0, model.Errorf("process", "the balance did not converge in %d steps (last T = %g K)", solveMaxIt, t)
}
