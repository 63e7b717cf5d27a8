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

// Humidity is the relative humidity of the water in a state: its partial
// pressure over the saturation pressure at the state's temperature,
// over liquid water from the triple point to the critical point and over
// ice below it (IAPWS equations).
type Humidity struct {
	Known   bool    // the blend holds water, at a temperature with a saturation pressure
	Percent float64 // 100 pH2O/psat
	OverIce bool
	PartPa  float64 // the water's partial pressure
	SatPa   float64 // its saturation pressure at the state's T
}

// RelativeHumidity is the relative humidity of the water in s, if any.
// Above 100 % the water condenses; the dew point says where.
func RelativeHumidity(s *State) Humidity {
	for i := range s.Species {
		t := &s.Species[i]
		if t.Species.Formula != "H2O" {
			continue
		}
		sat := realgas.VapourPressure(t.Species, s.TempK)
		if sat.Supercritical || !(sat.Pa > 0) {
			return Humidity{}
		}
		return Humidity{Known: true, Percent: 100 * t.PartialPresPa / sat.Pa, OverIce: sat.Frost, PartPa: t.PartialPresPa, SatPa: sat.Pa}
	}
	return Humidity{}
}
