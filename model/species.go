package model

import "strings"

// RotorKind says how a species rotates.
type RotorKind int

const (
	Atom      RotorKind = iota // no rotation
	Linear                     // one rotational constant B
	Nonlinear                  // three rotational constants A, B, C
)

func (k RotorKind) String() string {
	switch k {
	case Atom:
		return "atom"
	case Linear:
		return "linear"
	case Nonlinear:
		return "nonlinear"
	}
	return "unknown"
}

// VibMode is one harmonic vibrational fundamental.
type VibMode struct {
	WavenumberPerCm float64
	Degeneracy      int
}

// ElecLevel is one electronic level (or fine-structure component).
type ElecLevel struct {
	EnergyPerCm float64
	Degeneracy  int
}

// Hazard is a set of hazard classes, one bit each.
type Hazard uint8

const (
	Asphyxiant Hazard = 1 << iota
	Flammable
	Oxidizer
	Toxic
	Pyrophoric
	Corrosive
)

var hazardNames = []struct {
	h    Hazard
	name string
}{
	{Asphyxiant, "asphyxiant"},
	{Flammable, "flammable"},
	{Oxidizer, "oxidizer"},
	{Toxic, "toxic"},
	{Pyrophoric, "pyrophoric"},
	{Corrosive, "corrosive"},
}

// HazardByName returns the hazard class with the given name.
func HazardByName(name string) (Hazard, bool) {
	for _, hn := range hazardNames {
		if hn.name == name {
			return hn.h, true
		}
	}
	return 0, false
}

// Names lists the classes in h in a fixed order.
func (h Hazard) Names() []string {
	var out []string
	for _, hn := range hazardNames {
		if h&hn.h != 0 {
			out = append(out, hn.name)
		}
	}
	return out
}

func (h Hazard) String() string { return strings.Join(h.Names(), ", ") }

// AllHazards lists every hazard class, in display order.
func AllHazards() []Hazard {
	out := make([]Hazard, len(hazardNames))
	for i, hn := range hazardNames {
		out[i] = hn.h
	}
	return out
}

// Species is everything the partition function needs to know about one
// molecule, with the sources of its numbers.
type Species struct {
	Formula string // how the species is addressed, e.g. "CO2"
	Name    string // e.g. "carbon dioxide"

	MolarMassKgPerMol float64 // from the formula and IUPAC atomic weights

	Rotor RotorKind
	// RotConstPerCm holds B for a linear molecule and A, B, C for a
	// nonlinear one, in cm⁻¹.
	RotConstPerCm []float64
	Symmetry      int // rotational symmetry number σ
	// SpinWeights are the nuclear-spin statistical weights of even and odd
	// J for a homonuclear linear molecule; zero for heteronuclear ones.
	SpinWeights [2]float64
	// SpinMod says whether the spin modifications are in equilibrium (the
	// zero value) or frozen at a fixed ratio (see spinmod.go).
	SpinMod SpinModification

	Vib  []VibMode
	Elec []ElecLevel // ground level first, at 0 cm⁻¹

	// Dunham holds the ground state's spectroscopic constants of a
	// diatomic molecule, nil if it has none; with them, the default
	// treatment sums its rovibrational levels (see levels.go) and Rot,
	// Vib and Elec above serve the rigid-rotor / harmonic treatment.
	Dunham *DunhamConstants
	// States are excited electronic states with their own constants,
	// summed with the ground state's levels; they replace Elec's excited
	// levels in the level sum.
	States []ElecState
	// Torsions are hindered internal rotations that replace vibrational
	// modes when the levels are summed (see torsion.go).
	Torsions []Torsion
	// Ladders are modes given by their observed levels (NH3's inversion
	// ladder), replacing harmonic modes when the levels are summed (see
	// ladder.go).
	Ladders []Ladder
	// Distortion holds a nonlinear molecule's quartic centrifugal
	// distortion constants, nil if none (see distortion.go).
	Distortion *Distortion
	// Anharmonic holds a polyatomic's harmonic wavenumbers and xij, nil
	// if none (see anharmonic.go).
	Anharmonic *Anharmonic
	// DissociationCm is D0, the dissociation energy from the lowest
	// level, in cm⁻¹: the level sums stop there.
	DissociationCm float64

	// EnergyZeroJPerMol is ΔfH°(0 K): it puts all species on the scale of
	// the elements in their reference states.
	EnergyZeroJPerMol float64

	BoilingK float64 // normal boiling (or sublimation) point; 0 if unknown

	// Critical constants for the corresponding-states correlations of
	// mixtures/realgas; CriticalK is 0 when the species has none (radicals,
	// or a user species that gives none). For a quantum gas (He, Ne, H2,
	// D2) CriticalK and CriticalPa are the classical limits Tc⁰ and Pc⁰ of
	// effective constants that depend on temperature (see HasCritical).
	CriticalK  float64
	CriticalPa float64
	Acentric   float64 // acentric factor ω
	QuantumGas bool
	Hazards    Hazard
	Safety     SafetyData // flammable limits, ISO 10156 coefficients, LC50

	// Sources maps a field name of the catalogue file (for example "vib")
	// to the publication its numbers come from.
	Sources map[string]string
	// Notes is free text shown with the species (e.g. "sublimes").
	Notes string

	// Derived once by prepare: characteristic temperatures in K.
	rotThetaK  []float64
	vibThetaK  []float64
	vibDeg     []float64
	vibModes   []vibTerm // the same modes, packed for the hot loop
	elecThetaK []float64
	elecDeg    []float64
	lnElecG0   float64 // ln of the ground level's degeneracy
	levels     *rovibLevels
	// deferredLevels, when set, makes the level list on first use (see
	// levelList); deferLevels lets Prepare defer the costly level lists
	// (potential curves, anharmonic levels) of the built-in catalogue.
	deferredLevels *deferredLevels
	deferLevels    bool
	// torsionLevels and vibModesHindered serve the summed levels of a
	// molecule with torsions: one level list per set of alike torsions
	// (or ladders), and the modes left harmonic beside them.
	torsionLevels []torsionSet
	torsionKeys   []string     // per torsionLevels entry: the constants it holds (addTorsionSet)
	anharmonicVib *rovibLevels // the anharmonic vibrational levels
	// anharmonicDeferred, when set, makes them on first use instead.
	anharmonicDeferred *deferredLevels
	vibModesHindered   []vibTerm
	vibReplacedBy      []string // per Vib mode: what replaces it when summed (VibReplacedBy)
	distortionPerK     float64  // ln q_rot gains distortionPerK·T (see distortion.go)
	spinBase           string   // the species a spin modification derives from, "" if none
	// lnElecG0Levels is ln of the ground state's multiplicity in the
	// level sum (0 for ²Π, whose spin components are levels of their own).
	lnElecG0Levels float64
	massKg         float64
	// lnNQ0 is ln[(2π m k/h²)^{3/2}]: ln nQ = lnNQ0 + 1.5 ln T.
	lnNQ0 float64
	// lnRotClassical is ln(√π/σ / √(ΘAΘBΘC)) or ln(1/(σΘ)).
	lnRotClassical float64
	// rotQuantumK is a nonlinear rotor's first quantum correction, in K:
	// ln q_rot = ln q_classical + rotQuantumK/T (see rigidBodyRotor).
	rotQuantumK float64
	// frozenLnW is ln(g_i/(g_tot x_i)) of each frozen spin modification
	// (0 for a weight or fraction of 0), and frozenLnMix Σ x_i of it: the
	// constant terms of a frozen mixture's ln q (spinmod.go).
	frozenLnW   [2]float64
	frozenLnMix float64
}

// vibTerm is one vibrational mode as the partition function uses it.
type vibTerm struct {
	thetaK float64 // hcν̃/k
	deg    float64
	nDeg   int // deg as a count, for the product of 1 − e^{−x}
}

// RotThetaK returns the rotational temperatures hcB/k in K.
func (sp *Species) RotThetaK() []float64 { return sp.rotThetaK }

// VibThetaK returns the vibrational temperatures hcν̃/k in K, one per mode.
func (sp *Species) VibThetaK() []float64 { return sp.vibThetaK }

// ElecThetaK returns the electronic level energies as temperatures in K.
func (sp *Species) ElecThetaK() []float64 { return sp.elecThetaK }

// HasCritical reports whether the species carries critical constants.
func (sp *Species) HasCritical() bool { return sp.CriticalK > 0 }

// Homonuclear reports whether even and odd J carry separate spin weights.
func (sp *Species) Homonuclear() bool { return sp.SpinWeights[0]+sp.SpinWeights[1] > 0 }
