package realgas

import (
	"cmp"
	"math"
	"slices"
	"strconv"
	"strings"

	"zmix/model"
)

// Method names how a vapour pressure was found.
type Method int

const (
	NoMethod     Method = iota // the species cannot condense, or nothing is known
	IAPWSSat                   // water above its triple point: IAPWS saturation equation
	IAPWSSub                   // water below its triple point: IAPWS sublimation equation
	LeeKesler                  // corresponding states from Tc, Pc, ω
	TroutonRough               // from the normal boiling point: a rough estimate
)

func (m Method) String() string {
	switch m {
	case IAPWSSat:
		return "IAPWS saturation equation (Wagner and Pruss)"
	case IAPWSSub:
		return "IAPWS sublimation equation"
	case LeeKesler:
		return "Lee-Kesler correlation"
	case TroutonRough:
		return "Trouton's rule from the boiling point, a rough estimate"
	}
	return "none"
}

// Water's critical and triple points (IAPWS).
const (
	waterCriticalK   = 647.096
	waterCriticalPa  = 22.064e6
	waterTripleK     = 273.16
	waterTriplePa    = 611.657
	troutonSOverR    = 10.5 // ΔSvap/R at the normal boiling point, common practice
	sublimationMinK  = 50   // lower end of the IAPWS sublimation equation
	standardAtmPa    = model.StdPressureAtmPa
	quantumTcBelowMT = 21.8
	quantumPcBelowMT = 44.2
)

// Saturation is a species' vapour pressure at one temperature.
type Saturation struct {
	Pa            float64 // vapour (or sublimation) pressure; +Inf when supercritical
	Method        Method
	Supercritical bool    // T at or above the critical temperature: it never condenses
	CriticalK     float64 // the critical temperature used (effective for a quantum gas)
	Frost         bool    // the condensed phase is ice (water below its triple point)
}

// WaterSaturationPa is the vapour pressure of liquid water from the IAPWS
// saturation-pressure equation (Wagner and Pruß, J. Phys. Chem. Ref. Data
// 22, 783, 1993, as in the IAPWS 1992 revised supplementary release),
// valid from the triple point to the critical point:
//
//	ln(p/pc) = (Tc/T)(a₁τ + a₂τ^1.5 + a₃τ³ + a₄τ^3.5 + a₅τ⁴ + a₆τ^7.5), τ = 1 − T/Tc
func WaterSaturationPa(tempK float64) float64 {
	tau := 1 - tempK/waterCriticalK
	st := math.Sqrt(tau)
	t3 := tau * tau * tau
	t4 := t3 * tau
	sum := -7.85951783*tau + 1.84408259*tau*st - 11.7866497*t3 + 22.6807411*t3*st -
		15.9618719*t4 + 1.80122502*t4*t3*st
	return waterCriticalPa * math.Exp(waterCriticalK/tempK*sum)
}

// WaterSublimationPa is the vapour pressure over ice Ih from the IAPWS
// sublimation equation (IAPWS R14-08; Wagner, Riethmann, Feistel and
// Harvey, J. Phys. Chem. Ref. Data 40, 043103, 2011), valid from 50 K to
// the triple point:
//
//	ln(p/pt) = θ⁻¹ Σ aᵢ θ^bᵢ, θ = T/Tt
func WaterSublimationPa(tempK float64) float64 {
	th := tempK / waterTripleK
	sum := -0.212144006e2*math.Pow(th, 0.333333333e-2) +
		0.273203819e2*math.Pow(th, 0.120666667e1) -
		0.610598130e1*math.Pow(th, 0.170333333e1)
	return waterTriplePa * math.Exp(sum/th)
}

// LeeKeslerPa is the Lee–Kesler vapour pressure (AIChE J. 21, 510, 1975)
// from the critical constants:
//
//	ln Pr = f⁰ + ω f¹
//	f⁰ = 5.92714 − 6.09648/Tr − 1.28862 ln Tr + 0.169347 Tr⁶
//	f¹ = 15.2518 − 15.6875/Tr − 13.4721 ln Tr + 0.43577 Tr⁶
func LeeKeslerPa(tempK, criticalK, criticalPa, omega float64) float64 {
	tr := tempK / criticalK
	lnTr := math.Log(tr)
	tr6 := tr * tr * tr
	tr6 *= tr6
	f0 := 5.92714 - 6.09648/tr - 1.28862*lnTr + 0.169347*tr6
	f1 := 15.2518 - 15.6875/tr - 13.4721*lnTr + 0.43577*tr6
	return criticalPa * math.Exp(f0+omega*f1)
}

// VapourPressure returns the species' vapour pressure at T, with its
// method: IAPWS for water, Lee–Kesler from the critical constants for
// the others, Trouton's rule for a species that gives only a boiling
// point; NoMethod when nothing is known.
func VapourPressure(sp *model.Species, tempK float64) Saturation {
	if sp.Formula == "H2O" {
		switch {
		case tempK >= waterCriticalK:
			return Saturation{Pa: math.Inf(1), Supercritical: true, CriticalK: waterCriticalK}
		case tempK >= waterTripleK:
			return Saturation{Pa: WaterSaturationPa(tempK), Method: IAPWSSat, CriticalK: waterCriticalK}
		case tempK >= sublimationMinK:
			return Saturation{Pa: WaterSublimationPa(tempK), Method: IAPWSSub, CriticalK: waterCriticalK, Frost: true}
		}
		return Saturation{Pa: 0, Method: IAPWSSub, CriticalK: waterCriticalK, Frost: true}
	}
	if sp.HasCritical() {
		tc, pc := sp.CriticalK, sp.CriticalPa
		if sp.QuantumGas {
			mt := sp.MolarMassKgPerMol * 1000 * tempK
			tc, pc = tc/(1+quantumTcBelowMT/mt), pc/(1+quantumPcBelowMT/mt)
		}
		if tempK >= tc {
			return Saturation{Pa: math.Inf(1), Supercritical: true, CriticalK: tc}
		}
		return Saturation{Pa: LeeKeslerPa(tempK, tc, pc, sp.Acentric), Method: LeeKesler, CriticalK: tc}
	}
	if sp.BoilingK > 0 {
		// Clausius–Clapeyron through the normal boiling point with
		// ΔHvap = 10.5 R Tb (Trouton's rule, common practice).
		return Saturation{Pa: standardAtmPa * math.Exp(-troutonSOverR*(sp.BoilingK/tempK-1)), Method: TroutonRough}
	}
	return Saturation{}
}

// DewPoint is the temperature at which a blend at its line pressure starts
// to condense.
type DewPoint struct {
	// Known is false when nothing in the blend can condense at any
	// temperature the catalogue covers, or when a partial pressure lies
	// above its species' critical pressure (a dense fluid, no dew point).
	Known bool
	TempK float64
	// Species are those that condense first, most first.
	Species []string
	// Frost: water condenses as ice (below its triple point).
	Frost bool
	// Raoult: several species condense together, by the ideal-solution
	// (Raoult) dew point Σ yᵢP/Psatᵢ(T) = 1, an estimate.
	Raoult bool
	// Rough: a species' vapour pressure came from Trouton's rule.
	Rough bool
	// Why says, when not known, why not.
	Why string
}

// Condensable is one species of a blend for the dew point.
type Condensable struct {
	Species *model.Species
	X       float64
}

// DewPointOf finds the blend's dew point at presPa between minK and maxK
// (the temperatures the caller covers), by bisection on ln T of
// Σ xᵢP/Psatᵢ(T) − 1, which falls as T rises.
func DewPointOf(blend []Condensable, presPa, minK, maxK float64) DewPoint {
	sum := func(tempK float64) float64 {
		s := 0.0
		for _, c := range blend {
			sat := VapourPressure(c.Species, tempK)
			if sat.Method == NoMethod || sat.Supercritical {
				continue
			}
			if sat.Pa <= 0 {
				return math.Inf(1)
			}
			s += c.X * presPa / sat.Pa
		}
		return s
	}
	// The top of the search: the highest critical temperature, or maxK.
	hi := minK
	for _, c := range blend {
		sat := VapourPressure(c.Species, minK)
		switch {
		case sat.Method == TroutonRough:
			hi = maxK
		case sat.CriticalK > 0:
			hi = max(hi, min(sat.CriticalK*(1-1e-9), maxK))
		}
	}
	if hi <= minK || sum(minK) < 1 {
		return DewPoint{Why: "nothing in the blend condenses at any temperature from " + kelvinText(minK) + " up"}
	}
	if sum(hi) >= 1 {
		// Name the species: above its critical pressure, cooling at the
		// line pressure never splits it into vapour and liquid.
		var above []string
		for _, c := range blend {
			if c.Species.CriticalPa > 0 && c.X*presPa >= c.Species.CriticalPa {
				above = append(above, model.Printable(c.Species.Formula))
			}
		}
		who := "a species"
		if len(above) > 0 {
			who = strings.Join(above, ", ")
		}
		return DewPoint{Why: who + " at a partial pressure above its critical pressure: cooled at this pressure it stays one dense (supercritical-pressure) fluid, with no dew point"}
	}
	lo := minK
	for i := 0; i < 100 && hi/lo > 1+1e-12; i++ {
		mid := math.Sqrt(lo * hi)
		if sum(mid) >= 1 {
			lo = mid
		} else {
			hi = mid
		}
	}
	dp := DewPoint{Known: true, TempK: math.Sqrt(lo * hi)}
	type share struct {
		name string
		v    float64
	}
	var shares []share
	for _, c := range blend {
		sat := VapourPressure(c.Species, dp.TempK)
		if sat.Method == NoMethod || sat.Supercritical || sat.Pa <= 0 {
			continue
		}
		if v := c.X * presPa / sat.Pa; v >= 0.01 {
			shares = append(shares, share{c.Species.Formula, v})
			dp.Frost = dp.Frost || sat.Frost
			dp.Rough = dp.Rough || sat.Method == TroutonRough
		}
	}
	slices.SortStableFunc(shares, func(a, b share) int { return cmp.Compare(b.v, a.v) })
	for _, s := range shares {
		dp.Species = append(dp.Species, s.name)
	}
	dp.Raoult = len(dp.Species) > 1
	return dp
}

func kelvinText(k float64) string { return strconv.FormatFloat(k, 'g', 4, 64) + " K" }
