package mixtures

import (
	"fmt"
	"math"
	"sync"

	"gonum.org/v1/gonum/unit/constant"

	"zmix/model"
)

// Hot gases come apart. The blend's figures assume a frozen composition;
// these estimates say, from the species' own μ° on the shared energy
// scale, how much of each would dissociate or ionise in equilibrium. Full
// reacting equilibrium is a later issue: this is the warning.

// hotFraction is the equilibrium fraction above which a species gets a
// caution.
const hotFraction = 0.01

// hotMinK: below it no catalogue molecule dissociates by 1e-6 at 1 bar,
// and no atom ionises, so the estimates are skipped.
const hotMinK = 1200

// electronMassKg is the electron mass, CODATA 2018 recommended value
// (gonum's unit/constant does not carry it).
const electronMassKg = 9.1093837015e-31

// ionisationEV holds first ionisation energies in eV (NIST Atomic
// Spectra Database for the atoms, NIST Chemistry WebBook ion energetics
// for the molecules; all from memory). The ion's internal partition
// function is taken equal to the neutral's, except the electron's spin
// factor 2: an estimate.
var ionisationEV = map[string]float64{
	"H": 13.598, "He": 24.587, "Ne": 21.565, "Ar": 15.760, "Kr": 14.000, "Xe": 12.130,
	"N": 14.534, "O": 13.618, "H2": 15.426, "N2": 15.581, "O2": 12.070, "CO": 14.014,
	"NO": 9.264, "CO2": 13.777, "H2O": 12.621, "CH4": 12.61, "OH": 13.017,
}

// HotEstimate is one species' equilibrium dissociation or ionisation at a
// state, each on its own in the blend.
type HotEstimate struct {
	Species  string
	Products string  // "2 O", "OH + H", "O2+ + e-"
	Fraction float64 // of the species' molecules, 0 to 1
	Ionised  bool
}

// split is a dissociation of a species into two catalogue species.
type split struct{ a, b *model.Species }

var (
	splitsOnce sync.Once
	splits     map[string][]split
)

// catalogueSplits finds, for every built-in species, the pairs of
// built-in species whose formulas add up to it: O2 → O + O,
// H2O → OH + H, CO2 → CO + O.
func catalogueSplits() map[string][]split {
	splitsOnce.Do(func() {
		all := model.Builtin().All()
		counts := make([]map[string]int, len(all))
		for i, sp := range all {
			counts[i], _ = model.ParseFormula(sp.Formula)
		}
		splits = map[string][]split{}
		for m, whole := range all {
			for i := range all {
				for j := i; j < len(all); j++ {
					if sumsTo(counts[i], counts[j], counts[m]) {
						splits[whole.Formula] = append(splits[whole.Formula], split{all[i], all[j]})
					}
				}
			}
		}
	})
	return splits
}

// sumsTo reports whether two non-empty formulas add up to want.
func sumsTo(a, b, want map[string]int) bool {
	if len(a) == 0 || len(b) == 0 {
		return false
	}
	for _, m := range []map[string]int{a, b, want} {
		for el := range m {
			if a[el]+b[el] != want[el] {
				return false
			}
		}
	}
	return true
}

// equilibriumFraction solves for the fraction α of a species, at mole
// fraction x in an otherwise inert blend at P, that splits into two
// products (c = 4 when both are the same species, else 1), given
// K' = Kp P°/P:  x(c + K') α² + K'(1 − x) α − K' = 0.
func equilibriumFraction(kPrime, x, c float64) float64 {
	if kPrime <= 0 {
		return 0
	}
	if math.IsInf(kPrime, 1) {
		return 1
	}
	a := x * (c + kPrime)
	b := kPrime * (1 - x)
	// The positive root, written to keep digits when 4aK' ≪ b².
	return 2 * kPrime / (b + math.Sqrt(b*b+4*a*kPrime))
}

// HotEstimates returns the species of the state that would dissociate
// (into catalogue fragments, by the μ° of the built-in catalogue) or
// ionise (by the Saha equation) by more than hotFraction in equilibrium.
func HotEstimates(s *State) []HotEstimate {
	if s.TempK < hotMinK {
		return nil
	}
	var out []HotEstimate
	rt := model.GasConstant * s.TempK
	p0 := model.StdPressureBarPa
	mu0 := func(sp *model.Species) (float64, bool) {
		st, err := sp.State(s.TempK, p0)
		return st.GJPerMol, err == nil
	}
	for i := range s.Species {
		t := &s.Species[i]
		sp := t.Species
		// Dissociation: the most favourable split.
		if list := catalogueSplits()[sp.Formula]; len(list) > 0 {
			if muM, ok := mu0(sp); ok {
				best, bestAlpha := split{}, 0.0
				for _, sl := range list {
					muA, okA := mu0(sl.a)
					muB, okB := mu0(sl.b)
					if !okA || !okB {
						continue
					}
					kp := math.Exp(-(muA + muB - muM) / rt)
					c := 1.0
					if sl.a == sl.b {
						c = 4
					}
					if a := equilibriumFraction(kp*p0/s.PresPa, t.X, c); a > bestAlpha {
						best, bestAlpha = sl, a
					}
				}
				if bestAlpha > hotFraction {
					prod := best.a.Formula + " + " + best.b.Formula
					if best.a == best.b {
						prod = "2 " + best.a.Formula
					}
					out = append(out, HotEstimate{Species: sp.Formula, Products: prod, Fraction: bestAlpha})
				}
			}
		}
		// First ionisation, Saha: Kp = (2πmₑ/h²)^{3/2} (kT)^{5/2} · 2 · e^{−I/kT}, in Pa.
		if ev, ok := ionisationEV[sp.Formula]; ok {
			kT := float64(constant.Boltzmann) * s.TempK
			h := float64(constant.Planck)
			lnK := 1.5*math.Log(2*math.Pi*electronMassKg/(h*h)) + 2.5*math.Log(kT) + math.Ln2 -
				ev*float64(constant.ElementaryCharge)/kT
			if a := equilibriumFraction(math.Exp(lnK)/s.PresPa, t.X, 1); a > hotFraction {
				out = append(out, HotEstimate{Species: sp.Formula, Products: sp.Formula + "+ + e-", Fraction: a, Ionised: true})
			}
		}
	}
	return out
}

// hotNotes turns the estimates into cautions.
func hotNotes(s *State) []StateNote {
	var out []StateNote
	for _, h := range HotEstimates(s) {
		what, how := "dissociate to "+h.Products, "from the catalogue's μ°"
		if h.Ionised {
			what, how = "ionise to "+h.Products, "Saha equation, first ionisation"
		}
		out = append(out, StateNote{Species: h.Species, Note: model.Note{Severity: model.Caution,
			Text: fmt.Sprintf("about %.3g %% would %s in equilibrium here (%s, the species on its own in the blend); the figures shown assume a frozen composition", 100*h.Fraction, what, how)}})
	}
	return out
}
