package mixtures

import (
	"fmt"

	"zmix/mixtures/realgas"
	"zmix/model"
)

// nearSaturation is the fraction of its vapour pressure at which a
// species' partial pressure gets a caution: a cooler spot or a
// compression may then condense it (common practice).
const nearSaturation = 0.5

// DewPoint is the blend's dew point at the state's pressure: IAPWS for
// water (a frost point below its triple point), Lee–Kesler for species
// with critical constants, Trouton's rule as a rough fallback, and the
// ideal-solution (Raoult) estimate when several species condense.
func DewPoint(s *State) realgas.DewPoint {
	blend := make([]realgas.Condensable, len(s.Species))
	for i := range s.Species {
		blend[i] = realgas.Condensable{Species: s.Species[i].Species, X: s.Species[i].X}
	}
	return realgas.DewPointOf(blend, s.PresPa, model.MinTempK, model.MaxTempK)
}

// condensationNote says how near a species is to condensing at the
// state, from its vapour pressure; ok is false when the species has no
// vapour pressure but Trouton's rule, whose note the model gives.
func condensationNote(t *SpeciesTerm, tempK float64) (n model.Note, ok bool) {
	sat := realgas.VapourPressure(t.Species, tempK)
	switch {
	case sat.Supercritical:
		return model.Note{Severity: model.Info, Text: fmt.Sprintf("supercritical (T above its critical temperature, %.5g K): it does not condense at any pressure", sat.CriticalK)}, true
	case sat.Method == realgas.NoMethod || sat.Method == realgas.TroutonRough:
		return model.Note{}, false
	}
	over := "its vapour pressure"
	if sat.Frost {
		over = "its vapour pressure over ice"
	}
	ratio := t.PartialPresPa / sat.Pa
	est := fmt.Sprintf("%s, %s (%s)", over, paText(sat.Pa), sat.Method)
	switch {
	case ratio >= 1:
		return model.Note{Severity: model.Invalid, Text: fmt.Sprintf("partial pressure %s is above %s: it condenses", paText(t.PartialPresPa), est)}, true
	case ratio >= nearSaturation:
		return model.Note{Severity: model.Caution, Text: fmt.Sprintf("partial pressure is %.2g %% of %s: a cooler spot or a compression may condense it", 100*ratio, est)}, true
	}
	return model.Note{Severity: model.Info, Text: fmt.Sprintf("partial pressure is %.2g %% of %s", 100*ratio, est)}, true
}

// paText writes a pressure in a note, to four digits.
func paText(pa float64) string { return model.PressureNoteText(pa, 4) }
