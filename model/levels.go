package model

import (
	"math"
	"sort"
	"sync"
	"sync/atomic"
)

// DunhamConstants are the spectroscopic constants of one electronic state
// of a diatomic molecule, in cm⁻¹. The state's levels are
//
//	G(v)   = ωe(v+½) − ωexe(v+½)² + ωeye(v+½)³
//	B_v    = Be − αe(v+½) + γe(v+½)²
//	D_v    = De + βe(v+½)
//	E(v,N) = Te + G(v) + B_v·K − D_v·K²,  K = N(N+1) − Λ²
//
// with K from the Hill–Van Vleck formula for a ²Π state instead (see
// levelsOfState).
type DunhamConstants struct {
	TeCm                     float64 // electronic term value Te (0 for the ground state)
	WeCm, WeXeCm, WeYeCm     float64 // ωe, ωexe, ωeye
	BeCm, AlphaeCm, GammaeCm float64 // Be, αe, γe
	DeCm, BetaeCm            float64 // centrifugal distortion De, βe
	HeCm                     float64 // sextic distortion He (the K³ term), mostly 0
	SpinOrbitCm              float64 // A, for a ²Π state; 0 otherwise
	Term                     TermSymbol
	// FromCurve takes a ground Σ state's levels from its RKR potential
	// curve by WKB quantization, quasi-bound levels included (see
	// potential.go), instead of the series in K.
	FromCurve bool
}

// TermSymbol is what the level sum needs of a state's term symbol
// ^{2S+1}Λ^{±}_{g/u}.
type TermSymbol struct {
	Multiplicity int  // 2S+1
	Lambda       int  // 0 Σ, 1 Π, 2 Δ
	Minus        bool // Σ⁻ (Σ states only)
	Ungerade     bool // u (homonuclear molecules only)
}

// evenNSymmetric reports whether, in a homonuclear molecule, the levels of
// even N of a Σ state are symmetric under exchange of the nuclei: so for
// Σg⁺ and Σu⁻, not for Σg⁻ and Σu⁺.
func (t TermSymbol) evenNSymmetric() bool { return t.Minus == t.Ungerade }

// doubletPi reports a ²Π state, whose spin components are summed level by
// level (Hill–Van Vleck) rather than counted as a multiplicity.
func (t TermSymbol) doubletPi() bool { return t.Lambda == 1 && t.Multiplicity == 2 }

// ElecState is an excited electronic state of a diatomic molecule with its
// own constants; its levels are summed as the ground state's are.
type ElecState struct {
	Name string // e.g. "a1Δg"
	DunhamConstants
}

// Quasi-bound levels and the reach of the level sums.
//
// Levels are summed up to the molecule's lowest dissociation limit, D0
// above the lowest level: a level above it, held only behind the
// centrifugal barrier, is quasi-bound and left out, as are the levels of
// a vibrational ladder past the v at which G(v) stops rising and the
// rotational levels past the N at which E(v,N) stops rising (the Dunham
// series is no longer meaningful there).
const (
	maxRotN   = 2000  // a safety bound; no diatomic has bound N near it
	maxLevels = 50000 // each costs an exp at every node of the table
)

// levelClass says which partial sums a level belongs to.
const (
	classRot0   = iota // ground state, v = 0: the rotational ladder
	classGround        // ground state, v > 0
	classExcited
)

// rovibLevels is the level list of a diatomic molecule, sorted by energy
// from its lowest level, and the cached table of its sums over T.
type rovibLevels struct {
	thetaK []float64 // energy above the lowest level, in K
	weight []float64 // statistical weight over the ground state's multiplicity
	class  []uint8
	// mod is the spin modification a level belongs to in a homonuclear
	// molecule: 0 for the one of spin weight SpinWeights[0] (the even N of
	// a Σg⁺ ground state), 1 for the other.
	mod []uint8
	// frozen, with evenFraction, sums a frozen mixture of the two spin
	// modifications instead of their equilibrium (see spinmod.go).
	frozen       bool
	evenFraction float64
	modLowK      [2]float64 // each modification's lowest level
	lnNorm       float64    // ln(σ), or ln of the total spin weight
	// zeroShiftK is the lowest level's height above the energy zero; the
	// levels are listed from the lowest, so that no sum underflows.
	zeroShiftK float64

	// Below tableMinK the sums are taken level by level (few levels
	// count); above it they are read from the table, made as needed.
	tableMinK float64
	once      sync.Once
	table     levelTable
}

// addState appends the levels of one electronic state. limitCm is the
// dissociation limit above the state's own reference (the ground state's
// lowest level), or +Inf while the ground state itself is being built.
//
// sEven and sOdd are the spin weights of a Σ state's even and odd N, and
// par says which spin modification each belongs to; wS and wA are those of
// the levels symmetric and antisymmetric under exchange of the nuclei, of
// modifications par.s and par.a (a Λ-doubled level has one of each).
func (lv *rovibLevels) addLevels(st DunhamConstants, class0 uint8, gRel float64, sEven, sOdd, wS, wA float64, par parityMods, offsetCm, limitCm float64) {
	gv := func(v float64) float64 {
		h := v + 0.5
		return st.TeCm + h*(st.WeCm-h*(st.WeXeCm-h*st.WeYeCm))
	}
	lambda := float64(st.Term.Lambda)
	doubletPi := st.Term.doubletPi()
	prevG := math.Inf(-1)
	for v := 0; len(lv.thetaK) <= maxLevels; v++ {
		g := gv(float64(v))
		if g <= prevG || g-offsetCm > limitCm {
			break
		}
		prevG = g
		h := float64(v) + 0.5
		bv := st.BeCm - h*(st.AlphaeCm-h*st.GammaeCm)
		dv := st.DeCm + h*st.BetaeCm
		if bv <= 0 {
			break
		}
		class := class0
		if class0 == classRot0 && v > 0 {
			class = classGround
		}
		add := func(eCm, w float64, mod uint8) {
			if w == 0 {
				return // forbidden by the nuclear spins
			}
			lv.thetaK = append(lv.thetaK, WavenumberToKelvin(eCm-offsetCm))
			lv.weight = append(lv.weight, gRel*w)
			lv.class = append(lv.class, class)
			lv.mod = append(lv.mod, mod)
		}
		// addPair adds a Λ-doubled level: one component of each symmetry.
		addPair := func(eCm, deg float64) {
			if par.homo {
				add(eCm, wS*deg, par.s)
				add(eCm, wA*deg, par.a)
				return
			}
			add(eCm, (wS+wA)*deg, 0)
		}
		switch {
		case doubletPi:
			// Hill–Van Vleck: E = B[(J+½)² − Λ² ∓ ½X], X = √(4(J+½)²
			// + Y(Y−4)Λ²), Y = A/B_v. The lower root is Ω = 3/2 for an
			// inverted state (A < 0, J ≥ 3/2) and Ω = 1/2 for a regular
			// one (J ≥ ½); the upper root the other. Each J is
			// Λ-doubled; the stretching term is −D_v[(J+½)² − Λ²]².
			y := st.SpinOrbitCm / bv
			for comp := 0; comp < 2; comp++ {
				sign := -1.0
				j0 := 1.5 // lower root, inverted: Ω = 3/2
				if st.SpinOrbitCm > 0 {
					j0 = 0.5
				}
				if comp == 1 {
					sign, j0 = 1, 2-j0
				}
				prev := math.Inf(-1)
				for j := j0; j < maxRotN; j++ {
					k := (j+0.5)*(j+0.5) - lambda*lambda
					x := math.Sqrt(4*(j+0.5)*(j+0.5) + y*(y-4)*lambda*lambda)
					e := g + bv*(k+sign*0.5*x) - dv*k*k + st.HeCm*k*k*k
					if e <= prev || e-offsetCm > limitCm {
						break
					}
					prev = e
					addPair(e, 2*j+1)
				}
			}
		default:
			// N ≥ Λ; a Σ state's multiplicity is a weight (its spin
			// splitting, a few cm⁻¹, is left out).
			mult := float64(st.Term.Multiplicity)
			prev := math.Inf(-1)
			for n := st.Term.Lambda; n < maxRotN; n++ {
				fn := float64(n)
				k := fn*(fn+1) - lambda*lambda
				e := g + bv*k - dv*k*k + st.HeCm*k*k*k
				if e <= prev || e-offsetCm > limitCm {
					break
				}
				prev = e
				if st.Term.Lambda > 0 {
					addPair(e, mult*(2*fn+1))
					continue
				}
				w, mod := sOdd, par.odd
				if n%2 == 0 {
					w, mod = sEven, par.even
				}
				add(e, w*mult*(2*fn+1), mod)
			}
		}
	}
}

// buildLevels makes the level list of a diatomic species with Dunham
// constants and keeps it. It returns an error when the constants give no
// bound level.
func (sp *Species) buildLevels() error {
	lv, lnG0, err := sp.makeLevels()
	if err != nil {
		return err
	}
	sp.levels, sp.lnElecG0Levels = lv, lnG0
	return nil
}

// makeLevels makes the level list of a diatomic species with Dunham
// constants, and ln of the ground state's multiplicity in its sum,
// without changing the species (a deferred list is made on whichever
// goroutine first needs it).
func (sp *Species) makeLevels() (*rovibLevels, float64, error) {
	gs := *sp.Dunham
	// Spin weights of the levels symmetric (wS) and antisymmetric (wA)
	// under exchange of the nuclei; the species' spin field gives them for
	// even and odd N of the ground state.
	wS, wA := 1.0, 1.0
	norm := float64(sp.Symmetry)
	homo := sp.Homonuclear()
	if homo {
		norm = sp.SpinWeights[0] + sp.SpinWeights[1]
		if gs.Term.evenNSymmetric() {
			wS, wA = sp.SpinWeights[0], sp.SpinWeights[1]
		} else {
			wS, wA = sp.SpinWeights[1], sp.SpinWeights[0]
		}
	}
	// The symmetric levels belong to the modification of spin weight
	// SpinWeights[0] when the ground state's even N are symmetric.
	mods := parityMods{homo: homo, s: 0, a: 1}
	if homo && !gs.Term.evenNSymmetric() {
		mods.s, mods.a = 1, 0
	}
	parity := func(t TermSymbol) (even, odd float64, pm parityMods) {
		pm = mods
		if !homo {
			return 1, 1, pm
		}
		if t.evenNSymmetric() {
			pm.even, pm.odd = pm.s, pm.a
			return wS, wA, pm
		}
		pm.even, pm.odd = pm.a, pm.s
		return wA, wS, pm
	}
	// For a ²Π ground state the levels hold the spin components
	// themselves; the weight is per level, the multiplicity inside.
	g0 := float64(gs.Term.Multiplicity)
	if gs.Term.doubletPi() {
		g0 = 1
	}
	lv := &rovibLevels{lnNorm: math.Log(norm)}
	if sp.SpinMod.Frozen && homo {
		lv.frozen, lv.evenFraction = true, sp.SpinMod.EvenFraction
	}
	ev, od, pm := parity(gs.Term)
	// First pass: the lowest levels of the ground state, to find the
	// lowest of all.
	g00 := gs.TeCm + 0.5*gs.WeCm - 0.25*gs.WeXeCm + 0.125*gs.WeYeCm
	lv.addLevels(gs, classRot0, 1/g0, ev, od, wS, wA, pm, 0, g00+math.Abs(gs.SpinOrbitCm)+10*gs.BeCm)
	if len(lv.thetaK) == 0 {
		return nil, 0, Errorf("model", "%s: the Dunham constants give no bound level", sp.Formula)
	}
	lowK := lv.thetaK[0]
	for _, e := range lv.thetaK {
		lowK = min(lowK, e)
	}
	lowCm := lowK / WavenumberToKelvin(1)
	// The energy zero is the rotationless level v = 0, N = 0 of a Σ ground
	// state even where the nuclear spins forbid it (¹⁶O2), as in the
	// published tables.
	// For a ²Π ground state it is the rotationless point of the lowest
	// spin component, B0·Ω below its lowest level J = Ω (the case (a)
	// rotational energy B[J(J+1) − Ω²] of J = Ω), which is where the
	// tables put it: OH's lowest level, X²Π3/2 J = 3/2, sits 1.5 B0 ≈ 28
	// cm⁻¹ above the zero of table H-038.
	switch {
	case gs.Term.Lambda == 0:
		lv.zeroShiftK = lowK - WavenumberToKelvin(g00)
	case gs.Term.doubletPi():
		omega := 0.5
		if gs.SpinOrbitCm < 0 {
			omega = 1.5
		}
		lv.zeroShiftK = WavenumberToKelvin((gs.BeCm - 0.5*gs.AlphaeCm + 0.25*gs.GammaeCm) * omega)
	}
	// Second pass, from the lowest level and up to the dissociation limit.
	lv.thetaK, lv.weight, lv.class, lv.mod = lv.thetaK[:0], lv.weight[:0], lv.class[:0], lv.mod[:0]
	if gs.FromCurve {
		if err := lv.addCurveLevels(sp, gs, 1/g0, ev, od, pm, lowCm); err != nil {
			return nil, 0, err
		}
	} else {
		lv.addLevels(gs, classRot0, 1/g0, ev, od, wS, wA, pm, lowCm, sp.DissociationCm)
	}
	for _, st := range sp.States {
		ev, od, pm := parity(st.Term)
		lv.addLevels(st.DunhamConstants, classExcited, 1/g0, ev, od, wS, wA, pm, lowCm, sp.DissociationCm)
	}
	if len(lv.thetaK) > maxLevels {
		return nil, 0, Errorf("model", "%s: the constants give %d levels below the dissociation limit; want at most %d", sp.Formula, len(lv.thetaK), maxLevels)
	}
	sort.Sort(byEnergy{lv})
	lv.thetaK[0] = 0 // exactly, for the lowest level (rounding of lowCm)
	if lv.frozen {
		lv.modLowK = [2]float64{math.Inf(1), math.Inf(1)}
		for i, th := range lv.thetaK {
			lv.modLowK[lv.mod[i]] = min(lv.modLowK[lv.mod[i]], th)
		}
		for i, k := range lv.modLowK {
			if math.IsInf(k, 1) {
				lv.modLowK[i] = 0 // no level: the modification's sum is 0 and skipped
			}
		}
	}
	// The table starts where the 8th level lies 40 kT up: below it the
	// direct sum touches at most 8 levels.
	i := min(7, len(lv.thetaK)-1)
	lv.tableMinK = max(lv.thetaK[i]/40, MinTempK)
	return lv, math.Log(g0), nil
}

// parityMods says which spin modification (0 or 1, see rovibLevels.mod)
// the symmetric (s) and antisymmetric (a) levels, and a state's even and
// odd N, belong to; homo is false for a heteronuclear molecule.
type parityMods struct {
	homo            bool
	s, a, even, odd uint8
}

type byEnergy struct{ lv *rovibLevels }

func (b byEnergy) Len() int           { return len(b.lv.thetaK) }
func (b byEnergy) Less(i, j int) bool { return b.lv.thetaK[i] < b.lv.thetaK[j] }
func (b byEnergy) Swap(i, j int) {
	l := b.lv
	l.thetaK[i], l.thetaK[j] = l.thetaK[j], l.thetaK[i]
	l.weight[i], l.weight[j] = l.weight[j], l.weight[i]
	l.class[i], l.class[j] = l.class[j], l.class[i]
	if l.mod != nil {
		l.mod[i], l.mod[j] = l.mod[j], l.mod[i]
	}
}

// levelMoments are Σw e^{−x}, Σw x e^{−x}, Σw x² e^{−x} of one partial sum,
// x = E/kT.
type levelMoments struct{ z, m1, m2 float64 }

func (m *levelMoments) add(w, x, ex float64) {
	t := w * ex
	m.z += t
	m.m1 += t * x
	m.m2 += t * x * x
}

// terms returns ln z, U and Cv of the sum.
func (m levelMoments) terms() Terms {
	u := m.m1 / m.z
	return Terms{LnQ: math.Log(m.z), U: u, Cv: m.m2/m.z - u*u}
}

// sums returns the three nested partial sums at tempK: the ground state's
// v = 0 ladder, the whole ground state, and every state.
func (lv *rovibLevels) sums(tempK float64) (rot0, ground, all levelMoments) {
	invT := 1 / tempK
	for i, th := range lv.thetaK {
		x := th * invT
		if x > 40 {
			break // e^{−40} ≈ 4e-18 of the lowest level: sorted, so none after counts
		}
		ex := math.Exp(-x)
		w := lv.weight[i]
		switch lv.class[i] {
		case classRot0:
			rot0.add(w, x, ex)
			fallthrough
		case classGround:
			ground.add(w, x, ex)
			fallthrough
		default:
			all.add(w, x, ex)
		}
	}
	return
}

// direct returns the rotational, vibrational and electronic terms by the
// level sum itself: rotation is the v = 0 ladder of the ground state (its
// nuclear-spin and symmetry division included), vibration what the other
// levels of the ground state add to it (vibration–rotation coupling
// included), and electronic what the other states add (the ground state's
// multiplicity included by the caller).
func (lv *rovibLevels) direct(tempK float64) (rot, vib, el Terms) {
	if lv.frozen {
		return lv.directFrozen(tempK)
	}
	a, b, c := lv.sums(tempK)
	return lv.split(tempK, a, b, c)
}

// split turns the three nested partial sums into the three factors.
func (lv *rovibLevels) split(tempK float64, a, b, c levelMoments) (rot, vib, el Terms) {
	ta, tb, tc := a.terms(), b.terms(), c.terms()
	rot = ta
	x0 := lv.zeroShiftK / tempK
	rot.LnQ -= lv.lnNorm + x0
	rot.U += x0
	vib = Terms{tb.LnQ - ta.LnQ, tb.U - ta.U, tb.Cv - ta.Cv}
	el = Terms{tc.LnQ - tb.LnQ, tc.U - tb.U, tc.Cv - tb.Cv}
	return
}

// directFrozen returns the terms of a frozen mixture of the two spin
// modifications: each modification's sums over its own levels, weighted
// by its fraction x_i, with ln q = Σ x_i ln(z_i/(g_tot x_i)) (z_i holds
// the spin weight g_i), so that U and Cv are the fraction-weighted sums
// and S carries the mixing entropy of the two (see spinmod.go).
func (lv *rovibLevels) directFrozen(tempK float64) (rot, vib, el Terms) {
	// Each modification is summed from its own lowest level, so that
	// neither underflows at low T (ortho-H2 holds its J = 1 at 1 K).
	var m [2][3]levelMoments
	invT := 1 / tempK
	top := max(lv.modLowK[0], lv.modLowK[1]) * invT
	for i, th := range lv.thetaK {
		x := (th - lv.modLowK[lv.mod[i]]) * invT
		if x > 40 {
			if th*invT-top > 40 {
				break
			}
			continue
		}
		ex := math.Exp(-x)
		w := lv.weight[i]
		p := &m[lv.mod[i]]
		switch lv.class[i] {
		case classRot0:
			p[0].add(w, x, ex)
			fallthrough
		case classGround:
			p[1].add(w, x, ex)
			fallthrough
		default:
			p[2].add(w, x, ex)
		}
	}
	for i, frac := range [2]float64{lv.evenFraction, 1 - lv.evenFraction} {
		if frac == 0 || m[i][0].z == 0 {
			continue
		}
		r, v, e := lv.split(tempK, m[i][0], m[i][1], m[i][2])
		xLow := lv.modLowK[i] * invT
		r.LnQ -= math.Log(frac) + xLow
		r.U += xLow
		rot = rot.add(r.scale(frac))
		vib = vib.add(v.scale(frac))
		el = el.add(e.scale(frac))
	}
	return
}

// levelTable is the level sums tabulated against x = ln T, interpolated by
// quintic Hermite polynomials in x from ln q and its first two
// derivatives (dlnq/dx = U, d²lnq/dx² = Cv − U) at the nodes. ln q, U and
// Cv at any T then come from one polynomial, so Cv = ∂U/∂T and S = −∂A/∂T
// hold to rounding, and the interpolation error is of order h⁶ in ln q
// and h⁴ in Cv (below 1e-8 in Cv/R for the step used, see the tests).
//
// An interval's polynomial is made the first time a state falls in it,
// so that a species of 10⁵ levels costs a few milliseconds at its first
// state, not the whole table. Intervals are published with atomic
// pointers: two callers that race make the same numbers, and either
// result stands.
type levelTable struct {
	x0, invH float64
	n        int                             // intervals
	coef     []atomic.Pointer[[3]quintic]    // per interval: rot, vib, el
	nodes    []atomic.Pointer[[3][3]float64] // per node: [factor][f, f', f'']
}

// tableStepLnT is the table's step in ln T.
const tableStepLnT = 0.02

func (lv *rovibLevels) build() {
	x0 := math.Log(lv.tableMinK)
	x1 := math.Log(MaxTempK) + tableStepLnT
	n := int(math.Ceil((x1 - x0) / tableStepLnT))
	lv.table = levelTable{x0: x0, invH: 1 / tableStepLnT, n: n,
		coef: make([]atomic.Pointer[[3]quintic], n), nodes: make([]atomic.Pointer[[3][3]float64], n+1)}
}

// node returns node i's values, summing the levels the first time.
func (lv *rovibLevels) node(i int) *[3][3]float64 {
	if p := lv.table.nodes[i].Load(); p != nil {
		return p
	}
	rot, vib, el := lv.direct(math.Exp(lv.table.x0 + float64(i)*tableStepLnT))
	var nd [3][3]float64
	for k, t := range [3]Terms{rot, vib, el} {
		nd[k] = [3]float64{t.LnQ, t.U, t.Cv - t.U}
	}
	lv.table.nodes[i].Store(&nd)
	return &nd
}

// quintic is one factor's Hermite quintic on one interval, ln q as a
// polynomial in s ∈ [0, 1], with the polynomials of its derivatives in
// ln T ready made (U = T ∂ln q/∂T, and Cv − U = T² ∂²ln q/∂(ln T)²), so
// that a state reads the three by Horner's rule with no further product.
type quintic struct {
	lnQ      [6]float64
	u        [5]float64
	cvMinusU [4]float64
}

// interval returns interval i's coefficients, making them the first time.
func (lv *rovibLevels) interval(i int) *[3]quintic {
	if p := lv.table.coef[i].Load(); p != nil {
		return p
	}
	h, invH := tableStepLnT, lv.table.invH
	a, b := lv.node(i), lv.node(i+1)
	var qs [3]quintic
	for k := range qs {
		f0, d0, s0 := a[k][0], h*a[k][1], h*h*a[k][2]
		f1, d1, s1 := b[k][0], h*b[k][1], h*h*b[k][2]
		c := &qs[k].lnQ
		c[0] = f0
		c[1] = d0
		c[2] = s0 / 2
		c[3] = -10*f0 - 6*d0 - 1.5*s0 + 0.5*s1 - 4*d1 + 10*f1
		c[4] = 15*f0 + 8*d0 + 1.5*s0 - s1 + 7*d1 - 15*f1
		c[5] = -6*f0 - 3*d0 - 0.5*s0 + 0.5*s1 - 3*d1 + 6*f1
		for j := range qs[k].u {
			qs[k].u[j] = float64(j+1) * c[j+1] * invH
		}
		for j := range qs[k].cvMinusU {
			qs[k].cvMinusU[j] = float64((j+2)*(j+1)) * c[j+2] * invH * invH
		}
	}
	lv.table.coef[i].Store(&qs)
	return &qs
}

// at returns the three factors' terms at ln T = lnT (≥ ln tableMinK).
func (lv *rovibLevels) at(lnT float64) (rot, vib, el Terms) {
	q, s := lv.intervalAt(lnT)
	return q[0].at(s), q[1].at(s), q[2].at(s)
}

// intervalAt returns the coefficients of the interval holding ln T = lnT
// and the position s ∈ [0, 1] in it.
func (lv *rovibLevels) intervalAt(lnT float64) (q *[3]quintic, s float64) {
	t := &lv.table
	u := (lnT - t.x0) * t.invH
	i := int(u)
	if i >= t.n {
		i = t.n - 1
	}
	if q = t.coef[i].Load(); q == nil {
		q = lv.interval(i)
	}
	return q, u - float64(i)
}

// firstAt is at for a list whose levels all belong to the first factor
// (a torsion's): the other two quintics are zero and are not evaluated.
func (lv *rovibLevels) firstAt(lnT float64) Terms {
	q, s := lv.intervalAt(lnT)
	return q[0].at(s)
}

// at evaluates the quintic at s ∈ [0, 1]: ln q, U and Cv.
func (q *quintic) at(s float64) Terms {
	c, d, e := &q.lnQ, &q.u, &q.cvMinusU
	f := c[0] + s*(c[1]+s*(c[2]+s*(c[3]+s*(c[4]+s*c[5]))))
	u := d[0] + s*(d[1]+s*(d[2]+s*(d[3]+s*d[4])))
	cvMinusU := e[0] + s*(e[1]+s*(e[2]+s*e[3]))
	return Terms{LnQ: f, U: u, Cv: u + cvMinusU}
}

// rovib returns the rotational, vibrational and electronic terms of a
// species with a level list.
func (sp *Species) rovib(tempK, lnT float64) (rot, vib, el Terms) {
	lv := sp.levelList()
	if tempK < lv.tableMinK {
		rot, vib, el = lv.direct(tempK)
	} else {
		lv.once.Do(lv.build)
		rot, vib, el = lv.at(lnT)
	}
	el.LnQ += sp.lnElecG0Levels
	return
}

// HasLevels reports whether the species' rotation and vibration (and
// electronic states) can be summed level by level from Dunham constants.
func (sp *Species) HasLevels() bool { return sp.levels != nil || sp.deferredLevels != nil }

// levelList returns the species' level list, making a deferred one on
// first use.
func (sp *Species) levelList() *rovibLevels {
	if d := sp.deferredLevels; d != nil {
		return d.get()
	}
	return sp.levels
}

// deferredLevels is a level list made on first use: the built-in
// catalogue's potential curves (H2, D2 and their spin modifications) and
// CO2's 90 000 anharmonic levels take tens of milliseconds to make, which
// a command whose blend holds none of them need not pay. The catalogue's tests solve them all, so a failure here is
// a defect of the build, as a failure of the embedded catalogue is.
type deferredLevels struct {
	once sync.Once
	make func() (*rovibLevels, error)
	lv   *rovibLevels
}

func (d *deferredLevels) get() *rovibLevels {
	d.once.Do(func() {
		lv, err := d.make()
		if err != nil {
			panic(err)
		}
		d.lv = lv
	})
	return d.lv
}

// LevelCount returns the number of rovibronic levels summed, 0 if none.
func (sp *Species) LevelCount() int {
	if !sp.HasLevels() {
		return 0
	}
	return len(sp.levelList().thetaK)
}
