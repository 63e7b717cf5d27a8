package ui

import "zmix/mixtures"

// sweepProp is a curve the sweep pane can plot: a quantity of the blend
// and, where it has one, the matching quantity of each species. Names,
// symbols, units, scales and getters all come from the quantity table;
// only which plots exist is written here.
type sweepProp struct {
	key     string                    // the name in SweepSettings.Property
	blend   string                    // key of the blend quantity (mixtures.Quantities)
	species string                    // key of the species quantity; "": a blend property only
	q       *mixtures.Quantity        // the blend's row
	sq      *mixtures.SpeciesQuantity // each species' row; nil for the blend only
}

// sweepPlots are the plots p cycles through: a key, the blend quantity and
// the species quantity ("" for the blend only). "mu" plots each species'
// chemical potential, whose mole-fraction sum is the blend's G.
var sweepPlots = []struct{ key, blend, species string }{
	{"S", "S", "S"}, {"Cp", "Cp", "Cp"}, {"mu", "G", "mu"}, {"H", "H", "H"}, {"G", "G", ""}, {"gamma", "gamma", ""},
	{"Z", "Z", ""},
}

// sweepProps lists the plottable properties in the order p cycles them.
var sweepProps = func() []sweepProp {
	out := make([]sweepProp, 0, len(sweepPlots))
	for _, sp := range sweepPlots {
		q, ok := mixtures.QuantityByKey(sp.blend)
		if !ok {
			panic("ui: sweep plot " + sp.key + " names no quantity " + sp.blend)
		}
		p := sweepProp{key: sp.key, blend: sp.blend, species: sp.species, q: q}
		if sp.species != "" {
			if p.sq, ok = mixtures.SpeciesQuantityByKey(sp.species); !ok {
				panic("ui: sweep plot " + sp.key + " names no species quantity " + sp.species)
			}
		}
		out = append(out, p)
	}
	return out
}()

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

// scale is the blend value's display unit per SI unit; speciesScale the
// species value's.
func (p *sweepProp) scale() float64 { return p.q.Scale }

func (p *sweepProp) speciesScale() float64 { return p.sq.Scale }

// hasSpecies reports whether the property exists per species.
func (p *sweepProp) hasSpecies() bool { return p.sq != nil }

// sym is the property's symbol for the display mode: the species symbol
// where the plot is of the species' figure (μ), else the blend's.
func (p *sweepProp) sym(ascii bool) string {
	if p.sq != nil && p.sq.Label != p.q.Symbol {
		if ascii {
			return p.sq.LabelASCII
		}
		return p.sq.Label
	}
	if ascii {
		return p.q.SymbolASCII
	}
	return p.q.Symbol
}

// blendSym names the blend's curve: its symbol, or for μ the sum that
// makes it, Σxμ = G.
func (p *sweepProp) blendSym(ascii bool) string {
	if p.sq != nil && p.sq.Label != p.q.Symbol {
		if ascii {
			return "sum(x*" + p.sq.LabelASCII + ") = " + p.q.SymbolASCII
		}
		return "Σx" + p.sq.Label + " = " + p.q.Symbol
	}
	return p.sym(ascii)
}

// unitText is the property's unit for the display mode ("" for none).
func (p *sweepProp) unitText(ascii bool) string {
	if ascii {
		return p.q.UnitASCII
	}
	return p.q.Unit
}

// axisLabel is the y-axis label: what is plotted, for whom, in which unit.
// of names the one species plotted, "" for the blend; overlay says the
// blend and its species are drawn together.
func (p *sweepProp) axisLabel(ascii bool, of string, overlay bool) string {
	var q string
	switch {
	case overlay && p.blendSym(ascii) != p.sym(ascii):
		q = p.blendSym(ascii) + " of the blend, " + p.sym(ascii) + " of each species"
	case overlay:
		q = p.sym(ascii) + " of the blend and each species"
	case of != "":
		q = p.sym(ascii) + "(" + of + ")"
	default:
		q = p.blendSym(ascii)
		if p.q.Key == "gamma" {
			q += " = Cp/Cv"
		}
	}
	if u := p.unitText(ascii); u != "" {
		return q + " in " + u
	}
	return q
}
