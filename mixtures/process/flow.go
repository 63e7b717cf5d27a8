package process

import (
	"fmt"

	"zmix/mixtures"
	"zmix/mixtures/realgas"
	"zmix/model"
)

// Flow converts a flow of a blend between molar, mass, actual-volume and
// standard-volume units, with the density at the reference, the relative
// density to dry air and the gas correction factor of a thermal
// mass-flow instrument calibrated on N2.
type Flow struct {
	Mixture *mixtures.Mixture
	Rate    Rate
	// The line's temperature and pressure, for actual volumes; zero when
	// not given.
	LineTempK, LinePresPa float64
	// Ref is the reference of the standard volume reported, and of a
	// standard-volume rate whose unit names none; zero means normal.
	Ref   Reference
	Model Model // nil means Ideal{}
}

// FlowResult is a solved Flow.
type FlowResult struct {
	base
	MolPerSec, KgPerSec float64
	RefM3PerSec         float64
	Ref                 Reference
	RefDensityKgPerM3   float64
	RelativeDensity     float64
	ActualM3PerSec      float64 // 0 when the line's T and P are not given
	// ActualRealM3PerSec is the actual volume flow from the real-gas Z at
	// the line, 0 when the line is not given or no real-gas model
	// covers it.
	ActualRealM3PerSec      float64
	GasCorrectionFactor     float64
	InputRef                Reference // the reference the rate was read at, for a standard volume
	InputIsStandard, Actual bool
}

// DryAirMolarMassKgPerMol is the molar mass of dry air, ISO 6976:2016
// (28.96546 g/mol; from memory).
const DryAirMolarMassKgPerMol = 28.96546e-3

// The common-practice molecular structure factors of thermal mass-flow
// meters, by the number of atoms in the molecule (from memory: the values
// printed in instrument makers' gas-factor notes).
const (
	structureMonatomic  = 1.03
	structureDiatomic   = 1.00
	structureTriatomic  = 0.941
	structurePolyatomic = 0.88
)

// StructureFactor is the molecular structure factor of a species for the
// gas correction factor, from its atom count.
func StructureFactor(sp *model.Species) float64 {
	counts, err := model.ParseFormula(sp.Formula)
	n := 0
	for _, c := range counts {
		n += c
	}
	switch {
	case err != nil || n == 0:
		// A species file may name a species by something other than
		// its formula; its rotor kind still tells atoms from molecules.
		switch sp.Rotor {
		case model.Atom:
			return structureMonatomic
		case model.Linear:
			if len(sp.Vib) <= 1 {
				return structureDiatomic
			}
			return structureTriatomic
		}
		return structurePolyatomic
	case n == 1:
		return structureMonatomic
	case n == 2:
		return structureDiatomic
	case n == 3:
		return structureTriatomic
	}
	return structurePolyatomic
}

var (
	figRateMol = &Figure{Key: "n", Label: "molar flow", Symbol: "ṅ", SymbolASCII: "n", Unit: "mol/s", UnitASCII: "mol/s", Scale: 1,
		Name: "mol_s", Digits: mixtures.Digits{Sig: 6}, Also: []AltUnit{{Unit: "kmol/h", UnitASCII: "kmol/h", Scale: 3.6}}}
	figRateMass = &Figure{Key: "m", Label: "mass flow", Symbol: "ṁ", SymbolASCII: "m", Unit: "kg/s", UnitASCII: "kg/s", Scale: 1,
		Name: "kg_s", Digits: mixtures.Digits{Sig: 6}, Also: []AltUnit{{Unit: "kg/h", UnitASCII: "kg/h", Scale: 3600}, {Unit: "lb/h", UnitASCII: "lb/h", Scale: 3600 / pound}}}
	figRefVol = &Figure{Key: "vref", Label: "standard volume flow", Symbol: "V̇ref", SymbolASCII: "Vref", Unit: "m³/h", UnitASCII: "m3/h", Scale: 3600,
		Name: "ref_m3_s", Digits: mixtures.Digits{Sig: 6},
		Also: []AltUnit{{Unit: "L/min", UnitASCII: "L/min", Scale: 6e4}, {Unit: "cm³/min", UnitASCII: "cm3/min", Scale: 6e7}, {Unit: "ft³/h", UnitASCII: "ft3/h", Scale: 3600 / cubicFoot}, {Unit: "ft³/min", UnitASCII: "ft3/min", Scale: 60 / cubicFoot}}}
	figRefT = &Figure{Key: "tref", Label: "reference temperature", Symbol: "Tref", SymbolASCII: "Tref", Unit: "K", UnitASCII: "K", Scale: 1,
		Name: "ref_temperature_K", Digits: mixtures.Digits{Sig: 6}, Also: celsius}
	figRefP = &Figure{Key: "pref", Label: "reference pressure", Symbol: "Pref", SymbolASCII: "Pref", Unit: "kPa", UnitASCII: "kPa", Scale: 1e-3,
		Name: "ref_pressure_Pa", Digits: mixtures.Digits{Sig: 6}}
	figRefRho = &Figure{Key: "rhoref", Label: "density at the reference", Symbol: "ρref", SymbolASCII: "rho_ref", Unit: "kg/m³", UnitASCII: "kg/m3", Scale: 1,
		Name: "ref_density_kg_m3", Digits: mixtures.Digits{Sig: 5}}
	figRelDensity = &Figure{Key: "d", Label: "relative density to dry air", Symbol: "d", SymbolASCII: "d", Scale: 1,
		Name: "relative_density", Digits: mixtures.Digits{Sig: 5}}
	figActualVol = &Figure{Key: "vact", Label: "actual volume flow", Symbol: "V̇", SymbolASCII: "V", Unit: "m³/h", UnitASCII: "m3/h", Scale: 3600,
		Name: "actual_m3_s", Digits: mixtures.Digits{Sig: 6}, Also: []AltUnit{{Unit: "L/min", UnitASCII: "L/min", Scale: 6e4}, {Unit: "ACFM", UnitASCII: "ACFM", Scale: 60 / cubicFoot}}}
	figActualVolReal = &Figure{Key: "vactreal", Label: "actual volume flow, real gas", Symbol: "V̇real", SymbolASCII: "Vreal", Unit: "m³/h", UnitASCII: "m3/h", Scale: 3600,
		Name: "actual_m3_s_real_gas", Digits: mixtures.Digits{Sig: 6}, Also: []AltUnit{{Unit: "L/min", UnitASCII: "L/min", Scale: 6e4}, {Unit: "ACFM", UnitASCII: "ACFM", Scale: 60 / cubicFoot}}}
	figLineT = &Figure{Key: "tline", Label: "line temperature", Symbol: "T", SymbolASCII: "T", Unit: "K", UnitASCII: "K", Scale: 1,
		Name: "temperature_K", Digits: mixtures.Digits{Sig: 6}, Also: celsius}
	figLineP = &Figure{Key: "pline", Label: "line pressure", Symbol: "P", SymbolASCII: "P", Unit: "bar", UnitASCII: "bar", Scale: 1e-5,
		Name: "pressure_Pa", Digits: mixtures.Digits{Sig: 6}}
	figGCF = &Figure{Key: "gcf", Label: "gas correction factor (N2 = 1)", Symbol: "GCF", SymbolASCII: "GCF", Scale: 1,
		Name: "gas_correction_factor", Digits: mixtures.Digits{Sig: 4}}
)

// gcfNote qualifies the gas correction factor wherever it is shown.
const gcfNote = "gas correction factor: common-practice formula 1/GCF ∝ Σxᵢρᵢcpᵢ / Σxᵢsᵢ, with density at 0 °C and Cp at 25 °C, and structure factors 1.03, 1.00, 0.941 and 0.88 for one, two, three and more atoms; the instrument maker's factor governs."

// Solve converts the flow.
func (f Flow) Solve() (*FlowResult, error) {
	if f.Mixture == nil {
		return nil, model.Errorf("process", "flow: no blend given")
	}
	m := modelOr(f.Model)
	g := m.Gas(f.Mixture)
	ref := f.Ref
	if !(ref.TempK > 0) {
		ref = RefNormal
	}
	cond := Conditions{TempK: f.LineTempK, PresPa: f.LinePresPa, Ref: f.Ref}
	n, err := f.Rate.MolPerSec(g, cond)
	if err != nil {
		return nil, err
	}
	r := &FlowResult{MolPerSec: n, Ref: ref}
	r.kind = "flow"
	r.assumptions = "steady flow, " + m.Name() + ", standard volumes at the reference shown"
	mm := f.Mixture.MolarMassKgPerMol
	r.KgPerSec = n * mm

	var st mixtures.State
	var realNote string
	if err := g.State(&st, ref.TempK, ref.PresPa); err != nil {
		return nil, err
	}
	r.RefDensityKgPerM3 = st.DensityKgPerM3
	r.RefM3PerSec = r.KgPerSec / st.DensityKgPerM3
	r.RelativeDensity = mm / DryAirMolarMassKgPerMol

	if f.LineTempK > 0 && f.LinePresPa > 0 {
		if err := g.State(&st, f.LineTempK, f.LinePresPa); err != nil {
			return nil, err
		}
		r.ActualM3PerSec = r.KgPerSec / st.DensityKgPerM3
		r.Actual = true
		if rg, ok := st.RealGasResult(); ok && rg.Range == realgas.InRange {
			r.ActualRealM3PerSec = n * rg.VM3PerMol
			realNote = fmt.Sprintf("actual volume flow, real gas: from Z = %.4g at the line (%s)", rg.Z, rg.Model)
		}
	}
	r.GasCorrectionFactor, err = GasCorrectionFactor(m, f.Mixture)
	if err != nil {
		return nil, err
	}

	r.in(&Figure{Key: "rate", Label: "rate as given", Unit: f.Rate.Unit.Name, UnitASCII: f.Rate.Unit.Name, Scale: 1 / f.Rate.Unit.SI,
		Name: "rate_given", Digits: mixtures.Digits{Sig: 6}}, f.Rate.Value*f.Rate.Unit.SI)
	if f.Rate.Unit.Basis == BasisStandard {
		r.InputIsStandard = true
		r.InputRef = f.Rate.Reference(cond)
		r.note("rate as given read at " + r.InputRef.Label)
	}
	if r.Actual {
		r.in(figLineT, f.LineTempK)
		r.in(figLineP, f.LinePresPa)
	}
	r.in(figMolarMass, mm)
	r.out(figRateMol, n)
	r.out(figRateMass, r.KgPerSec)
	r.out(figRefVol, r.RefM3PerSec)
	r.out(figRefT, ref.TempK)
	r.out(figRefP, ref.PresPa)
	r.out(figRefRho, r.RefDensityKgPerM3)
	if r.Actual {
		r.out(figActualVol, r.ActualM3PerSec)
	}
	if r.ActualRealM3PerSec > 0 {
		r.out(figActualVolReal, r.ActualRealM3PerSec)
	}
	r.out(figRelDensity, r.RelativeDensity)
	r.out(figGCF, r.GasCorrectionFactor)
	r.note("standard volume at " + ref.Label)
	r.note("relative density: M/M_air, with dry air 28.96546 g/mol (ISO 6976)")
	r.note(gcfNote)
	if realNote != "" {
		r.note(realNote)
	}
	if r.Actual {
		r.caution(realGasCautions(processPoint{"line", g, f.LineTempK, f.LinePresPa})...)
	}
	if f.LinePresPa > 0 {
		r.caution(mixtures.Cautions(f.Mixture, f.LinePresPa)...)
	} else {
		r.caution(mixtures.Cautions(f.Mixture, ref.PresPa)...)
	}
	return r, nil
}

// GasCorrectionFactor is the common-practice factor of a thermal
// mass-flow meter calibrated on N2, for the mixture mix:
//
//	GCF = (Σ xᵢsᵢ / Σ xᵢρᵢcpᵢ) · (ρcp)_N2 / s_N2
//
// with ρᵢcpᵢ the heat capacity per volume: density at 0 °C and
// 101.325 kPa, cp at 25 °C, as the published factor tables take them.
// For an ideal gas ρᵢcpᵢ = P·Cpᵢ/(RT₀), so the molar masses and the
// density cancel, and the ratio of molar Cp at 25 °C is what remains.
func GasCorrectionFactor(m Model, mix *mixtures.Mixture) (float64, error) {
	var st mixtures.State
	if err := modelOr(m).Gas(mix).State(&st, gcfCpTempK, RefNormal.PresPa); err != nil {
		return 0, err
	}
	var sumS, sumRhoCp float64
	for i := range st.Species {
		t := &st.Species[i]
		sumS += t.X * StructureFactor(t.Species)
		sumRhoCp += t.X * t.CpJPerMolK
	}
	n2, err := nitrogenCp(m)
	if err != nil {
		return 0, err
	}
	return sumS / sumRhoCp * n2 / structureDiatomic, nil
}

// gcfCpTempK is where the factor takes Cp: 25 °C.
const gcfCpTempK = 298.15

// nitrogenCp is the molar Cp of N2 at 25 °C, from the built-in catalogue:
// the calibration gas is the real N2 whatever a species file says.
func nitrogenCp(m Model) (float64, error) {
	n2, ok := model.Builtin().Lookup("N2")
	if !ok {
		return 0, model.Errorf("process", "the built-in catalogue has no N2")
	}
	mix, err := mixtures.NewMixture([]mixtures.Component{{Species: n2, X: 1}})
	if err != nil {
		return 0, err
	}
	var st mixtures.State
	if err := modelOr(m).Gas(mix).State(&st, gcfCpTempK, RefNormal.PresPa); err != nil {
		return 0, err
	}
	return st.CpJPerMolK, nil
}
