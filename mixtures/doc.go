// Package mixtures combines species from package model into ideal-gas
// blends: it parses blend text and values with units, mixes, sweeps T or
// P, and saves and loads blend files.
//
// # Ideal mixing
//
// Each species i of mole fraction xᵢ is taken at its partial pressure
// pᵢ = xᵢP, so that its chemical potential is
//
//	μᵢ = μᵢ°(T) + RT ln(xᵢP/P°),
//
// with μᵢ°(T) the pure species' Gibbs energy at the standard pressure P°
// (1 bar unless 1 atm is chosen). Molar properties of the blend are
// mole-fraction sums of the species' partial molar properties:
//
//	H = Σ xᵢHᵢ   Cp = Σ xᵢCpᵢ   S = Σ xᵢSᵢ(T, pᵢ)   G = Σ xᵢμᵢ
//
// so S holds the mixing entropy ΔS_mix = −R Σ xᵢ ln xᵢ, which is also
// reported on its own. Density is PM/(RT) and the speed of sound is
// √(γRT/M), with γ = Cp/Cv.
//
// # Conventions
//
// Energies sit on the scale of package model: each species' energy zero is
// its ΔfH°(0 K), so G and μ are referenced to the elements in their
// standard reference states at 0 K. Inputs and outputs are SI unless a
// name says otherwise (tempK, presPa, JPerMolK).
//
// # Blend text
//
// A blend is a list of "SPECIES AMOUNT" items separated by commas,
// semicolons or new lines, for example
//
//	N2 78.08%, O2 20.95%, Ar 0.93%, CO2 0.04%
//	SiH4 2%, H2 500ppm, N2 bal
//	N2 0.79, O2 0.21
//
// An amount is a bare mole fraction (0.21), a mole percent (21% or
// 21 mol%), ppm or ppb by moles, a mass fraction (0.3 kg/kg), a mass
// percent (30 wt% or 30 mass%), a partial pressure with a pressure unit
// (0.2 bar, 150 Pa), or "bal" for the one balance species. Amounts that
// sum to 100 % within 0.05 % are renormalised. A species listed twice is
// one species: its amounts add, and it adds no mixing entropy. A species
// alone, as the whole blend ("N2"), is the pure gas. A named mixture
// (air, see named.go) is one item whose amount is shared among its
// species: "CH4 2.5%, air bal".
//
// Blend text is one front end: NewBlend builds the same Blend from
// (species, amount) items, such as recipe rows or blend-file components,
// and its errors name the item by index and by the origin the caller gave
// ("lab.json:7"). A balance species that would get nothing is an error.
//
// Unit words ignore case, except that "mPa" is refused: read as MPa it
// would be 10⁹ times off. Every pressure unit with a gauge form takes it
// (kPag, MPag, barg, mbarg, psig: 101 325 Pa is added) and the matching
// absolute form (kPaa, bara, psia, …); gauge units are not accepted as
// partial pressures.
//
// # Sweeps
//
// A Sweep is a grid of Steps points over T (linear, or log on request) or
// P (always log), end points exactly as typed. A range reads as
// "FROM..TO UNIT" or "FROM UNIT..TO UNIT" (ParseSweepRange); the number of
// points is given apart (ParseSteps). Mixture.CheckSweep checks every
// point up front; Mixture.Stream computes the points in order into one
// reused State, keeping none; a SweepTable keeps chosen figures of every
// point as float64 columns.
package mixtures
