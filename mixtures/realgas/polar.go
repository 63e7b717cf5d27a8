package realgas

// Tsonopoulos' polar term adds, to B Pc/(R Tc) = f⁰ + ω f¹,
//
//	f² = a/Tr⁶ − b/Tr⁸
//
// (Tsonopoulos, AIChE J. 20, 263, 1974; the rules as restated by
// Tsonopoulos and Heidman, Fluid Phase Equilib. 57, 261, 1990, and in
// Poling, Prausnitz and O'Connell, The Properties of Gases and Liquids,
// 5th ed., section 4-5; all from memory). A polar gas that does not
// hydrogen-bond takes b = 0 and a from its reduced dipole moment,
//
//	μr = 10⁵ μ² Pc/Tc²   (μ in debye, Pc in atm, Tc in K)
//	a  = −2.14×10⁻⁴ μr − 4.308×10⁻²¹ μr⁸
//
// the rule Tsonopoulos gave for ketones, aldehydes, nitriles and ethers,
// and which he found to hold for NH3 and H2S. Water, hydrogen-bonded,
// takes the fitted a = −0.0109, b = 0 of Tsonopoulos and Heidman. Here
// the same non-hydrogen-bonded rule is applied to SO2, HCl, HBr and NO2,
// small polar molecules that do not associate: an estimate, which the
// package doc says. HF associates into chains and rings in the gas, and
// CHF3 belongs to the alkyl-halide class, whose coefficients are not
// carried here: their polar terms are left out, and the output says so.
//
// For a pair, a polar and a non-polar species take aᵢⱼ = bᵢⱼ = 0; two
// polar species the means of their a and b (Tsonopoulos 1974, from
// memory).

// polarSpecies is one species' entry of the polar term.
type polarSpecies struct {
	dipoleD float64 // dipole moment in debye, where a is found from it
	// a, b fitted (water); used when fitted is true.
	fitted bool
	a, b   float64
	// leftOut: the term is not known here; B is the non-polar one.
	leftOut bool
}

// polarTable holds the dipole moments (CRC Handbook of Chemistry and
// Physics, "Dipole moments" table, gas-phase values, from memory) and
// the fitted water parameters.
var polarTable = map[string]polarSpecies{
	"H2O":  {dipoleD: 1.855, fitted: true, a: -0.0109, b: 0}, // a, b: Tsonopoulos and Heidman 1990, from memory
	"NH3":  {dipoleD: 1.471},                                 // CRC, from memory
	"H2S":  {dipoleD: 0.978},                                 // CRC, from memory
	"SO2":  {dipoleD: 1.633},                                 // CRC, from memory
	"HCl":  {dipoleD: 1.109},                                 // CRC, from memory
	"HBr":  {dipoleD: 0.827},                                 // CRC, from memory
	"NO2":  {dipoleD: 0.316},                                 // CRC, from memory
	"HF":   {dipoleD: 1.827, leftOut: true},                  // CRC, from memory; associates
	"CHF3": {dipoleD: 1.651, leftOut: true},                  // CRC, from memory; alkyl-halide class
}

// atmPa is one standard atmosphere, the pressure unit of μr.
const atmPa = 101325

// polarAB returns a species' a and b for its critical constants, and
// whether it takes a polar term at all.
func polarAB(formula string, tcK, pcPa float64) (a, b float64, ok bool) {
	p, found := polarTable[formula]
	if !found || p.leftOut {
		return 0, 0, false
	}
	if p.fitted {
		return p.a, p.b, true
	}
	mur := 1e5 * p.dipoleD * p.dipoleD * (pcPa / atmPa) / (tcK * tcK)
	mur8 := mur * mur * mur * mur
	mur8 *= mur8
	return -2.14e-4*mur - 4.308e-21*mur8, 0, true
}

// PolarLeftOut reports whether the species is polar but its polar term
// of Tsonopoulos' correlation is not known here, so that its |B| is
// underestimated.
func PolarLeftOut(formula string) bool { return polarTable[formula].leftOut }
