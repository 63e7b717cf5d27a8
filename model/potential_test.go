package model

import (
	"math"
	"strings"
	"testing"
)

// TestCurveLevels checks H2's levels from its RKR curve (potential.go):
//   - at N = 0, WKB on the RKR curve returns the Dunham G(v) it was built
//     from (RKR is the inverse of first-order WKB), within 0.5 cm⁻¹ to v = 8;
//   - the rotational levels against H2's observed Raman lines (from
//     memory): S(0) = E(0,2) − E(0,0) = 354.37, S(1) = E(0,3) − E(0,1) =
//     587.03 and Q(1) = E(1,1) − E(0,1) = 4155.25 cm⁻¹, within 0.5 cm⁻¹;
//   - the counts: H2 has 301 bound levels and some 50 quasi-bound ones
//     (from memory); the curve holds 270–301 bound (its G(v) is the cubic
//     series, which runs out near v = 12 of 14) and 40–60 quasi-bound.
//     Its last N, 32, lies below H2's, about 37 (from memory): the curve
//     ends at 3.1 re and its r⁻⁶ tail is a stated guess, so the widest
//     barriers come out low; the check takes 30 to 40.
func TestCurveLevels(t *testing.T) {
	sp := mustSpecies(t, "eH2")
	d := *sp.Dunham
	c, ok := newRKRCurve(d, sp.DissociationCm)
	if !ok {
		t.Fatal("no RKR curve for H2")
	}
	ls, _ := curveLevels(d, sp.DissociationCm)
	e := map[[2]int]float64{}
	bound, quasi, maxN := 0, 0, 0
	for _, l := range ls {
		e[[2]int{l.v, l.n}] = l.eCm
		if l.eCm < c.de {
			bound++
		} else {
			quasi++
		}
		maxN = max(maxN, l.n)
	}
	g := func(v float64) float64 {
		h := v + 0.5
		return h * (d.WeCm - h*(d.WeXeCm-h*d.WeYeCm))
	}
	for v := 0; v <= 8; v++ {
		if got := e[[2]int{v, 0}]; math.Abs(got-g(float64(v))) > 0.5 {
			t.Errorf("E(v=%d, N=0) = %.3f cm⁻¹ above the minimum, Dunham G(v) = %.3f", v, got, g(float64(v)))
		}
	}
	for _, tt := range []struct {
		name      string
		got, want float64
	}{
		{"S(0)", e[[2]int{0, 2}] - e[[2]int{0, 0}], 354.37},
		{"S(1)", e[[2]int{0, 3}] - e[[2]int{0, 1}], 587.03},
		{"Q(1)", e[[2]int{1, 1}] - e[[2]int{0, 1}], 4155.25},
	} {
		if math.Abs(tt.got-tt.want) > 0.5 {
			t.Errorf("H2 %s = %.3f cm⁻¹, want %.2f ± 0.5 (observed Raman line, from memory)", tt.name, tt.got, tt.want)
		}
	}
	if bound < 270 || bound > 301 || quasi < 40 || quasi > 60 || maxN < 30 || maxN > 40 {
		t.Errorf("H2 curve: %d bound, %d quasi-bound levels, last N %d; want 270–301, 40–60, 30–40", bound, quasi, maxN)
	}
	t.Logf("H2 curve: %d bound and %d quasi-bound levels, N up to %d", bound, quasi, maxN)
}

// TestCurveField: "curve" takes yes or no, and only a Σ ground state.
func TestCurveField(t *testing.T) {
	if _, err := ParseCatalogue("user.cat", strings.NewReader(coBlock("", "")+"curve = maybe\n")); err == nil || !strings.Contains(UserMessage(err), "want yes or no") {
		t.Errorf("curve = maybe: got %v", err)
	}
	list, err := ParseCatalogue("user.cat", strings.NewReader(coBlock("", "")+"curve = yes\n"))
	if err != nil {
		t.Fatalf("CO from its curve refused: %v", err)
	}
	if !list[0].Dunham.FromCurve || list[0].LevelCount() < 1000 {
		t.Errorf("CO from its curve: FromCurve %v, %d levels", list[0].Dunham.FromCurve, list[0].LevelCount())
	}
}
