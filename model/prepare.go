package model

import "math"

// Prepare checks a species' data and derives its molar mass and
// characteristic temperatures. A species must be prepared before use;
// the catalogue does it for every species it loads.
func (sp *Species) Prepare() error {
	m, err := MolarMassKgPerMol(sp.Formula)
	if err != nil {
		return err
	}
	sp.MolarMassKgPerMol = m
	sp.massKg = m / avogadroPerMol
	sp.lnNQ0 = 1.5*math.Log(sp.massKg) + math.Log(quantumConcTerm)

	if sp.Symmetry == 0 {
		sp.Symmetry = 1
	}
	wantRot := map[RotorKind]int{Atom: 0, Linear: 1, Nonlinear: 3}[sp.Rotor]
	if len(sp.RotConstPerCm) != wantRot {
		return Errorf("model", "%s: a %s rotor takes %d rotational constants, got %d", sp.Formula, sp.Rotor, wantRot, len(sp.RotConstPerCm))
	}
	sp.rotThetaK = sp.rotThetaK[:0]
	prod := 1.0
	for _, b := range sp.RotConstPerCm {
		if !rotRange.contains(b) {
			return Errorf("model", "%s: rotational constant %g cm⁻¹; want %s", sp.Formula, b, rotRange)
		}
		th := WavenumberToKelvin(b)
		sp.rotThetaK = append(sp.rotThetaK, th)
		prod *= th
	}
	switch sp.Rotor {
	case Linear:
		sp.lnRotClassical = -math.Log(float64(sp.Symmetry) * prod)
	case Nonlinear:
		sp.lnRotClassical = 0.5*math.Log(math.Pi) - math.Log(float64(sp.Symmetry)) - 0.5*math.Log(prod)
	}
	sp.rotQuantumK = 0
	if sp.Rotor == Nonlinear {
		a, b, c := sp.rotThetaK[0], sp.rotThetaK[1], sp.rotThetaK[2]
		sp.rotQuantumK = (2*(a+b+c) - (a*b/c + b*c/a + c*a/b)) / 12
	}
	if sp.Homonuclear() && sp.Rotor != Linear {
		return Errorf("model", "%s: spin weights apply to linear molecules only", sp.Formula)
	}
	// The summed rotor divides by the spin weights and the series by σ;
	// they agree only for σ = 2, the one value a rotation that exchanges
	// identical nuclei can have in a linear molecule.
	if sp.Homonuclear() && sp.Symmetry != 2 {
		return Errorf("model", "%s: spin weights need symmetry number 2, got %d", sp.Formula, sp.Symmetry)
	}
	if sp.SpinWeights[0] < 0 || sp.SpinWeights[1] < 0 {
		return Errorf("model", "%s: spin weights must not be negative", sp.Formula)
	}
	for _, w := range sp.SpinWeights {
		if !spinRange.contains(w) {
			return Errorf("model", "%s: spin weight %g; want %s", sp.Formula, w, spinRange)
		}
	}
	if !sigmaRange.contains(float64(sp.Symmetry)) {
		return Errorf("model", "%s: symmetry number %d; want %s", sp.Formula, sp.Symmetry, sigmaRange)
	}

	sp.vibThetaK, sp.vibDeg, sp.vibModes = sp.vibThetaK[:0], sp.vibDeg[:0], sp.vibModes[:0]
	if len(sp.Vib) > maxVibModes {
		return Errorf("model", "%s: %d vibrational modes; want at most %d", sp.Formula, len(sp.Vib), maxVibModes)
	}
	for _, v := range sp.Vib {
		if !vibRange.contains(v.WavenumberPerCm) || !vibDegRange.contains(float64(v.Degeneracy)) {
			return Errorf("model", "%s: vibration %g cm⁻¹ ×%d: want %s and %s", sp.Formula, v.WavenumberPerCm, v.Degeneracy, vibRange, vibDegRange)
		}
		sp.vibThetaK = append(sp.vibThetaK, WavenumberToKelvin(v.WavenumberPerCm))
		sp.vibDeg = append(sp.vibDeg, float64(v.Degeneracy))
		sp.vibModes = addVibTerm(sp.vibModes, WavenumberToKelvin(v.WavenumberPerCm), v.Degeneracy)
	}

	if len(sp.Elec) == 0 {
		sp.Elec = []ElecLevel{{0, 1}}
	}
	if len(sp.Elec) > maxElecLevels {
		return Errorf("model", "%s: %d electronic levels; want at most %d", sp.Formula, len(sp.Elec), maxElecLevels)
	}
	sp.elecThetaK, sp.elecDeg = sp.elecThetaK[:0], sp.elecDeg[:0]
	for i, e := range sp.Elec {
		if !elecDegRange.contains(float64(e.Degeneracy)) || !elecRange.contains(e.EnergyPerCm) || (i == 0 && e.EnergyPerCm != 0) {
			return Errorf("model", "%s: electronic level %g cm⁻¹ ×%d: the ground level must be at 0 cm⁻¹; want %s and %s", sp.Formula, e.EnergyPerCm, e.Degeneracy, elecRange, elecDegRange)
		}
		sp.elecThetaK = append(sp.elecThetaK, WavenumberToKelvin(e.EnergyPerCm))
		sp.elecDeg = append(sp.elecDeg, float64(e.Degeneracy))
	}
	sp.lnElecG0 = math.Log(sp.elecDeg[0])
	// Species built in code, not read from a file, meet the same ranges
	// as the file's fields; Tc = 0 means none.
	if sp.CriticalK != 0 || sp.CriticalPa != 0 {
		if !critTRange.contains(sp.CriticalK) || !critPRange.contains(sp.CriticalPa/1e5) || !omegaRange.contains(sp.Acentric) {
			return Errorf("model", "%s: critical constants Tc %g K, Pc %g bar, ω %g; want %s, %s and %s", sp.Formula, sp.CriticalK, sp.CriticalPa/1e5, sp.Acentric, critTRange, critPRange, omegaRange)
		}
	}
	if sp.BoilingK != 0 && !boilRange.contains(sp.BoilingK) {
		return Errorf("model", "%s: boiling point %g K; want 0 (unknown) or %s", sp.Formula, sp.BoilingK, boilRange)
	}
	if !dHf0Range.contains(sp.EnergyZeroJPerMol / 1000) {
		return Errorf("model", "%s: ΔfH°(0 K) %g kJ/mol; want %s", sp.Formula, sp.EnergyZeroJPerMol/1000, dHf0Range)
	}
	sp.frozenLnW, sp.frozenLnMix = [2]float64{}, 0
	if sp.SpinMod.Frozen && sp.Homonuclear() {
		gTot := sp.SpinWeights[0] + sp.SpinWeights[1]
		for parity, x := range [2]float64{sp.SpinMod.EvenFraction, 1 - sp.SpinMod.EvenFraction} {
			if g := sp.SpinWeights[parity]; g > 0 && x > 0 {
				sp.frozenLnW[parity] = math.Log(g / (gTot * x))
				sp.frozenLnMix += x * sp.frozenLnW[parity]
			}
		}
	}
	if err := sp.prepareTorsions(); err != nil {
		return err
	}
	if err := sp.prepareAnharmonic(); err != nil {
		return err
	}
	if err := sp.prepareDistortion(); err != nil {
		return err
	}
	return sp.prepareLevels()
}

// prepareLevels checks a diatomic's Dunham constants and builds its level
// list; a species without them has none.
func (sp *Species) prepareLevels() error {
	sp.levels, sp.lnElecG0Levels, sp.deferredLevels = nil, 0, nil
	if sp.Dunham == nil {
		if len(sp.States) > 0 {
			return Errorf("model", "%s: electronic states with constants need the ground state's Dunham constants", sp.Formula)
		}
		return nil
	}
	counts, err := ParseFormula(sp.Formula)
	if err != nil {
		return err
	}
	atoms := 0
	for _, n := range counts {
		atoms += n
	}
	if atoms != 2 || sp.Rotor != Linear {
		return Errorf("model", "%s: Dunham constants apply to diatomic molecules only", sp.Formula)
	}
	if !dissocRange.contains(sp.DissociationCm) {
		return Errorf("model", "%s: dissociation energy D0 %g cm⁻¹; want %s", sp.Formula, sp.DissociationCm, dissocRange)
	}
	if err := sp.Dunham.check(sp.Formula, "ground state", true); err != nil {
		return err
	}
	if len(sp.States) > maxElecStates {
		return Errorf("model", "%s: %d electronic states; want at most %d", sp.Formula, len(sp.States), maxElecStates)
	}
	for _, st := range sp.States {
		if err := st.check(sp.Formula, "state "+Quote(st.Name), false); err != nil {
			return err
		}
	}
	if sp.Dunham.FromCurve && sp.deferLevels {
		// Checked now, solved on first use: the curve must exist, and the
		// ground state's multiplicity enters every state.
		if sp.Dunham.Term.Lambda != 0 {
			return Errorf("model", "%s: levels from the potential curve take a Σ ground state", sp.Formula)
		}
		if _, ok := newRKRCurve(*sp.Dunham, sp.DissociationCm); !ok {
			return Errorf("model", "%s: the Dunham constants give no RKR curve (G(v) must rise to near D0)", sp.Formula)
		}
		sp.lnElecG0Levels = math.Log(float64(sp.Dunham.Term.Multiplicity))
		sp.deferredLevels = &deferredLevels{make: func() (*rovibLevels, error) {
			lv, _, err := sp.makeLevels()
			return lv, err
		}}
		return nil
	}
	return sp.buildLevels()
}

// addVibTerm appends a mode to the packed list, or adds its degeneracy to
// a mode of the same wavenumber already there: the terms are the same, so
// one exponential serves both.
func addVibTerm(modes []vibTerm, thetaK float64, deg int) []vibTerm {
	for i := range modes {
		if modes[i].thetaK == thetaK {
			modes[i].nDeg += deg
			modes[i].deg = float64(modes[i].nDeg)
			return modes
		}
	}
	return append(modes, vibTerm{thetaK, float64(deg), deg})
}
