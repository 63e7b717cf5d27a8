package ui

import "zmix/mixtures"

// sweepProp is a property the sweep pane can plot: which rows of the
// engine's quantity table hold it, for the blend and for each species
// where that exists, and how to label it. Values are shown in display
// units: SI times scale.
type sweepProp struct {
	key              string // the name in SweepSettings.Property
	symbol, symASCII string
	unit, unitASCII  string
	scale            float64
	blend            string // key of the blend quantity (mixtures.Quantities)
	species          string // key of the species quantity; "": a blend property only
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
		blend:   "S",
		species: "S",
	},
	{
		key: "Cp", symbol: "Cp", symASCII: "Cp", unit: sweepEntropyUnit, unitASCII: sweepEntropyUnitASCII, scale: 1,
		blend:   "Cp",
		species: "Cp",
	},
	{
		key: "mu", symbol: "μ", symASCII: "mu", unit: sweepEnergyUnit, unitASCII: sweepEnergyUnitASCII, scale: 1e-3,
		blend:    "G",
		species:  "mu",
		blendSym: "Σxμ = G", blendSymASCII: "sum(x*mu) = G",
	},
	{
		key: "H", symbol: "H", symASCII: "H", unit: sweepEnergyUnit, unitASCII: sweepEnergyUnitASCII, scale: 1e-3,
		blend:   "H",
		species: "H",
	},
	{
		key: "G", symbol: "G", symASCII: "G", unit: sweepEnergyUnit, unitASCII: sweepEnergyUnitASCII, scale: 1e-3,
		blend: "G",
	},
	{
		key: "gamma", symbol: "γ", symASCII: "gamma", scale: 1,
		blend: "gamma",
	},
	{
		key: "Z", symbol: "Z", symASCII: "Z", scale: 1,
		blend: "Z",
	},
}

// sweepColumns are the columns a sweep of m keeps: the swept and held
// conditions and every property the pane can plot, so that changing the
// property or the species recomputes nothing.
func sweepColumns(m *mixtures.Mixture) []mixtures.SweepColumn {
	var cols []mixtures.SweepColumn
	seen := map[string]bool{}
	for _, key := range []string{"T", "P"} {
		c, _ := mixtures.BlendColumn(key)
		cols = append(cols, c)
	}
	for _, p := range sweepProps {
		if !seen["b"+p.blend] {
			seen["b"+p.blend] = true
			c, _ := mixtures.BlendColumn(p.blend)
			cols = append(cols, c)
		}
		if p.species != "" && !seen["s"+p.species] {
			seen["s"+p.species] = true
			sc, _ := mixtures.SpeciesColumns(p.species, m)
			cols = append(cols, sc...)
		}
	}
	return cols
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
