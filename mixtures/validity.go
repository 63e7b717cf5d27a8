package mixtures

import (
	"fmt"

	"zmix/model"
)

// idealPressurePa is where the ideal-gas law starts to need checking: at
// 10 bar, compressibility factors of common gases near room temperature
// differ from 1 by a percent or more (common practice).
const idealPressurePa = 10e5

// StateNote is a validity remark about one species, or the blend as a
// whole when Species is empty.
type StateNote struct {
	Species string
	model.Note
}

// Notes returns the validity remarks of a state: the model's notes for
// every species at its partial pressure, and the blend-wide pressure note.
// Info-level notes are left out unless all is set.
func Notes(s *State, all bool) []StateNote {
	var out []StateNote
	if s.PresPa > idealPressurePa {
		out = append(out, StateNote{Note: model.Note{Severity: model.Caution,
			Text: fmt.Sprintf("%.4g bar: real-gas effects (compressibility) may exceed ~1 %%; the ideal-gas figures are a first estimate", s.PresPa/1e5)}})
	}
	for i := range s.Species {
		t := &s.Species[i]
		v := t.Species.Validity(s.TempK, t.PartialPresPa)
		// Condensation depends on the partial pressure, but the boiling
		// point is at 1 atm; report it for the species present.
		for _, n := range v.Notes(t.Species) {
			if n.Severity == model.Info && !all {
				continue
			}
			out = append(out, StateNote{Species: t.Species.Formula, Note: n})
		}
	}
	return out
}
