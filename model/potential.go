package model

import (
	"math"
	"runtime"
	"sort"
	"sync"

	"gonum.org/v1/gonum/integrate/quad"
)

// Levels of a light diatomic from its potential curve.
//
// For H2 and D2 the Dunham series in K = N(N+1) fails at high N: with D
// alone the levels of N > 15 fall far too low, and with H they rise too
// high past N ≈ 25, where the true levels bend over towards the
// dissociation limit and end in quasi-bound levels behind the centrifugal
// barrier. newRKRCurve builds the potential curve V(r) from the
// Dunham G(v) and B_v by the RKR method (Rydberg, Klein, Rees): the
// turning points of each v are
//
//	r± = √(f/g + f²) ± f,  f = √(ħ²/2μ) ∫ dv′/√(G(v) − G(v′)),
//	g = (2μ/ħ²)^{½} ∫ B(v′) dv′/√(G(v) − G(v′)),  v′ from −½ to v,
//
// (in units of re, with ħ²/2μre² = Be), continued inwards by an
// exponential wall and outwards as De − C/r⁶ to the dissociation limit
// De = D0 + G(0). The levels of each N are then found in the effective
// potential V_N(r) = V(r) + ħ²N(N+1)/2μr² by first-order WKB
// quantization, ∫ k dr = π(v + ½) between the turning points of the
// well; at N = 0 this returns G(v), since RKR is its inverse. Where the
// RKR inner wall folds back near the top (G(v) from three terms no longer
// holds there), the wall above 0.8 De is the exponential through its
// points at 0.6 and 0.8 De.
//
// Cut-off: a level counts if it lies below the dissociation limit, or,
// quasi-bound, above it but below the top of its centrifugal barrier.
// H2's quasi-bound levels live from picoseconds to far longer than a
// collision (from memory); counting them brings its Cp° at 6000 K from
// 2.6 % to 0.84 % below table H-050, so the table counts them too.
type rkrCurve struct {
	be, de       float64   // Be and the well depth De, cm⁻¹
	xIn, vIn     []float64 // inner branch, x = r/re rising, V falling
	xOut, vOut   []float64 // outer branch, x rising, V rising
	wallA        float64   // inner wall V = vIn[0]·e^{−a(x−xIn[0])}
	farC         float64   // outer tail V = De − farC/x⁶
	quadX, quadW []float64 // Gauss–Legendre nodes on [0, 1]
}

// newRKRCurve builds the curve of a state with constants d and dissociation
// energy d0Cm above its lowest level.
func newRKRCurve(d DunhamConstants, d0Cm float64) (*rkrCurve, bool) {
	g := func(v float64) float64 {
		h := v + 0.5
		return h * (d.WeCm - h*(d.WeXeCm-h*d.WeYeCm))
	}
	b := func(v float64) float64 {
		h := v + 0.5
		return d.BeCm - h*(d.AlphaeCm-h*d.GammaeCm)
	}
	de := d0Cm + g(0)
	c := &rkrCurve{be: d.BeCm, de: de}
	const nq = 64
	c.quadX, c.quadW = make([]float64, nq), make([]float64, nq)
	quad.Legendre{}.FixedLocations(c.quadX, c.quadW, 0, 1)
	// The top of the RKR curve: where G stops rising or nears De.
	vTop := -0.5
	for step := 0.01; ; {
		nv := vTop + step
		if g(nv) >= 0.999*de || g(nv) <= g(vTop) || b(nv) <= 0 {
			break
		}
		vTop = nv
	}
	if vTop < 1 {
		return nil, false
	}
	// Points even in √(v+½), dense near the minimum.
	const np = 400
	sTop := math.Sqrt(vTop + 0.5)
	var xin, vin, xout, vout []float64
	for i := 1; i <= np; i++ {
		v := -0.5 + math.Pow(sTop*float64(i)/np, 2)
		gv := g(v)
		tMax := math.Sqrt(v + 0.5)
		var f, gg float64
		for k, u := range c.quadX {
			t := u * tMax
			w := c.quadW[k] * tMax
			dg := gv - g(v-t*t)
			var kern float64
			if dg > 0 {
				kern = 2 * t / math.Sqrt(dg)
			} else {
				kern = 2 / math.Sqrt(d.WeCm)
			}
			f += w * kern
			gg += w * kern * b(v-t*t)
		}
		f *= math.Sqrt(d.BeCm)
		gg /= math.Sqrt(d.BeCm)
		root := math.Sqrt(f/gg + f*f)
		xin = append(xin, root-f)
		xout = append(xout, root+f)
		vin = append(vin, gv)
		vout = append(vout, gv)
	}
	// Each branch is kept while it moves away from the minimum: near the
	// top an RKR curve's inner wall may fold back, where the series G(v)
	// no longer holds; the wall is continued from the last good points.
	keep := func(xs []float64, out bool) int {
		for i := 1; i < len(xs); i++ {
			if out && xs[i] <= xs[i-1] || !out && xs[i] >= xs[i-1] {
				return i
			}
		}
		return len(xs)
	}
	ni := keep(xin, false)
	// Of the inner wall, the part above 0.8 De is taken from the
	// exponential through the points at 0.6 and 0.8 De, steadier than the
	// folding top.
	for i := 0; i < ni; i++ {
		if vin[i] > 0.8*de {
			ni = i
			break
		}
	}
	xin, vin = xin[:ni], vin[:ni]
	no := keep(xout, true)
	xout, vout = xout[:no], vout[:no]
	if ni < 10 || no < 10 {
		return nil, false
	}
	// Inner branch with x rising.
	for i, j := 0, len(xin)-1; i < j; i, j = i+1, j-1 {
		xin[i], xin[j] = xin[j], xin[i]
		vin[i], vin[j] = vin[j], vin[i]
	}
	c.xIn, c.vIn, c.xOut, c.vOut = xin, vin, xout, vout
	// The wall through the top point and the one at 0.6 De.
	j := sort.Search(len(vin), func(i int) bool { return vin[i] < 0.6*de })
	if j >= len(vin) || j == 0 {
		return nil, false
	}
	c.wallA = math.Log(vin[0]/vin[j]) / (xin[j] - xin[0])
	xl := xout[len(xout)-1]
	c.farC = (de - vout[len(vout)-1]) * math.Pow(xl, 6)
	return c, true
}

// v returns V at x = r/re, in cm⁻¹ above the minimum.
func (c *rkrCurve) v(x float64) float64 {
	switch {
	case x < c.xIn[0]:
		return c.vIn[0] * math.Exp(-c.wallA*(x-c.xIn[0]))
	case x <= c.xIn[len(c.xIn)-1]:
		return interpRising(c.xIn, c.vIn, x)
	case x <= 1:
		// Between the innermost RKR points and the minimum (V ≤ 0.4
		// cm⁻¹ for H2): the harmonic parabola through the last point.
		n := len(c.xIn) - 1
		return c.vIn[n] * math.Pow((1-x)/(1-c.xIn[n]), 2)
	case x <= c.xOut[0]:
		return c.vOut[0] * math.Pow((x-1)/(c.xOut[0]-1), 2)
	case x <= c.xOut[len(c.xOut)-1]:
		return interpRising(c.xOut, c.vOut, x)
	}
	return c.de - c.farC/math.Pow(x, 6)
}

// interpRising interpolates y(x) linearly on rising xs.
func interpRising(xs, ys []float64, x float64) float64 {
	i := sort.SearchFloat64s(xs, x)
	if i == 0 {
		return ys[0]
	}
	if i == len(xs) {
		return ys[len(ys)-1]
	}
	t := (x - xs[i-1]) / (xs[i] - xs[i-1])
	return ys[i-1] + t*(ys[i]-ys[i-1])
}

// curveCache holds the levels of each curve built: the spin modifications
// of H2 and D2 share their base gas's constants, so each curve is solved
// once per process.
var curveCache struct {
	sync.Mutex
	m map[curveKey][]rkrLevel
}

type curveKey struct {
	d    DunhamConstants
	d0Cm float64
}

// curveLevels returns the levels of the curve of d, solving it once.
func curveLevels(d DunhamConstants, d0Cm float64) ([]rkrLevel, bool) {
	curveCache.Lock()
	defer curveCache.Unlock()
	k := curveKey{d, d0Cm}
	if ls, ok := curveCache.m[k]; ok {
		return ls, true
	}
	c, ok := newRKRCurve(d, d0Cm)
	if !ok {
		return nil, false
	}
	ls := c.levels(maxLevels)
	if curveCache.m == nil {
		curveCache.m = map[curveKey][]rkrLevel{}
	}
	curveCache.m[k] = ls
	return ls, true
}

// addCurveLevels appends the ground state's levels from its curve, with
// the weights of addLevels' Σ branch; offsetCm is the lowest level.
func (lv *rovibLevels) addCurveLevels(sp *Species, gs DunhamConstants, gRel, sEven, sOdd float64, par parityMods, offsetCm float64) error {
	if gs.Term.Lambda != 0 {
		return Errorf("model", "%s: levels from the potential curve take a Σ ground state", sp.Formula)
	}
	ls, ok := curveLevels(gs, sp.DissociationCm)
	if !ok {
		return Errorf("model", "%s: the Dunham constants give no RKR curve (G(v) must rise to near D0)", sp.Formula)
	}
	mult := float64(gs.Term.Multiplicity)
	for _, l := range ls {
		w, mod := sOdd, par.odd
		if l.n%2 == 0 {
			w, mod = sEven, par.even
		}
		if w == 0 {
			continue
		}
		class := uint8(classRot0)
		if l.v > 0 {
			class = classGround
		}
		lv.thetaK = append(lv.thetaK, WavenumberToKelvin(l.eCm-offsetCm))
		lv.weight = append(lv.weight, gRel*w*mult*float64(2*l.n+1))
		lv.class = append(lv.class, class)
		lv.mod = append(lv.mod, mod)
	}
	return nil
}

// rkrLevel is one level found on the curve.
type rkrLevel struct {
	v, n int
	eCm  float64 // above the curve's minimum
}

// levels returns the bound and quasi-bound levels of every N.
func (c *rkrCurve) levels(maxLevels int) []rkrLevel {
	// Each N's ladder is its own problem: solve a batch of them at once,
	// one per core, and keep them in order up to the first N whose well
	// is gone. The result is the same as solving them one after another.
	workers := max(1, runtime.GOMAXPROCS(0))
	var out []rkrLevel
	for n0 := 0; n0 < maxRotN; n0 += workers {
		k := min(workers, maxRotN-n0)
		ladders := make([][]rkrLevel, k)
		gone := make([]bool, k)
		var wg sync.WaitGroup
		for i := 0; i < k; i++ {
			wg.Add(1)
			go func() {
				defer wg.Done()
				ladders[i], gone[i] = c.ladder(n0+i, maxLevels)
			}()
		}
		wg.Wait()
		for i := 0; i < k; i++ {
			if gone[i] {
				return out
			}
			out = append(out, ladders[i]...)
			if len(out) >= maxLevels {
				return out[:maxLevels]
			}
		}
	}
	return out
}

// ladder solves the vibrational ladder of rotational level N (at most
// maxLevels levels); gone says the well has vanished at this N.
func (c *rkrCurve) ladder(n, maxLevels int) (out []rkrLevel, gone bool) {
	rot := c.be * float64(n*(n+1))
	vn := func(x float64) float64 { return c.v(x) + rot/(x*x) }
	// The well's minimum and the barrier's top, on a grid out to
	// 40 re; with no barrier (N = 0) the limit is De. Beyond the
	// barrier V_N falls back towards De, as rot/x² outlasts C/x⁶.
	const xMax, steps = 40.0, 2000
	xm, vm := 0.0, math.Inf(1)
	for i := 1; i <= steps; i++ {
		x := 0.2 + (xMax-0.2)*float64(i)/steps
		if y := vn(x); y < vm {
			xm, vm = x, y
		}
	}
	xb, top := xMax, c.de
	for i := 1; i <= steps; i++ {
		x := xm + (xMax-xm)*float64(i)/steps
		if y := vn(x); y > top {
			xb, top = x, y
		}
	}
	if top-vm < 1 {
		return nil, true // no well left
	}
	turn := func(e float64) (x1, x2 float64) {
		lo, hi := 0.05, xm
		for k := 0; k < 48; k++ {
			mid := 0.5 * (lo + hi)
			if vn(mid) > e {
				lo = mid
			} else {
				hi = mid
			}
		}
		x1 = 0.5 * (lo + hi)
		lo, hi = xm, xb
		for k := 0; k < 48; k++ {
			mid := 0.5 * (lo + hi)
			if vn(mid) > e {
				hi = mid
			} else {
				lo = mid
			}
		}
		return x1, 0.5 * (lo + hi)
	}
	// phase is ∫k dx/π − ½ with x = mid + half·cos φ.
	phase := func(e float64) float64 {
		x1, x2 := turn(e)
		mid, half := 0.5*(x1+x2), 0.5*(x2-x1)
		s := 0.0
		for k, u := range c.quadX {
			phi := math.Pi * u
			d := e - vn(mid+half*math.Cos(phi))
			if d > 0 {
				s += c.quadW[k] * math.Sqrt(d/c.be) * math.Sin(phi)
			}
		}
		return s*math.Pi*half/math.Pi - 0.5
	}
	hiE := top - 1e-9*top
	pTop := phase(hiE)
	lo, fLo := vm, -0.5 // the phase is −½ at the bottom of the well
	for v := 0; float64(v) <= pTop && len(out) < maxLevels; v++ {
		// Illinois false position on the smooth, rising phase.
		a, fa := lo, fLo-float64(v)
		b, fb := hiE, pTop-float64(v)
		side := 0
		var e float64
		for k := 0; k < 100; k++ {
			e = (a*fb - b*fa) / (fb - fa)
			fe := phase(e) - float64(v)
			if math.Abs(fe) < 1e-9 || b-a < 1e-9 {
				break
			}
			if fe*fb > 0 {
				b, fb = e, fe
				if side == 1 {
					fa /= 2
				}
				side = 1
			} else {
				a, fa = e, fe
				if side == -1 {
					fb /= 2
				}
				side = -1
			}
		}
		out = append(out, rkrLevel{v, n, e})
		lo, fLo = e, float64(v)
	}
	return out, false
}
