package process

import (
	"strconv"
	"strings"

	"zmix/mixtures"
	"zmix/model"
)

// Dilution mixes a parent blend with a diluent (a pure gas or a second
// blend) to bring one species to a target mole fraction, or says what a
// given ratio gives. By the mole balance of that species,
//
//	x = (x_p + r·x_d)/(1 + r),  so  r = (x_p − x)/(x − x_d),
//
// with r the moles of diluent per mole of parent.
type Dilution struct {
	Parent, Diluent *mixtures.Mixture
	Species         *model.Species
	// TargetX is the level to reach; when it is 0, Ratio is used instead.
	TargetX float64
	// Ratio is moles of diluent per mole of parent.
	Ratio float64
	// ParentRateMolPerSec is the parent's flow, for the flows; 0 means
	// none given.
	ParentRateMolPerSec float64
}

// DilutionResult is a solved Dilution.
type DilutionResult struct {
	base
	Ratio, MassRatio, Factor float64
	LevelX                   float64
	Mixture                  *mixtures.Mixture
}

// levelFigure shows a mole fraction in ppm, with % beside.
func levelFigure(key, label, name string) *Figure {
	return &Figure{Key: key, Label: label, Symbol: "x", SymbolASCII: "x", Unit: "ppm", UnitASCII: "ppm", Scale: 1e6,
		Name: name, Digits: mixtures.Digits{Sig: 5}, Also: []AltUnit{{Unit: "%", UnitASCII: "%", Scale: 100}}}
}

var (
	figParentLevel  = levelFigure("xp", "level in the parent", "parent_level")
	figDiluentLevel = levelFigure("xd", "level in the diluent", "diluent_level")
	figTargetLevel  = levelFigure("xt", "target level", "target_level")
	figFinalLevel   = levelFigure("x", "final level", "final_level")
	figRatio        = &Figure{Key: "r", Label: "diluent per parent, by moles", Symbol: "r", SymbolASCII: "r", Unit: "mol/mol", UnitASCII: "mol/mol", Scale: 1,
		Name: "diluent_per_parent_mol_mol", Digits: mixtures.Digits{Sig: 6}}
	figMassRatio = &Figure{Key: "rm", Label: "diluent per parent, by mass", Symbol: "rm", SymbolASCII: "rm", Unit: "kg/kg", UnitASCII: "kg/kg", Scale: 1,
		Name: "diluent_per_parent_kg_kg", Digits: mixtures.Digits{Sig: 6}}
	figFactor = &Figure{Key: "f", Label: "dilution factor (total/parent)", Symbol: "f", SymbolASCII: "f", Scale: 1,
		Name: "dilution_factor", Digits: mixtures.Digits{Sig: 6}}
	figParentRate = &Figure{Key: "np", Label: "parent flow", Symbol: "ṅp", SymbolASCII: "np", Unit: "mol/s", UnitASCII: "mol/s", Scale: 1,
		Name: "parent_rate_mol_s", Digits: mixtures.Digits{Sig: 6}, Also: []AltUnit{{Unit: "SLPM at 0 °C", UnitASCII: "SLPM at 0 C", Scale: slpmPerMolS}}}
	figDiluentRate = &Figure{Key: "nd", Label: "diluent flow", Symbol: "ṅd", SymbolASCII: "nd", Unit: "mol/s", UnitASCII: "mol/s", Scale: 1,
		Name: "diluent_rate_mol_s", Digits: mixtures.Digits{Sig: 6}, Also: []AltUnit{{Unit: "SLPM at 0 °C", UnitASCII: "SLPM at 0 C", Scale: slpmPerMolS}}}
	figTotalRate = &Figure{Key: "n", Label: "total flow", Symbol: "ṅ", SymbolASCII: "n", Unit: "mol/s", UnitASCII: "mol/s", Scale: 1,
		Name: "rate_mol_s", Digits: mixtures.Digits{Sig: 6}, Also: []AltUnit{{Unit: "SLPM at 0 °C", UnitASCII: "SLPM at 0 C", Scale: slpmPerMolS}}}
	figX = &Figure{Key: "x", Label: "x", Symbol: "x", SymbolASCII: "x", Unit: "mol/mol", UnitASCII: "mol/mol", Scale: 1,
		Name: "x", Digits: mixtures.Digits{Sig: 6}}
)

// slpmPerMolS is one mol/s in litres per minute at 0 °C and 101.325 kPa,
// for an ideal gas: 60 s/min × 1000 L/m³ × RT₀/P₀.
var slpmPerMolS = 60e3 * model.GasConstant * model.ZeroCelsiusK / model.StdPressureAtmPa

// Solve finds the ratio for the target, or the level for the ratio.
// MaxDilutionRatio bounds the moles of diluent per mole of parent, given
// or solved for: 1 ppt made from a pure gas is 1e12, so that a larger
// ratio is a slip (a target of 1e-300 ppb), refused before it overflows
// the mixture's amounts.
const MaxDilutionRatio = 1e12

// ParseDilutionRatio reads a dilution ratio, moles of diluent per mole
// of parent, from 0 to MaxDilutionRatio: the one reader of the command's
// --ratio and the workbench's ratio field.
func ParseDilutionRatio(s string) (float64, error) {
	r, err := strconv.ParseFloat(strings.TrimSpace(s), 64)
	if err != nil || !(r >= 0) || r > MaxDilutionRatio {
		return 0, model.Errorf("process", "ratio %s: want moles of diluent per mole of parent, a number from 0 to 1e12", model.Quote(s))
	}
	return r, nil
}

func (d Dilution) Solve() (*DilutionResult, error) {
	if d.Parent == nil || d.Diluent == nil || d.Species == nil {
		return nil, model.Errorf("process", "dilution: want a parent, a diluent and a species")
	}
	xp, xd := fractionOf(d.Parent, d.Species), fractionOf(d.Diluent, d.Species)
	r := &DilutionResult{}
	name := d.Species.Formula
	switch {
	case d.TargetX > 0:
		xt := d.TargetX
		lo, hi := min(xp, xd), max(xp, xd)
		if xt == xp {
			r.Ratio = 0
		} else if !(xt > lo && xt < hi) {
			return nil, model.Errorf("process",
				"the parent holds %s ppm of %s and the diluent %s ppm: their mixes lie between those, so %s ppm cannot be reached",
				ppm(xp), name, ppm(xd), ppm(xt))
		} else {
			r.Ratio = (xp - xt) / (xt - xd)
		}
	case d.Ratio >= 0 && d.Ratio <= MaxDilutionRatio:
		r.Ratio = d.Ratio
	default:
		return nil, model.Errorf("process", "dilution ratio %g: want a number from 0 to 1e12 (moles of diluent per mole of parent)", d.Ratio)
	}
	if r.Ratio > MaxDilutionRatio {
		need := "more than 1e300"
		if r.Ratio < 1e300 {
			need = strconv.FormatFloat(r.Ratio, 'g', 3, 64)
		}
		return nil, model.Errorf("process",
			"diluting %s so needs %s moles of diluent per mole of parent, beyond the 1e12 zmix computes (1 ppt made from a pure gas); want a higher target level or a smaller ratio",
			name, need)
	}
	r.LevelX = (xp + r.Ratio*xd) / (1 + r.Ratio)
	r.Factor = 1 + r.Ratio
	r.MassRatio = r.Ratio * d.Diluent.MolarMassKgPerMol / d.Parent.MolarMassKgPerMol
	comps := make([]mixtures.Component, 0, len(d.Parent.Components)+len(d.Diluent.Components))
	for _, c := range d.Parent.Components {
		comps = append(comps, mixtures.Component{Species: c.Species, X: c.X})
	}
	for _, c := range d.Diluent.Components {
		comps = append(comps, mixtures.Component{Species: c.Species, X: c.X * r.Ratio})
	}
	mix, err := mixtures.NewMixture(comps)
	if err != nil {
		return nil, err
	}
	r.Mixture = mix

	r.kind = "dilute"
	r.assumptions = "mole balance of ideal gases, no reaction, well mixed; a volume ratio at one reference equals the mole ratio"
	r.in(figParentLevel, xp)
	r.in(figDiluentLevel, xd)
	if d.TargetX > 0 {
		r.in(figTargetLevel, d.TargetX)
	}
	if d.ParentRateMolPerSec > 0 {
		r.in(figParentRate, d.ParentRateMolPerSec)
	}
	r.out(figRatio, r.Ratio)
	r.out(figMassRatio, r.MassRatio)
	r.out(figFactor, r.Factor)
	r.out(figFinalLevel, r.LevelX)
	if d.ParentRateMolPerSec > 0 {
		r.out(figDiluentRate, d.ParentRateMolPerSec*r.Ratio)
		r.out(figTotalRate, d.ParentRateMolPerSec*r.Factor)
	}
	rows := make([][]Value, len(mix.Components))
	labels := make([]string, len(mix.Components))
	for i, c := range mix.Components {
		labels[i] = c.Species.Formula
		rows[i] = []Value{{figX, c.X}}
	}
	r.tables = []Table{{Name: "species", Title: "Outlet composition", RowName: "name", RowLabels: labels, Rows: rows}}
	r.note("levels of " + name + "; SLPM figures are at 0 °C and 101.325 kPa, ideal gas")
	r.caution(mixtures.Cautions(mix, mixtures.AtmospherePa)...)
	return r, nil
}

func ppm(x float64) string { return trimFloat(x * 1e6) }
