package model

import (
	"fmt"
	"math"

	"gonum.org/v1/gonum/floats"
)

// Validity holds the figures that say whether the ideal-gas,
// rigid-rotor/harmonic picture can be trusted at a state.
type Validity struct {
	// Degeneracy is n/nQ: the number density over the quantum
	// concentration. Classical (Boltzmann) statistics needs it ≪ 1.
	Degeneracy float64
	// TOverThetaRot is T over the largest rotational temperature; zero
	// for atoms, which have no rotation.
	TOverThetaRot float64
	// TOverThetaVib is T over the lowest vibrational temperature; zero for
	// atoms.
	TOverThetaVib float64
	// TOverBoiling is T over the normal boiling point; zero if unknown.
	TOverBoiling float64
	// RotorSummed says the rotor levels were summed rather than taken in
	// the high-temperature limit.
	RotorSummed bool
}

// Validity returns the validity figures of the species at (T, P).
func (sp *Species) Validity(tempK, presPa float64) Validity {
	var v Validity
	// n/nQ = P/(kT) / nQ, in logs so that n alone cannot overflow.
	lnT := math.Log(tempK)
	v.Degeneracy = math.Exp(math.Log(presPa) - lnBoltzmann - lnT - sp.lnNQ0 - 1.5*lnT)
	if len(sp.rotThetaK) > 0 {
		v.TOverThetaRot = tempK / floats.Max(sp.rotThetaK)
		v.RotorSummed = sp.Rotor == Linear && tempK < rotorSumLimit*sp.rotThetaK[0]
	}
	if len(sp.vibThetaK) > 0 {
		v.TOverThetaVib = tempK / floats.Min(sp.vibThetaK)
	}
	if sp.BoilingK > 0 {
		v.TOverBoiling = tempK / sp.BoilingK
	}
	return v
}

// Severity ranks a validity note.
type Severity int

const (
	Info    Severity = iota // worth knowing
	Caution                 // the result may be off
	Invalid                 // the model does not hold here
)

func (s Severity) String() string {
	return [...]string{"note", "caution", "outside model"}[s]
}

// Note is one validity remark in plain words.
type Note struct {
	Severity Severity
	Text     string
}

// Notes turns the validity figures of sp into plain-word remarks.
func (v Validity) Notes(sp *Species) []Note {
	var out []Note
	switch {
	case v.Degeneracy > 0.1:
		out = append(out, Note{Invalid, fmt.Sprintf("n/nQ = %.2g: quantum degeneracy, classical statistics fails", v.Degeneracy)})
	case v.Degeneracy > 1e-3:
		out = append(out, Note{Caution, fmt.Sprintf("n/nQ = %.2g: not ≪ 1, quantum corrections may matter", v.Degeneracy)})
	default:
		out = append(out, Note{Info, fmt.Sprintf("n/nQ = %.2g ≪ 1: classical statistics holds", v.Degeneracy)})
	}
	if sp.Rotor != Atom {
		switch {
		case v.RotorSummed:
			out = append(out, Note{Info, fmt.Sprintf("T/Θrot = %.3g: rotor levels summed one by one", v.TOverThetaRot)})
		case sp.Rotor == Nonlinear && v.TOverThetaRot < 5:
			out = append(out, Note{Caution, fmt.Sprintf("T/Θrot = %.3g: classical rotor is rough this close to Θrot", v.TOverThetaRot)})
		default:
			out = append(out, Note{Info, fmt.Sprintf("T/Θrot = %.3g: rotation fully classical", v.TOverThetaRot)})
		}
	}
	if len(sp.vibThetaK) > 0 {
		switch {
		case v.TOverThetaVib > 1.5:
			out = append(out, Note{Caution, fmt.Sprintf("T/Θvib = %.3g: harmonic vibration drifts (anharmonicity) this hot", v.TOverThetaVib)})
		case v.TOverThetaVib < 0.1:
			out = append(out, Note{Info, fmt.Sprintf("T/Θvib = %.3g: vibrations frozen out", v.TOverThetaVib)})
		default:
			out = append(out, Note{Info, fmt.Sprintf("T/Θvib = %.3g: vibrations partly excited", v.TOverThetaVib)})
		}
	}
	if v.TOverBoiling > 0 {
		switch {
		case v.TOverBoiling < 1:
			out = append(out, Note{Invalid, fmt.Sprintf("T is below the normal boiling point (%.4g K): it condenses near 1 atm", sp.BoilingK)})
		case v.TOverBoiling < 1.5:
			out = append(out, Note{Caution, fmt.Sprintf("T is within 1.5× the boiling point (%.4g K): real-gas effects grow", sp.BoilingK)})
		}
	}
	return out
}
