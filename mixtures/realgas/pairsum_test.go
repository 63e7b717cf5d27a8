package realgas

import (
	"math"
	"testing"
)

// directSecondVirial sums Tsonopoulos' B pair by pair at T, every
// constant at T, with the polar term aᵢⱼ/Tr⁶ − bᵢⱼ/Tr⁸ of two polar
// species: the definition that the per-composition sums of New must
// reproduce to rounding.
func directSecondVirial(m *Mixture, tempK float64) (b, db, d2b float64) {
	sp := m.atTemperature(nil, tempK)
	for i := range sp {
		for j := i; j < len(sp); j++ {
			w, tcij, scale, wij := pairConstants(&sp[i], &sp[j], i != j)
			f, f1, f2 := tsonopoulos(tempK/tcij, wij)
			if sp[i].polar && sp[j].polar {
				a, bb := 0.5*(sp[i].polarA+sp[j].polarA), 0.5*(sp[i].polarB+sp[j].polarB)
				u := tcij / tempK // 1/Tr
				u6 := math.Pow(u, 6)
				f += a*u6 - bb*u6*u*u
				f1 += -6*a*u6*u + 8*bb*u6*u*u*u
				f2 += 42*a*u6*u*u - 72*bb*u6*u*u*u*u
			}
			b += w * scale * f
			db += w * scale * f1 / tcij
			d2b += w * scale * f2 / (tcij * tcij)
		}
	}
	return b, db, d2b
}

// The blend's B and its T-derivatives, summed once per composition with
// the quantum gases' pairs expanded in their constants at T, equal the
// pair-by-pair sum to rounding, with no quantum gas, one, and two.
func TestSecondVirialPairSum(t *testing.T) {
	blends := []map[string]float64{
		{"N2": 0.79, "O2": 0.21},
		{"N2": 0.7, "H2": 0.3},
		{"N2": 0.7195, "O2": 0.1, "Ar": 0.05, "CO2": 0.04, "H2": 0.03, "He": 0.02, "CO": 0.01, "CH4": 0.01, "H2O": 0.02, "NH3": 0.0005},
		{"He": 0.5, "H2": 0.5},
		{"He": 1},
		{"H2O": 0.4, "NH3": 0.3, "N2": 0.2, "H2": 0.1}, // two polar, a non-polar and a quantum gas
	}
	const tol = 1e-12 // relative to the largest pair term: rounding only
	for _, xs := range blends {
		m := blend(t, xs)
		for _, tempK := range []float64{20, 77, 300, 812.5, 3000} {
			b, db, d2b := m.SecondVirial(tempK)
			wb, wdb, wd2b := directSecondVirial(m, tempK)
			scale := math.Abs(wb) + 1e-6 // m³/mol: B of a few cm³/mol and up
			if math.Abs(b-wb) > tol*scale || math.Abs(db-wdb) > tol*(math.Abs(wdb)+scale/tempK) ||
				math.Abs(d2b-wd2b) > tol*(math.Abs(wd2b)+scale/(tempK*tempK)) {
				t.Errorf("%v at %g K: B, B', B'' = %g, %g, %g; pair by pair %g, %g, %g", xs, tempK, b, db, d2b, wb, wdb, wd2b)
			}
		}
	}
}
