package process

import (
	"errors"
	"math"
	"sync"

	"zmix/mixtures"
	"zmix/model"
)

// Compression takes a gas from (T₁, P₁) to P₂ adiabatically in steady
// flow, in one stage or several of equal pressure ratio with intercooling
// between them. P₂ below P₁ makes it an expander.
type Compression struct {
	Mixture      *mixtures.Mixture
	InletTempK   float64
	InletPresPa  float64
	OutletPresPa float64
	// Efficiency is the isentropic efficiency η, in (0, 1]; 0 means 1.
	Efficiency float64
	// Stages is the number of compression stages; 0 means 1. Expansion
	// has one.
	Stages int
	// IntercoolTempK is the temperature the gas is cooled back to
	// between stages; 0 means the inlet temperature.
	IntercoolTempK float64
	// RateMolPerSec is the flow, for the power; 0 means none given.
	RateMolPerSec float64
	Model         Model // nil means Ideal{}
}

// Stage is one stage of a compression.
type Stage struct {
	InletTempK, InletPresPa, OutletPresPa float64
	IsentropicOutletTempK, OutletTempK    float64
	WorkJPerMol                           float64 // h₂ − h₁, > 0 when work is done on the gas
	EntropyRiseJPerMolK                   float64 // s₂ − s₁, generated since the stage is adiabatic
	// MeanGamma is the constant γ that would give the same isentropic
	// outlet: T₂s/T₁ = (P₂/P₁)^((γ−1)/γ).
	MeanGamma float64
	// PolytropicN is the exponent n of the actual path: T₂/T₁ = (P₂/P₁)^((n−1)/n).
	PolytropicN float64
	// IntercoolJPerMol is the heat taken out after the stage, h₂ − h_ic,
	// positive when heat is removed; 0 after the last stage.
	IntercoolJPerMol float64
}

// CompressionResult is a solved Compression.
type CompressionResult struct {
	base
	Stages                             []Stage
	OutletTempK, IsentropicOutletTempK float64
	WorkJPerMol, WorkJPerKg            float64 // total over the stages
	PowerW                             float64 // 0 when no flow is given
	IntercoolJPerMol                   float64
	EntropyRiseJPerMolK                float64
	MaxTempK                           float64
	Expansion                          bool
	MolarMassKgPerMol, Efficiency      float64

	gas Gas // for the path
}

// MaxStages bounds the stages, so a typo cannot ask for a million.
const MaxStages = 20

var (
	figOutletP = &Figure{Key: "p2", Label: "outlet pressure", Symbol: "P₂", SymbolASCII: "P2", Unit: "bar", UnitASCII: "bar", Scale: 1e-5,
		Name: "outlet_pressure_Pa", Digits: mixtures.Digits{Sig: 6}}
	figEff = &Figure{Key: "eta", Label: "isentropic efficiency", Symbol: "η", SymbolASCII: "eta", Scale: 1,
		Name: "isentropic_efficiency", Digits: mixtures.Digits{Sig: 4}}
	figStages = &Figure{Key: "stages", Label: "stages", Symbol: "N", SymbolASCII: "N", Scale: 1,
		Name: "stage_count", Digits: mixtures.Digits{Sig: 3}, Integer: true}
	figIntercoolT = &Figure{Key: "tic", Label: "intercooling to", Symbol: "Tic", SymbolASCII: "Tic", Unit: "K", UnitASCII: "K", Scale: 1,
		Name: "intercool_temperature_K", Digits: mixtures.Digits{Sig: 6}, Also: celsius}
	figRateIn = &Figure{Key: "n", Label: "molar flow", Symbol: "ṅ", SymbolASCII: "n", Unit: "mol/s", UnitASCII: "mol/s", Scale: 1,
		Name: "rate_mol_s", Digits: mixtures.Digits{Sig: 6}, Also: []AltUnit{{Unit: "kmol/h", UnitASCII: "kmol/h", Scale: 3.6}}}
	figT2 = &Figure{Key: "t2", Label: "outlet temperature", Symbol: "T₂", SymbolASCII: "T2", Unit: "K", UnitASCII: "K", Scale: 1,
		Name: "outlet_temperature_K", Digits: mixtures.Digits{Sig: 6}, Also: celsius}
	figT2s = &Figure{Key: "t2s", Label: "isentropic outlet temperature", Symbol: "T₂s", SymbolASCII: "T2s", Unit: "K", UnitASCII: "K", Scale: 1,
		Name: "isentropic_outlet_temperature_K", Digits: mixtures.Digits{Sig: 6}, Also: celsius}
	figWork = &Figure{Key: "w", Label: "specific work (on the gas)", Symbol: "w", SymbolASCII: "w", Unit: unitKJPerMol, UnitASCII: unitKJPerMol, Scale: 1e-3,
		Name: "work_J_mol", Digits: mixtures.Digits{Sig: 6}}
	figWorkKg = &Figure{Key: "wkg", Label: "specific work per kg", Symbol: "w", SymbolASCII: "w", Unit: unitKJPerKg, UnitASCII: unitKJPerKg, Scale: 1e-3,
		Name: "work_J_kg", Digits: mixtures.Digits{Sig: 6}}
	figPower = &Figure{Key: "power", Label: "power (on the gas)", Symbol: "Ẇ", SymbolASCII: "W", Unit: unitKW, UnitASCII: unitKW, Scale: 1e-3,
		Name: "power_W", Digits: mixtures.Digits{Sig: 6}}
	figIntercoolQ = &Figure{Key: "qic", Label: "intercooling heat removed", Symbol: "Qic", SymbolASCII: "Qic", Unit: unitKJPerMol, UnitASCII: unitKJPerMol, Scale: 1e-3,
		Name: "intercool_J_mol", Digits: mixtures.Digits{Sig: 6}}
	figDS = &Figure{Key: "sgen", Label: "entropy generated", Symbol: "Δs", SymbolASCII: "ds", Unit: unitJPerMolK, UnitASCII: unitJPerMolKA, Scale: 1,
		Name: "entropy_generation_J_molK", Digits: mixtures.Digits{Sig: 5}}
	figGammaMean = &Figure{Key: "gammabar", Label: "mean γ over the path", Symbol: "γ̄", SymbolASCII: "gamma_mean", Scale: 1,
		Name: "mean_gamma", Digits: mixtures.Digits{Sig: 5}}
	figPolyN = &Figure{Key: "npoly", Label: "polytropic exponent", Symbol: "n", SymbolASCII: "n", Scale: 1,
		Name: "polytropic_exponent", Digits: mixtures.Digits{Sig: 5}}
	figStageNo = &Figure{Key: "stage", Label: "stage", Symbol: "#", SymbolASCII: "#", Scale: 1,
		Name: "stage", Digits: mixtures.Digits{Sig: 3}, Integer: true}
)

// Solve runs the compression or expansion.
func (c Compression) Solve() (*CompressionResult, error) {
	if c.Mixture == nil {
		return nil, model.Errorf("process", "compression: no blend given")
	}
	p1, p2 := c.InletPresPa, c.OutletPresPa
	if !(p1 > 0) || !(p2 > 0) || math.IsInf(p1, 0) || math.IsInf(p2, 0) {
		return nil, model.Errorf("process", "compression: want inlet and outlet pressures above 0 Pa (got %g Pa and %g Pa)", p1, p2)
	}
	if p1 == p2 {
		return nil, model.Errorf("process", "the outlet pressure equals the inlet pressure, %g Pa; want a higher one to compress or a lower one to expand", p1)
	}
	eta := c.Efficiency
	if eta == 0 {
		eta = 1
	}
	if !(eta > 0 && eta <= 1) {
		return nil, model.Errorf("process", "isentropic efficiency %g: want a value above 0 and at most 1 (0.8, or 80%%)", eta)
	}
	n := c.Stages
	if n == 0 {
		n = 1
	}
	expansion := p2 < p1
	if n < 1 || n > MaxStages {
		return nil, model.Errorf("process", "%d stages: want 1 to %d", c.Stages, MaxStages)
	}
	if expansion && n > 1 {
		return nil, model.Errorf("process", "an expansion (outlet %g Pa below inlet %g Pa) has one stage here; want --stages 1", p2, p1)
	}
	if !(c.RateMolPerSec >= 0) || math.IsInf(c.RateMolPerSec, 0) {
		return nil, model.Errorf("process", "flow %g mol/s: want a finite flow of 0 or more", c.RateMolPerSec)
	}
	tic := c.IntercoolTempK
	if tic == 0 {
		tic = c.InletTempK
	}
	m := modelOr(c.Model)
	g := m.Gas(c.Mixture)
	ratio := math.Pow(p2/p1, 1/float64(n))

	r := &CompressionResult{Expansion: expansion, MolarMassKgPerMol: c.Mixture.MolarMassKgPerMol, Efficiency: eta, gas: g}
	w := workPool.Get().(*stateWork)
	defer workPool.Put(w)
	tIn, pIn := c.InletTempK, p1
	for i := range n {
		pOut := pIn * ratio
		if i == n-1 {
			pOut = p2 // no drift from the product of ratios
		}
		st, err := w.stage(g, tIn, pIn, pOut, eta)
		if err != nil {
			return nil, err
		}
		if i < n-1 {
			hic, err := w.enthalpy(g, tic, pOut)
			if err != nil {
				return nil, err
			}
			st.IntercoolJPerMol = w.h2 - hic
			r.IntercoolJPerMol += st.IntercoolJPerMol
			tIn = tic
		}
		r.Stages = append(r.Stages, st)
		r.WorkJPerMol += st.WorkJPerMol
		r.EntropyRiseJPerMolK += st.EntropyRiseJPerMolK
		r.MaxTempK = max(r.MaxTempK, st.OutletTempK)
		pIn = pOut
	}
	last := r.Stages[len(r.Stages)-1]
	r.OutletTempK, r.IsentropicOutletTempK = last.OutletTempK, last.IsentropicOutletTempK
	r.WorkJPerKg = r.WorkJPerMol / r.MolarMassKgPerMol
	r.PowerW = r.WorkJPerMol * c.RateMolPerSec

	r.kind = "compress"
	what := "compression"
	if expansion {
		r.kind, what = "expand", "expansion"
	}
	r.assumptions = "adiabatic " + what + ", steady flow, " + m.Name() + ", kinetic and potential energy neglected"
	if n > 1 {
		r.assumptions += ", equal pressure ratios, intercooling at the stage pressure"
	}
	r.in(figInletT, c.InletTempK)
	r.in(figInletP, p1)
	r.in(figOutletP, p2)
	r.in(figEff, eta)
	if n > 1 {
		r.in(figStages, float64(n))
		r.in(figIntercoolT, tic)
	}
	if c.RateMolPerSec > 0 {
		r.in(figRateIn, c.RateMolPerSec)
	}
	r.out(figT2, r.OutletTempK)
	r.out(figT2s, r.IsentropicOutletTempK)
	r.out(figWork, r.WorkJPerMol)
	r.out(figWorkKg, r.WorkJPerKg)
	if c.RateMolPerSec > 0 {
		r.out(figPower, r.PowerW)
	}
	if n > 1 {
		r.out(figIntercoolQ, r.IntercoolJPerMol)
	} else {
		r.out(figGammaMean, last.MeanGamma)
		r.out(figPolyN, last.PolytropicN)
	}
	r.out(figDS, r.EntropyRiseJPerMolK)
	rows := make([][]Value, len(r.Stages))
	for i, s := range r.Stages {
		rows[i] = []Value{{figStageNo, float64(i + 1)}, {figInletT, s.InletTempK}, {figInletP, s.InletPresPa}, {figOutletP, s.OutletPresPa},
			{figT2s, s.IsentropicOutletTempK}, {figT2, s.OutletTempK}, {figWork, s.WorkJPerMol}, {figGammaMean, s.MeanGamma}, {figPolyN, s.PolytropicN},
			{figIntercoolQ, s.IntercoolJPerMol}}
		if c.RateMolPerSec > 0 {
			rows[i] = append(rows[i], Value{figPower, s.WorkJPerMol * c.RateMolPerSec})
		}
	}
	r.tables = []Table{{Name: "stages", Title: "Stages", Rows: rows, Brief: []string{"stage", "p2", "t2s", "t2", "w", "npoly", "qic", "power"}}}
	if n > 1 {
		r.note("the isentropic outlet temperature is the last stage's")
	}
	if expansion {
		r.note("the work is negative: the gas does work on the expander")
	}
	// The hottest point is a stage outlet; an expander's coldest is its outlet.
	r.laterCautions = func() []mixtures.Caution {
		out := realGasCautions(processPoint{"inlet", g, c.InletTempK, p1}, processPoint{"outlet", g, r.OutletTempK, p2})
		out = append(out, temperatureCautions(c.Mixture, r.MaxTempK, "outlet")...)
		return append(out, mixtures.Cautions(c.Mixture, max(p1, p2))...)
	}
	return r, nil
}

// stateWork holds the state a compression reuses, so that a stage
// allocates nothing after the first, and the last state a balance
// evaluated.
type stateWork struct {
	st mixtures.State
	h2 float64
	// The last state evaluated by a balance: T, H, S and Cp.
	tLast, hLast, sLast, cpLast float64
}

// workPool keeps stateWorks between solves: a state of a ten-species
// blend holds kilobytes of species terms, which a solve would otherwise
// allocate each time.
var workPool = sync.Pool{New: func() any { return new(stateWork) }}

// enthalpy is H(T, P) of g.
func (w *stateWork) enthalpy(g Gas, tempK, presPa float64) (float64, error) {
	if err := g.State(&w.st, tempK, presPa); err != nil {
		return 0, err
	}
	return w.st.HJPerMol, nil
}

// eval computes g at (T, P) and keeps it as the last state.
func (w *stateWork) eval(g Gas, tempK, presPa float64) error {
	if err := g.State(&w.st, tempK, presPa); err != nil {
		return err
	}
	w.tLast, w.hLast, w.sLast, w.cpLast = tempK, w.st.HJPerMol, w.st.SJPerMolK, w.st.CpJPerMolK
	return nil
}

// at carries the last state's H and S to a T a Newton step away, at
// constant P: dH = Cp dT, dS = Cp/T dT. The step is below solveRelTol·T,
// so the error, of order dT², is far below any digit shown, and no state
// is computed again.
func (w *stateWork) at(tempK float64) (h, s float64) {
	dt := tempK - w.tLast
	return w.hLast + w.cpLast*dt, w.sLast + w.cpLast/w.tLast*dt
}

// stage solves one adiabatic stage from (t1, p1) to p2 at efficiency eta.
func (w *stateWork) stage(g Gas, t1, p1, p2, eta float64) (Stage, error) {
	if err := w.eval(g, t1, p1); err != nil {
		return Stage{}, err
	}
	h1, s1, cp1 := w.hLast, w.sLast, w.cpLast
	// S(T₂s, P₂) = S(T₁, P₁), from the constant-Cp guess.
	guess := t1 * math.Pow(p2/p1, model.GasConstant/cp1)
	t2s, err := solveT(func(tempK float64) (float64, float64, error) {
		if err := w.eval(g, tempK, p2); err != nil {
			return 0, 0, err
		}
		return w.sLast - s1, w.cpLast / tempK, nil
	}, guess)
	if errors.Is(err, errOutOfRange) {
		return Stage{}, model.Errorf("process", "the isentropic outlet from %.6g K at %.6g bar to %.6g bar would lie outside the model's %g K to %g K; want a pressure ratio nearer 1",
			t1, p1/1e5, p2/1e5, model.MinTempK, model.MaxTempK)
	}
	if err != nil {
		return Stage{}, model.Errorf("process", "the isentropic outlet from %.6g K at %.6g bar to %.6g bar: %v", t1, p1/1e5, p2/1e5, err)
	}
	h2s, s2 := w.at(t2s)
	var h2 float64
	if p2 > p1 {
		h2 = h1 + (h2s-h1)/eta
	} else {
		h2 = h1 - eta*(h1-h2s)
	}
	t2 := t2s
	if eta != 1 {
		t2, err = solveT(func(tempK float64) (float64, float64, error) {
			if err := w.eval(g, tempK, p2); err != nil {
				return 0, 0, err
			}
			return w.hLast - h2, w.cpLast, nil
		}, t2s+(h2-h2s)/w.cpLast)
		if err != nil {
			return Stage{}, model.Errorf("process", "the actual outlet at %g Pa: %v", p2, err)
		}
		_, s2 = w.at(t2)
	}
	w.h2 = h2
	lnPR := math.Log(p2 / p1)
	k := math.Log(t2s/t1) / lnPR // (γ̄−1)/γ̄
	np := math.Log(t2/t1) / lnPR // (n−1)/n
	return Stage{
		InletTempK: t1, InletPresPa: p1, OutletPresPa: p2,
		IsentropicOutletTempK: t2s, OutletTempK: t2,
		WorkJPerMol:         h2 - h1,
		EntropyRiseJPerMolK: s2 - s1,
		MeanGamma:           1 / (1 - k),
		PolytropicN:         1 / (1 - np),
	}, nil
}
