package process

import (
	"fmt"
	"math"
	"strconv"
	"strings"
	"unicode/utf8"

	"zmix/mixtures"
	"zmix/model"
)

// ParentForm says how one weighed parent gas is written, for messages.
const ParentForm = `"MASS [± U] [of] GAS", GAS a species ("N2"), a species with impurities ` +
	`("N2 with O2 <5ppm, H2O 10ppm ±2ppm") or a premix ("CO2 5.003% ±0.002%, N2 bal")`

// maxParentChars bounds one parent's text before any work that grows
// with it: room for a premix and a dozen impurities.
const maxParentChars = 1000

// plusMinus are the ways to write ±, the ASCII ones for keyboards that
// have no ±.
var plusMinus = strings.NewReplacer("+/-", "±", "+-", "±")

// massUnits are the units of every mass the process calculations read:
// a weighed mass and its uncertainty, a cylinder's contents by weight.
var massUnits = map[string]float64{"kg": 1, "g": 1e-3, "mg": 1e-6, "lb": 0.45359237}

// MassUnits lists them, for messages and help; WeighedMassUnits is the
// same list under the name the weighing help uses.
const (
	MassUnits        = "kg, g, mg, lb"
	WeighedMassUnits = MassUnits
)

// MaxMassKg bounds every mass read, as volumes and rates are bounded:
// far beyond any cylinder, trailer or weighing, so that a slip of the
// exponent (1e308 g) is refused rather than carried into an overflow of
// the uncertainty sums.
const MaxMassKg = 1e9

// parseMassKg reads a mass with its unit ("2.5 mg", "25.103g") in kg, of
// size at most MaxMassKg; the callers bound its sign.
func parseMassKg(s string) (float64, error) {
	if err := tooLongN("a mass", s, maxInputChars); err != nil {
		return 0, err
	}
	x, unit, err := mixtures.SplitNumber(s)
	if err != nil {
		return 0, model.Errorf("process", "mass %s: want a number and a unit (%s), e.g. 25.103 g", model.Quote(s), MassUnits)
	}
	scale, ok := massUnits[strings.ToLower(unit)]
	if !ok {
		return 0, model.Errorf("process", "mass %s: unknown unit %s; want %s", model.Quote(s), model.Quote(unit), MassUnits)
	}
	kg := x * scale
	if math.IsNaN(kg) || math.IsInf(kg, 0) {
		return 0, model.Errorf("process", "mass %s: want a number and a unit (%s), e.g. 25.103 g", model.Quote(s), MassUnits)
	}
	if math.Abs(kg) > MaxMassKg {
		return 0, model.Errorf("process", "mass %s: want at most 1e9 kg", model.Quote(s))
	}
	return kg, nil
}

// ParseWeighedMass reads a mass with its unit ("2.5 mg", "25.103g") in
// kg; it must be finite and 0 or more.
func ParseWeighedMass(s string) (float64, error) {
	kg, err := parseMassKg(s)
	if err != nil {
		return 0, err
	}
	if !(kg >= 0) {
		return 0, model.Errorf("process", "mass %s: want a finite mass of 0 or more", model.Quote(s))
	}
	return kg, nil
}

// ParseParent reads one weighed parent gas, "MASS [± U] [of] GAS", looking
// its species up in cat. A mass with no ± gets the common uncertainty of
// the balance later (MassUKg < 0 here).
func ParseParent(cat *model.Catalogue, s string) (WeighedParent, error) {
	if err := tooLongN("a parent gas", s, maxParentChars); err != nil {
		return WeighedParent{}, err
	}
	fail := func(why string) (WeighedParent, error) {
		return WeighedParent{}, model.Errorf("process", "parent %s: %s; want %s", model.Quote(s), why, ParentForm)
	}
	text := strings.TrimSpace(plusMinus.Replace(s))
	p := WeighedParent{Text: text, MassUKg: -1}
	// The mass: a number and a unit, the first two fields (or one, "25g").
	mass, rest, ok := cutMass(text)
	if !ok {
		return fail("it does not start with a mass")
	}
	var err error
	if p.MassKg, err = ParseWeighedMass(mass); err != nil {
		return WeighedParent{}, model.Errorf("process", "parent %s: %v", model.Quote(s), err)
	}
	if !(p.MassKg > 0) {
		return fail("the mass must be above 0")
	}
	if r, ok := strings.CutPrefix(rest, "±"); ok {
		u, after, ok := cutMass(strings.TrimSpace(r))
		if !ok {
			return fail("± must be followed by a mass")
		}
		if p.MassUKg, err = ParseWeighedMass(u); err != nil {
			return WeighedParent{}, model.Errorf("process", "parent %s: the mass's uncertainty: %v", model.Quote(s), err)
		}
		rest = after
	}
	if r, ok := strings.CutPrefix(rest, "of "); ok {
		rest = r
	}
	rest = strings.TrimSpace(rest)
	if rest == "" {
		return fail("the gas is missing")
	}
	p.Gas = rest
	// "N2 with O2 <5ppm, ..." is "N2 bal, O2 <5ppm, ...".
	items := rest
	if head, tail, ok := strings.Cut(rest, " with "); ok {
		if len(strings.Fields(head)) != 1 {
			return fail("before \"with\" goes one species, the main gas")
		}
		items = strings.TrimSpace(head) + " bal, " + tail
	}
	list := strings.Split(items, ",")
	if _, _, found := mixtures.SplitSpeciesAmount(list[0]); len(list) == 1 && !found {
		list[0] += " bal" // a pure gas, named by formula or in words
	}
	seen := map[string]bool{}
	var byMole, byMass string // the first item stated on each basis
	for _, it := range list {
		part, basis, err := parsePart(cat, strings.TrimSpace(it))
		if err != nil {
			return WeighedParent{}, model.Errorf("process", "parent %s: %v", model.Quote(s), err)
		}
		switch {
		case basis == mixtures.MassFraction && byMass == "":
			byMass = strings.TrimSpace(it)
		case basis == mixtures.MoleFraction && byMole == "":
			byMole = strings.TrimSpace(it)
		}
		if byMass != "" && byMole != "" {
			return WeighedParent{}, model.Errorf("process", "parent %s: %s is by moles and %s by mass; give one parent's amounts all by moles (%%, ppm) or all by mass (wt%%, kg/kg)",
				model.Quote(s), model.Quote(byMole), model.Quote(byMass))
		}
		p.ByMass = byMass != ""
		if seen[part.Species.Formula] {
			return fail(part.Species.Formula + " is named twice")
		}
		seen[part.Species.Formula] = true
		p.Parts = append(p.Parts, part)
	}
	if err := p.check(); err != nil {
		return WeighedParent{}, model.Errorf("process", "parent %s: %v", model.Quote(s), err)
	}
	return p, nil
}

// cutMass splits the leading "NUMBER UNIT" from s: "25.103 g of CO2" →
// "25.103 g", "of CO2".
func cutMass(s string) (mass, rest string, ok bool) {
	s = strings.TrimSpace(s)
	_, after, err := mixtures.SplitNumber(s)
	if err != nil || after == "" || !strings.HasSuffix(s, after) {
		return "", "", false
	}
	num := strings.TrimSpace(s[:len(s)-len(after)])
	// The unit is the letters after the number, up to a space or ±.
	unitEnd := strings.IndexFunc(after, func(r rune) bool { return r == ' ' || r == '±' })
	if unitEnd < 0 {
		unitEnd = len(after)
	}
	return num + " " + after[:unitEnd], strings.TrimSpace(after[unitEnd:]), true
}

// parsePart reads "SPECIES AMOUNT [± U]", "SPECIES <LIMIT" or
// "SPECIES bal", and says whether the amount is by moles or by mass
// (mixtures.Balance for the balance, which states neither).
func parsePart(cat *model.Catalogue, it string) (ParentPart, mixtures.Basis, error) {
	name, amount, _ := mixtures.SplitSpeciesAmount(it)
	if amount == "" {
		return ParentPart{}, 0, model.Errorf("process", "item %s: want SPECIES AMOUNT, SPECIES <LIMIT or SPECIES bal", model.Quote(it))
	}
	fields := []string{name} // the species, as typed
	sp, ok := cat.Lookup(fields[0])
	if !ok {
		if m, named := mixtures.LookupNamedMixture(fields[0]); named {
			// A weighed parent's composition is its certificate's, with
			// its uncertainties, not the atmosphere's (synthetic air
			// holds no argon).
			return ParentPart{}, 0, model.Errorf("process", "%s stands for %s in blend text; a weighed parent gives the composition its certificate states, with uncertainties, e.g. \"500 g of N2 79.5%% ±0.1%%, O2 bal\"",
				model.Quote(fields[0]), m.Short)
		}
		hint := cat.UnknownHint(fields[0])
		if hint == "" {
			hint = "it is not in the catalogue"
		}
		return ParentPart{}, 0, model.Errorf("process", "unknown species %s; %s", model.Quote(fields[0]), hint)
	}
	if _, err := model.ParseFormula(sp.Formula); err != nil {
		return ParentPart{}, 0, model.Errorf("process", "%s: its formula is needed for the molar mass: %v", model.Quote(fields[0]), err)
	}
	part := ParentPart{Species: sp}
	if low := strings.ToLower(amount); low == "bal" || low == "balance" {
		part.Balance = true
		return part, mixtures.Balance, nil
	}
	if lim, ok := strings.CutPrefix(amount, "<"); ok {
		x, basis, err := parentAmount(it, lim)
		if err != nil {
			return ParentPart{}, 0, err
		}
		if !(x > 0) {
			return ParentPart{}, 0, model.Errorf("process", "item %s: a limit must be above 0", model.Quote(it))
		}
		// ISO 6142-1: a component below a limit L is taken as L/2 with a
		// rectangular distribution over [0, L].
		part.Limit, part.LimitX = true, x
		part.X, part.UX = x/2, x/(2*math.Sqrt(3))
		return part, basis, nil
	}
	val, unc, hasU := strings.Cut(amount, "±")
	x, basis, err := parentAmount(it, val)
	if err != nil {
		return ParentPart{}, 0, err
	}
	part.X = x
	if hasU {
		var uBasis mixtures.Basis
		if part.UX, uBasis, err = parentAmount(it, unc); err != nil {
			return ParentPart{}, 0, err
		}
		if uBasis != basis {
			return ParentPart{}, 0, model.Errorf("process", "item %s: the amount and its uncertainty must be on one basis, both by moles or both by mass", model.Quote(it))
		}
		part.Stated = true
	}
	return part, basis, nil
}

// parentAmount reads an amount of a parent gas: a mole fraction (mol/mol,
// %, ppm, ppb) or a mass fraction (kg/kg, wt%).
func parentAmount(item, s string) (float64, mixtures.Basis, error) {
	a, err := mixtures.ParseAmount(strings.TrimSpace(s))
	if err != nil {
		return 0, 0, model.Errorf("process", "item %s: %v", model.Quote(item), err)
	}
	if a.Basis != mixtures.MoleFraction && a.Basis != mixtures.MassFraction {
		return 0, 0, model.Errorf("process", "item %s: amounts in a parent gas are by moles (mol/mol, %%, ppm, ppb) or by mass (kg/kg, wt%%)", model.Quote(item))
	}
	return a.Value, a.Basis, nil
}

// tooLongN refuses text longer than n characters.
func tooLongN(what, s string, n int) error {
	if c := utf8.RuneCountInString(s); c > n {
		return model.Errorf("process", "%s of %d characters; want at most %d", what, c, n)
	}
	return nil
}

// AtomicWeightForm says how an atomic weight is written, for messages.
const AtomicWeightForm = `"ELEMENT VALUE ± U" in g/mol, U a standard uncertainty, e.g. "Ar 39.9478 ± 0.0002"`

// ParseAtomicWeight reads "ELEMENT VALUE ± U" (or "ELEMENT=VALUE+-U"),
// an element's atomic weight in g/mol with its standard uncertainty.
func ParseAtomicWeight(s string) (AtomicWeight, error) {
	if err := tooLongN("an atomic weight", s, maxInputChars); err != nil {
		return AtomicWeight{}, err
	}
	fail := func(why string) (AtomicWeight, error) {
		return AtomicWeight{}, model.Errorf("process", "atomic weight %s: %s; want %s", model.Quote(s), why, AtomicWeightForm)
	}
	text := strings.TrimSpace(plusMinus.Replace(strings.Replace(s, "=", " ", 1)))
	el, rest, ok := strings.Cut(text, " ")
	if !ok {
		return fail("the value is missing")
	}
	counts, err := model.ParseFormula(el)
	if err != nil || len(counts) != 1 || counts[el] != 1 {
		return fail("unknown element " + model.Quote(el))
	}
	val, unc, ok := strings.Cut(rest, "±")
	if !ok {
		return fail("the uncertainty is missing")
	}
	a := AtomicWeight{Element: el}
	if a.GPerMol, err = strconv.ParseFloat(strings.TrimSpace(strings.TrimSuffix(strings.TrimSpace(val), "g/mol")), 64); err != nil || !(a.GPerMol > 0) || math.IsInf(a.GPerMol, 0) {
		return fail("the value must be a number above 0")
	}
	if a.UGPer, err = strconv.ParseFloat(strings.TrimSpace(strings.TrimSuffix(strings.TrimSpace(unc), "g/mol")), 64); err != nil || !(a.UGPer >= 0) || math.IsInf(a.UGPer, 0) {
		return fail("the uncertainty must be a number of 0 or more")
	}
	// A value far from the standard one is a typing slip, not a sample.
	if std, _ := model.MolarMassKgPerMol(el); math.Abs(a.GPerMol/(std*1e3)-1) > 0.01 {
		return fail(fmt.Sprintf("%s is more than 1 %% from the standard %s g/mol", trimFloat(a.GPerMol), trimFloat(std*1e3)))
	}
	return a, nil
}
