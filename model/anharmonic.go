package model

import (
	"math"
	"sort"
)

// Anharmonic vibration of a polyatomic molecule: its vibrational levels
// from harmonic wavenumbers ωi and anharmonicity constants xij,
//
//	G(v, l) = Σ ωi (vi + di/2) + Σ_{i≤j} xij (vi + di/2)(vj + dj/2) + Σ_t g_tt l_t²,
//
// di the degeneracy of mode i (1 or 2); a doubly degenerate mode t has
// the vibrational angular momentum l_t = vt, vt − 2, … ≥ 0, each l > 0
// twice (±l), with its constant g_tt.
// summed over every v whose G lies at or below the lowest dissociation
// limit D0 above G(0), along each mode only while G still rises. The sum
// is the second-order (Dunham-type) expansion of the vibrational term,
// exact to first order in the xij; it neglects Fermi and Darling–Dennison
// resonances, so it is stated for molecules without strong resonances
// (H2O) and for T up to where the levels near D0 start to count (a few
// thousand K).
//
// With alpha_cm, each level also carries its own rotational constants,
// B_v = B_0 − Σ αi vi for each of rot_cm's constants, and so its own
// classical rotor: relative to the ground level's, its rotational
// partition function is Π_k (B_0,k/B_v,k)^{1/2}. The level's weight takes
// this factor to first order in the αi, as exp(½ Σ_k Σ_i αik vi/B_0,k),
// which stays positive and finite where the linear B_v of a level high up
// a ladder would not. For H2O the bend's negative αA (A grows from 27.9
// to 31.1 cm⁻¹ in v2 = 1) lowers Cp° by about 1 % at 3000 K, which is
// what the first-order centrifugal distortion adds there.
type Anharmonic struct {
	HarmonicCm []float64   // ωi, one per mode, in vib_cm's order
	XCm        [][]float64 // xij, i ≤ j, as xij_cm lists the upper triangle row by row
	GllCm      []float64   // g_tt, one per doubly degenerate mode, in order
	// AlphaCm holds αik, mode i's vibration–rotation constant for
	// rot_cm's constant k, row by row (mode by mode); nil when not given.
	AlphaCm []float64
}

// Limits of the anharmonic fields (values from memory): |xij| stays below
// some 200 cm⁻¹ (H2O's x13 is −166), and a molecule with more modes than
// maxAnharmonicModes has too many levels to list.
var xijRange = numRange{"anharmonicity constant xij", -500, 500, "cm⁻¹", false}

// alphaRange bounds a vibration–rotation constant αi (H2O's bend, −3.2
// cm⁻¹, is among the largest); prepareAnharmonic also holds each below
// its rotational constant.
var alphaRange = numRange{"vibration–rotation constant αi", -20, 20, "cm⁻¹", false}

const (
	maxAnharmonicModes  = 6
	maxAnharmonicLevels = 200000
)

// anharmonicLevels lists the vibrational levels from G(0), sorted.
func (sp *Species) anharmonicLevels() (*rovibLevels, error) {
	a := sp.Anharmonic
	n := len(a.HarmonicCm)
	deg := make([]float64, n)
	var degenerate []int // modes with l, in order
	for i, m := range sp.Vib {
		deg[i] = float64(m.Degeneracy)
		if m.Degeneracy == 2 {
			degenerate = append(degenerate, i)
		}
	}
	g := func(v []int) float64 {
		e := 0.0
		for i := 0; i < n; i++ {
			hi := float64(v[i]) + deg[i]/2
			e += a.HarmonicCm[i] * hi
			for j := i; j < n; j++ {
				e += a.XCm[i][j] * hi * (float64(v[j]) + deg[j]/2)
			}
		}
		return e
	}
	// rotorFactor is a level's rotational partition function relative to
	// the ground level's, to first order in the αi (see Anharmonic).
	nRot := len(sp.RotConstPerCm)
	rotorFactor := func(v []int) float64 {
		if a.AlphaCm == nil {
			return 1
		}
		x := 0.0
		for i := 0; i < n; i++ {
			for k := 0; k < nRot; k++ {
				x += a.AlphaCm[i*nRot+k] * float64(v[i]) / sp.RotConstPerCm[k]
			}
		}
		return math.Exp(x / 2)
	}
	v := make([]int, n)
	g0 := g(v)
	es, ws := make([]float64, 0, 1024), make([]float64, 0, 1024)
	// leaf adds the levels of one v, over the l of its degenerate modes.
	var leaf func(t int, e, w float64)
	leaf = func(t int, e, w float64) {
		if t == len(degenerate) {
			es, ws = append(es, e), append(ws, w)
			return
		}
		vt := v[degenerate[t]]
		for l := vt; l >= 0; l -= 2 {
			wl := 1.0
			if l > 0 {
				wl = 2
			}
			leaf(t+1, e+a.GllCm[t]*float64(l*l), w*wl)
		}
	}
	// Odometer over v: raise the first mode while G rises and stays
	// below the limit; otherwise reset it and carry to the next.
	var walk func(k int) error
	walk = func(k int) error {
		if k < 0 {
			leaf(0, g(v)-g0, rotorFactor(v))
			if len(es) > maxAnharmonicLevels {
				return Errorf("model", "%s: the anharmonic constants give over %d levels below D0", sp.Formula, maxAnharmonicLevels)
			}
			return nil
		}
		prev := math.Inf(-1)
		for v[k] = 0; ; v[k]++ {
			e := g(v) - g0
			if e > sp.DissociationCm || e <= prev {
				break
			}
			prev = e
			if err := walk(k - 1); err != nil {
				return err
			}
		}
		v[k] = 0
		return nil
	}
	if err := walk(n - 1); err != nil {
		return nil, err
	}
	lv := &rovibLevels{ // sized once: CO2 has some 90 000 levels
		thetaK: make([]float64, 0, len(es)),
		weight: make([]float64, 0, len(es)),
		class:  make([]uint8, 0, len(es)),
	}
	for i, e := range es {
		lv.thetaK = append(lv.thetaK, WavenumberToKelvin(e))
		lv.weight = append(lv.weight, ws[i])
		lv.class = append(lv.class, classRot0)
	}
	sort.Sort(byEnergy{lv})
	i := min(7, len(lv.thetaK)-1)
	lv.tableMinK = max(lv.thetaK[i]/40, MinTempK)
	return lv, nil
}

// prepareAnharmonic checks the constants against the modes and builds
// the level list.
func (sp *Species) prepareAnharmonic() error {
	sp.anharmonicVib, sp.anharmonicDeferred = nil, nil
	a := sp.Anharmonic
	if a == nil {
		return nil
	}
	n := len(a.HarmonicCm)
	if n != len(sp.Vib) || n > maxAnharmonicModes || len(sp.Torsions) > 0 || len(sp.Ladders) > 0 {
		return Errorf("model", "%s: harm_cm gives %d harmonic wavenumbers for %d modes; want one per vib_cm mode, at most %d, and no torsions or ladders", sp.Formula, n, len(sp.Vib), maxAnharmonicModes)
	}
	nDeg := 0
	for _, m := range sp.Vib {
		switch m.Degeneracy {
		case 1:
		case 2:
			nDeg++
		default:
			return Errorf("model", "%s: anharmonic constants take nondegenerate and doubly degenerate modes only", sp.Formula)
		}
	}
	if len(a.GllCm) != nDeg {
		return Errorf("model", "%s: gll_cm gives %d constants for %d doubly degenerate modes; want one each", sp.Formula, len(a.GllCm), nDeg)
	}
	for _, x := range a.GllCm {
		if !xijRange.contains(x) {
			return Errorf("model", "%s: g_tt %g cm⁻¹; want %s", sp.Formula, x, xijRange)
		}
	}
	if len(a.XCm) != n {
		return Errorf("model", "%s: xij_cm gives %d rows; want the upper triangle of %d modes", sp.Formula, len(a.XCm), n)
	}
	for i, w := range a.HarmonicCm {
		if !vibRange.contains(w) || len(a.XCm[i]) != n {
			return Errorf("model", "%s: harmonic wavenumber %g cm⁻¹; want %s", sp.Formula, w, vibRange)
		}
		for j := i; j < n; j++ {
			if !xijRange.contains(a.XCm[i][j]) {
				return Errorf("model", "%s: x%d%d %g cm⁻¹; want %s", sp.Formula, i+1, j+1, a.XCm[i][j], xijRange)
			}
		}
		// The fundamental must rise: ωi + (1 + di)xii + Σ_{j≠i} xij dj/2
		// > 0 (the l term of a degenerate fundamental is small beside it).
		di := float64(sp.Vib[i].Degeneracy)
		f := w + (1+di)*a.XCm[i][i]
		for j := 0; j < n; j++ {
			dj := float64(sp.Vib[j].Degeneracy)
			if j < i {
				f += a.XCm[j][i] * dj / 2
			} else if j > i {
				f += a.XCm[i][j] * dj / 2
			}
		}
		if f <= 0 {
			return Errorf("model", "%s: mode %d has no rising ladder (fundamental %g cm⁻¹)", sp.Formula, i+1, f)
		}
	}
	if !dissocRange.contains(sp.DissociationCm) {
		return Errorf("model", "%s: anharmonic levels need D0_cm, %s", sp.Formula, dissocRange)
	}
	if a.AlphaCm != nil {
		nRot := len(sp.RotConstPerCm)
		if len(a.AlphaCm) != n*nRot {
			return Errorf("model", "%s: alpha_cm gives %d constants; want %d, one per rot_cm constant (%d) for each of the %d modes", sp.Formula, len(a.AlphaCm), n*nRot, nRot, n)
		}
		for i, x := range a.AlphaCm {
			if b := sp.RotConstPerCm[i%nRot]; math.Abs(x) >= b/2 {
				return Errorf("model", "%s: α%d = %g cm⁻¹ for a rotational constant of %g; want |α| below half of it", sp.Formula, i/nRot+1, x, b)
			}
		}
	}
	if sp.deferLevels {
		sp.anharmonicDeferred = &deferredLevels{make: sp.anharmonicLevels}
		return nil
	}
	lv, err := sp.anharmonicLevels()
	if err != nil {
		return err
	}
	sp.anharmonicVib = lv
	return nil
}

// hasAnharmonic reports whether the species sums anharmonic levels.
func (sp *Species) hasAnharmonic() bool {
	return sp.anharmonicVib != nil || sp.anharmonicDeferred != nil
}

// anharmonicList returns the anharmonic levels, making deferred ones on
// first use.
func (sp *Species) anharmonicList() *rovibLevels {
	if d := sp.anharmonicDeferred; d != nil {
		return d.get()
	}
	return sp.anharmonicVib
}
