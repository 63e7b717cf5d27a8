package model

import "strings"

// TreatmentReport says how a species is modelled under a treatment, for
// the Anatomy pane and the catalogue: a one-line kind, each factor's
// model (as FactorTreatments), and what the treatment adds to S and Cp
// over the rigid rotor with harmonic vibration at the state asked for.
type TreatmentReport struct {
	// Kind lists the treatments that apply, e.g. "summed rovibronic
	// levels (Dunham constants); spin modifications frozen: normal
	// hydrogen (3:1 ortho:para, frozen)", or "rigid rotor and harmonic
	// oscillator".
	Kind    string
	Factors [4]string // translation, rotation, vibration, electronic
	// RigidHarmonic is true when the treatment is the rigid rotor with
	// harmonic vibration itself; the deltas are then 0.
	RigidHarmonic bool
	// DeltaSJPerMolK and DeltaCpJPerMolK are S and Cp under tr less those
	// of the rigid rotor with harmonic vibration at the same (T, P).
	DeltaSJPerMolK, DeltaCpJPerMolK float64
}

// Treatments reports how sp is modelled under tr at (T, P); the state
// must be one State accepts (the deltas are 0 otherwise).
func (sp *Species) Treatments(tempK, presPa float64, tr Treatment) TreatmentReport {
	r := TreatmentReport{Factors: sp.FactorTreatments(tr)}
	var kinds []string
	summed := sp.summedLevels(tr)
	switch {
	case sp.usesLevels(tr):
		k := "summed rovibronic levels (Dunham constants)"
		if sp.Dunham.FromCurve {
			k = "summed rovibronic levels from the RKR potential curve, quasi-bound levels included"
		}
		if len(sp.States) > 0 {
			k += " with excited states"
		}
		kinds = append(kinds, k)
	case summed && sp.hasAnharmonic() && tr.Vibration == VibrationHarmonic:
		k := "anharmonic vibration summed from xij"
		if sp.Anharmonic.AlphaCm != nil {
			k += ", with vibration–rotation coupling (αi)"
		}
		kinds = append(kinds, k)
	}
	if summed && tr.Vibration == VibrationHarmonic {
		if len(sp.Torsions) > 0 {
			kinds = append(kinds, "hindered internal rotation")
		}
		if len(sp.Ladders) > 0 {
			kinds = append(kinds, "inversion ladder from observed levels")
		}
	}
	if summed && sp.distortionPerK != 0 {
		kinds = append(kinds, "first-order centrifugal distortion")
	}
	if len(kinds) == 0 {
		kinds = append(kinds, "rigid rotor and harmonic oscillator")
		r.RigidHarmonic = true
	}
	if sp.Homonuclear() && sp.Rotor == Linear {
		if sp.SpinMod.Frozen {
			kinds = append(kinds, "spin modification: "+sp.Name)
		} else {
			kinds = append(kinds, "spin modifications in equilibrium")
		}
	}
	r.Kind = strings.Join(kinds, "; ")
	if r.RigidHarmonic || CheckConditions(tempK, presPa) != nil {
		return r
	}
	rr := tr
	rr.Levels = LevelsRigidHarmonic
	var a, b State
	sp.fill(&a, tempK, presPa, tr)
	sp.fill(&b, tempK, presPa, rr)
	r.DeltaSJPerMolK = a.SJPerMolK - b.SJPerMolK
	r.DeltaCpJPerMolK = a.CpJPerMolK - b.CpJPerMolK
	return r
}

// vibrationSummed reports whether, under the default treatment, all of
// sp's vibrations are summed over anharmonic levels (a diatomic's levels,
// or a polyatomic's from its xij), so that the harmonic drift note does
// not apply.
func (sp *Species) vibrationSummed() bool {
	var tr Treatment
	return sp.usesLevels(tr) || sp.hasAnharmonic() && sp.summedLevels(tr)
}

// levelSource names where a diatomic's summed levels come from.
func (sp *Species) levelSource() string {
	if sp.Dunham.FromCurve {
		return "RKR curve"
	}
	return "Dunham constants"
}

// hinderedText names the vibrational model of a molecule whose summed
// vibration holds torsions or ladders.
func (sp *Species) hinderedText() string {
	var parts []string
	if len(sp.Torsions) > 0 {
		parts = append(parts, "torsions as hindered rotors")
	}
	if len(sp.Ladders) > 0 {
		parts = append(parts, "the inversion mode from its levels")
	}
	return "harmonic, " + strings.Join(parts, ", ")
}
