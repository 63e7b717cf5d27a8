package process

import (
	"fmt"
	"math"

	"zmix/mixtures"
	"zmix/model"
)

// Stream is one inlet of a mixer.
type Stream struct {
	Label         string // how the stream is named: its blend text
	Mixture       *mixtures.Mixture
	TempK         float64
	RateMolPerSec float64
}

// Mixing joins streams adiabatically at one pressure, in steady flow.
// Each stream enters at the mixing pressure; the outlet temperature comes
// from the energy balance Σ ṅᵢHᵢ(Tᵢ) = ṅ H_out(T), on the engine's common
// energy scale (each species at its ΔfH°(0 K)), so no species' zero
// cancels by accident.
type Mixing struct {
	Streams []Stream
	PresPa  float64
	Model   Model // nil means Ideal{}
}

// MixingResult is a solved Mixing.
type MixingResult struct {
	base
	Mixture               *mixtures.Mixture
	OutletTempK           float64
	RateMolPerSec         float64
	RateKgPerSec          float64
	EntropyGenWPerK       float64 // ṅS_out − Σ ṅᵢSᵢ
	MixingEntropyGenWPerK float64 // the part from the change of composition
	State                 mixtures.State
}

// MaxStreams bounds the streams of one mixer.
const MaxStreams = 32

var (
	figMixT = &Figure{Key: "t", Label: "outlet temperature", Symbol: "T", SymbolASCII: "T", Unit: "K", UnitASCII: "K", Scale: 1,
		Name: "outlet_temperature_K", Digits: mixtures.Digits{Sig: 6}, Also: celsius}
	figMixRate = &Figure{Key: "n", Label: "outlet molar flow", Symbol: "ṅ", SymbolASCII: "n", Unit: "mol/s", UnitASCII: "mol/s", Scale: 1,
		Name: "rate_mol_s", Digits: mixtures.Digits{Sig: 6}, Also: []AltUnit{{Unit: "kmol/h", UnitASCII: "kmol/h", Scale: 3.6}}}
	figMixMass = &Figure{Key: "m", Label: "outlet mass flow", Symbol: "ṁ", SymbolASCII: "m", Unit: "kg/h", UnitASCII: "kg/h", Scale: 3600,
		Name: "rate_kg_s", Digits: mixtures.Digits{Sig: 6}}
	figSgen = &Figure{Key: "sgen", Label: "entropy generated", Symbol: "Ṡgen", SymbolASCII: "Sgen", Unit: unitWPerK, UnitASCII: unitWPerK, Scale: 1,
		Name: "entropy_generation_W_K", Digits: mixtures.Digits{Sig: 5}}
	figSgenMix = &Figure{Key: "sgenmix", Label: "  of which by mixing", Symbol: "Ṡmix", SymbolASCII: "Smix", Unit: unitWPerK, UnitASCII: unitWPerK, Scale: 1,
		Name: "entropy_generation_mixing_W_K", Digits: mixtures.Digits{Sig: 5}}
	figStreamT = &Figure{Key: "ti", Label: "temperature", Symbol: "T", SymbolASCII: "T", Unit: "K", UnitASCII: "K", Scale: 1,
		Name: "temperature_K", Digits: mixtures.Digits{Sig: 6}, Also: celsius}
	figStreamRate = &Figure{Key: "ni", Label: "molar flow", Symbol: "ṅ", SymbolASCII: "n", Unit: "mol/s", UnitASCII: "mol/s", Scale: 1,
		Name: "rate_mol_s", Digits: mixtures.Digits{Sig: 6}}
	figStreamH = &Figure{Key: "hi", Label: "enthalpy flow", Symbol: "ṅH", SymbolASCII: "nH", Unit: unitKW, UnitASCII: unitKW, Scale: 1e-3,
		Name: "enthalpy_flow_W", Digits: mixtures.Digits{Decimals: 4}}
)

// Solve mixes the streams.
func (mx Mixing) Solve() (*MixingResult, error) {
	var r MixingResult
	if err := mx.SolveInto(&r); err != nil {
		return nil, err
	}
	mx.Describe(&r)
	return &r, nil
}

// SolveInto solves the balances into r, reusing its storage, without the
// figures and cautions that Describe adds.
func (mx Mixing) SolveInto(r *MixingResult) error {
	switch {
	case len(mx.Streams) < 2:
		return model.Errorf("process", "mixing needs at least two streams (got %d)", len(mx.Streams))
	case len(mx.Streams) > MaxStreams:
		return model.Errorf("process", "%d streams: want at most %d", len(mx.Streams), MaxStreams)
	case !(mx.PresPa > 0) || math.IsInf(mx.PresPa, 0):
		return model.Errorf("process", "mixing pressure %g Pa: want a finite pressure above 0", mx.PresPa)
	}
	m := modelOr(mx.Model)
	var comps []mixtures.Component
	var nTot, hFlow, sIn, smixIn float64
	st := &r.State
	for i, s := range mx.Streams {
		if s.Mixture == nil {
			return model.Errorf("process", "stream %d has no blend", i+1)
		}
		if !(s.RateMolPerSec > 0) || math.IsInf(s.RateMolPerSec, 0) {
			return model.Errorf("process", "stream %d: flow %g mol/s; want a finite flow above zero", i+1, s.RateMolPerSec)
		}
		if err := m.Gas(s.Mixture).State(st, s.TempK, mx.PresPa); err != nil {
			return model.Errorf("process", "stream %d: %v", i+1, err)
		}
		nTot += s.RateMolPerSec
		hFlow += s.RateMolPerSec * st.HJPerMol
		sIn += s.RateMolPerSec * st.SJPerMolK
		smixIn += s.RateMolPerSec * st.SMixJPerMolK
		for _, c := range s.Mixture.Components {
			comps = append(comps, mixtures.Component{Species: c.Species, X: c.X * s.RateMolPerSec})
		}
	}
	out, err := mixtures.NewMixture(comps)
	if err != nil {
		return err
	}
	g := m.Gas(out)
	hOut := hFlow / nTot
	// The flow-weighted mean temperature is the constant-Cp answer.
	var guess float64
	for _, s := range mx.Streams {
		guess += s.TempK * s.RateMolPerSec / nTot
	}
	tOut, err := solveT(func(tempK float64) (float64, float64, error) {
		if err := g.State(st, tempK, mx.PresPa); err != nil {
			return 0, 0, err
		}
		return st.HJPerMol - hOut, st.CpJPerMolK, nil
	}, guess)
	if err != nil {
		return model.Errorf("process", "mixing: %v", err)
	}
	if err := g.State(st, tOut, mx.PresPa); err != nil {
		return err
	}
	r.base = base{kind: "mix"}
	r.Mixture, r.OutletTempK, r.RateMolPerSec = out, tOut, nTot
	r.RateKgPerSec = nTot * out.MolarMassKgPerMol
	r.EntropyGenWPerK = nTot*st.SJPerMolK - sIn
	r.MixingEntropyGenWPerK = nTot*st.SMixJPerMolK - smixIn
	return nil
}

// Describe fills in the figures, notes and cautions of a mixing that
// SolveInto solved.
func (mx Mixing) Describe(r *MixingResult) {
	m := modelOr(mx.Model)
	r.assumptions = "adiabatic, steady flow, " + m.Name() + ", each stream enters at the mixing pressure, kinetic and potential energy neglected"
	r.in(figPres, mx.PresPa)
	r.out(figMixT, r.OutletTempK)
	r.out(figMixRate, r.RateMolPerSec)
	r.out(figMixMass, r.RateKgPerSec)
	r.out(figSgen, r.EntropyGenWPerK)
	r.out(figSgenMix, r.MixingEntropyGenWPerK)
	rows := make([][]Value, len(mx.Streams))
	labels := make([]string, len(mx.Streams))
	var st mixtures.State
	for i, s := range mx.Streams {
		_ = m.Gas(s.Mixture).State(&st, s.TempK, mx.PresPa) // solved above
		rows[i] = []Value{{figStreamT, s.TempK}, {figStreamRate, s.RateMolPerSec}, {figStreamH, s.RateMolPerSec * st.HJPerMol}}
		labels[i] = s.Label
	}
	r.tables = []Table{{Name: "streams", Title: "Streams", RowName: "blend", RowLabels: labels, Rows: rows}}
	r.outlet = &r.State
	r.note("enthalpy flows on the engine's scale: each species at its enthalpy of formation at 0 K")
	r.note("entropy generated includes the mixing entropy; the line below it is that part alone")
	// Each stream at its inlet, and the outlet, in one caution.
	points := make([]processPoint, 0, len(mx.Streams)+1)
	for i, s := range mx.Streams {
		points = append(points, processPoint{fmt.Sprintf("inlet of stream %d", i+1), m.Gas(s.Mixture), s.TempK, mx.PresPa})
	}
	r.caution(realGasCautions(append(points, processPoint{"outlet", m.Gas(r.Mixture), r.OutletTempK, mx.PresPa})...)...)
	r.caution(temperatureCautions(r.Mixture, r.OutletTempK, "outlet")...)
	r.caution(mixtures.Cautions(r.Mixture, mx.PresPa)...)
}
