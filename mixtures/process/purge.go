package process

import (
	"math"

	"zmix/mixtures"
	"zmix/model"
)

// PurgeMethod is how a volume is purged.
type PurgeMethod int

const (
	// PurgeSwing pressurises with purge gas to PHighPa and vents to
	// PLowPa, cycle after cycle.
	PurgeSwing PurgeMethod = iota
	// PurgeVacuum evacuates to PLowPa and refills to PHighPa; by the same
	// balance it takes as many cycles as a swing between those pressures.
	PurgeVacuum
	// PurgeFlow sweeps purge gas through a well-mixed volume.
	PurgeFlow
)

// Purge brings one species in a vessel or line from its level in the
// start gas to a target, with a purge gas that may hold some of it. The
// model is the common-practice ideal-mixing one: each fill mixes
// perfectly and each vent or evacuation leaves the composition as it is,
// so after k cycles
//
//	x_k − y = (x₀ − y)·(P_low/P_high)^k,
//
// and a flow purge of a well-mixed volume V at actual flow Q follows
//
//	x(t) − y = (x₀ − y)·exp(−Q t / V).
type Purge struct {
	Start, PurgeGas *mixtures.Mixture
	Target          Target
	Method          PurgeMethod
	// The two pressures of a swing or vacuum purge, absolute.
	PLowPa, PHighPa float64
	// The volume and gas temperature; for a swing purge they are
	// optional and give the gas used.
	VolumeM3, TempK float64
	// For a flow purge: the flow and the vessel pressure.
	Rate   Rate
	PresPa float64
	Model  Model // nil means Ideal{}
}

// PurgeResult is a solved Purge.
type PurgeResult struct {
	base
	Cycles          int
	TimeS           float64
	VolumeExchanges float64
	FinalX          float64
	GasUsedMol      float64 // 0 when the volume is not given
}

// MaxPurgeCycles bounds the count, which a purge gas barely cleaner than
// the target could push to millions.
const MaxPurgeCycles = 10000

var (
	figStartLevel = levelFigure("x0", "start level", "start_level")
	figPurgeLevel = levelFigure("y", "level in the purge gas", "purge_gas_level")
	figPLow       = &Figure{Key: "plow", Label: "low pressure", Symbol: "Plow", SymbolASCII: "Plow", Unit: "bar", UnitASCII: "bar", Scale: 1e-5,
		Name: "low_pressure_Pa", Digits: mixtures.Digits{Sig: 6}}
	figPHigh = &Figure{Key: "phigh", Label: "high pressure", Symbol: "Phigh", SymbolASCII: "Phigh", Unit: "bar", UnitASCII: "bar", Scale: 1e-5,
		Name: "high_pressure_Pa", Digits: mixtures.Digits{Sig: 6}}
	figVolume = &Figure{Key: "v", Label: "volume", Symbol: "V", SymbolASCII: "V", Unit: "m³", UnitASCII: "m3", Scale: 1,
		Name: "volume_m3", Digits: mixtures.Digits{Sig: 6}, Also: []AltUnit{{Unit: "L", UnitASCII: "L", Scale: 1e3}}}
	figVesselT = &Figure{Key: "t", Label: "gas temperature", Symbol: "T", SymbolASCII: "T", Unit: "K", UnitASCII: "K", Scale: 1,
		Name: "temperature_K", Digits: mixtures.Digits{Sig: 6}, Also: celsius}
	figActualFlow = &Figure{Key: "q", Label: "purge flow at vessel conditions", Symbol: "Q", SymbolASCII: "Q", Unit: "m³/h", UnitASCII: "m3/h", Scale: 3600,
		Name: "actual_m3_s", Digits: mixtures.Digits{Sig: 6}, Also: []AltUnit{{Unit: "L/min", UnitASCII: "L/min", Scale: 6e4}}}
	figCycles = &Figure{Key: "cycles", Label: "cycles (rounded up)", Symbol: "k", SymbolASCII: "k", Scale: 1,
		Name: "cycles", Digits: mixtures.Digits{Sig: 6}, Integer: true}
	figCyclesExact = &Figure{Key: "kexact", Label: "cycles, unrounded", Symbol: "k", SymbolASCII: "k", Scale: 1,
		Name: "cycles_exact", Digits: mixtures.Digits{Sig: 4}}
	figTime = &Figure{Key: "time", Label: "time", Symbol: "t", SymbolASCII: "t", Unit: "min", UnitASCII: "min", Scale: 1.0 / 60,
		Name: "time_s", Digits: mixtures.Digits{Sig: 5}, Also: []AltUnit{{Unit: "h", UnitASCII: "h", Scale: 1.0 / 3600}}}
	figExchanges = &Figure{Key: "exch", Label: "volume exchanges", Symbol: "N", SymbolASCII: "N", Scale: 1,
		Name: "volume_exchanges", Digits: mixtures.Digits{Sig: 5}}
	figGasUsed = &Figure{Key: "gas", Label: "purge gas used", Symbol: "n", SymbolASCII: "n", Unit: "mol", UnitASCII: "mol", Scale: 1,
		Name: "purge_gas_mol", Digits: mixtures.Digits{Sig: 5}, Also: []AltUnit{{Unit: "Nm³", UnitASCII: "Nm3", Scale: 1 / normalMolPerM3}}}
)

// normalMolPerM3 is an ideal gas's amount per m³ at 0 °C and 101.325 kPa.
var normalMolPerM3 = model.StdPressureAtmPa / (model.GasConstant * model.ZeroCelsiusK)

// Solve counts the cycles, or the time.
func (p Purge) Solve() (*PurgeResult, error) {
	if p.Start == nil || p.PurgeGas == nil || p.Target.Species == nil {
		return nil, model.Errorf("process", "purge: want a start gas, a purge gas and a target")
	}
	sp := p.Target.Species
	x0, y, xt := fractionOf(p.Start, sp), fractionOf(p.PurgeGas, sp), p.Target.X
	name := sp.Formula
	if xt <= y {
		return nil, model.Errorf("process", "the purge gas itself holds %s ppm of %s, so no purge brings it to %s ppm; want a cleaner purge gas or a target above %s ppm",
			ppm(y), name, ppm(xt), ppm(y))
	}
	m := modelOr(p.Model)
	r := &PurgeResult{}
	// lnRatio is ln((x₀ − y)/(x_t − y)): the decades to remove, in e-folds.
	lnRatio := 0.0
	if x0 > xt {
		lnRatio = math.Log((x0 - y) / (xt - y))
	}
	r.in(figStartLevel, x0)
	r.in(figPurgeLevel, y)
	r.in(figTargetLevel, xt)
	switch p.Method {
	case PurgeSwing, PurgeVacuum:
		lo, hi := p.PLowPa, p.PHighPa
		if !(lo > 0) || !(hi > lo) || math.IsInf(hi, 0) {
			return nil, model.Errorf("process", "purge pressures %g Pa and %g Pa: want a low pressure above 0 and a high pressure above it, both absolute", lo, hi)
		}
		exact := lnRatio / math.Log(hi/lo)
		// A count that is whole but for rounding is that whole number.
		k := math.Ceil(exact - 1e-9)
		if k > MaxPurgeCycles {
			return nil, model.Errorf("process", "the purge takes %.4g cycles between these pressures, more than %d; widen the pressure ratio or use a flow purge", exact, MaxPurgeCycles)
		}
		r.Cycles = int(max(k, 0))
		r.FinalX = y + (x0-y)*math.Pow(lo/hi, float64(r.Cycles))
		r.kind = "purge"
		if p.Method == PurgeVacuum {
			r.assumptions = "vacuum purge: evacuate, then refill with purge gas; ideal mixing on each refill, evacuation leaves the composition, ideal gas, isothermal"
		} else {
			r.assumptions = "pressure-swing purge: fill with purge gas, then vent; ideal mixing on each fill, venting leaves the composition, ideal gas, isothermal"
		}
		r.in(figPLow, lo)
		r.in(figPHigh, hi)
		r.out(figCycles, float64(r.Cycles))
		r.out(figCyclesExact, max(exact, 0))
		if p.VolumeM3 > 0 && p.TempK > 0 {
			c, err := molarDensity(m.Gas(p.PurgeGas), p.TempK, hi)
			if err != nil {
				return nil, err
			}
			cLo, err := molarDensity(m.Gas(p.PurgeGas), p.TempK, lo)
			if err != nil {
				return nil, err
			}
			r.GasUsedMol = float64(r.Cycles) * (c - cLo) * p.VolumeM3
			r.in(figVolume, p.VolumeM3)
			r.in(figVesselT, p.TempK)
			r.out(figGasUsed, r.GasUsedMol)
			r.caution(realGasCautions(processPoint{"high pressure", m.Gas(p.PurgeGas), p.TempK, hi})...)
		}
	case PurgeFlow:
		if !(p.VolumeM3 > 0) || math.IsInf(p.VolumeM3, 0) {
			return nil, model.Errorf("process", "purge volume %g m³: want a finite volume above 0", p.VolumeM3)
		}
		known := p.TempK > 0 && p.PresPa > 0
		if !known && p.Rate.Unit.Basis != BasisActual {
			return nil, model.Errorf("process", "a flow purge at %s needs the vessel's temperature and pressure, to turn it into a volume flow; give both, or the flow in an actual-volume unit (m3/h, L/min, ACFM)", model.Quote(p.Rate.Text))
		}
		if known {
			r.caution(realGasCautions(processPoint{"vessel", m.Gas(p.PurgeGas), p.TempK, p.PresPa})...)
		}
		// q is the actual volume flow at the vessel's conditions.
		q := p.Rate.Value * p.Rate.Unit.SI
		var c float64 // purge gas in the vessel, mol/m³
		if known {
			g := m.Gas(p.PurgeGas)
			var err error
			if c, err = molarDensity(g, p.TempK, p.PresPa); err != nil {
				return nil, err
			}
			if p.Rate.Unit.Basis != BasisActual {
				n, err := p.Rate.MolPerSec(g, Conditions{TempK: p.TempK, PresPa: p.PresPa})
				if err != nil {
					return nil, err
				}
				q = n / c
			}
		}
		r.VolumeExchanges = lnRatio
		r.TimeS = lnRatio * p.VolumeM3 / q
		r.FinalX = min(x0, xt)
		r.kind = "purge"
		r.assumptions = "flow-through purge of a well-mixed volume at constant T and P, ideal gas, purge gas of constant composition"
		r.in(figVolume, p.VolumeM3)
		if known {
			r.in(figVesselT, p.TempK)
			r.in(figPres, p.PresPa)
		}
		r.in(figActualFlow, q)
		r.out(figTime, r.TimeS)
		r.out(figExchanges, r.VolumeExchanges)
		if known {
			r.GasUsedMol = q * r.TimeS * c
			r.out(figGasUsed, r.GasUsedMol)
		}
	default:
		return nil, model.Errorf("process", "unknown purge method %d", p.Method)
	}
	r.out(figFinalLevel, r.FinalX)
	if x0 <= xt {
		r.note("the start gas already meets the target: no purge is needed")
	}
	r.note("levels of " + name + "; dead legs and poorly mixed corners purge more slowly than this model says")
	if purgeOxygen(p.PurgeGas) < oxygenSafeX {
		r.caution(mixtures.Caution{Title: "Asphyxiant purge", Species: formulas(p.PurgeGas), Text: "the purge gas holds too little oxygen to breathe, and the vented gas and the purged volume are just as short of it: vent to a safe place, ventilate and monitor oxygen where people are, and never enter a purged vessel without confined-space entry procedures."})
	}
	r.caution(mixtures.Cautions(p.PurgeGas, max(p.PHighPa, p.PresPa))...)
	return r, nil
}

// oxygenSafeX is the oxygen fraction of a breathable atmosphere, 19.5 %
// (common practice).
const oxygenSafeX = 0.195

func purgeOxygen(mix *mixtures.Mixture) float64 {
	for _, c := range mix.Components {
		if c.Species.Formula == "O2" {
			return c.X
		}
	}
	return 0
}

func formulas(mix *mixtures.Mixture) []string {
	out := make([]string, len(mix.Components))
	for i, c := range mix.Components {
		out[i] = c.Species.Formula
	}
	return out
}
