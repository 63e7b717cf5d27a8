package model

import (
	"math"
	"strings"
	"testing"

	"gonum.org/v1/gonum/mat"
	"gonum.org/v1/gonum/spatial/r3"
	"gonum.org/v1/gonum/unit/constant"
)

// The catalogue's rotational constants and internal rotational constants
// F of n-butane and isobutane are each computed from one structure (see
// their rot_cm and torsion_cm sources). This file builds those structures
// again and checks both, so that a changed structure or constant cannot
// drift from the other.
//
// The reduced moment of a top is Pitzer's (J. Chem. Phys. 14, 239 (1946);
// for several tops, Kilpatrick and Pitzer, J. Chem. Phys. 17, 1064
// (1949); both from memory): the kinetic energy of the internal rotation
// with the molecule's translation and overall rotation removed (zero
// linear and angular momentum), which is the Schur complement of the
// rotations in the kinetic-energy matrix. For a top whose centre of mass lies off the
// axis, as n-butane's ethyl groups do, it is far below I_top/2.

// isotopeMassU are the masses of ¹²C (exact, by definition of u) and ¹H
// (AME2020, from memory) that rotational constants take.
var isotopeMassU = map[string]float64{"C": 12, "H": 1.00782503}

type site struct {
	el string
	p  r3.Vec
}

// rotConstCmPerUA2 is h/(8π²c) in cm⁻¹·u·Å²: B = rotConstCmPerUA2/I.
var rotConstCmPerUA2 = planckJs / (8 * math.Pi * math.Pi * lightSpeedMPerS * 100 * float64(constant.AtomicMass) * 1e-20)

// zmat places D bonded to C at distance r, with angle BCD = theta and
// dihedral ABCD = phi (degrees).
func zmat(a, b, c r3.Vec, r, theta, phi float64) r3.Vec {
	th, ph := theta*math.Pi/180, phi*math.Pi/180
	bc := r3.Unit(r3.Sub(c, b))
	n := r3.Unit(r3.Cross(r3.Sub(b, a), bc))
	m := r3.Cross(n, bc)
	d := r3.Add(r3.Scale(-r*math.Cos(th), bc), r3.Add(r3.Scale(r*math.Sin(th)*math.Cos(ph), m), r3.Scale(r*math.Sin(th)*math.Sin(ph), n)))
	return r3.Add(c, d)
}

func massCentre(s []site) (r3.Vec, float64) {
	var sum r3.Vec
	total := 0.0
	for _, a := range s {
		m := isotopeMassU[a.el]
		sum = r3.Add(sum, r3.Scale(m, a.p))
		total += m
	}
	return r3.Scale(1/total, sum), total
}

// inertiaTensor returns the inertia tensor about the centre of mass, u·Å².
func inertiaTensor(s []site) *mat.SymDense {
	c, _ := massCentre(s)
	t := mat.NewSymDense(3, nil)
	for _, a := range s {
		r := r3.Sub(a.p, c)
		v := [3]float64{r.X, r.Y, r.Z}
		for i := range 3 {
			for j := i; j < 3; j++ {
				d := -v[i] * v[j]
				if i == j {
					d += r3.Dot(r, r)
				}
				t.SetSym(i, j, t.At(i, j)+isotopeMassU[a.el]*d)
			}
		}
	}
	return t
}

// top is a set of sites turning about the axis through p along e.
type top struct {
	sites []int
	p, e  r3.Vec
}

// topMatrix returns the kinetic-energy matrix of the tops, u·Å², with the
// molecule's translation and overall rotation removed: for each pair,
// Σ m vᵢ·vⱼ less the parts carried by the linear and angular momentum,
// which is the Schur complement of the rotations (and translations) in
// the whole kinetic-energy matrix. Its diagonal holds each top's reduced
// moment; off the diagonal, the kinetic coupling of two tops.
func topMatrix(t *testing.T, s []site, tops []top) *mat.SymDense {
	c, total := massCentre(s)
	var invI mat.Dense
	if err := invI.Inverse(inertiaTensor(s)); err != nil {
		t.Fatal(err)
	}
	vel := make([][]r3.Vec, len(tops)) // velocities for a unit rate of turn
	mom := make([]r3.Vec, len(tops))
	ang := mat.NewDense(len(tops), 3, nil)
	for k, tp := range tops {
		vel[k] = make([]r3.Vec, len(s))
		e := r3.Unit(tp.e)
		for _, i := range tp.sites {
			vel[k][i] = r3.Cross(e, r3.Sub(s[i].p, tp.p))
		}
		var l r3.Vec
		for i, a := range s {
			m := isotopeMassU[a.el]
			mom[k] = r3.Add(mom[k], r3.Scale(m, vel[k][i]))
			l = r3.Add(l, r3.Scale(m, r3.Cross(r3.Sub(a.p, c), vel[k][i])))
		}
		ang.SetRow(k, []float64{l.X, l.Y, l.Z})
	}
	var rot, lIL mat.Dense
	rot.Mul(ang, &invI)
	lIL.Mul(&rot, ang.T())
	out := mat.NewSymDense(len(tops), nil)
	for k := range tops {
		for j := k; j < len(tops); j++ {
			raw := 0.0
			for i, a := range s {
				raw += isotopeMassU[a.el] * r3.Dot(vel[k][i], vel[j][i])
			}
			out.SetSym(k, j, raw-lIL.At(k, j)-r3.Dot(mom[k], mom[j])/total)
		}
	}
	return out
}

// reducedMoment returns the reduced moment, u·Å², of one top.
func reducedMoment(t *testing.T, s []site, tp top) float64 {
	return topMatrix(t, s, []top{tp}).At(0, 0)
}

// checkRotConsts checks the rotational constants of the structure against
// sp's rot_cm, within the rounding of its figures.
func checkRotConsts(t *testing.T, sp *Species, s []site) {
	var eig mat.EigenSym
	if !eig.Factorize(inertiaTensor(s), false) {
		t.Fatal("inertia tensor did not factorize")
	}
	moments := eig.Values(nil) // ascending: A, B, C follow
	for i, want := range sp.RotConstPerCm {
		if got := rotConstCmPerUA2 / moments[i]; math.Abs(got/want-1) > 5e-4 {
			t.Errorf("%s rotational constant %d from the structure = %.5f cm⁻¹, catalogue %.4f", sp.Formula, i, got, want)
		}
	}
}

// nButaneAnti builds anti n-butane from the structure of its rot_cm
// source: r(C–C) 1.531, r(C–H) 1.095 Å, CCC 113.8°, methyl CCH 111°
// (staggered), methylene HCH 107° in the plane bisecting CCC. Indices:
// C1..C4 are 0..3, C1's methyl H 4..6, C4's 7..9, C2's H 10, 11.
func nButaneAnti() []site {
	const rCC, rCH, angCCC, angCCH, angHCH = 1.531, 1.095, 113.8, 111.0, 107.0
	c1 := r3.Vec{}
	c2 := r3.Vec{X: rCC}
	c3 := r3.Add(c2, r3.Vec{X: -rCC * math.Cos(angCCC*math.Pi/180), Y: rCC * math.Sin(angCCC*math.Pi/180)})
	c4 := zmat(c1, c2, c3, rCC, angCCC, 180)
	s := []site{{"C", c1}, {"C", c2}, {"C", c3}, {"C", c4}}
	for _, phi := range []float64{180, 60, -60} {
		s = append(s, site{"H", zmat(c3, c2, c1, rCH, angCCH, phi)})
	}
	for _, phi := range []float64{180, 60, -60} {
		s = append(s, site{"H", zmat(c2, c3, c4, rCH, angCCH, phi)})
	}
	methylene := func(a, b, c r3.Vec) {
		u1, u3 := r3.Unit(r3.Sub(a, b)), r3.Unit(r3.Sub(c, b))
		bisector := r3.Unit(r3.Scale(-1, r3.Add(u1, u3)))
		normal := r3.Unit(r3.Cross(u1, u3))
		half := angHCH / 2 * math.Pi / 180
		for _, sign := range []float64{1, -1} {
			dir := r3.Add(r3.Scale(math.Cos(half), bisector), r3.Scale(sign*math.Sin(half), normal))
			s = append(s, site{"H", r3.Add(b, r3.Scale(rCH, dir))})
		}
	}
	methylene(c1, c2, c3)
	methylene(c2, c3, c4)
	return s
}

// TestButaneReducedMoments: the structure gives n-butane's rot_cm, and the
// F of each torsion_cm entry is rotConstCmPerUA2 over the top's reduced
// moment, within the rounding of the catalogue's figures.
func TestButaneReducedMoments(t *testing.T) {
	s := nButaneAnti()
	sp := mustSpecies(t, "n-C4H10")
	checkRotConsts(t, sp, s)
	c := func(i int) r3.Vec { return s[i].p }
	ethyl := reducedMoment(t, s, top{[]int{0, 4, 5, 6, 10, 11}, c(1), r3.Sub(c(2), c(1))})
	methyl := reducedMoment(t, s, top{[]int{4, 5, 6}, c(0), r3.Sub(c(1), c(0))})
	var bare float64 // the ethyl top's own moment about the axis, for the log
	axis := r3.Unit(r3.Sub(c(2), c(1)))
	for _, i := range []int{0, 4, 5, 6, 10, 11} {
		r := r3.Sub(c(i), c(1))
		perp := r3.Sub(r, r3.Scale(r3.Dot(r, axis), axis))
		bare += isotopeMassU[s[i].el] * r3.Dot(perp, perp)
	}
	t.Logf("n-butane C–C torsion: reduced moment %.3f u·Å² (I_top/2 %.3f); methyl %.3f", ethyl, bare/2, methyl)
	for _, tor := range sp.Torsions {
		want := rotConstCmPerUA2 / methyl
		if tor.Fold == 1 {
			want = rotConstCmPerUA2 / ethyl
		}
		if math.Abs(tor.FCm/want-1) > 1e-3 {
			t.Errorf("torsion replacing %g cm⁻¹: F = %g cm⁻¹, the structure gives %.4f", tor.ReplacesCm, tor.FCm, want)
		}
	}
	if !strings.Contains(sp.Sources["torsion_cm"], "Pitzer") {
		t.Errorf("torsion_cm source %q should name Pitzer's reduced moment", sp.Sources["torsion_cm"])
	}
}

// isobutaneC3v builds isobutane from the structure of its rot_cm source:
// r(C–C) 1.525 Å, CCC 111.15°, tertiary r(C–H) 1.108 Å along the C3
// axis, methyl r(C–H) 1.094 Å and CCH 111°, staggered. Indices: the
// central C 0, its H 1, the methyl carbons 2..4, methyl k's H
// 5+3k..7+3k.
func isobutaneC3v() []site {
	const rCC, angCCC, rCHt, rCH, angCCH = 1.525, 111.15, 1.108, 1.094, 111.0
	// Three bonds at polar angle a from −z meet at cos CCC = 1.5 cos²a − 0.5.
	a := math.Acos(math.Sqrt((math.Cos(angCCC*math.Pi/180) + 0.5) / 1.5))
	hTert := r3.Vec{Z: rCHt}
	s := []site{{"C", r3.Vec{}}, {"H", hTert}}
	for k := range 3 {
		phi := float64(k) * 2 * math.Pi / 3
		s = append(s, site{"C", r3.Vec{X: rCC * math.Sin(a) * math.Cos(phi), Y: rCC * math.Sin(a) * math.Sin(phi), Z: -rCC * math.Cos(a)}})
	}
	for k := range 3 {
		for _, phi := range []float64{180, 60, -60} {
			s = append(s, site{"H", zmat(hTert, r3.Vec{}, s[2+k].p, rCH, angCCH, phi)})
		}
	}
	return s
}

// TestIsobutaneTops: the structure gives isobutane's rot_cm and the F of
// its three methyl tops, and their kinetic coupling is too small to
// matter: the classical partition function of the three tops goes as
// √det K of their kinetic matrix, which differs from the product of
// their reduced moments by under 0.2 %, less than 0.01 J/(mol·K) in S°.
// So the model's S° gap to the TRC value (see TestRecalledButanes) is not
// the tops' kinetic coupling; it lies in the recalled barrier or in the
// tops' potential coupling, which no source here gives.
func TestIsobutaneTops(t *testing.T) {
	s := isobutaneC3v()
	sp := mustSpecies(t, "i-C4H10")
	checkRotConsts(t, sp, s)
	var tops []top
	for k := range 3 {
		c := s[2+k].p
		tops = append(tops, top{[]int{5 + 3*k, 6 + 3*k, 7 + 3*k}, c, r3.Sub(r3.Vec{}, c)})
	}
	k := topMatrix(t, s, tops)
	for _, tor := range sp.Torsions {
		if want := rotConstCmPerUA2 / k.At(0, 0); math.Abs(tor.FCm/want-1) > 1e-3 {
			t.Errorf("isobutane torsion replacing %g cm⁻¹: F = %g cm⁻¹, the structure gives %.4f", tor.ReplacesCm, tor.FCm, want)
		}
	}
	prod := k.At(0, 0) * k.At(1, 1) * k.At(2, 2)
	dS := GasConstant / 2 * math.Log(mat.Det(k)/prod)
	t.Logf("isobutane methyl tops: reduced moment %.3f u·Å², coupling %.4f; √det K against the product: ΔS° = %+.4f J/(mol·K)", k.At(0, 0), k.At(0, 1), dS)
	if math.Abs(dS) > 0.01 {
		t.Errorf("the tops' kinetic coupling moves S° by %.4f J/(mol·K); the README says under 0.01", dS)
	}
}
