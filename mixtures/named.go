package mixtures

import (
	"slices"
	"strings"

	"zmix/model"
)

// A named mixture is a gas the trade buys, vents and dilutes with as one
// thing though it is a blend: air. Blend text takes it as an item
// ("CO2 5%, air bal", "CH4 2.5%, air bal", or "air" alone), and Resolve
// puts its components in, each at its share of the item's amount, merged
// with the same species given on their own. It is not a catalogue
// species, so that every readout still lists the species that are there.

// NamedPart is one component of a named mixture: a formula of the
// catalogue and its mole fraction in the mixture.
type NamedPart struct {
	Formula string
	X       float64
}

// NamedMixture is a mixture blend text may name as one item.
type NamedMixture struct {
	Name    string   // the name blend text uses
	Aliases []string // other names it answers to
	Short   string   // what it is, in a few words, for search lists
	Title   string   // what it is, with its composition and source
	Parts   []NamedPart
}

// namedMixtures are the named mixtures blend text knows.
//
// Dry air by volume: O2 20.946 % and Ar 0.934 % (US Standard Atmosphere
// 1976, Table 3, from memory); CO2 0.04 %, rounded from today's ~420 ppm
// (the 1976 table's 0.0314 % is out of date); N2 the balance, 78.080 %,
// which takes in the traces (Ne, He, Kr, Xe, CH4, H2: under 25 ppm in
// all) so that air is not called flammable for its 2 ppm of methane. Its
// molar mass, 28.966 g/mol, is ISO 2533's 28.9644 g/mol (from memory)
// within the CO2 update (TestNamedAir).
var namedMixtures = []NamedMixture{{
	Name:    "air",
	Aliases: []string{"dry air"},
	Short:   "dry air (N2, O2, Ar, CO2)",
	Title:   "dry air: O2 20.946 %, Ar 0.934 %, CO2 0.04 %, N2 bal (US Standard Atmosphere 1976, CO2 updated; from memory)",
	Parts:   []NamedPart{{"N2", 1 - 0.20946 - 0.00934 - 0.0004}, {"O2", 0.20946}, {"Ar", 0.00934}, {"CO2", 0.0004}},
}}

// LookupNamedMixture returns the named mixture key names, if any (case
// and surrounding space do not matter).
func LookupNamedMixture(key string) (NamedMixture, bool) {
	key = strings.TrimSpace(key)
	for _, m := range namedMixtures {
		if strings.EqualFold(m.Name, key) {
			return m, true
		}
		for _, a := range m.Aliases {
			if strings.EqualFold(a, strings.Join(strings.Fields(key), " ")) {
				return m, true
			}
		}
	}
	return NamedMixture{}, false
}

// AllNamedMixtures lists the named mixtures, for help and search.
func AllNamedMixtures() []NamedMixture { return namedMixtures }

// itemParts is what one blend item stands for: a species alone, or the
// components of a named mixture, each with its fraction of the item,
// and the item's molar mass.
type itemParts struct {
	parts             []Component
	molarMassKgPerMol float64
	named             string // the named mixture's name, "" for a species
}

// partsOf resolves a key: a named mixture, whose every component must be
// in cat, or else a catalogue species. A named mixture comes first, so
// that "air" means the same in every readout and its note is true (a
// species file cannot put a species under a mixture's name).
//
// missing names a named mixture's component cat lacks, when that is why
// ok is false.
func partsOf(cat *model.Catalogue, key string) (parts itemParts, missing string, ok bool) {
	m, ok := LookupNamedMixture(key)
	if !ok {
		sp, ok := cat.Lookup(key)
		if !ok {
			return itemParts{}, "", false
		}
		return itemParts{parts: []Component{{Species: sp, X: 1}}, molarMassKgPerMol: sp.MolarMassKgPerMol}, "", true
	}
	out := itemParts{parts: make([]Component, 0, len(m.Parts)), named: m.Name}
	for _, p := range m.Parts {
		sp, ok := cat.Lookup(p.Formula)
		if !ok {
			return itemParts{}, p.Formula, false
		}
		out.parts = append(out.parts, Component{Species: sp, X: p.X})
		out.molarMassKgPerMol += p.X * sp.MolarMassKgPerMol
	}
	return out, "", true
}

// NamedMixtures returns the named mixtures b's items name, each once, in
// the order they first appear, so that a readout can say what "air" was
// taken to be.
func (b *Blend) NamedMixtures() []NamedMixture {
	var out []NamedMixture
	for _, it := range b.Items {
		m, ok := LookupNamedMixture(it.Key)
		if !ok || slices.ContainsFunc(out, func(o NamedMixture) bool { return o.Name == m.Name }) {
			continue
		}
		out = append(out, m)
	}
	return out
}

// NamedNote is the note a readout gives for the named mixtures in b,
// "air = dry air: O2 20.946 %, …", or "" when there are none.
func (b *Blend) NamedNote() string {
	var notes []string
	for _, m := range b.NamedMixtures() {
		notes = append(notes, m.Name+" = "+m.Title)
	}
	return strings.Join(notes, "; ")
}

// CheckNamesFree refuses a catalogue in which a species (from a species
// file) goes by a named mixture's name, which blend text would read as
// the mixture: the species could never be reached, without a word.
func CheckNamesFree(cat *model.Catalogue) error {
	for _, m := range namedMixtures {
		for _, name := range append([]string{m.Name}, m.Aliases...) {
			if sp, ok := cat.Lookup(name); ok {
				return model.Errorf("mixtures", "species %s (%s) goes by the name %s, which blend text keeps for %s; give it another formula and name",
					model.Quote(sp.Formula), model.Printable(sp.Name), model.Quote(name), m.Short)
			}
		}
	}
	return nil
}
