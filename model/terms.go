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

// translation returns the translational terms at (T, P), given ln T,
// with the 1/N! of indistinguishable molecules folded in (Sackur-Tetrode).
func (sp *Species) translation(lnT, presPa float64) Terms {
	lnNQ := sp.lnNQ0 + 1.5*lnT
	// V/N = kT/P, taken in logs so that no product over- or underflows.
	lnVPerN := lnBoltzmann + lnT - math.Log(presPa)
	return Terms{LnQ: lnNQ + lnVPerN + 1, U: 1.5, Cv: 1.5}
}

// rotorSumLimit is the T/Θrot below which linear rotor levels are summed.
const rotorSumLimit = 50

// rotation returns the rigid-rotor terms.
func (sp *Species) rotation(tempK, lnT float64, how RotationTreatment) Terms {
	switch sp.Rotor {
	case Atom:
		return Terms{}
	case Nonlinear:
		// ln q = const + (3/2) ln T: U = 3/2 and Cv = ∂(T·U)/∂T = 3/2.
		return Terms{LnQ: sp.lnRotClassical + 1.5*lnT, U: 1.5, Cv: 1.5}
	}
	theta := sp.rotThetaK[0]
	switch how {
	case RotationClassical:
		return Terms{LnQ: sp.lnRotClassical + lnT, U: 1, Cv: 1}
	case RotationSummed:
		return sp.linearRotorSum(tempK)
	}
	if tempK < rotorSumLimit*theta {
		return sp.linearRotorSum(tempK)
	}
	return linearRotorSeries(sp.lnRotClassical, theta, tempK, lnT)
}

// linearRotorSeries is the Euler–Maclaurin expansion of the rigid-rotor
// sum, q = T/(σΘ)·(1 + y/3 + y²/15 + 4y³/315) with y = Θ/T. Its error at
// T ≥ 50 Θ is below 1e-8 in ln q.
func linearRotorSeries(lnInvSigmaTheta, theta, tempK, lnT float64) Terms {
	y := theta / tempK
	f := 1 + y/3 + y*y/15 + 4*y*y*y/315
	// y·df/dy and y²·d²f/dy², to carry the derivatives through T = Θ/y.
	yf1 := y/3 + 2*y*y/15 + 12*y*y*y/315
	y2f2 := 2*y*y/15 + 24*y*y*y/315
	// With D = T∂/∂T = −y∂/∂y on ln q = ln T + ln f(y):
	// U = D ln q and Cv = D ln q + D² ln q.
	g1 := yf1 / f
	u := 1 - g1
	d2 := g1 + y2f2/f - g1*g1
	return Terms{LnQ: lnInvSigmaTheta + lnT + math.Log(f), U: u, Cv: u + d2}
}

// linearRotorSum sums Σ g_J (2J+1) exp(−J(J+1)Θ/T) directly, with the
// nuclear-spin weights of a homonuclear molecule (equilibrium between spin
// isomers) or 1/σ for a heteronuclear one. The energy zero stays at J = 0
// even when J = 0 is forbidden (¹⁶O2), but the sum runs relative to the
// lowest allowed level, so that it cannot underflow to zero at low T.
func (sp *Species) linearRotorSum(tempK float64) Terms {
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
	ratio := theta / tempK
	x0 := float64(j0*(j0+1)) * ratio // lowest allowed level, in units of kT
	// Moments of the level energy ε_J − ε_J0, in units of kT.
	var z, m1, m2 float64
	for j := j0; ; j++ {
		x := 0.0
		if j > j0 {
			x = float64(j*(j+1)-j0*(j0+1)) * ratio
			if x > 60 {
				break
			}
		}
		w := wEven
		if j%2 == 1 {
			w = wOdd
		}
		if w == 0 {
			continue
		}
		t := w * float64(2*j+1) * math.Exp(-x)
		z += t
		m1 += t * x
		m2 += t * x * x
	}
	mean := m1 / z
	return Terms{LnQ: math.Log(z/norm) - x0, U: mean + x0, Cv: m2/z - mean*mean}
}

// vibration returns the harmonic-oscillator terms, energy zero at v = 0.
// ln q = −Σ g ln(1 − e^{−x}) is taken as the log of one product, so that a
// mode costs a single exponential.
func (sp *Species) vibration(tempK float64) Terms {
	var lnQ, u, cv float64
	invT := 1 / tempK
	prod := 1.0 // Π (1 − e^{−x})^g not yet logged
	for _, m := range sp.vibModes {
		x := m.thetaK * invT
		if x > 700 {
			continue // exp(−x) underflows: the mode is frozen
		}
		em := math.Exp(-x) // e^{−x}
		om := 1 - em       // 1 − e^{−x}: exact enough while e^{−x} < 1/2
		if em > 0.5 {
			om = -math.Expm1(-x)
		}
		switch m.nDeg {
		case 1:
			prod *= om
		case 2:
			prod *= om * om
		case 3:
			prod *= om * om * om
		default:
			prod *= math.Pow(om, m.deg)
		}
		if prod < 1e-250 { // keep the product clear of underflow
			lnQ -= math.Log(prod)
			prod = 1
		}
		r := x / om  // x/(1 − e^{−x})
		xe := r * em // x/(e^x − 1)
		u += m.deg * xe
		cv += m.deg * xe * r // x² e^x/(e^x − 1)²
	}
	lnQ -= math.Log(prod)
	return Terms{LnQ: lnQ, U: u, Cv: cv}
}

// electronic returns the terms of the listed electronic levels.
func (sp *Species) electronic(tempK float64, how ElectronicTreatment) Terms {
	if len(sp.elecThetaK) == 0 {
		return Terms{}
	}
	if how == ElectronicGroundOnly || len(sp.elecThetaK) == 1 {
		return Terms{LnQ: sp.lnElecG0}
	}
	var z, m1, m2 float64
	for i, theta := range sp.elecThetaK {
		x := theta / tempK
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
