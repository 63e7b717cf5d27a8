package model

import (
	"fmt"
	"math"
	"slices"

	"gonum.org/v1/gonum/mat"
)

// Torsion is a hindered internal rotation that replaces one vibrational
// mode when the levels are summed: a rotor with internal rotational
// constant F in the potential V(φ) = (V0/2)(1 − cos nφ). Its levels are
// the eigenvalues of F·(−i d/dφ)² + V(φ) in the basis e^{imφ}; they run
// from a harmonic ladder at the bottom of the wells to free rotation far
// above the barrier, which is the whole point of summing them.
type Torsion struct {
	ReplacesCm float64 // the fundamental in Vib that this rotor stands for
	BarrierCm  float64 // V0
	FCm        float64 // F = h/(8π²c I_red)
	Fold       int     // n: minima per turn
	Symmetry   int     // σ_int: indistinguishable positions per turn
	// More are further terms (Vk/2)(1 − cos nk φ) of the potential, for
	// a torsion whose wells differ in depth: n-butane's C–C torsion has
	// its anti well and two gauche wells above it, which a single
	// cos 3φ term would put at the same energy.
	More []PotentialTerm
}

// PotentialTerm is one Fourier term (V/2)(1 − cos nφ) of a torsional
// potential; V may be negative.
type PotentialTerm struct {
	Cm   float64
	Fold int
}

// meanPotentialCm is the potential's average over a turn, Σ V/2: the
// level of the free rotor far above the barriers.
func (tor Torsion) meanPotentialCm() float64 {
	v := tor.BarrierCm / 2
	for _, t := range tor.More {
		v += t.Cm / 2
	}
	return v
}

// Limits of the torsion fields (values from memory): methyl barriers lie
// near 1000 cm⁻¹, and the lightest top (CH3, F ≈ 5.3 cm⁻¹ alone) has F
// below 30 cm⁻¹ for any reduced moment; folds beyond 6 do not occur in
// gas-mixture molecules.
var (
	barrierRange  = numRange{"torsional barrier V0", 1, 20000, "cm⁻¹", false}
	termRange     = numRange{"further torsional term V", -20000, 20000, "cm⁻¹", false}
	torsionFRange = numRange{"internal rotational constant F", 0.01, 100, "cm⁻¹", false}
	foldRange     = numRange{"torsional fold n", 1, 6, "", true}
	maxTorsions   = 6
	// maxTorsionTerms bounds the further Fourier terms of one torsion:
	// n-butane's published C–C potential has six terms, V1 to V6.
	maxTorsionTerms = 5
)

// torsionBasisM is the largest |m| of the basis: eigenvalues well below
// F·M² are converged; above them the levels are taken as the free
// rotor's, F m² + V0/2, which they approach once E ≫ V0.
const torsionBasisM = 120

// tunnelMergeCm is the tunnelling splitting below which levels are merged.
const tunnelMergeCm = 0.01

// eigenvalues returns, in ascending order, the eigenvalues of
// F·(−i d/dφ)² + V(φ) in the basis e^{imφ}, |m| ≤ torsionBasisM. A term
// of fold n couples m only to m ± n, so the matrix falls apart into g
// blocks, one per residue of m modulo g, the greatest common divisor of
// the folds: a methyl top's three blocks take a ninth of the work of
// the whole matrix, which is most of the catalogue's load time.
func (tor Torsion) eigenvalues() []float64 {
	g := tor.Fold
	for _, t := range tor.More {
		g = gcd(g, t.Fold)
	}
	mean := tor.meanPotentialCm()
	var vals []float64
	for r := 0; r < g; r++ {
		var ms []int // this block's m, ascending
		for m := -torsionBasisM; m <= torsionBasisM; m++ {
			if ((m-r)%g+g)%g == 0 {
				ms = append(ms, m)
			}
		}
		n := len(ms)
		h := mat.NewSymDense(n, nil)
		for i, m := range ms {
			h.SetSym(i, i, tor.FCm*float64(m*m)+mean)
		}
		// Within a block, m + fold sits fold/g places further on.
		couple := func(fold int, vCm float64) {
			for i := 0; i+fold/g < n; i++ {
				j := i + fold/g
				h.SetSym(i, j, h.At(i, j)-vCm/4)
			}
		}
		couple(tor.Fold, tor.BarrierCm)
		for _, t := range tor.More {
			couple(t.Fold, t.Cm)
		}
		var eig mat.EigenSym
		if !eig.Factorize(h, false) {
			// EigenSym does not fail on a finite symmetric matrix; a
			// NaN would be caught by the state's finite check.
			vals = append(vals, math.NaN())
			continue
		}
		vals = append(vals, eig.Values(nil)...)
	}
	slices.Sort(vals)
	return vals
}

func gcd(a, b int) int {
	for b != 0 {
		a, b = b, a%b
	}
	return a
}

// torsionLevels builds the level list of one torsion, energies from its
// lowest level, up to the energy a sum at MaxTempK needs.
func (tor Torsion) levels() *rovibLevels {
	vals := tor.eigenvalues()
	// Converged below the free-rotor energy of |m| = M − 10; free rotor
	// levels (each ±m, so twice) from there on.
	mCut := torsionBasisM - 10
	eCut := tor.FCm*float64(mCut*mCut) + tor.meanPotentialCm()
	lv := &rovibLevels{lnNorm: math.Log(float64(tor.Symmetry))}
	e0 := vals[0]
	group := e0
	for _, e := range vals {
		if e >= eCut {
			break
		}
		// Tunnelling splittings below tunnelMergeCm (ethane's ground
		// level: 0.006 cm⁻¹) matter only below a tenth of a kelvin; the
		// split levels are taken as one, so that a frozen torsion and a
		// cold one agree exactly.
		if e-group < tunnelMergeCm {
			e = group
		} else {
			group = e
		}
		lv.thetaK = append(lv.thetaK, WavenumberToKelvin(e-e0))
		lv.weight = append(lv.weight, 1)
		lv.class = append(lv.class, classRot0)
	}
	topK := 45 * MaxTempK
	for m := mCut; ; m++ {
		e := tor.FCm*float64(m*m) + tor.meanPotentialCm()
		if e < eCut {
			continue
		}
		th := WavenumberToKelvin(e - e0)
		if th > topK {
			break
		}
		lv.thetaK = append(lv.thetaK, th)
		lv.weight = append(lv.weight, 2)
		lv.class = append(lv.class, classRot0)
	}
	lv.thetaK[0] = 0
	i := min(7, len(lv.thetaK)-1)
	lv.tableMinK = max(lv.thetaK[i]/40, MinTempK)
	return lv
}

// torsionTerms returns one torsion's terms at T. Its levels are all of
// the first factor (classRot0), so the table's other two are not read.
func (lv *rovibLevels) torsionTerms(tempK, lnT float64) Terms {
	if tempK < lv.tableMinK {
		t, _, _ := lv.direct(tempK)
		return t
	}
	lv.once.Do(lv.build)
	return lv.firstAt(lnT)
}

// torsionSet is the level list of one torsion or ladder, counted as many
// times as the molecule has torsions alike in every constant (propane's
// two methyl rotors), so that their sum or table is taken once.
type torsionSet struct {
	levels *rovibLevels
	count  float64
}

// addTorsionSet counts one more torsion or ladder whose constants key
// describes: a key seen before adds to its set, a new one makes the
// level list.
func (sp *Species) addTorsionSet(key string, levels func() *rovibLevels) {
	for i := range sp.torsionLevels {
		if sp.torsionKeys[i] == key {
			sp.torsionLevels[i].count++
			return
		}
	}
	sp.torsionKeys = append(sp.torsionKeys, key)
	sp.torsionLevels = append(sp.torsionLevels, torsionSet{levels: levels(), count: 1})
}

// prepareTorsions checks the torsions and builds their levels, and the
// list of vibrational modes that remain harmonic beside them.
func (sp *Species) prepareTorsions() error {
	sp.torsionLevels, sp.torsionKeys, sp.vibModesHindered, sp.vibReplacedBy = nil, nil, nil, nil
	if len(sp.Torsions) == 0 && len(sp.Ladders) == 0 {
		return nil
	}
	sp.vibReplacedBy = make([]string, len(sp.Vib))
	if len(sp.Torsions) > maxTorsions {
		return Errorf("model", "%s: %d torsions; want at most %d", sp.Formula, len(sp.Torsions), maxTorsions)
	}
	if sp.Rotor != Nonlinear {
		return Errorf("model", "%s: hindered internal rotations and level ladders need a nonlinear molecule", sp.Formula)
	}
	left := make([]int, len(sp.Vib)) // indices into Vib of the modes not yet replaced
	for i := range left {
		left[i] = i
	}
	// take marks the first single mode at cm not yet replaced as replaced
	// by what; false if there is none.
	take := func(cm float64, by string) bool {
		i := slices.IndexFunc(left, func(j int) bool { v := sp.Vib[j]; return v.WavenumberPerCm == cm && v.Degeneracy == 1 })
		if i < 0 {
			return false
		}
		sp.vibReplacedBy[left[i]] = by
		left = slices.Delete(left, i, i+1)
		return true
	}
	for _, tor := range sp.Torsions {
		if !barrierRange.contains(tor.BarrierCm) || !torsionFRange.contains(tor.FCm) || !foldRange.contains(float64(tor.Fold)) || !sigmaRange.contains(float64(tor.Symmetry)) || tor.Symmetry > tor.Fold {
			return Errorf("model", "%s: torsion V0 %g cm⁻¹, F %g cm⁻¹, n %d, σ %d: want %s, %s, %s, and σ from 1 to n", sp.Formula, tor.BarrierCm, tor.FCm, tor.Fold, tor.Symmetry, barrierRange, torsionFRange, foldRange)
		}
		for _, t := range tor.More {
			// σ_int positions are alike only if every term repeats
			// σ_int times a turn.
			if !termRange.contains(t.Cm) || !foldRange.contains(float64(t.Fold)) || t.Fold%tor.Symmetry != 0 {
				return Errorf("model", "%s: torsion term V %g cm⁻¹, n %d: want %s, %s, and n a multiple of σ %d", sp.Formula, t.Cm, t.Fold, termRange, foldRange, tor.Symmetry)
			}
		}
		if !take(tor.ReplacesCm, "hindered rotor") {
			return Errorf("model", "%s: torsion replaces %g cm⁻¹, which vib_cm does not list as a single mode", sp.Formula, tor.ReplacesCm)
		}
		// Every constant but the mode replaced; %v spells a float
		// exactly, so only equal constants share.
		sp.addTorsionSet(fmt.Sprintf("torsion %v %v %d %d %v", tor.BarrierCm, tor.FCm, tor.Fold, tor.Symmetry, tor.More), tor.levels)
	}
	for _, l := range sp.Ladders {
		if err := l.check(sp.Formula); err != nil {
			return err
		}
		if !dissocRange.contains(sp.DissociationCm) {
			return Errorf("model", "%s: a ladder needs D0_cm, %s, where its continuation stops", sp.Formula, dissocRange)
		}
		if !take(l.ReplacesCm, "level ladder") {
			return Errorf("model", "%s: ladder replaces %g cm⁻¹, which vib_cm does not list as a single mode", sp.Formula, l.ReplacesCm)
		}
		sp.addTorsionSet(fmt.Sprintf("ladder %d %v", l.Symmetry, l.LevelsCm), func() *rovibLevels { return l.levels(sp.DissociationCm) })
	}
	for _, j := range left {
		v := sp.Vib[j]
		sp.vibModesHindered = addVibTerm(sp.vibModesHindered, WavenumberToKelvin(v.WavenumberPerCm), v.Degeneracy)
	}
	return nil
}

// VibReplacedBy says, for mode i of Vib, what stands for it when the
// levels are summed (the default treatment): "hindered rotor" for a
// torsion, "level ladder" for a mode given by its levels, "" for a
// harmonic mode.
func (sp *Species) VibReplacedBy(i int) string {
	if i < 0 || i >= len(sp.vibReplacedBy) || !sp.summedLevels(Treatment{}) {
		return ""
	}
	return sp.vibReplacedBy[i]
}

// hinderedVibration returns the vibrational terms with the torsions as
// hindered rotors and the other modes harmonic.
func (sp *Species) hinderedVibration(tempK, invT, lnT float64) Terms {
	t := vibrationOf(sp.vibModesHindered, invT)
	for _, set := range sp.torsionLevels {
		tt := set.levels.torsionTerms(tempK, lnT)
		if set.count != 1 {
			tt = tt.scale(set.count)
		}
		t = t.add(tt)
	}
	return t
}
