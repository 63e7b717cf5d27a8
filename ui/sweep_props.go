package ui

import "zmix/mixtures"

// sweepProp is a property the sweep pane can plot: how to read it from a
// mixture state (and from one species' share, where that exists) and how
// to label it. Values are shown in display units: SI times scale.
type sweepProp struct {
	key              string // the name in SweepSettings.Property
	symbol, symASCII string
	unit, unitASCII  string
	scale            float64
	blend            func(*mixtures.State) float64
	species          func(*mixtures.SpeciesTerm) float64 // nil: a blend property only
	// blendSym names the blend's value in the axis label when it is not
	// the symbol itself (μ of the blend is Σxμ, which is G).
	blendSym, blendSymASCII string
}

const (
	sweepEntropyUnit      = "J mol⁻¹ K⁻¹"
	sweepEntropyUnitASCII = "J mol^-1 K^-1"
	sweepEnergyUnit       = "kJ mol⁻¹"
	sweepEnergyUnitASCII  = "kJ mol^-1"
)

// sweepProps lists the plottable properties in the order p cycles them.
var sweepProps = []sweepProp{
	{
		key: "S", symbol: "S", symASCII: "S", unit: sweepEntropyUnit, unitASCII: sweepEntropyUnitASCII, scale: 1,
		blend:   func(s *mixtures.State) float64 { return s.SJPerMolK },
		species: func(t *mixtures.SpeciesTerm) float64 { return t.SJPerMolK },
	},
	{
		key: "Cp", symbol: "Cp", symASCII: "Cp", unit: sweepEntropyUnit, unitASCII: sweepEntropyUnitASCII, scale: 1,
		blend:   func(s *mixtures.State) float64 { return s.CpJPerMolK },
		species: func(t *mixtures.SpeciesTerm) float64 { return t.CpJPerMolK },
	},
	{
		key: "mu", symbol: "μ", symASCII: "mu", unit: sweepEnergyUnit, unitASCII: sweepEnergyUnitASCII, scale: 1e-3,
		blend:    func(s *mixtures.State) float64 { return s.GJPerMol },
		species:  func(t *mixtures.SpeciesTerm) float64 { return t.MuJPerMol },
		blendSym: "Σxμ = G", blendSymASCII: "sum(x*mu) = G",
	},
	{
		key: "H", symbol: "H", symASCII: "H", unit: sweepEnergyUnit, unitASCII: sweepEnergyUnitASCII, scale: 1e-3,
		blend:   func(s *mixtures.State) float64 { return s.HJPerMol },
		species: func(t *mixtures.SpeciesTerm) float64 { return t.HJPerMol },
	},
	{
		key: "G", symbol: "G", symASCII: "G", unit: sweepEnergyUnit, unitASCII: sweepEnergyUnitASCII, scale: 1e-3,
		blend: func(s *mixtures.State) float64 { return s.GJPerMol },
	},
	{
		key: "gamma", symbol: "γ", symASCII: "gamma", scale: 1,
		blend: func(s *mixtures.State) float64 { return s.Gamma },
	},
}

// sweepPropIndex returns the index of the property named key, and false
// for an unknown name.
func sweepPropIndex(key string) (int, bool) {
	for i, p := range sweepProps {
		if p.key == key {
			return i, true
		}
	}
	return 0, false
}

// sym is the property's symbol for the display mode.
func (p *sweepProp) sym(ascii bool) string {
	if ascii {
		return p.symASCII
	}
	return p.symbol
}

// unitText is the property's unit for the display mode ("" for none).
func (p *sweepProp) unitText(ascii bool) string {
	if ascii {
		return p.unitASCII
	}
	return p.unit
}

// axisLabel is the y-axis label, "Cp(SiH4) / J mol⁻¹ K⁻¹": the quantity
// over its unit, as in published tables.
func (p *sweepProp) axisLabel(ascii bool, of string, overlay bool) string {
	q := p.sym(ascii)
	switch {
	case overlay:
		q += " of blend and species"
	case of != "":
		q += "(" + of + ")"
	case p.blendSym != "":
		q = p.blendSym
		if ascii {
			q = p.blendSymASCII
		}
	}
	if u := p.unitText(ascii); u != "" {
		return q + " / " + u
	}
	if p.key == "gamma" {
		q += " = Cp/Cv"
	}
	return q
}
