package model

import (
	"math"
	"testing"
)

// rowAllowance is what a comparison with a table allows at one
// temperature: Cp° as a fraction, S° and −[G°−H°(298.15)]/T in J/(mol·K);
// a zero gefAbs leaves that column unchecked.
type rowAllowance struct{ cpRel, sAbs, gefAbs float64 }

// deviation is the largest deviation of one column over the rows, and
// the temperature where it occurs.
type deviation struct{ d, tempK float64 }

func (w *deviation) note(d, tempK float64) {
	if math.Abs(d) > math.Abs(w.d) {
		w.d, w.tempK = d, tempK
	}
}

// checkTableRows compares sp under tr with the quoted rows of a published
// table (id, e.g. "H-064"), each within allow(T), and returns the worst
// Cp° (a fraction) and S° deviations for the test log. A nil allow only
// measures.
func checkTableRows(t *testing.T, sp *Species, id string, rows []janafRow, tr Treatment, allow func(tempK float64) rowAllowance) (cp, s deviation) {
	t.Helper()
	for _, row := range rows {
		got, err := sp.Table(row.tempK, StdPressureBarPa, tr)
		if err != nil {
			t.Fatal(err)
		}
		dCp, dS := got.CpJPerMolK/row.cpJPerMolK-1, got.SJPerMolK-row.sJPerMolK
		cp.note(dCp, row.tempK)
		s.note(dS, row.tempK)
		if allow == nil {
			continue
		}
		a := allow(row.tempK)
		if math.Abs(dCp) > a.cpRel {
			t.Errorf("%s (table %s) Cp°(%g K) = %.3f, want %.3f ± %.2g %%", sp.Formula, id, row.tempK, got.CpJPerMolK, row.cpJPerMolK, 100*a.cpRel)
		}
		if math.Abs(dS) > a.sAbs {
			t.Errorf("%s (table %s) S°(%g K) = %.3f, want %.3f ± %.3g", sp.Formula, id, row.tempK, got.SJPerMolK, row.sJPerMolK, a.sAbs)
		}
		if d := got.GefJPerMolK - row.gefJPerMolK; a.gefAbs > 0 && math.Abs(d) > a.gefAbs {
			t.Errorf("%s (table %s) −[G°−H°(298.15)]/T at %g K = %.3f, want %.3f ± %.3g", sp.Formula, id, row.tempK, got.GefJPerMolK, row.gefJPerMolK, a.gefAbs)
		}
	}
	return cp, s
}
