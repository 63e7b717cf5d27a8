package mixtures

import (
	"fmt"
	"math"

	"zmix/mixtures/realgas"
	"zmix/model"
)

// idealPressurePa is where the ideal-gas law starts to need checking when
// no real-gas model applies (no species with critical constants): at 10
// bar, compressibility factors of common gases near room temperature
// differ from 1 by a percent or more (common practice).
const idealPressurePa = 10e5

// densityCautionFraction is the deviation of the ideal-gas density from
// the real one, |Z − 1|, above which the state gets a caution.
const densityCautionFraction = 0.01

// StateNote is a validity remark about one species, or the blend as a
// whole when Species is empty.
type StateNote struct {
	Species string
	model.Note
}

// Notes returns the validity remarks of a state: the blend's Z, the
// model's notes for every species at its partial pressure, and how near
// each species is to condensing.
// Info-level notes are left out unless all is set.
func Notes(s *State, all bool) []StateNote {
	out := realGasNotes(s, all)
	out = append(out, hotNotes(s)...)
	for i := range s.Species {
		t := &s.Species[i]
		v := t.Species.Validity(s.TempK, t.PartialPresPa)
		notes := v.Notes(t.Species)
		// The vapour pressure from IAPWS or the critical constants
		// replaces the model's estimate from the boiling point, which
		// it gives only when the boiling point is known.
		if n, ok := condensationNote(t, s.TempK); ok {
			if v.TOverBoiling > 0 {
				v.TOverBoiling = 0
				notes = v.Notes(t.Species)
			}
			notes = append(notes, n)
		}
		for _, n := range notes {
			if n.Severity == model.Info && !all {
				continue
			}
			out = append(out, StateNote{Species: t.Species.Formula, Note: n})
		}
	}
	return out
}

// RealGasNote is the blend's real-gas remark at the state when there is
// one to heed: the ideal-gas density off by more than 1 %, the state
// outside every real-gas model, or a pressure above 10 bar that no
// model covers. The state readout adds where its real-gas figures are;
// the processes give it at their inlets and outlets.
func RealGasNote(s *State) (model.Note, bool) {
	note := func(sev model.Severity, format string, args ...any) (model.Note, bool) {
		return model.Note{Severity: sev, Text: fmt.Sprintf(format, args...)}, true
	}
	rg, known := s.RealGasResult()
	if !known {
		if s.PresPa > idealPressurePa {
			return note(model.Caution, "no species of the blend carries critical constants, so real-gas effects are not computed; above 10 bar they may exceed 1 %% (common practice)")
		}
		return model.Note{}, false
	}
	dev := math.Abs(rg.Z - 1)
	switch {
	case rg.Range != realgas.InRange:
		return note(model.Invalid, "outside every model here (%s): Z from %s is %.3g, and neither it nor the ideal-gas figures can be trusted", rg.Range, rg.Model, rg.Z)
	case dev > densityCautionFraction:
		return note(model.Caution, "Z = %.4g (%s): the ideal-gas density is off by %.2g %%", rg.Z, rg.Model, 100*dev)
	}
	return model.Note{}, false
}

// realGasNotes says, as numbers, how far the ideal gas is from the real
// one at the state.
func realGasNotes(s *State, all bool) []StateNote {
	rg, known := s.RealGasResult()
	if n, ok := RealGasNote(s); ok {
		switch {
		case !known:
			n.Text = fmt.Sprintf("%.4g bar: %s", s.PresPa/1e5, n.Text)
		case n.Severity == model.Caution:
			n.Text += "; the real-gas figures stand beside it"
		}
		return []StateNote{{Note: n}}
	}
	if known && all {
		dev := math.Abs(rg.Z - 1)
		return []StateNote{{Note: model.Note{Severity: model.Info, Text: fmt.Sprintf("Z = %.5g (%s): the ideal-gas density is within %.2g %%", rg.Z, rg.Model, 100*dev)}}}
	}
	return nil
}
