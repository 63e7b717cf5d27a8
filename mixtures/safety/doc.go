// Package safety holds zmix's screening calculations for the hazards of a
// gas blend: its flammable limits in air, whether it is flammable or more
// oxidizing than air by ISO 10156, its acute inhalation toxicity by the GHS
// additivity formula, and what a release does to a room. It works on
// species and mole fractions (Part) and reads each species' figures from
// model.SafetyData; it imports only package model, so that package
// mixtures can cite its results in its cautions.
//
// Every result names its method, and lists the sources of the figures it
// used; a result that rests on a figure recalled rather than read says so
// (Result.Recalled). Where a figure is missing the result is "not known",
// never a guess. These are screening calculations: they do not replace the
// safety data sheet, the applicable codes, gas-detection design or a
// qualified assessment.
//
// # Flammable limits of the blend: Le Chatelier's rule
//
// Over the flammable components i, with fractions yᵢ of the fuel part
// alone (yᵢ = xᵢ/F, F = Σ xᵢ over the fuels),
//
//	LFL_fuel = 1 / Σ (yᵢ / LFLᵢ)    UFL_fuel = 1 / Σ (yᵢ / UFLᵢ)
//
// (H. Le Chatelier, 1891; as used in M. G. Zabetakis, US Bureau of Mines
// Bulletin 627, 1965). The blend released into air reaches the fuel's LFL
// when the blend makes LFL_fuel/F of the mixture with air, and leaves the
// range above UFL_fuel/F; those are the blend's limits in air. Le
// Chatelier's rule treats the blend's inert components like air: it
// ignores that they narrow the range. ISO 10156 below counts them.
//
// The air that brings a release to its LFL, per volume of blend, is
// 100/LFL_blend − 1. The blend as stored is inside its flammable range when
// it holds an oxidizer and its fuel content F lies between LFL_fuel and
// UFL_fuel. The limits are those in air: a blend leaner in oxygen than air
// may not burn even so (the screen errs on the side of caution), and one
// richer in oxygen burns beyond UFL_fuel, which the readout says.
//
// # ISO 10156: flammable in air
//
// ISO 10156 (Gas cylinders — Gases and gas mixtures — Determination of
// fire potential and oxidizing ability for the selection of cylinder valve
// outlets) converts each inert gas k of fraction Bₖ to its nitrogen
// equivalent KₖBₖ, and each flammable gas i of fraction Aᵢ to
//
//	A'ᵢ = Aᵢ / (Σ Aⱼ + Σ KₖBₖ)
//
// The mixture is flammable in air when Σ A'ᵢ/Tciᵢ > 1, Tciᵢ being the most
// of gas i in nitrogen that is not flammable in air. A component that is
// neither flammable nor an inert gas with a tabulated Kₖ (an oxidizer, or a
// gas such as HCl) is not counted as a diluent: that can only raise the
// sum. ISO 10156 asks for a test, not this calculation, for a mixture of
// fuels with oxidizers; the readout says so. When a flammable component has
// no Tci, the sum of the others is a lower bound: above 1 it still
// decides. No Tci can be below the gas's LFL in air (a mix of the gas in
// nitrogen below its LFL stays below it however much air is added), so
// the sum with each missing Tci replaced by the LFL is an upper bound: at
// or below 1 it decides that the blend is not flammable. Between the two
// bounds the answer is not known, and the readout gives both.
//
// # ISO 10156: more oxidizing than air
//
// With Cᵢ each oxidizer's oxygen-equivalency coefficient (1 for O2), the
// mixture is more oxidizing than air when Σ xᵢCᵢ > 0.235.
//
// # GHS acute inhalation toxicity: additivity
//
// With Cᵢ in % and LC50ᵢ the 4 h rat LC50 of each toxic component in ppm
// by volume (a 1 h value halved, as the notes to GHS Table 3.1.1 prescribe
// for gases),
//
//	100 / LC50_mix = Σ Cᵢ / LC50ᵢ
//
// and the category for gases is 1 up to 100 ppm, 2 up to 500, 3 up to 2500
// and 4 up to 20 000 (UN GHS, chapter 3.1). A toxic component with no LC50
// is "of unknown acute toxicity": GHS has the mixture classified on the
// others with that share stated, and, once the unknown share reaches 10 %,
// the left side becomes (100 − C_unknown)/LC50_mix.
//
// # Autoignition and temperature class
//
// A blend's own autoignition temperature is seldom measured; the screen
// takes the lowest figure among its flammable components, which errs on
// the side of caution (common practice), and names whose it is. That
// figure places the blend in a temperature class of IEC 60079-20-1 (T1
// above 450 °C, T2 above 300 °C, T3 above 200 °C, T4 above 135 °C, T5
// above 100 °C, T6 above 85 °C; from memory), the class of the hottest
// surface that equipment in the gas may have; a figure on a bound falls in
// the stricter class. A flammable component with no figure leaves the
// lowest "at most" and the class "or stricter"; a pyrophoric one ignites
// in air at room temperature, and no class applies. The catalogue's
// figures are NFPA 325's, which may differ from the standard's own
// listing by tens of degrees, since the test methods differ: the site's
// hazardous-area classification decides.
//
// # Release into a room: the well-mixed model
//
// A room of volume V, a released standard volume Q of blend (or a rate q)
// and a ventilation flow v (air changes per hour × V). The gas is taken as
// mixed through the room at once (common practice for oxygen-deficiency
// and release assessments). An instant release ends at one of two closed
// forms, and the lower oxygen of the two is reported:
//
//	closed room, gas added:      x_O2 = (0.209 V + x_O2,blend Q)/(V + Q)
//	room air displaced outward:  x_O2 = 0.209 + (x_O2,blend − 0.209)(1 − e^(−Q/V))
//
// which for a blend with no oxygen are 20.9 % × V/(V+Q) and
// 20.9 % × e^(−Q/V). A continuous release at rate q into a room ventilated
// at v approaches, with time constant V/(q+v),
//
//	x(t) = x_ss + (x(0) − x_ss) e^(−(q+v)t/V),  x_ss = (v·x_air + q·x_blend)/(q+v)
//
// for oxygen and every species alike. Each flammable species' peak is
// given as % of its LFL, against the alarm points of 10 % and 25 % LFL
// (common practice), and each toxic species' peak ppm against its LC50 and
// any exposure limit shown.
package safety
