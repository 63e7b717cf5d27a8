package mixtures

import "slices"

// One table describes every figure of a mixture state: its names, unit,
// digits and getter. The commands' text, JSON and CSV, the workbench's
// Properties and Sweep panes, the exports and the finite check all read
// these rows, so that adding a figure is one row plus its tests.

// Digits says how a figure is written: Sig significant figures, or, when
// Decimals > 0, that many decimals (for energies, whose zero is arbitrary
// and whose absolute digits matter).
type Digits struct {
	Sig      int
	Decimals int
}

// Section says where a blend quantity stands in a readout.
type Section int

const (
	SectionMixture    Section = iota // the blend's own figures (the zero value)
	SectionConditions                // T, P, P°: what the state was asked at
	// SectionRealGas: the real-gas figures beside the ideal-gas ones,
	// shown on a line of their own with the model that gives them.
	SectionRealGas
)

// Quantity is one figure of the blend.
type Quantity struct {
	Key         string // stable short name, used by settings and flags: "cp"
	Label       string // "heat capacity Cp"
	Symbol      string // "Cp", "ρ", "γ"
	SymbolASCII string // "rho", "gamma"
	Unit        string // display unit per mole, "" for none
	UnitASCII   string
	Scale       float64 // display value = SI value × Scale
	// Name is the JSON key and CSV column, in SI units per mole.
	Name string
	// PerKgName, when set, is the key of the per-kilogram form (SI value
	// divided by the molar mass), shown in PerKgUnit.
	PerKgName      string
	PerKgUnit      string
	PerKgUnitASCII string
	Digits         Digits
	Section        Section
	// SpeciesKey names the species quantity that is this figure's share
	// per species, for plots that overlay the species ("" for none).
	SpeciesKey string
	// Optional marks a figure that may be not known at a state (NaN):
	// written as null in JSON, empty in CSV, and passed by the finite
	// check. The real-gas figures are optional: a blend whose species
	// carry no critical constants has none.
	Optional bool
	Get      func(*State) float64
}

// HasPerKg reports whether the quantity has a per-kilogram form.
func (q *Quantity) HasPerKg() bool { return q.PerKgName != "" }

// PerKg returns the per-kilogram SI value of q at s.
func (q *Quantity) PerKg(s *State) float64 { return q.Get(s) / s.MolarMassKgPerMol }

// SpeciesQuantity is one figure of a species within the blend.
type SpeciesQuantity struct {
	Key         string
	Label       string // column heading: "x", "mass", "p", "μ"
	LabelASCII  string
	Unit        string // "mol/mol", "kPa"
	UnitASCII   string
	Scale       float64
	Name        string // JSON key and the suffix of the CSV column "N2.x"
	Digits      Digits
	Get         func(*SpeciesTerm) float64
	ShareOf     string // when set, text shows this as a percentage of the blend quantity with this key
	TextHidden  bool   // in JSON and CSV only, not in the text readout's species table
	Description string
}

const (
	unitJPerMolK      = "J/(mol·K)"
	unitJPerMolKASCII = "J/(mol.K)"
	unitJPerKgK       = "J/(kg·K)"
	unitJPerKgKASCII  = "J/(kg.K)"
)

// Quantities lists the blend's figures in the order every output shows
// them.
var Quantities = []Quantity{
	{Key: "T", Label: "temperature T", Symbol: "T", SymbolASCII: "T", Unit: "K", UnitASCII: "K", Scale: 1,
		Name: "temperature_K", Digits: Digits{Sig: 6}, Section: SectionConditions,
		Get: func(s *State) float64 { return s.TempK }},
	{Key: "P", Label: "pressure P", Symbol: "P", SymbolASCII: "P", Unit: "Pa", UnitASCII: "Pa", Scale: 1,
		Name: "pressure_Pa", Digits: Digits{Sig: 7}, Section: SectionConditions,
		Get: func(s *State) float64 { return s.PresPa }},
	{Key: "P0", Label: "standard pressure P°", Symbol: "P°", SymbolASCII: "P0", Unit: "Pa", UnitASCII: "Pa", Scale: 1,
		Name: "standard_pressure_Pa", Digits: Digits{Sig: 6}, Section: SectionConditions,
		Get: func(s *State) float64 { return s.StdPresPa }},
	{Key: "M", Label: "molar mass M", Symbol: "M", SymbolASCII: "M", Unit: "g/mol", UnitASCII: "g/mol", Scale: 1000,
		Name: "molar_mass_kg_mol", Digits: Digits{Sig: 6},
		Get: func(s *State) float64 { return s.MolarMassKgPerMol }},
	{Key: "rho", Label: "density ρ", Symbol: "ρ", SymbolASCII: "rho", Unit: "kg/m³", UnitASCII: "kg/m3", Scale: 1,
		Name: "density_kg_m3", Digits: Digits{Sig: 5},
		Get: func(s *State) float64 { return s.DensityKgPerM3 }},
	{Key: "rho_real", Label: "real density ρ", Symbol: "ρ", SymbolASCII: "rho", Unit: "kg/m³", UnitASCII: "kg/m3", Scale: 1,
		Name: "real_density_kg_m3", Digits: Digits{Sig: 5}, Optional: true, Section: SectionRealGas,
		Get: (*State).RealDensityKgPerM3},
	{Key: "Z", Label: "compressibility Z", Symbol: "Z", SymbolASCII: "Z", Scale: 1,
		Name: "z", Digits: Digits{Sig: 5}, Optional: true, Section: SectionRealGas,
		Get: (*State).Z},
	{Key: "Cp", Label: "heat capacity Cp", Symbol: "Cp", SymbolASCII: "Cp", Unit: unitJPerMolK, UnitASCII: unitJPerMolKASCII, Scale: 1,
		Name: "cp_J_molK", PerKgName: "cp_J_kgK", PerKgUnit: unitJPerKgK, PerKgUnitASCII: unitJPerKgKASCII, Digits: Digits{Sig: 5},
		SpeciesKey: "Cp",
		Get:        func(s *State) float64 { return s.CpJPerMolK }},
	{Key: "Cv", Label: "heat capacity Cv", Symbol: "Cv", SymbolASCII: "Cv", Unit: unitJPerMolK, UnitASCII: unitJPerMolKASCII, Scale: 1,
		Name: "cv_J_molK", PerKgName: "cv_J_kgK", PerKgUnit: unitJPerKgK, PerKgUnitASCII: unitJPerKgKASCII, Digits: Digits{Sig: 5},
		Get: func(s *State) float64 { return s.CvJPerMolK }},
	{Key: "gamma", Label: "γ = Cp/Cv", Symbol: "γ", SymbolASCII: "gamma", Scale: 1,
		Name: "gamma", Digits: Digits{Sig: 5},
		Get: func(s *State) float64 { return s.Gamma }},
	{Key: "c", Label: "speed of sound c", Symbol: "c", SymbolASCII: "c", Unit: "m/s", UnitASCII: "m/s", Scale: 1,
		Name: "sound_speed_m_s", Digits: Digits{Sig: 5},
		Get: func(s *State) float64 { return s.SoundSpeedMPerS }},
	{Key: "H", Label: "enthalpy H", Symbol: "H", SymbolASCII: "H", Unit: "kJ/mol", UnitASCII: "kJ/mol", Scale: 1e-3,
		Name: "h_J_mol", PerKgName: "h_J_kg", PerKgUnit: "kJ/kg", PerKgUnitASCII: "kJ/kg", Digits: Digits{Decimals: 3},
		SpeciesKey: "H",
		Get:        func(s *State) float64 { return s.HJPerMol }},
	{Key: "U", Label: "internal energy U", Symbol: "U", SymbolASCII: "U", Unit: "kJ/mol", UnitASCII: "kJ/mol", Scale: 1e-3,
		Name: "u_J_mol", PerKgName: "u_J_kg", PerKgUnit: "kJ/kg", PerKgUnitASCII: "kJ/kg", Digits: Digits{Decimals: 3},
		Get: func(s *State) float64 { return s.UJPerMol }},
	{Key: "S", Label: "entropy S", Symbol: "S", SymbolASCII: "S", Unit: unitJPerMolK, UnitASCII: unitJPerMolKASCII, Scale: 1,
		Name: "s_J_molK", PerKgName: "s_J_kgK", PerKgUnit: unitJPerKgK, PerKgUnitASCII: unitJPerKgKASCII, Digits: Digits{Sig: 6},
		SpeciesKey: "S",
		Get:        func(s *State) float64 { return s.SJPerMolK }},
	{Key: "G", Label: "Gibbs energy G", Symbol: "G", SymbolASCII: "G", Unit: "kJ/mol", UnitASCII: "kJ/mol", Scale: 1e-3,
		Name: "g_J_mol", PerKgName: "g_J_kg", PerKgUnit: "kJ/kg", PerKgUnitASCII: "kJ/kg", Digits: Digits{Decimals: 3},
		SpeciesKey: "mu",
		Get:        func(s *State) float64 { return s.GJPerMol }},
	{Key: "A", Label: "Helmholtz energy A", Symbol: "A", SymbolASCII: "A", Unit: "kJ/mol", UnitASCII: "kJ/mol", Scale: 1e-3,
		Name: "a_J_mol", PerKgName: "a_J_kg", PerKgUnit: "kJ/kg", PerKgUnitASCII: "kJ/kg", Digits: Digits{Decimals: 3},
		Get: func(s *State) float64 { return s.AJPerMol }},
	{Key: "Smix", Label: "mixing entropy", Symbol: "ΔSmix", SymbolASCII: "dSmix", Unit: unitJPerMolK, UnitASCII: unitJPerMolKASCII, Scale: 1,
		Name: "s_mix_J_molK", Digits: Digits{Sig: 5},
		Get: func(s *State) float64 { return s.SMixJPerMolK }},
	// The reversible work to part the blend into its pure gases at the
	// same T and P: the counterpart of the mixing entropy, T·ΔSmix.
	{Key: "Wsep", Label: "min. separation work", Symbol: "Wsep", SymbolASCII: "Wsep", Unit: "kJ/mol", UnitASCII: "kJ/mol", Scale: 1e-3,
		Name: "min_separation_work_J_mol", PerKgName: "min_separation_work_J_kg", PerKgUnit: "kJ/kg", PerKgUnitASCII: "kJ/kg", Digits: Digits{Sig: 5},
		Get: func(s *State) float64 { return s.TempK * s.SMixJPerMolK }},
}

// SpeciesQuantities lists each species' figures in the order every output
// shows them.
var SpeciesQuantities = []SpeciesQuantity{
	{Key: "x", Label: "x", LabelASCII: "x", Unit: "mol/mol", UnitASCII: "mol/mol", Scale: 1,
		Name: "x", Digits: Digits{Sig: 4}, Description: "mole fraction",
		Get: func(t *SpeciesTerm) float64 { return t.X }},
	{Key: "w", Label: "mass", LabelASCII: "mass", Unit: "kg/kg", UnitASCII: "kg/kg", Scale: 1,
		Name: "mass_fraction", Digits: Digits{Sig: 4}, Description: "mass fraction",
		Get: func(t *SpeciesTerm) float64 { return t.MassFrac }},
	{Key: "p", Label: "p", LabelASCII: "p", Unit: "kPa", UnitASCII: "kPa", Scale: 1e-3,
		Name: "partial_pressure_Pa", Digits: Digits{Sig: 4}, Description: "partial pressure xᵢP",
		Get: func(t *SpeciesTerm) float64 { return t.PartialPresPa }},
	{Key: "mu", Label: "μ", LabelASCII: "mu", Unit: "kJ/mol", UnitASCII: "kJ/mol", Scale: 1e-3,
		Name: "mu_J_mol", Digits: Digits{Decimals: 3}, Description: "chemical potential μᵢ = μᵢ° + RT ln(xᵢP/P°)",
		Get: func(t *SpeciesTerm) float64 { return t.MuJPerMol }},
	{Key: "mu0", Label: "μ°", LabelASCII: "mu0", Unit: "kJ/mol", UnitASCII: "kJ/mol", Scale: 1e-3,
		Name: "mu_std_J_mol", Digits: Digits{Decimals: 3}, TextHidden: true, Description: "standard chemical potential μᵢ°(T) at P°",
		Get: func(t *SpeciesTerm) float64 { return t.Mu0JPerMol }},
	{Key: "S", Label: "S", LabelASCII: "S", Unit: unitJPerMolK, UnitASCII: unitJPerMolKASCII, Scale: 1,
		Name: "s_J_molK", Digits: Digits{Sig: 5}, Description: "partial molar entropy, at (T, pᵢ)",
		Get: func(t *SpeciesTerm) float64 { return t.SJPerMolK }},
	{Key: "Cp", Label: "Cp", LabelASCII: "Cp", Unit: unitJPerMolK, UnitASCII: unitJPerMolKASCII, Scale: 1,
		Name: "cp_J_molK", Digits: Digits{Sig: 4}, Description: "heat capacity",
		Get: func(t *SpeciesTerm) float64 { return t.CpJPerMolK }},
	{Key: "H", Label: "H", LabelASCII: "H", Unit: "kJ/mol", UnitASCII: "kJ/mol", Scale: 1e-3,
		Name: "h_J_mol", Digits: Digits{Decimals: 3}, TextHidden: true, Description: "enthalpy",
		Get: func(t *SpeciesTerm) float64 { return t.HJPerMol }},
	{Key: "Sshare", Label: "share", LabelASCII: "share", Unit: "of S", UnitASCII: "of S", Scale: 1,
		Name: "s_share_J_molK", Digits: Digits{Decimals: 1}, ShareOf: "S", Description: "xᵢSᵢ, the species' part of S",
		Get: func(t *SpeciesTerm) float64 { return t.SShareJPerMolK }},
	{Key: "Cpshare", Label: "share", LabelASCII: "share", Unit: "of Cp", UnitASCII: "of Cp", Scale: 1,
		Name: "cp_share_J_molK", Digits: Digits{Decimals: 1}, ShareOf: "Cp", Description: "xᵢCpᵢ, the species' part of Cp",
		Get: func(t *SpeciesTerm) float64 { return t.CpShareJPerMolK }},
}

// QuantityByKey returns the blend quantity with the key, and false for
// an unknown key.
func QuantityByKey(key string) (*Quantity, bool) {
	i := slices.IndexFunc(Quantities, func(q Quantity) bool { return q.Key == key })
	if i < 0 {
		return nil, false
	}
	return &Quantities[i], true
}

// SpeciesQuantityByKey returns the species quantity with the key.
func SpeciesQuantityByKey(key string) (*SpeciesQuantity, bool) {
	i := slices.IndexFunc(SpeciesQuantities, func(q SpeciesQuantity) bool { return q.Key == key })
	if i < 0 {
		return nil, false
	}
	return &SpeciesQuantities[i], true
}

// FirstNonFinite returns the name of the first figure of s that is NaN or
// infinite, per mole, per kilogram or per species, and "" when every
// figure is finite. It reads the quantity table: no reflection, no
// allocation, so that sweeps may call it on every point.
func FirstNonFinite(s *State) string {
	for i := range Quantities {
		q := &Quantities[i]
		v := q.Get(s)
		if q.Optional && v != v {
			continue // not known, and written as such
		}
		if !finite(v) {
			return q.Label
		}
		if q.HasPerKg() && !finite(v/s.MolarMassKgPerMol) {
			return q.Label + " per kg"
		}
	}
	for j := range s.Species {
		t := &s.Species[j]
		for i := range SpeciesQuantities {
			if !finite(SpeciesQuantities[i].Get(t)) {
				return t.Species.Formula + " " + SpeciesQuantities[i].Description
			}
		}
	}
	return ""
}

func finite(x float64) bool { return x-x == 0 }
