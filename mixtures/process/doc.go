// Package process acts on a blend: it converts flows, compresses and
// expands, heats and cools, mixes streams, dilutes, and purges. Each
// calculation is a value holding its inputs (Flow, Compression, Heating,
// Mixing, Dilution, Purge) whose Solve returns a result; the commands and
// the workbench's Process pane both call it, and both write the result
// through the one description of its figures (Figure: names, unit,
// digits, JSON name), as the quantity table of package mixtures serves a
// state. Every result says what it assumes in one line.
//
// # The state function
//
// The calculations ask a Model for the Gas of a composition, and the Gas
// for H(T, P), S(T, P) and Cp(T, P) through mixtures.State. Ideal, the
// default, is the engine's partition-function mixture; a real-gas model
// plugs in by giving its own Gas, and every state the calculations need,
// volumes at reference conditions included, then comes from it. No
// calculation assumes a constant Cp.
//
// # Solving a balance
//
// Balances in T at fixed P are monotone, and the state holds their
// slopes, ∂H/∂T = Cp and ∂S/∂T = Cp/T. They are solved by Newton steps
// kept inside a bracket of the model's temperature range (a step that
// leaves it bisects in ln T), from a constant-Cp first guess. gonum v0.17
// exports no scalar root finder: mathext's false position is internal,
// and package optimize minimises. The last state evaluated is carried to
// the root by dH = Cp dT, dS = Cp/T dT, a step below 1e-7 T, so no state
// is computed twice.
//
// # Flows
//
// Molar and mass flows convert by the molar mass; volumes by the gas's
// density at the line's (T, P) for actual volumes, or at a reference
// condition for standard volumes: normal (0 °C, 101.325 kPa), 15 °C
// (ISO 13443), 20 °C, 60 °F and 14.696 psia, or one the user gives.
// Nm³ and SCF name their reference; SLPM, sccm and Sm³ take the one asked
// for, else 0 °C (SLPM, sccm) or 15 °C (Sm³). The relative density is
// M/M_air with dry air at 28.96546 g/mol (ISO 6976). The gas correction
// factor of a thermal mass-flow meter calibrated on N2 is the
// common-practice
//
//	GCF = (Σ xᵢsᵢ / Σ xᵢρᵢcpᵢ) · (ρcp)_N2 / s_N2,
//
// with density at 0 °C, cp at 25 °C and structure factors s of 1.03,
// 1.00, 0.941 and 0.88 for one, two, three and more atoms; for ideal gases
// ρᵢcpᵢ ∝ Cpᵢ (molar). The instrument maker's factor governs.
//
// # Compression and expansion
//
// Adiabatic steady flow from (T₁, P₁) to P₂ at isentropic efficiency η:
//
//	S(T₂s, P₂) = S(T₁, P₁)
//	h₂ = h₁ + (h₂s − h₁)/η   (compression, P₂ > P₁)
//	h₂ = h₁ − η(h₁ − h₂s)    (expansion, P₂ < P₁)
//	w = h₂ − h₁              (per mole, > 0 when done on the gas)
//
// N stages share one pressure ratio (P₂/P₁)^(1/N), with intercooling at
// the stage pressure back to a given temperature. The mean γ over a path
// is the constant γ with T₂s/T₁ = (P₂/P₁)^((γ−1)/γ), and the polytropic
// exponent n the one with T₂/T₁ = (P₂/P₁)^((n−1)/n).
//
// # Heating and mixing
//
// A heating duty at constant P is ΔH = H(T₂, P) − H(T₁, P). Streams
// joined adiabatically at P give the outlet composition by a mole
// balance and its temperature by Σ ṅᵢHᵢ(Tᵢ, P) = ṅ H_out(T, P), on the
// engine's energy scale (each species at its ΔfH°(0 K)); the entropy
// generated is ṅ S_out − Σ ṅᵢSᵢ, mixing entropy included, and zero for
// identical gases at one temperature.
//
// # Dilution and purging
//
// Dilution is the mole balance of one species, x = (x_p + r·x_d)/(1 + r),
// for r moles of diluent per mole of parent. Purging is the common-
// practice ideal-mixing model with a purge gas holding y of the species:
// after k pressure-swing or vacuum cycles between P_low and P_high,
// x_k − y = (x₀ − y)(P_low/P_high)^k, so k is ln((x₀ − y)/(x_t − y)) /
// ln(P_high/P_low) rounded up; a well-mixed volume V swept at actual
// flow Q follows x − y = (x₀ − y) e^(−Qt/V), N = Qt/V volume exchanges.
//
// # Composition from weighed masses
//
// Weighing is the gravimetric method of ISO 6142-1 run backwards from
// the masses mA of the parent gases weighed into a cylinder, each parent
// a set of mole fractions yₖ,A (its main species the balance):
//
//	nA = mA/MA,  MA = Σₖ yₖ,A Mₖ,  Mₖ = Σₑ νₖₑ Aₑ,  xᵢ = Σ_A yᵢ,A nA / Σ_A nA
//
// The inputs q are the masses, the parents' stated amounts and the
// atomic weights Aₑ; the sensitivities follow from ∂xᵢ/∂nA = (yᵢ,A − xᵢ)/N
// through nA, and u²(xᵢ) = Σⱼ (∂xᵢ/∂qⱼ)² u²(qⱼ) (JCGM 100, 5.1.2, inputs
// uncorrelated; the covariance of the fractions is (J U)(J U)ᵀ, each of
// its rows summing to 0). An amount below a limit L is L/2 with
// u = L/(2√3), and an atomic weight's ± is the half-width of a
// rectangular distribution.
//
// Inputs and outputs are SI unless a name says otherwise (tempK, presPa,
// RateMolPerSec); temperatures are absolute, pressures absolute.
package process
