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
	// TOverThetaVib is T over the lowest vibrational temperature of the
	// modes taken as harmonic under the default treatment (a mode summed
	// as a hindered rotor or from its ladder is left out: C2F6's 68 cm⁻¹
	// torsion does not make its 216 cm⁻¹ bend "drift" at room
	// temperature); zero for atoms, and for a molecule with no such mode.
	TOverThetaVib float64
	// TOverBoiling is T over the normal boiling point; zero if unknown.
	TOverBoiling float64
	// PresOverSat is the pressure over a vapour pressure estimated from
	// the normal boiling point with Trouton's rule (see troutonEntropyOverR);
	// zero if the boiling point is unknown. At 1 or more the gas would
	// condense; well below 1 it is far from condensing.
	PresOverSat float64
	// SatPresEstPa is that estimated vapour pressure in Pa.
	SatPresEstPa float64

	presPa float64 // the pressure the figures are for
	// RotorSummed says the rotor levels were summed rather than taken in
	// the high-temperature limit.
	RotorSummed bool
}

// Validity returns the validity figures of the species at (T, P).
func (sp *Species) Validity(tempK, presPa float64) Validity {
	v := Validity{presPa: presPa}
	// n/nQ = P/(kT) / nQ, in logs so that n alone cannot overflow.
	lnT := math.Log(tempK)
	v.Degeneracy = math.Exp(math.Log(presPa) - lnBoltzmann - lnT - sp.lnNQ0 - 1.5*lnT)
	if len(sp.rotThetaK) > 0 {
		v.TOverThetaRot = tempK / floats.Max(sp.rotThetaK)
		v.RotorSummed = sp.Rotor == Linear && tempK < rotorSumLimit*sp.rotThetaK[0]
	}
	if theta := sp.lowestHarmonicThetaK(); theta > 0 {
		v.TOverThetaVib = tempK / theta
	}
	if sp.BoilingK > 0 {
		v.TOverBoiling = tempK / sp.BoilingK
		// Clausius-Clapeyron from the normal boiling point, with the
		// enthalpy of vaporisation from Trouton's rule.
		lnSat := math.Log(StdPressureAtmPa) - troutonEntropyOverR*(sp.BoilingK/tempK-1)
		v.SatPresEstPa = math.Exp(min(lnSat, 700))
		v.PresOverSat = math.Exp(max(math.Log(presPa)-lnSat, -700))
	}
	return v
}

// lowestHarmonicThetaK returns the lowest vibrational temperature among
// the modes the default treatment takes as harmonic, or 0 if none.
func (sp *Species) lowestHarmonicThetaK() float64 {
	if len(sp.vibThetaK) == 0 {
		return 0
	}
	if sp.torsionLevels == nil || !sp.summedLevels(Treatment{}) {
		return floats.Min(sp.vibThetaK)
	}
	lowest := 0.0
	for _, m := range sp.vibModesHindered {
		if lowest == 0 || m.thetaK < lowest {
			lowest = m.thetaK
		}
	}
	return lowest
}

// troutonEntropyOverR is the entropy of vaporisation at the normal boiling
// point over R: about 10.5 (≈ 88 J/(mol·K)) for most liquids, by Trouton's
// rule (common practice). It gives vapour pressures good to a factor of
// about two away from the boiling point: enough to say whether a partial
// pressure is near condensing, not to design a condenser.
const troutonEntropyOverR = 10.5

// Thresholds of the condensation and real-gas notes. nearSatFraction is
// where a cooler spot or a compression may bring the gas to its vapour
// pressure. Near its boiling point (T < 1.5 Tb) a gas departs from ideal
// by a percent or more once its pressure reaches some tenths of a bar;
// below realGasMinPa that departure stays small (a rough rule chosen here,
// from the size of second virial coefficients near the boiling point).
const (
	nearSatFraction  = 0.5
	nearBoilingRatio = 1.5
	realGasMinPa     = 20e3
)

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
			out = append(out, Note{Caution, fmt.Sprintf("T/Θrot = %.3g: classical rotor is rough this close to Θrot, even with its first quantum correction", v.TOverThetaRot)})
		case sp.Rotor == Nonlinear:
			out = append(out, Note{Info, fmt.Sprintf("T/Θrot = %.3g: rotation classical, with its first quantum correction", v.TOverThetaRot)})
		default:
			out = append(out, Note{Info, fmt.Sprintf("T/Θrot = %.3g: rotation fully classical", v.TOverThetaRot)})
		}
	}
	if v.TOverThetaVib > 0 {
		switch {
		case v.TOverThetaVib > 1.5 && sp.vibrationSummed():
			out = append(out, Note{Info, fmt.Sprintf("T/Θvib = %.3g: vibrations summed over their anharmonic levels", v.TOverThetaVib)})
		case v.TOverThetaVib > 1.5:
			out = append(out, Note{Caution, fmt.Sprintf("T/Θvib = %.3g: harmonic vibration drifts (anharmonicity) this hot", v.TOverThetaVib)})
		case v.TOverThetaVib < 0.1:
			out = append(out, Note{Info, fmt.Sprintf("T/Θvib = %.3g: vibrations frozen out", v.TOverThetaVib)})
		default:
			out = append(out, Note{Info, fmt.Sprintf("T/Θvib = %.3g: vibrations partly excited", v.TOverThetaVib)})
		}
	}
	if v.TOverBoiling > 0 {
		est := fmt.Sprintf("vapour pressure estimated from the boiling point (%.4g K), %s", sp.BoilingK, formatPaApprox(v.SatPresEstPa))
		switch {
		case v.PresOverSat >= 1:
			out = append(out, Note{Invalid, fmt.Sprintf("pressure above its %s: it would condense", est)})
		case v.PresOverSat >= nearSatFraction:
			out = append(out, Note{Caution, fmt.Sprintf("pressure is %.2g %% of its %s: a cooler spot or a compression may condense it", 100*v.PresOverSat, est)})
		case v.TOverBoiling < nearBoilingRatio && v.presPa >= realGasMinPa:
			out = append(out, Note{Caution, fmt.Sprintf("T is within 1.5× the boiling point (%.4g K) at %s: real-gas effects may exceed ~1 %%", sp.BoilingK, formatPa(v.presPa))})
		case v.TOverBoiling < 1:
			out = append(out, Note{Info, fmt.Sprintf("below the normal boiling point, but the pressure is only %.2g %% of its %s", 100*v.PresOverSat, est)})
		default:
			out = append(out, Note{Info, fmt.Sprintf("far from condensing: its vapour pressure, estimated from the boiling point (%.4g K), is %s", sp.BoilingK, formatPaApprox(v.SatPresEstPa))})
		}
	}
	return out
}

// formatPaApprox writes an estimated pressure. Above 1000 bar the
// vapour-pressure estimate means only "far above any working pressure",
// so it says so.
func formatPaApprox(pa float64) string {
	if pa > 1e8 {
		return "over 1000 bar"
	}
	return "about " + formatPa(pa)
}

// formatPa writes a pressure for a note, to three digits.
func formatPa(pa float64) string { return PressureNoteText(pa, 3) }

// PressureNoteText writes a pressure in a note, in bar, kPa or Pa as its
// size suits, to sig significant digits. Notes are made below the
// presentation layer (mixtures/report), so they keep this one small
// formatter for themselves.
func PressureNoteText(pa float64, sig int) string {
	switch {
	case pa >= 1e5:
		return fmt.Sprintf("%.*g bar", sig, pa/1e5)
	case pa >= 1e3:
		return fmt.Sprintf("%.*g kPa", sig, pa/1e3)
	}
	return fmt.Sprintf("%.*g Pa", min(sig, 3), pa)
}
