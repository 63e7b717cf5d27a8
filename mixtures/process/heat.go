package process

import (
	"math"

	"zmix/mixtures"
	"zmix/model"
)

// Heating takes a gas from T₁ to T₂ at constant pressure: the duty is
// ΔH = H(T₂, P) − H(T₁, P), from the engine's H(T), not a constant Cp.
type Heating struct {
	Mixture     *mixtures.Mixture
	InletTempK  float64
	OutletTempK float64
	PresPa      float64
	// RateMolPerSec is the flow, for the duty as a power; 0 means none.
	RateMolPerSec float64
	Model         Model // nil means Ideal{}
}

// HeatingResult is a solved Heating.
type HeatingResult struct {
	base
	DutyJPerMol, DutyJPerKg, DutyW float64
	EntropyChangeJPerMolK          float64
	MeanCpJPerMolK                 float64

	gas            Gas // for the path
	t1, t2, presPa float64
}

var (
	figDuty = &Figure{Key: "q", Label: "duty ΔH (into the gas)", Symbol: "q", SymbolASCII: "q", Unit: unitKJPerMol, UnitASCII: unitKJPerMol, Scale: 1e-3,
		Name: "duty_J_mol", Digits: mixtures.Digits{Sig: 6}}
	figDutyKg = &Figure{Key: "qkg", Label: "duty per kg", Symbol: "q", SymbolASCII: "q", Unit: unitKJPerKg, UnitASCII: unitKJPerKg, Scale: 1e-3,
		Name: "duty_J_kg", Digits: mixtures.Digits{Sig: 6}}
	figDutyW = &Figure{Key: "qdot", Label: "duty as a power", Symbol: "Q̇", SymbolASCII: "Q", Unit: unitKW, UnitASCII: unitKW, Scale: 1e-3,
		Name: "duty_W", Digits: mixtures.Digits{Sig: 6}}
	figDSHeat = &Figure{Key: "ds", Label: "entropy change", Symbol: "Δs", SymbolASCII: "ds", Unit: unitJPerMolK, UnitASCII: unitJPerMolKA, Scale: 1,
		Name: "entropy_change_J_molK", Digits: mixtures.Digits{Sig: 5}}
	figMeanCp = &Figure{Key: "cpbar", Label: "mean Cp over the range", Symbol: "C̄p", SymbolASCII: "Cp_mean", Unit: unitJPerMolK, UnitASCII: unitJPerMolKA, Scale: 1,
		Name: "mean_cp_J_molK", Digits: mixtures.Digits{Sig: 5}}
)

// Solve computes the duty.
func (h Heating) Solve() (*HeatingResult, error) {
	if h.Mixture == nil {
		return nil, model.Errorf("process", "heating: no blend given")
	}
	if !(h.RateMolPerSec >= 0) || math.IsInf(h.RateMolPerSec, 0) {
		return nil, model.Errorf("process", "flow %g mol/s: want a finite flow of 0 or more", h.RateMolPerSec)
	}
	m := modelOr(h.Model)
	g := m.Gas(h.Mixture)
	var st mixtures.State
	if err := g.State(&st, h.InletTempK, h.PresPa); err != nil {
		return nil, err
	}
	h1, s1 := st.HJPerMol, st.SJPerMolK
	if err := g.State(&st, h.OutletTempK, h.PresPa); err != nil {
		return nil, err
	}
	r := &HeatingResult{DutyJPerMol: st.HJPerMol - h1, EntropyChangeJPerMolK: st.SJPerMolK - s1,
		gas: g, t1: h.InletTempK, t2: h.OutletTempK, presPa: h.PresPa}
	r.DutyJPerKg = r.DutyJPerMol / h.Mixture.MolarMassKgPerMol
	r.DutyW = r.DutyJPerMol * h.RateMolPerSec
	r.kind = "heat"
	r.assumptions = "constant pressure, steady flow (or a closed amount: ΔH is the heat either way), " + m.Name() + ", no phase change, kinetic and potential energy neglected"
	r.in(figInletT, h.InletTempK)
	r.in(figT2, h.OutletTempK) // the compression's outlet temperature, given here
	r.in(figPres, h.PresPa)
	if h.RateMolPerSec > 0 {
		r.in(figRateIn, h.RateMolPerSec)
	}
	r.out(figDuty, r.DutyJPerMol)
	r.out(figDutyKg, r.DutyJPerKg)
	if h.RateMolPerSec > 0 {
		r.out(figDutyW, r.DutyW)
	}
	r.out(figDSHeat, r.EntropyChangeJPerMolK)
	if dt := h.OutletTempK - h.InletTempK; dt != 0 {
		r.MeanCpJPerMolK = r.DutyJPerMol / dt
		r.out(figMeanCp, r.MeanCpJPerMolK)
	}
	if r.DutyJPerMol < 0 {
		r.note("a negative duty is heat taken out of the gas: cooling")
	}
	r.caution(realGasCautions(processPoint{"inlet", g, h.InletTempK, h.PresPa}, processPoint{"outlet", g, h.OutletTempK, h.PresPa})...)
	r.caution(temperatureCautions(h.Mixture, h.OutletTempK, "outlet")...)
	r.caution(mixtures.Cautions(h.Mixture, h.PresPa)...)
	return r, nil
}
