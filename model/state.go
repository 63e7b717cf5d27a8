package model

import (
	"math"
	"strconv"
)

// RotationTreatment chooses how linear rotors are handled.
type RotationTreatment int

const (
	// RotationAuto sums levels while T < 50 Θrot, else uses the series.
	RotationAuto RotationTreatment = iota
	// RotationSummed always sums the rigid-rotor levels.
	RotationSummed
	// RotationClassical always uses the high-temperature limit T/(σΘ).
	RotationClassical
)

// VibrationTreatment chooses the vibrational model.
type VibrationTreatment int

const (
	VibrationHarmonic VibrationTreatment = iota // harmonic oscillators
	VibrationFrozen                             // no vibrational excitation
)

// ElectronicTreatment chooses the electronic model.
type ElectronicTreatment int

const (
	ElectronicLevels     ElectronicTreatment = iota // sum the listed levels
	ElectronicGroundOnly                            // ground-level degeneracy only
)

// LevelTreatment chooses, for a diatomic with Dunham constants, between
// its summed rovibronic levels and the rigid rotor with harmonic
// vibration. Species without constants always take the latter.
type LevelTreatment int

const (
	// LevelsDefault takes the package default, summedByDefault.
	LevelsDefault LevelTreatment = iota
	// LevelsSummed sums the levels from the Dunham constants: anharmonic
	// vibration, vibration–rotation coupling, centrifugal stretching,
	// fine structure and the excited states with their own constants.
	LevelsSummed
	// LevelsRigidHarmonic keeps the rigid rotor, harmonic vibration and
	// the listed electronic levels.
	LevelsRigidHarmonic
)

// summedByDefault says whether LevelsDefault sums the levels. It is set.
// Turning it off moves figures of the README's worked examples and the
// workbench's golden screens in the fourth or fifth digit; they must be
// refreshed in the same change.
const summedByDefault = true

// Treatment picks a model per degree of freedom. The zero value is the
// default: the summed levels of a species with Dunham or anharmonic
// constants (summedByDefault), otherwise the summed/series rigid rotor,
// harmonic vibration and all listed electronic levels.
//
// With the summed levels, RotationSummed and RotationClassical (which
// name rigid rotors) select the rigid rotor and harmonic vibration;
// VibrationFrozen keeps the v = 0 levels only; ElectronicGroundOnly keeps
// the ground state only.
type Treatment struct {
	Rotation   RotationTreatment
	Vibration  VibrationTreatment
	Electronic ElectronicTreatment
	Levels     LevelTreatment
}

// usesLevels reports whether the state of sp under tr comes from its
// summed levels.
func (sp *Species) usesLevels(tr Treatment) bool {
	return sp.HasLevels() && sp.summedLevels(tr) && tr.Rotation == RotationAuto
}

// summedLevels reports whether tr asks for summed levels where a species
// has the constants for them.
func (sp *Species) summedLevels(tr Treatment) bool {
	return tr.Levels == LevelsSummed || tr.Levels == LevelsDefault && summedByDefault
}

// State is one species at one (T, P): the terms of each factor and the
// molar properties they give.
type State struct {
	TempK, PresPa float64

	Trans, Rot, Vib, Elec Terms

	CvJPerMolK float64
	CpJPerMolK float64
	UJPerMol   float64 // internal energy, on the ΔfH°(0 K) scale
	HJPerMol   float64
	SJPerMolK  float64
	AJPerMol   float64
	GJPerMol   float64 // also the chemical potential μ of the pure gas
}

// Total returns the sum of the four factors' terms.
func (s *State) Total() Terms { return s.Trans.add(s.Rot).add(s.Vib).add(s.Elec) }

// Errors from State: kinds that errors.Is matches. The errors returned
// carry the value that was refused; their UserMessage reads without the
// "model: " prefix.
var (
	ErrTemperature = Errorf("model", "temperature must be a finite number above 0 K")
	ErrPressure    = Errorf("model", "pressure must be a finite number above 0 Pa")
)

// The temperatures the model accepts. No gas is classical at either end
// (the validity notes say so long before); the bounds keep every figure
// finite: below MinTempK level spacings over kT overflow, and far above
// MaxTempK RT·ln q does.
const (
	MinTempK = 1e-3
	MaxTempK = 1e6
)

// CheckConditions reports whether (T, P) is a state the model can take.
// Any finite pressure above 0 Pa is accepted.
func CheckConditions(tempK, presPa float64) error {
	if !(tempK > 0) || math.IsInf(tempK, 0) {
		return KindErrorf("model", ErrTemperature, "temperature must be a finite number above 0 K (got %g K)", tempK)
	}
	if tempK < MinTempK || tempK > MaxTempK {
		return KindErrorf("model", ErrTemperature, "temperature must be from %s K to %s K (got %g K)",
			strconv.FormatFloat(MinTempK, 'f', -1, 64), strconv.FormatFloat(MaxTempK, 'f', -1, 64), tempK)
	}
	if !(presPa > 0) || math.IsInf(presPa, 0) {
		return KindErrorf("model", ErrPressure, "pressure must be a finite number above 0 Pa (got %g Pa)", presPa)
	}
	return nil
}

// State computes the species at (T, P) with the default treatment.
func (sp *Species) State(tempK, presPa float64) (State, error) {
	return sp.StateWith(tempK, presPa, Treatment{})
}

// StateWith computes the species at (T, P) with a chosen treatment.
func (sp *Species) StateWith(tempK, presPa float64, tr Treatment) (State, error) {
	if err := CheckConditions(tempK, presPa); err != nil {
		return State{}, err
	}
	var s State
	sp.fill(&s, tempK, presPa, tr)
	return s, nil
}

// Fill computes the state into s without checking (T, P); callers that have
// checked the conditions once use it in loops.
func (sp *Species) Fill(s *State, tempK, presPa float64, tr Treatment) {
	sp.fill(s, tempK, presPa, tr)
}

// FillLn is Fill given lnT = ln T and lnP = ln P as well, for a caller
// that has them already: a mixture takes ln T once for all its species,
// and ln pᵢ = ln xᵢ + ln P from the ln xᵢ it keeps, so that a species
// costs no log of its own for translation.
func (sp *Species) FillLn(s *State, tempK, lnT, presPa, lnP float64, tr Treatment) {
	sp.fillLn(s, tempK, lnT, presPa, lnP, tr)
}

func (sp *Species) fill(s *State, tempK, presPa float64, tr Treatment) {
	sp.fillLn(s, tempK, math.Log(tempK), presPa, math.Log(presPa), tr)
}

func (sp *Species) fillLn(s *State, tempK, lnT, presPa, lnP float64, tr Treatment) {
	s.TempK, s.PresPa = tempK, presPa
	if sp.Rotor == Atom && len(sp.elecThetaK) == 1 {
		// An atom with one electronic level (the noble gases): translation
		// and a constant ln g₀, under every treatment.
		trans := sp.translation(lnT, lnP)
		s.Trans, s.Rot, s.Vib, s.Elec = trans, Terms{}, Terms{}, Terms{LnQ: sp.lnElecG0}
		sp.fillTotals(s, tempK, Terms{LnQ: trans.LnQ + sp.lnElecG0, U: trans.U, Cv: trans.Cv})
		return
	}
	var invT float64 // 1/T: one division, shared by every factor that needs it
	if sp.Rotor != Atom || len(sp.elecThetaK) > 1 {
		invT = 1 / tempK
	}
	s.Trans = sp.translation(lnT, lnP)
	if sp.usesLevels(tr) {
		s.Rot, s.Vib, s.Elec = sp.rovib(tempK, lnT)
		if tr.Vibration == VibrationFrozen {
			s.Vib = Terms{}
		}
		if tr.Electronic == ElectronicGroundOnly {
			s.Elec = Terms{LnQ: sp.lnElecG0Levels}
		}
	} else {
		if sp.Rotor == Linear {
			s.Rot = sp.linearRotor(tempK, invT, lnT, tr.Rotation)
		} else {
			s.Rot = sp.rigidBodyRotor(lnT, invT, tr.Rotation) // inlined: no call for most species
			if sp.distortionPerK != 0 && sp.summedLevels(tr) {
				s.Rot = s.Rot.add(sp.distortionTerms(tempK))
			}
		}
		s.Vib = Terms{}
		switch {
		case tr.Vibration != VibrationHarmonic:
		case sp.torsionLevels != nil && sp.summedLevels(tr):
			s.Vib = sp.hinderedVibration(tempK, invT, lnT)
		case sp.hasAnharmonic() && sp.summedLevels(tr):
			s.Vib = sp.anharmonicList().torsionTerms(tempK, lnT)
		case len(sp.vibModes) > 0:
			s.Vib = sp.vibration(invT)
		}
		s.Elec = sp.electronic(invT, tr.Electronic)
	}
	sp.fillTotals(s, tempK, Terms{
		LnQ: s.Trans.LnQ + s.Rot.LnQ + s.Vib.LnQ + s.Elec.LnQ,
		U:   s.Trans.U + s.Rot.U + s.Vib.U + s.Elec.U,
		Cv:  s.Trans.Cv + s.Rot.Cv + s.Vib.Cv + s.Elec.Cv,
	})
}

// fillTotals writes the molar properties that the total terms give.
func (sp *Species) fillTotals(s *State, tempK float64, tot Terms) {
	r := GasConstant
	rt := r * tempK
	s.CvJPerMolK = r * tot.Cv
	s.CpJPerMolK = s.CvJPerMolK + r
	s.UJPerMol = sp.EnergyZeroJPerMol + rt*tot.U
	s.HJPerMol = s.UJPerMol + rt
	s.SJPerMolK = r * (tot.LnQ + tot.U)
	s.AJPerMol = sp.EnergyZeroJPerMol - rt*tot.LnQ
	s.GJPerMol = s.AJPerMol + rt
}

// QuantumConcentration returns nQ = (2π m kT/h²)^{3/2} in m⁻³.
func (sp *Species) QuantumConcentration(tempK float64) float64 {
	return math.Exp(sp.lnNQ0 + 1.5*math.Log(tempK))
}

// FactorShare is one degree of freedom's share of a species' S and Cp.
type FactorShare struct {
	Name       string // "translation", "rotation", "vibration", "electronic"
	SJPerMolK  float64
	CpJPerMolK float64
}

// Breakdown splits S and Cp among the four factors. The R of Cp − Cv, the
// P dV work of heating at constant pressure, is booked with translation,
// so the shares sum to the state's S and Cp.
func (s *State) Breakdown() [4]FactorShare {
	r := GasConstant
	share := func(name string, t Terms, cpExtra float64) FactorShare {
		return FactorShare{Name: name, SJPerMolK: r * t.S(), CpJPerMolK: r*t.Cv + cpExtra}
	}
	return [4]FactorShare{
		share("translation", s.Trans, r),
		share("rotation", s.Rot, 0),
		share("vibration", s.Vib, 0),
		share("electronic", s.Elec, 0),
	}
}

// FactorTreatments names, for the Anatomy pane and reports, the model
// each factor of sp takes under tr, in the order of Breakdown.
func (sp *Species) FactorTreatments(tr Treatment) [4]string {
	out := [4]string{"particle in a box (classical)", "none", "none", "listed levels"}
	levels := sp.usesLevels(tr)
	switch {
	case sp.Rotor == Atom:
	case levels && sp.SpinMod.Frozen:
		out[1] = "summed levels, v = 0 (" + sp.levelSource() + "), spin modifications frozen"
	case levels:
		out[1] = "summed levels, v = 0 (" + sp.levelSource() + ")"
	case sp.Rotor == Nonlinear && tr.Rotation == RotationClassical:
		out[1] = "rigid rotor, classical"
	case sp.Rotor == Nonlinear && sp.distortionPerK != 0 && sp.summedLevels(tr):
		out[1] = "rigid rotor, classical with first quantum correction, and first-order centrifugal distortion"
	case sp.Rotor == Nonlinear:
		out[1] = "rigid rotor, classical with first quantum correction"
	case tr.Rotation == RotationClassical:
		out[1] = "rigid rotor, classical"
	case sp.SpinMod.Frozen:
		out[1] = "rigid rotor, summed, spin modifications frozen"
	default:
		out[1] = "rigid rotor, summed below 50 Θrot"
	}
	switch {
	case tr.Vibration == VibrationFrozen:
		out[2] = "frozen"
	case levels:
		out[2] = "summed levels (anharmonic, vibration–rotation coupling)"
	case sp.torsionLevels != nil && sp.summedLevels(tr):
		out[2] = sp.hinderedText()
	case sp.hasAnharmonic() && sp.summedLevels(tr) && sp.Anharmonic.AlphaCm != nil:
		out[2] = "summed levels (anharmonic, xij; each level's own rotational constants, αi)"
	case sp.hasAnharmonic() && sp.summedLevels(tr):
		out[2] = "summed levels (anharmonic, xij)"
	case len(sp.vibModes) > 0:
		out[2] = "harmonic"
	}
	switch {
	case tr.Electronic == ElectronicGroundOnly:
		out[3] = "ground level only"
	case levels && len(sp.States) > 0:
		out[3] = "excited states summed with their own constants"
	case levels:
		out[3] = "ground state only (no excited states listed)"
	}
	return out
}
