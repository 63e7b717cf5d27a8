package model

import "math"

// Terms are one factor's contribution to the molar thermodynamics, all
// dimensionless: LnQ = ln q, U = T ∂ln q/∂T and Cv = ∂(T² ∂ln q/∂T)/∂T.
// A factor contributes −RT·LnQ to A, RT·U to U, R·(LnQ+U) to S and R·Cv to
// Cv.
type Terms struct {
	LnQ, U, Cv float64
}

// S returns the factor's entropy over R.
func (t Terms) S() float64 { return t.LnQ + t.U }

func (t Terms) add(o Terms) Terms { return Terms{t.LnQ + o.LnQ, t.U + o.U, t.Cv + o.Cv} }

// scale multiplies each term by f.
func (t Terms) scale(f float64) Terms { return Terms{f * t.LnQ, f * t.U, f * t.Cv} }

// translation returns the translational terms at (T, P), given ln T and
// ln P, with the 1/N! of indistinguishable molecules folded in
// (Sackur-Tetrode).
func (sp *Species) translation(lnT, lnP float64) Terms {
	lnNQ := sp.lnNQ0 + 1.5*lnT
	// V/N = kT/P, taken in logs so that no product over- or underflows.
	lnVPerN := lnBoltzmann + lnT - lnP
	return Terms{LnQ: lnNQ + lnVPerN + 1, U: 1.5, Cv: 1.5}
}

// rotorSumLimit is the T/Θrot below which linear rotor levels are summed.
const rotorSumLimit = 50

// rigidBodyRotor returns the terms of an atom (none) or of a nonlinear
// rigid rotor: the classical limit, ln q = const + (3/2) ln T, with its
// first quantum correction unless how asks for the classical rotor alone.
//
// The correction is the leading term of the high-temperature expansion
// of the rigid asymmetric top's level sum (Stripp and Kirkwood, J. Chem.
// Phys. 19, 1131 (1951), from memory):
//
//	q = q_classical · [1 + (1/12T)(2(ΘA+ΘB+ΘC) − ΘAΘB/ΘC − ΘBΘC/ΘA − ΘCΘA/ΘB) + O(Θ²/T²)]
//
// which for a spherical top is the familiar e^{Θ/4T}. Taken as
// ln q += a/T, it leaves S and Cv unchanged (U gains −a/T, Cv nothing)
// and lowers H − H(0) by R·a: the classical rotor's energy counts from
// the bottom of a continuum, the quantum rotor's from its J = 0 level.
// For H2O, a = 4.45 K, so H°(298.15) − H°(0) drops by 37 J/mol. The
// test against an exact sum over the asymmetric top's levels is
// TestRotorQuantumCorrection. It is small enough to be inlined, so that
// fill calls nothing for these species.
func (sp *Species) rigidBodyRotor(lnT, invT float64, how RotationTreatment) Terms {
	var t Terms
	if sp.Rotor == Nonlinear {
		// ln q = const + (3/2) ln T: U = 3/2 and Cv = ∂(T·U)/∂T = 3/2.
		t = Terms{LnQ: sp.lnRotClassical + 1.5*lnT, U: 1.5, Cv: 1.5}
		if how != RotationClassical {
			c := sp.rotQuantumK * invT
			t.LnQ += c
			t.U -= c
		}
	}
	return t
}

// linearRotor returns the terms of a linear rigid rotor; invT is 1/T.
func (sp *Species) linearRotor(tempK, invT, lnT float64, how RotationTreatment) Terms {
	theta := sp.rotThetaK[0]
	switch {
	case how == RotationClassical:
		return Terms{LnQ: sp.lnRotClassical + lnT, U: 1, Cv: 1}
	case sp.SpinMod.Frozen:
		// Every level of each modification counts with its own weight
		// (see spinmod.go); well above Θ both hold half the levels'
		// sum, so the mixture is the sum's expansion plus a constant.
		if y := theta * invT; how == RotationAuto && y <= rotorExpansionMaxY { // homonuclear
			t := linearRotorExpansion(sp.lnRotClassical, y, lnT)
			t.LnQ += sp.frozenLnMix
			return t
		}
		return sp.frozenRotorSum(invT)
	case how == RotationSummed:
		return sp.linearRotorSum(invT)
	}
	if tempK < rotorSumLimit*theta {
		if y := theta * invT; y <= sp.expansionMaxY() {
			return linearRotorExpansion(sp.lnRotClassical, y, lnT)
		}
		return sp.linearRotorSum(invT)
	}
	return linearRotorSeries(sp.lnRotClassical, theta*invT, lnT)
}

// rotorExpansionMaxY is the y = Θ/T up to which a summed linear rotor
// takes linearRotorExpansion instead of its levels one by one: T ≥ 20 Θ
// for a homonuclear molecule, T ≥ 10 Θ for a heteronuclear one (see
// linearRotorExpansion for why they differ).
const (
	rotorExpansionMaxY       = 0.05
	rotorExpansionMaxYHetero = 0.1
)

// expansionMaxY returns the y up to which sp's rotor takes the expansion.
func (sp *Species) expansionMaxY() float64 {
	if sp.Homonuclear() {
		return rotorExpansionMaxY
	}
	return rotorExpansionMaxYHetero
}

// linearRotorExpansion is the sum of linearRotorSum, Σ (2J+1) e^{−J(J+1)y}
// over all J divided by σ, to rounding and with no exp or log. For small y
// its Euler–Maclaurin expansion, taken on the half-integers m = J + ½
// where J(J+1) = m² − ¼,
//
//	Σ = e^{y/4}/y · P(y),  P(y) = 1 + Σₖ (1 − 2^{1−2k}) B₂ₖ (−1)^{k−1} yᵏ/k!,
//
// B₂ₖ the Bernoulli numbers, leaves out only terms of order e^{−π²/y}.
// So ln Σ = −ln y + L(y), with L = y/4 + ln P as a power series whose
// coefficients bₖ are exact fractions (expansionCoef); the sixteen kept
// leave out less than 1e-16 of Cv at y = 0.12 and 1e-20 at y = 0.05
// (checked against the level sum in 50-digit arithmetic, and against
// linearRotorSum in the tests).
//
// A homonuclear molecule's two sets of levels, even and odd J with their
// own spin weights, each hold half of Σ only to within e^{−π²/4y}, 1e-21
// at y = 0.05 but 2e-9 at y = 0.1: so it takes the expansion, with σ = 2,
// from 20 Θ up only (rotorExpansionMaxY).
//
// As in linearRotorSeries, U = 1 − Σ k bₖ yᵏ and Cv = 1 + Σ k(k−1) bₖ yᵏ.
func linearRotorExpansion(lnInvSigmaTheta, y, lnT float64) Terms {
	y2 := y * y
	y4 := y2 * y2
	y8 := y4 * y4
	// Each sum as four short Horner chains joined by y⁴ and y⁸: the
	// chains run side by side, where one long chain would make each
	// product wait for the one before (written out: a call would not be
	// inlined).
	var p [3]float64
	for k := range p {
		c := &expansionCoef[k]
		q0 := c[0] + y*(c[1]+y*(c[2]+y*c[3]))
		q1 := c[4] + y*(c[5]+y*(c[6]+y*c[7]))
		q2 := c[8] + y*(c[9]+y*(c[10]+y*c[11]))
		q3 := c[12] + y*(c[13]+y*(c[14]+y*c[15]))
		p[k] = (q0 + y4*q1) + y8*(q2+y4*q3)
	}
	return Terms{LnQ: lnInvSigmaTheta + lnT + y*p[0], U: 1 - y*p[1], Cv: 1 + y2*p[2]}
}

// expansionCoef holds, for linearRotorExpansion, the bₖ of L(y) from k = 1
// (row 0), k bₖ from k = 1 (row 1) and k(k−1) bₖ from k = 2 (row 2), as
// coefficients of y⁰, y¹, ….
var expansionCoef = func() (c [3][16]float64) {
	b := [17]float64{1: 1.0 / 3, 2: 1.0 / 90, 3: 8.0 / 2835, 4: 59.0 / 56700, 5: 232.0 / 467775,
		6:  550789.0 / 1915538625,
		7:  34064.0 / 174139875,
		8:  596004707.0 / 3907698795000,
		9:  235096832632.0 / 1754068296605625,
		10: 21073847696521.0 / 160789593855515625,
		11: 313280875774288.0 / 2218896395206115625,
		12: 3019614055330977301.0 / 18172761476738086968750,
		13: 1927742867610986896.0 / 9086380738369043484375,
		14: 104972817498717726494.0 / 359325056471866719609375,
		15: 36648373247058364752093088.0 / 84913182070036240111050234375,
		16: 78646362672309210964606620583.0 / 115481927615249286551028318750000,
	}
	for k := 1; k <= 16; k++ {
		c[0][k-1] = b[k]
		c[1][k-1] = float64(k) * b[k]
		if k >= 2 {
			c[2][k-2] = float64(k*(k-1)) * b[k]
		}
	}
	return c
}()

// linearRotorSeries is the Euler–Maclaurin expansion of the rigid-rotor
// sum, q = T/(σΘ)·f(y) with f = 1 + y/3 + y²/15 + 4y³/315 and y = Θ/T. Its
// error at T ≥ 50 Θ is below 1e-8 in ln q.
//
// ln f is taken as its Taylor series in y to y⁷, whose coefficients are
// exact fractions (from expanding ln(1 + a) with a = f − 1); the first
// term left out is below 1e-19 at y = 1/50, so this is ln f to rounding,
// with no log and no division. With D = T∂/∂T = −y∂/∂y and
// ln f = Σ a_k y^k: U = 1 + D ln f = 1 − Σ k a_k y^k and
// Cv = U + D² ln q = 1 + Σ k(k−1) a_k y^k.
func linearRotorSeries(lnInvSigmaTheta, y, lnT float64) Terms {
	const (
		a1 = 1.0 / 3
		a2 = 1.0 / 90
		a3 = 8.0 / 2835
		a4 = -121.0 / 56700
		a5 = 17.0 / 42525
		a6 = -457.0 / 13395375
		a7 = 83.0 / 13395375
	)
	lnF := y * (a1 + y*(a2+y*(a3+y*(a4+y*(a5+y*(a6+y*a7))))))
	kA := y * (a1 + y*(2*a2+y*(3*a3+y*(4*a4+y*(5*a5+y*(6*a6+y*7*a7))))))
	kkA := y * y * (2*a2 + y*(6*a3+y*(12*a4+y*(20*a5+y*(30*a6+y*42*a7)))))
	return Terms{LnQ: lnInvSigmaTheta + lnT + lnF, U: 1 - kA, Cv: 1 + kkA}
}

// linearRotorSum sums Σ g_J (2J+1) exp(−J(J+1)Θ/T) directly, with the
// nuclear-spin weights of a homonuclear molecule (equilibrium between spin
// isomers) or 1/σ for a heteronuclear one. The energy zero stays at J = 0
// even when J = 0 is forbidden (¹⁶O2), but the sum runs relative to the
// lowest allowed level, so that it cannot underflow to zero at low T.
//
// The Boltzmann factors come by recurrence, with one exp for the whole
// sum: from J to J+1 the factor is multiplied by e^{−2(J+1)Θ/T}, and that
// step itself by c = e^{−2Θ/T}. Rounding grows by one ulp a product, about
// 1e-13 at the last level that counts while T < 50 Θ.
func (sp *Species) linearRotorSum(invT float64) Terms {
	theta := sp.rotThetaK[0]
	wEven, wOdd := 1.0, 1.0
	norm := 1.0
	if sp.Homonuclear() {
		wEven, wOdd = sp.SpinWeights[0], sp.SpinWeights[1]
		norm = wEven + wOdd
	} else if sp.Symmetry > 1 {
		norm = float64(sp.Symmetry)
	}
	j0 := 0
	if wEven == 0 {
		j0 = 1
	}
	ratio := theta * invT
	e0 := j0 * (j0 + 1)
	x0 := float64(e0) * ratio // lowest allowed level, in units of kT
	c := math.Exp(-2 * ratio)
	step := c // e^{−2(J+1)Θ/T} at J = j0
	if j0 == 1 {
		step = c * c
	}
	boltz := 1.0 // e^{−(ε_J − ε_J0)/kT}
	// Moments of the level energy ε_J − ε_J0, in units of kT.
	var z, m1, m2 float64
	for j := j0; ; j++ {
		x := float64(j*(j+1)-e0) * ratio
		if x > 60 {
			break
		}
		w := wEven
		if j&1 == 1 {
			w = wOdd
		}
		t := w * float64(2*j+1) * boltz
		z += t
		m1 += t * x
		m2 += t * x * x
		boltz *= step
		step *= c
	}
	mean := m1 / z
	return Terms{LnQ: math.Log(z/norm) - x0, U: mean + x0, Cv: m2/z - mean*mean}
}

// vibration returns the harmonic-oscillator terms, energy zero at v = 0.
// ln q = −Σ g ln(1 − e^{−x}) is taken as the log of one product, so that a
// mode costs a single exponential.
func (sp *Species) vibration(invT float64) Terms { return vibrationOf(sp.vibModes, invT) }

// vibrationOf returns the harmonic-oscillator terms of a list of modes.
func vibrationOf(modes []vibTerm, invT float64) Terms {
	if len(modes) > 2 {
		return vibrationTwoPass(modes, invT)
	}
	var lnQ, u, cv float64
	prod := 1.0 // Π (1 − e^{−x})^g not yet logged
	for _, m := range modes {
		x := m.thetaK * invT
		if x > 700 {
			continue // e^{−x} underflows: the mode is frozen
		}
		var em, om float64 // e^{−x} and 1 − e^{−x}, for one call
		if x < expm1Below {
			om = -math.Expm1(-x) // 1 − e^{−x} would lose digits
			em = 1 - om
		} else {
			em = math.Exp(-x)
			om = 1 - em
		}
		if m.nDeg == 1 {
			prod *= om // most modes: no call and no loop
		} else {
			prod *= powInt(om, m.nDeg)
		}
		r := x / om  // x/(1 − e^{−x})
		xe := r * em // x/(e^x − 1)
		u += m.deg * xe
		cv += m.deg * xe * r // x² e^x/(e^x − 1)²
	}
	if prod != 1 { // no mode excited: ln 1 costs a call for nothing
		lnQ -= math.Log(prod)
	}
	return Terms{LnQ: lnQ, U: u, Cv: cv}
}

// vibrationTwoPass is vibrationOf for three modes or more, with the same
// arithmetic in the same order. The exponentials come first, into a
// small buffer, and the arithmetic after: across a call nothing stays in
// a register, so a loop that did both would store and reload its running
// sums around every exp.
func vibrationTwoPass(modes []vibTerm, invT float64) Terms {
	var lnQ, u, cv float64
	prod := 1.0
	var ems [vibChunk]float64
	for len(modes) > 0 {
		chunk := modes[:min(len(modes), vibChunk)]
		modes = modes[len(chunk):]
		for i, m := range chunk {
			x := m.thetaK * invT
			switch {
			case x > 700: // frozen, and skipped below too
			case x < expm1Below:
				ems[i] = math.Expm1(-x)
			default:
				ems[i] = math.Exp(-x)
			}
		}
		for i, m := range chunk {
			x := m.thetaK * invT
			if x > 700 {
				continue
			}
			var em, om float64
			if x < expm1Below {
				om = -ems[i]
				em = 1 - om
			} else {
				em = ems[i]
				om = 1 - em
			}
			switch m.nDeg {
			case 1:
				prod *= om
			case 2:
				prod *= om * om
			case 3:
				prod *= om * om * om
			default:
				prod *= powInt(om, m.nDeg)
			}
			if prod < 1e-250 { // keep the product clear of underflow
				lnQ -= math.Log(prod)
				prod = 1
			}
			r := x / om
			xe := r * em
			u += m.deg * xe
			cv += m.deg * xe * r
		}
	}
	if prod != 1 {
		lnQ -= math.Log(prod)
	}
	return Terms{LnQ: lnQ, U: u, Cv: cv}
}

// vibChunk is how many modes vibrationOf takes per pass; most molecules
// have fewer distinct modes.
const vibChunk = 32

// expm1Below is the x under which 1 − e^{−x} is taken from expm1: there
// e^{−x} > 0.78, and 1 − e^{−x} would lose more than two bits. Either way
// a mode costs one call.
const expm1Below = 0.25

// powInt returns x^n for n ≥ 0 by squaring: a degeneracy needs no exp and
// log, as math.Pow would spend.
func powInt(x float64, n int) float64 {
	p := 1.0
	for ; n > 0; n >>= 1 {
		if n&1 == 1 {
			p *= x
		}
		x *= x
	}
	return p
}

// electronic returns the terms of the listed electronic levels. It is
// small enough to be inlined, so that a single level costs no call.
func (sp *Species) electronic(invT float64, how ElectronicTreatment) Terms {
	// Prepare lists at least the ground level.
	if how == ElectronicGroundOnly || len(sp.elecThetaK) == 1 {
		return Terms{LnQ: sp.lnElecG0}
	}
	return sp.electronicLevels(invT)
}

// electronicLevels sums the electronic levels.
func (sp *Species) electronicLevels(invT float64) Terms {
	// The ground level sits at 0: its Boltzmann factor is 1, with no exp.
	z, m1, m2 := sp.elecDeg[0], 0.0, 0.0
	for i := 1; i < len(sp.elecThetaK); i++ {
		x := sp.elecThetaK[i] * invT
		if x > 700 {
			continue // unpopulated; skipping it also avoids 0·∞ at tiny T
		}
		t := sp.elecDeg[i] * math.Exp(-x)
		z += t
		m1 += t * x
		m2 += t * x * x
	}
	mean := m1 / z
	return Terms{LnQ: math.Log(z), U: mean, Cv: m2/z - mean*mean}
}
