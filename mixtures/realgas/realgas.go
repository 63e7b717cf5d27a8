package realgas

import (
	"math"

	"zmix/model"
)

// Component is one species of a blend as the real-gas models see it.
type Component struct {
	Formula           string
	X                 float64 // mole fraction
	MolarMassKgPerMol float64
	// CriticalK is 0 for a species without critical constants, which
	// then counts as an ideal gas.
	CriticalK, CriticalPa, Acentric float64
	Quantum                         bool // CriticalK, CriticalPa are Chueh–Prausnitz Tc⁰, Pc⁰
}

// ComponentOf reads a catalogue species' constants.
func ComponentOf(sp *model.Species, x float64) Component {
	return Component{Formula: sp.Formula, X: x, MolarMassKgPerMol: sp.MolarMassKgPerMol,
		CriticalK: sp.CriticalK, CriticalPa: sp.CriticalPa, Acentric: sp.Acentric, Quantum: sp.QuantumGas}
}

// Model names the equation that gives a reported state.
type Model int

const (
	Virial       Model = iota // Tsonopoulos second virial coefficient
	PengRobinson              // Peng–Robinson, van der Waals one-fluid mixing
)

func (m Model) String() string {
	if m == PengRobinson {
		return "Peng-Robinson"
	}
	return "virial (Tsonopoulos B)"
}

// Short is the model's name where a line has little room.
func (m Model) Short() string {
	if m == PengRobinson {
		return "Peng-Robinson"
	}
	return "virial"
}

// Range says whether a state lies where the models hold.
type Range int

const (
	InRange      Range = iota
	TooDense           // reduced density above 2: liquid-like
	LiquidRoot         // the stable cubic root is liquid-like
	NearCritical       // near the pseudo-critical point
)

func (r Range) String() string {
	switch r {
	case TooDense:
		return "denser than twice the critical density"
	case LiquidRoot:
		return "the stable root of the cubic is liquid-like"
	case NearCritical:
		return "near the critical point"
	}
	return "in range"
}

// ReducedDensitySwitch is where the virial hands over to Peng–Robinson,
// and ReducedDensityLimit where both are left behind (common practice;
// see the package doc).
const (
	ReducedDensitySwitch = 0.25
	ReducedDensityLimit  = 2.0
)

// Result is a blend's real-gas state at one (T, P), per mole of blend.
type Result struct {
	Model Model
	Range Range
	// Z = PV/(RT); VM3PerMol the real molar volume.
	Z         float64
	VM3PerMol float64
	// Departure functions at the same T and P as the ideal gas.
	HResJPerMol  float64
	SResJPerMolK float64
	// Real-gas heat capacities, speed of sound and Joule–Thomson
	// coefficient.
	CpJPerMolK         float64
	CvJPerMolK         float64
	SoundSpeedMPerS    float64
	JouleThomsonKPerPa float64
	// ReducedDensity is Vc/V with Kay's pseudo-critical Vc;
	// PseudoCriticalK and PseudoCriticalPa are Kay's Σ xᵢTcᵢ and Σ xᵢPcᵢ.
	ReducedDensity   float64
	PseudoCriticalK  float64
	PseudoCriticalPa float64
	// BM3PerMol is the blend's second virial coefficient at T.
	BM3PerMol float64
}

// species is one component with what every state shares.
type species struct {
	x, omega    float64
	tc0, pc0    float64 // as given; classical limits for a quantum gas
	quantum     bool
	massGPerMol float64
	kappa       float64 // Peng–Robinson κ(ω)
	// Tsonopoulos' polar term a/Tr⁶ − b/Tr⁸ (see polar.go); never for a
	// quantum gas, so a pair with one has no polar term.
	polar          bool
	polarA, polarB float64
	zc             float64 // Lee–Kesler Zc
	// At the current T (fixed for a classical species):
	tcK, pcPa  float64
	sqrtTc     float64
	cbrtVc     float64
	sqrtAc     float64 // √(0.45724 R² Tc²/Pc)
	bM3PerMol  float64 // 0.07780 R Tc/Pc
	vcM3PerMol float64
}

// Mixture holds a blend's constants for the real-gas models. It is built
// once per composition and not changed after, so that states may be
// computed from several goroutines; Eval allocates nothing for blends of
// up to maxStackSpecies species with constants.
type Mixture struct {
	sp      []species // species with critical constants only
	Ideal   []string  // formulas taken as ideal gases (no critical constants)
	Polar   []string  // polar formulas whose polar virial terms are not known here
	quantum bool      // some species has temperature-dependent constants
	massKg  float64
	xTotal  float64 // mole fraction carried by species with constants
	// Tsonopoulos' B is a polynomial in 1/T: the pairs of classical
	// species sum, once per composition, to B = Σₖ bPoly[k]/Tᵏ over the
	// powers in tsonoPowers. A pair of a quantum gas and a classical
	// species is summed once per composition too, as the coefficients of
	// quantumTerm; only pairs of two quantum gases are summed at each
	// state (quantumPair, indices into the quantum gases).
	bPoly        [len(tsonoPowers)]float64
	quantumTerms []quantumTerm
	quantumPair  [][2]int
	// classicalPseudo is Σ xᵢTcᵢ, Σ xᵢPcᵢ and Σ xᵢVcᵢ over the classical
	// species, to which Kay's rule adds the quantum gases at each T.
	classicalPseudo [3]float64
}

// quantumTerm is one quantum gas's pairs with every classical species j.
// A pair adds to B the term xq xj (aq + bj)³/(2(Zcq + Zcj)) ·
// Σₖ cₖ(ωqj) (sq sj)^nₖ / T^nₖ, with a = ∛Vc and s = √Tc; only aq and sq
// depend on T. Expanding the cube, the pairs sum once per composition to
// g[k][m], the coefficient of aq^m sq^nₖ / T^nₖ.
type quantumTerm struct {
	idx int // the gas in Mixture.sp
	g   [len(tsonoPowers)][4]float64
}

// maxStackQuantum is how many quantum gases Eval keeps on the stack.
const maxStackQuantum = 8

// tsonoPowers are the powers of Tc/T in Tsonopoulos' f⁰, f¹ and polar
// f² = a/Tr⁶ − b/Tr⁸, with their coefficients (per unit a and b).
var (
	tsonoPowers = [6]int{0, 1, 2, 3, 6, 8}
	tsonoF0     = [6]float64{0.1445, -0.330, -0.1385, -0.0121, 0, -0.000607}
	tsonoF1     = [6]float64{0.0637, 0, 0.331, -0.423, 0, -0.008}
	tsonoA      = [6]float64{0, 0, 0, 0, 1, 0}
	tsonoB      = [6]float64{0, 0, 0, 0, 0, -1}
)

const maxStackSpecies = 24

const (
	prOmegaA = 0.45724
	prOmegaB = 0.07780
	sqrt2    = math.Sqrt2
)

// New builds the models' constants for a blend.
func New(comps []Component) *Mixture {
	m := &Mixture{}
	for _, c := range comps {
		m.massKg += c.X * c.MolarMassKgPerMol
		if c.CriticalK <= 0 || c.CriticalPa <= 0 {
			m.Ideal = append(m.Ideal, c.Formula)
			continue
		}
		if PolarLeftOut(c.Formula) {
			m.Polar = append(m.Polar, c.Formula)
		}
		s := species{x: c.X, omega: c.Acentric, tc0: c.CriticalK, pc0: c.CriticalPa,
			quantum: c.Quantum, massGPerMol: c.MolarMassKgPerMol * 1000}
		if !c.Quantum {
			s.polarA, s.polarB, s.polar = polarAB(c.Formula, c.CriticalK, c.CriticalPa)
		}
		w := c.Acentric
		if w <= 0.49 {
			s.kappa = 0.37464 + 1.54226*w - 0.26992*w*w
		} else {
			s.kappa = 0.379642 + 1.48503*w - 0.164423*w*w + 0.016666*w*w*w
		}
		s.zc = 0.2905 - 0.085*w
		s.setCritical(c.CriticalK, c.CriticalPa)
		m.quantum = m.quantum || c.Quantum
		m.xTotal += c.X
		m.sp = append(m.sp, s)
	}
	qpos := make([]int, len(m.sp)) // a quantum gas's place in quantumTerms
	for i := range m.sp {
		if s := &m.sp[i]; s.quantum {
			qpos[i] = len(m.quantumTerms)
			m.quantumTerms = append(m.quantumTerms, quantumTerm{idx: i})
		} else {
			m.classicalPseudo[0] += s.x * s.tcK
			m.classicalPseudo[1] += s.x * s.pcPa
			m.classicalPseudo[2] += s.x * s.vcM3PerMol
		}
	}
	for i := range m.sp {
		for j := i; j < len(m.sp); j++ {
			si, sj := &m.sp[i], &m.sp[j]
			switch {
			case si.quantum && sj.quantum:
				m.quantumPair = append(m.quantumPair, [2]int{qpos[i], qpos[j]})
			case si.quantum || sj.quantum:
				q, c := si, sj
				if sj.quantum {
					q, c = sj, si
				}
				qt := &m.quantumTerms[qpos[i]]
				if sj.quantum {
					qt = &m.quantumTerms[qpos[j]]
				}
				// w·scale of pairConstants with the cube left open.
				w := 2 * q.x * c.x / (4 * (q.zc + c.zc))
				wij := 0.5 * (q.omega + c.omega)
				b := c.cbrtVc
				for k, n := range tsonoPowers {
					coef := w * (tsonoF0[k] + wij*tsonoF1[k]) * math.Pow(c.sqrtTc, float64(n))
					g := &qt.g[k]
					g[0] += coef * b * b * b
					g[1] += coef * 3 * b * b
					g[2] += coef * 3 * b
					g[3] += coef
				}
			default:
				w, tcij, scale, wij := pairConstants(si, sj, i != j)
				var aij, bij float64
				if si.polar && sj.polar {
					aij, bij = 0.5*(si.polarA+sj.polarA), 0.5*(si.polarB+sj.polarB)
				}
				for k, n := range tsonoPowers {
					f := tsonoF0[k] + wij*tsonoF1[k] + aij*tsonoA[k] + bij*tsonoB[k]
					m.bPoly[k] += w * scale * f * math.Pow(tcij, float64(n))
				}
			}
		}
	}
	return m
}

// pairConstants returns a pair's weight xᵢxⱼ (twice for i ≠ j), its
// Tcᵢⱼ, its R Tcᵢⱼ/Pcᵢⱼ from the combining rules, and ωᵢⱼ.
func pairConstants(si, sj *species, cross bool) (w, tcij, scale, wij float64) {
	w = si.x * sj.x
	if cross {
		w *= 2
	}
	tcij = si.sqrtTc * sj.sqrtTc
	sum := si.cbrtVc + sj.cbrtVc
	scale = sum * sum * sum / (4 * (si.zc + sj.zc))
	return w, tcij, scale, 0.5 * (si.omega + sj.omega)
}

func (s *species) setCritical(tcK, pcPa float64) {
	r := model.GasConstant
	s.tcK, s.pcPa = tcK, pcPa
	s.sqrtTc = math.Sqrt(tcK)
	s.vcM3PerMol = s.zc * r * tcK / pcPa
	s.cbrtVc = math.Cbrt(s.vcM3PerMol)
	s.sqrtAc = math.Sqrt(prOmegaA) * r * tcK / math.Sqrt(pcPa)
	s.bM3PerMol = prOmegaB * r * tcK / pcPa
}

// atTemperature returns the species with the quantum gases' effective
// constants set for T, in buf when it has room; m.sp itself when no
// species is a quantum gas.
func (m *Mixture) atTemperature(buf []species, tempK float64) []species {
	if !m.quantum {
		return m.sp
	}
	sp := buf[:0]
	if len(m.sp) > cap(buf) {
		sp = make([]species, 0, len(m.sp))
	}
	sp = append(sp, m.sp...)
	for i := range sp {
		s := &sp[i]
		if s.quantum {
			mt := s.massGPerMol * tempK
			s.setCritical(s.tc0/(1+21.8/mt), s.pc0/(1+44.2/mt))
		}
	}
	return sp
}

// quantumAt returns the quantum gases, in the order of quantumTerms,
// with their effective constants set for T, in buf when it has room.
func (m *Mixture) quantumAt(buf []species, tempK float64) []species {
	q := buf[:0]
	if len(m.quantumTerms) > cap(buf) {
		q = make([]species, 0, len(m.quantumTerms))
	}
	for _, qt := range m.quantumTerms {
		s := m.sp[qt.idx]
		mt := s.massGPerMol * tempK
		s.setCritical(s.tc0/(1+21.8/mt), s.pc0/(1+44.2/mt))
		q = append(q, s)
	}
	return q
}

// Known reports whether any species carries critical constants.
func (m *Mixture) Known() bool { return len(m.sp) > 0 }

// SecondVirial returns the blend's B and its first two T-derivatives,
// in m³/mol, m³/(mol·K), m³/(mol·K²).
func (m *Mixture) SecondVirial(tempK float64) (b, db, d2b float64) {
	var buf [maxStackQuantum]species
	return m.secondVirial(m.quantumAt(buf[:], tempK), tempK)
}

// secondVirial sums B from the quantum gases q at T (see quantumAt).
// The T-derivatives are taken at fixed effective constants.
func (m *Mixture) secondVirial(q []species, tempK float64) (b, db, d2b float64) {
	u := 1 / tempK
	u2 := u * u
	u3 := u2 * u
	u4 := u2 * u2
	u6 := u4 * u2
	u8 := u4 * u4
	p := m.bPoly
	for i := range m.quantumTerms {
		g := &m.quantumTerms[i].g
		a := q[i].cbrtVc
		s := q[i].sqrtTc
		s2 := s * s
		s4 := s2 * s2
		sn := [len(tsonoPowers)]float64{1, s, s2, s2 * s, s4 * s2, s4 * s4} // s^nₖ
		for k := range p {
			p[k] += sn[k] * (g[k][0] + a*(g[k][1]+a*(g[k][2]+a*g[k][3])))
		}
	}
	// Σₖ cₖ/Tᵏ and its derivatives −k cₖ/Tᵏ⁺¹, k(k+1) cₖ/Tᵏ⁺².
	b = p[0] + p[1]*u + p[2]*u2 + p[3]*u3 + p[4]*u6 + p[5]*u8
	db = -(p[1]*u2 + 2*p[2]*u3 + 3*p[3]*u4 + 6*p[4]*u6*u + 8*p[5]*u8*u)
	d2b = 2*p[1]*u3 + 6*p[2]*u4 + 12*p[3]*u4*u + 42*p[4]*u8 + 72*p[5]*u8*u2
	for _, ij := range m.quantumPair {
		w, tcij, scale, wij := pairConstants(&q[ij[0]], &q[ij[1]], ij[0] != ij[1])
		f, f1, f2 := tsonopoulos(tempK/tcij, wij)
		b += w * scale * f
		db += w * scale * f1 / tcij
		d2b += w * scale * f2 / (tcij * tcij)
	}
	return b, db, d2b
}

// tsonopoulos returns f⁰ + ω f¹ and its first two derivatives in Tr.
func tsonopoulos(tr, omega float64) (f, df, d2f float64) {
	u := 1 / tr
	u2 := u * u
	u3 := u2 * u
	u4 := u2 * u2
	u5 := u4 * u
	u8 := u4 * u4
	u9 := u8 * u
	u10 := u5 * u5
	f0 := 0.1445 - 0.330*u - 0.1385*u2 - 0.0121*u3 - 0.000607*u8
	f1 := 0.0637 + 0.331*u2 - 0.423*u3 - 0.008*u8
	d0 := 0.330*u2 + 2*0.1385*u3 + 3*0.0121*u4 + 8*0.000607*u9
	d1 := -2*0.331*u3 + 3*0.423*u4 + 8*0.008*u9
	dd0 := -2*0.330*u3 - 6*0.1385*u4 - 12*0.0121*u5 - 72*0.000607*u10
	dd1 := 6*0.331*u4 - 12*0.423*u5 - 72*0.008*u10
	return f0 + omega*f1, d0 + omega*d1, dd0 + omega*dd1
}

// pseudo returns Kay's pseudo-critical Tc, Pc and Vc over the species
// with constants, normalised to their share of the blend, given the
// quantum gases q at T.
func (m *Mixture) pseudo(q []species) (tcK, pcPa, vc float64) {
	if m.xTotal == 0 {
		return 0, 0, 0
	}
	tcK, pcPa, vc = m.classicalPseudo[0], m.classicalPseudo[1], m.classicalPseudo[2]
	for i := range q {
		s := &q[i]
		tcK += s.x * s.tcK
		pcPa += s.x * s.pcPa
		vc += s.x * s.vcM3PerMol
	}
	return tcK / m.xTotal, pcPa / m.xTotal, vc
}

// Eval computes the real-gas state at (T, P) into r. cpIdealJPerMolK is
// the ideal-gas Cp of the blend at T.
func (m *Mixture) Eval(r *Result, tempK, presPa, cpIdealJPerMolK float64) {
	rg := model.GasConstant
	rt := rg * tempK
	cvIdeal := cpIdealJPerMolK - rg
	var qbuf [maxStackQuantum]species
	q := m.quantumAt(qbuf[:], tempK)
	b, db, d2b := m.secondVirial(q, tempK)
	tpc, ppc, vc := m.pseudo(q)
	*r = Result{Model: Virial, BM3PerMol: b, PseudoCriticalK: tpc, PseudoCriticalPa: ppc}

	z := 1 + b*presPa/rt
	v := z * rt / presPa
	if z > 0 && vc/v <= ReducedDensitySwitch {
		r.Z, r.VM3PerMol, r.ReducedDensity = z, v, vc/v
		r.HResJPerMol = presPa * (b - tempK*db)
		r.SResJPerMolK = -presPa * db
		cp := cpIdealJPerMolK - presPa*tempK*d2b
		// V = RT/P + B: (∂P/∂V)_T = −P²/(RT) and (∂P/∂T)_V =
		// (P/T)(1 + P B'/R), so T (∂P/∂T)²/(∂P/∂V) = −R (1 + P B'/R)² and
		// V² (∂P/∂V)_T = −Z²RT. Taken so, with P cancelled, nothing
		// underflows at the lowest pressures the engine accepts, where P²
		// would (below 1e-154 Pa) and turn Cv and c into 0/0.
		f := 1 + presPa*db/rg
		cv := cp - rg*f*f
		m.finish(r, cp, cv, -z*z*rt)
		r.JouleThomsonKPerPa = (tempK*db - b) / cp
		m.checkRange(r, tempK, presPa)
		return
	}
	var buf [maxStackSpecies]species
	m.pengRobinson(r, m.atTemperature(buf[:], tempK), tempK, presPa, cpIdealJPerMolK, cvIdeal, vc)
	m.checkRange(r, tempK, presPa)
}

// finish sets the figures common to both models, given v2dPdV =
// V² (∂P/∂V)_T: c² = −V² (∂P/∂V)_T γ / M.
func (m *Mixture) finish(r *Result, cp, cv, v2dPdV float64) {
	r.CpJPerMolK, r.CvJPerMolK = cp, cv
	c2 := -v2dPdV / m.massKg * cp / cv
	r.SoundSpeedMPerS = math.Sqrt(c2)
}

// pengRobinson fills r from the Peng–Robinson equation; r carries the
// pseudo-critical constants already.
func (m *Mixture) pengRobinson(r *Result, sp []species, tempK, presPa, cpIdeal, cvIdeal, vc float64) {
	rg := model.GasConstant
	rt := rg * tempK
	sqrtT := math.Sqrt(tempK)
	// a = Q², Q = Σ xᵢ √aᵢ(T), √aᵢ = √aᶜᵢ (1 + κᵢ(1 − √(T/Tcᵢ))).
	var q, dq, d2q, bm float64
	for i := range sp {
		s := &sp[i]
		sr := sqrtT / s.sqrtTc
		q += s.x * s.sqrtAc * (1 + s.kappa*(1-sr))
		g := s.x * s.sqrtAc * s.kappa / s.sqrtTc
		dq -= g / (2 * sqrtT)
		d2q += g / (4 * tempK * sqrtT)
		bm += s.x * s.bM3PerMol
	}
	a := q * q
	da := 2 * q * dq
	d2a := 2 * (dq*dq + q*d2q)
	bigA := a * presPa / (rt * rt)
	bigB := bm * presPa / rt

	z, liquid := prRoot(bigA, bigB)
	v := z * rt / presPa
	lnRatio := math.Log((z + (1+sqrt2)*bigB) / (z + (1-sqrt2)*bigB))
	k := 1 / (2 * sqrt2 * bm)
	r.Model = PengRobinson
	r.Z, r.VM3PerMol, r.ReducedDensity = z, v, vc/v
	r.HResJPerMol = rt*(z-1) + (tempK*da-a)*k*lnRatio
	r.SResJPerMolK = rg*math.Log(z-bigB) + da*k*lnRatio
	cv := cvIdeal + tempK*d2a*k*lnRatio
	den := v*v + 2*bm*v - bm*bm
	dPdT := rg/(v-bm) - da/den
	dPdV := -rt/((v-bm)*(v-bm)) + 2*a*(v+bm)/(den*den)
	cp := cv - tempK*dPdT*dPdT/dPdV
	m.finish(r, cp, cv, v*v*dPdV)
	r.JouleThomsonKPerPa = -(tempK*dPdT/dPdV + v) / cp
	// A liquid-like root, or a dense state below the pseudo-critical
	// temperature, is a liquid: no gas model here describes it.
	if liquid || (tempK < r.PseudoCriticalK && r.ReducedDensity > 1) {
		r.Range = LiquidRoot
	}
}

// prRoot solves the Peng–Robinson cubic for Z. With three real roots it
// returns the one of lowest fugacity, and says whether that is the
// liquid-like (smallest) one.
func prRoot(bigA, bigB float64) (z float64, liquid bool) {
	c2 := -(1 - bigB)
	c1 := bigA - 3*bigB*bigB - 2*bigB
	c0 := -(bigA*bigB - bigB*bigB - bigB*bigB*bigB)
	// Depressed cubic t³ + pt + q = 0 with Z = t − c2/3.
	p := c1 - c2*c2/3
	qq := 2*c2*c2*c2/27 - c2*c1/3 + c0
	disc := qq*qq/4 + p*p*p/27
	shift := -c2 / 3
	if disc >= 0 {
		sd := math.Sqrt(disc)
		return math.Cbrt(-qq/2+sd) + math.Cbrt(-qq/2-sd) + shift, false
	}
	rad := 2 * math.Sqrt(-p/3)
	phi := math.Acos(3 * qq / (p * rad))
	zHi := rad*math.Cos(phi/3) + shift
	zLo := rad*math.Cos((phi+4*math.Pi)/3) + shift
	if zLo <= bigB {
		return zHi, false
	}
	if lnPhi(zLo, bigA, bigB) < lnPhi(zHi, bigA, bigB) {
		return zLo, true
	}
	return zHi, false
}

// lnPhi is the Peng–Robinson fugacity coefficient of the blend as one
// fluid, enough to rank the roots.
func lnPhi(z, bigA, bigB float64) float64 {
	return z - 1 - math.Log(z-bigB) - bigA/(2*sqrt2*bigB)*math.Log((z+(1+sqrt2)*bigB)/(z+(1-sqrt2)*bigB))
}

// checkRange marks states past the models' useful range.
func (m *Mixture) checkRange(r *Result, tempK, presPa float64) {
	if r.Range != InRange {
		return
	}
	if r.ReducedDensity > ReducedDensityLimit {
		r.Range = TooDense
		return
	}
	if r.PseudoCriticalK > 0 && math.Abs(tempK/r.PseudoCriticalK-1) < 0.03 && math.Abs(presPa/r.PseudoCriticalPa-1) < 0.15 {
		r.Range = NearCritical
	}
}
