package safety

import (
	"fmt"
	"strings"

	"zmix/model"
)

// Method names of the ignition screen.
const (
	MethodLowestAIT = "Autoignition temperature of a blend taken as the lowest of its flammable components' (common practice: conservative, since a blend's own is seldom measured)"
	MethodTClass    = "Temperature classes of IEC 60079-20-1 by autoignition temperature: T1 above 450 °C, T2 above 300 °C, T3 above 200 °C, T4 above 135 °C, T5 above 100 °C, T6 above 85 °C (from memory); applied to the catalogue's figures, which may differ from the standard's own listing by tens of °C (the test methods differ): the hazardous-area classification of the site decides"
)

// tClassLimitsC are the lower bounds of the IEC 60079-20-1 temperature
// classes T1…T6, °C: a gas belongs to the first class whose bound its
// autoignition temperature exceeds (IEC 60079-20-1, from memory). The
// class names the hottest surface that equipment in the gas may have.
var tClassLimitsC = [6]float64{450, 300, 200, 135, 100, 85}

// TemperatureClass returns the IEC 60079-20-1 temperature class ("T1" to
// "T6") of a gas whose autoignition temperature is aitC in °C, and false
// when it is at or below 85 °C, under every class.
func TemperatureClass(aitC float64) (string, bool) {
	for i, lim := range tClassLimitsC {
		if aitC > lim {
			return fmt.Sprintf("T%d", i+1), true
		}
	}
	return "", false
}

// Ignition is the autoignition screen of a blend: the lowest
// autoignition temperature among its flammable components, and the
// temperature class it puts the blend in.
type Ignition struct {
	// LowestK is the lowest autoignition temperature known among the
	// flammable components present, K; 0 when none is known. Species is
	// whose it is.
	LowestK float64
	Species string
	// Unknown lists flammable components with no autoignition
	// temperature in the catalogue; Pyrophoric those that ignite in air
	// on their own at room temperature, for which no surface is cool
	// enough.
	Unknown, Pyrophoric []string
}

// Class is the blend's temperature class, and whether it is decided: a
// flammable component with no autoignition temperature may put it in a
// stricter class, and a pyrophoric one in none.
func (ig *Ignition) Class() (class string, decided bool) {
	if ig.LowestK == 0 || len(ig.Pyrophoric) > 0 {
		return "", false
	}
	class, ok := TemperatureClass(ig.LowestK - model.ZeroCelsiusK)
	return class, ok && len(ig.Unknown) == 0
}

// Verdict is the screen in words.
func (ig *Ignition) Verdict() string {
	if len(ig.Pyrophoric) > 0 {
		return "ignites in air at room temperature (" + strings.Join(ig.Pyrophoric, ", ") + " pyrophoric): no surface temperature is safe; keep air out"
	}
	if ig.LowestK == 0 {
		return "not known: no autoignition temperature for " + strings.Join(ig.Unknown, ", ")
	}
	s := fmt.Sprintf("%.0f °C (%.0f K, %s)", ig.LowestK-model.ZeroCelsiusK, ig.LowestK, ig.Species)
	class, ok := TemperatureClass(ig.LowestK - model.ZeroCelsiusK)
	switch {
	case !ok:
		s = "lowest of the components " + s + ": at or below 85 °C, under every temperature class"
	case len(ig.Unknown) > 0:
		s = "at most " + s + ": temperature class " + class + " or stricter by that figure (no autoignition temperature for " + strings.Join(ig.Unknown, ", ") + ")"
	default:
		s = "lowest of the components " + s + ": temperature class " + class + " by that figure"
	}
	return s
}

// ignition screens the flammable components present (x > 0).
func (r *Result) ignition(parts []Part, cite func(*model.Species, string)) {
	ig := &r.Ignition
	for _, p := range parts {
		sp := p.Species
		if sp.Hazards&model.Flammable == 0 || p.X <= 0 {
			continue
		}
		switch ait := sp.Safety.AutoIgnitionK; {
		case sp.Hazards&model.Pyrophoric != 0:
			ig.Pyrophoric = append(ig.Pyrophoric, sp.Formula)
		case ait == 0:
			ig.Unknown = append(ig.Unknown, sp.Formula)
		default:
			cite(sp, "autoign_K")
			if ig.LowestK == 0 || ait < ig.LowestK {
				ig.LowestK, ig.Species = ait, sp.Formula
			}
		}
	}
}

// SpeciesFigures are one component's safety figures as the
// classification read them. A zero is a figure the catalogue does not
// hold; Flammable, Oxidizer and Toxic say which figures apply.
type SpeciesFigures struct {
	Formula                    string
	X                          float64
	Flammable, Oxidizer, Toxic bool
	// Diluent is a component ISO 10156 counts as an inert diluent by
	// its Ki: neither fuel nor oxidizer, in a blend that holds a fuel.
	Diluent                       bool
	LFLPct, UFLPct, AutoIgnitionK float64
	TciPct, Ki, Ci                float64
	LC50FourHourPPM               float64 // 4 h rat LC50, ppm
	LC50Converted                 bool    // from a 1 h value, halved
}

// figures lists each component's figures, and cites the ones the
// classification did not already use, so that every figure a readout
// shows has its source listed.
func (r *Result) figures(parts []Part, cite func(*model.Species, string)) {
	fuel := len(r.Flammables) > 0
	for _, p := range parts {
		sp := p.Species
		sd := sp.Safety
		f := SpeciesFigures{
			Formula:   sp.Formula,
			X:         p.X,
			Flammable: sp.Hazards&model.Flammable != 0,
			Oxidizer:  sp.Hazards&model.Oxidizer != 0,
			Toxic:     sp.Hazards&model.Toxic != 0,
			Diluent:   fuel && sp.Hazards&(model.Flammable|model.Oxidizer) == 0,
			LFLPct:    sd.LFLPct, UFLPct: sd.UFLPct, AutoIgnitionK: sd.AutoIgnitionK,
			TciPct: sd.TciPct, Ki: sd.Ki, Ci: sd.Ci,
		}
		if sd.LC50.Known() {
			f.LC50FourHourPPM, f.LC50Converted = sd.LC50.FourHourPPM()
		}
		for _, c := range []struct {
			field string
			shown bool
		}{
			{"lfl_pct", f.LFLPct > 0}, {"ufl_pct", f.UFLPct > 0}, {"autoign_K", f.AutoIgnitionK > 0},
			{"tci_pct", f.TciPct > 0}, {"ki", f.Diluent && f.Ki > 0}, {"ci", f.Ci > 0}, {"lc50_ppm", f.LC50FourHourPPM > 0},
		} {
			if c.shown {
				cite(sp, c.field)
			}
		}
		r.Figures = append(r.Figures, f)
	}
}
