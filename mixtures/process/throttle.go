package process

import (
	"math"

	"zmix/mixtures"
	"zmix/model"
)

// RealGas is the real-gas model for the process calculations: the
// engine's ideal-gas state with the departures of package realgas added
// to H and S, and the real Cp (virial or Peng–Robinson, as the state
// readout chooses). Where no species carries critical constants it is
// the ideal gas. The zero value uses the engine's default options.
type RealGas struct {
	Options mixtures.Options
}

// Gas returns the real-gas state function of mix.
func (m RealGas) Gas(mix *mixtures.Mixture) Gas { return realGas{mix: mix, opts: m.Options} }

// Name says which model it is.
func (RealGas) Name() string {
	return "real gas (departures from the virial or Peng-Robinson equation)"
}

type realGas struct {
	mix  *mixtures.Mixture
	opts mixtures.Options
}

func (g realGas) State(s *mixtures.State, tempK, presPa float64) error {
	if err := g.mix.CheckConditions(tempK, presPa); err != nil {
		return err
	}
	g.mix.Fill(s, tempK, presPa, g.opts)
	if rg, known := s.RealGasResult(); known {
		s.HJPerMol += rg.HResJPerMol
		s.SJPerMolK += rg.SResJPerMolK
		s.GJPerMol += rg.HResJPerMol - tempK*rg.SResJPerMolK
		s.CpJPerMolK, s.CvJPerMolK = rg.CpJPerMolK, rg.CvJPerMolK
		s.Gamma = rg.CpJPerMolK / rg.CvJPerMolK
		s.SoundSpeedMPerS = rg.SoundSpeedMPerS
		s.DensityKgPerM3 = s.MolarMassKgPerMol / rg.VM3PerMol
	}
	return nil
}

func (g realGas) Mixture() *mixtures.Mixture { return g.mix }

// Throttle is an adiabatic expansion across a valve: the enthalpy is
// kept, so the outlet temperature solves H(T₂, P₂) = H(T₁, P₁). With the
// ideal gas H depends on T only and the throttle is isothermal; the
// real gas cools or warms by the Joule–Thomson effect.
type Throttle struct {
	Mixture      *mixtures.Mixture
	InletTempK   float64
	InletPresPa  float64
	OutletPresPa float64
	Model        Model // nil means RealGas{}
}

// ThrottleResult is a solved Throttle.
type ThrottleResult struct {
	base
	OutletTempK, DeltaTK float64
	// MeanJouleThomsonKPerPa is ΔT/ΔP over the valve.
	MeanJouleThomsonKPerPa float64
}

var (
	figThrP2 = &Figure{Key: "p2", Label: "outlet pressure", Symbol: "P₂", SymbolASCII: "P2", Unit: "bar", UnitASCII: "bar", Scale: 1e-5,
		Name: "outlet_pressure_Pa", Digits: mixtures.Digits{Sig: 6}}
	figThrT2 = &Figure{Key: "t2", Label: "outlet temperature", Symbol: "T₂", SymbolASCII: "T2", Unit: "K", UnitASCII: "K", Scale: 1,
		Name: "outlet_temperature_K", Digits: mixtures.Digits{Sig: 6}, Also: celsius}
	figThrDT = &Figure{Key: "dt", Label: "temperature change", Symbol: "ΔT", SymbolASCII: "dT", Unit: "K", UnitASCII: "K", Scale: 1,
		Name: "delta_T_K", Digits: mixtures.Digits{Sig: 4}}
	figThrJT = &Figure{Key: "jt", Label: "mean Joule-Thomson coefficient", Symbol: "μJT", SymbolASCII: "muJT", Unit: "K/bar", UnitASCII: "K/bar", Scale: 1e5,
		Name: "mean_jt_K_per_Pa", Digits: mixtures.Digits{Sig: 4}}
)

// Solve finds the outlet temperature by bisection on H(T₂, P₂) − H₁,
// which rises with T₂ (Cp > 0).
func (t Throttle) Solve() (*ThrottleResult, error) {
	if t.Mixture == nil {
		return nil, model.Errorf("process", "throttle: no blend given")
	}
	if !(t.OutletPresPa > 0) || t.OutletPresPa > t.InletPresPa {
		return nil, model.Errorf("process", "throttle: outlet pressure %g Pa; want above 0 and at most the inlet pressure %g Pa", t.OutletPresPa, t.InletPresPa)
	}
	m := t.Model
	if m == nil {
		m = RealGas{}
	}
	g := m.Gas(t.Mixture)
	var s mixtures.State
	if err := g.State(&s, t.InletTempK, t.InletPresPa); err != nil {
		return nil, err
	}
	h1 := s.HJPerMol
	lo, hi := math.Max(model.MinTempK, 0.5*t.InletTempK), math.Min(model.MaxTempK, 1.5*t.InletTempK)
	f := func(tk float64) (float64, error) {
		if err := g.State(&s, tk, t.OutletPresPa); err != nil {
			return 0, err
		}
		return s.HJPerMol - h1, nil
	}
	flo, err := f(lo)
	if err != nil {
		return nil, err
	}
	fhi, err := f(hi)
	if err != nil {
		return nil, err
	}
	if flo > 0 || fhi < 0 {
		return nil, model.Errorf("process", "throttle: no outlet temperature between %.4g K and %.4g K keeps the enthalpy", lo, hi)
	}
	for i := 0; i < 100 && hi-lo > 1e-9*hi; i++ {
		mid := 0.5 * (lo + hi)
		fm, err := f(mid)
		if err != nil {
			return nil, err
		}
		if fm > 0 {
			hi = mid
		} else {
			lo = mid
		}
	}
	r := &ThrottleResult{OutletTempK: 0.5 * (lo + hi)}
	r.DeltaTK = r.OutletTempK - t.InletTempK
	r.MeanJouleThomsonKPerPa = r.DeltaTK / (t.OutletPresPa - t.InletPresPa)
	r.kind = "throttle"
	r.assumptions = "adiabatic, steady flow across a valve, enthalpy kept, " + m.Name() + ", kinetic and potential energy neglected"
	r.in(figInletT, t.InletTempK)
	r.in(figInletP, t.InletPresPa)
	r.in(figThrP2, t.OutletPresPa)
	r.out(figThrT2, r.OutletTempK)
	r.out(figThrDT, r.DeltaTK)
	if t.OutletPresPa < t.InletPresPa {
		r.out(figThrJT, r.MeanJouleThomsonKPerPa)
	}
	r.caution(temperatureCautions(t.Mixture, r.OutletTempK, "outlet")...)
	return r, nil
}
