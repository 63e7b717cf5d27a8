package mixtures

import (
	"fmt"
	"strings"

	"zmix/mixtures/safety"
	"zmix/model"
)

// Caution is one safety reminder for a blend or a state.
type Caution struct {
	Title   string   // short heading, e.g. "Flammable"
	Species []string // the formulas it concerns, if any
	Text    string
}

// DeferLine closes every caution block.
const DeferLine = "These are reminders, not a hazard assessment: follow your site's codes, the safety data sheet of each gas, and licensed professional practice."

// Oxygen thresholds for breathing atmospheres, in mole fraction (common
// practice: 19.5 % and 23.5 % are the usual workplace limits).
const (
	oxygenDeficientX = 0.195
	oxygenEnrichedX  = 0.235
)

// highPressurePa is where stored-energy cautions start: 0.5 bar gauge, the
// usual threshold of pressure-equipment rules (common practice).
const highPressurePa = AtmospherePa + 0.5e5

// Cautions lists the safety reminders for the mixture at pressure presPa.
// An empty list means no caution applies.
func Cautions(m *Mixture, presPa float64) []Caution {
	byClass := map[model.Hazard][]string{}
	xO2 := 0.0
	for _, c := range m.Components {
		if c.Species.Formula == "O2" {
			xO2 += c.X
		}
		for _, h := range model.AllHazards() {
			if c.Species.Hazards&h != 0 {
				byClass[h] = append(byClass[h], c.Species.Formula)
			}
		}
	}
	cls := safety.Classify(SafetyParts(m))
	var out []Caution
	add := func(title string, species []string, text string) {
		out = append(out, Caution{Title: title, Species: species, Text: text})
	}
	if sp := byClass[model.Pyrophoric]; len(sp) > 0 {
		add("Pyrophoric", sp, "can ignite on its own on contact with air; keep systems leak-tight, purge with inert gas before opening, and vent to a treated exhaust.")
	}
	if sp := byClass[model.Flammable]; len(sp) > 0 {
		add("Flammable", sp, "keep ignition sources away, and purge with inert gas before and after service. "+flammableCite(&cls))
	}
	oxidizers := byClass[model.Oxidizer]
	if xO2 > 0 && xO2 <= oxygenEnrichedX {
		// Air-like oxygen does not make the blend an oxidizer hazard.
		oxidizers = without(oxidizers, "O2")
	}
	if len(oxidizers) > 0 {
		add("Oxidizer", oxidizers, "feeds combustion; keep away from oils, greases and fuels, and use equipment cleaned and rated for oxidizer service. ISO 10156 oxidizing power: "+cls.OxVerdict()+".")
	}
	if len(byClass[model.Flammable]) > 0 && len(oxidizers)+countIf(xO2 > 0) > 0 {
		add("Fuel with oxidizer", nil, "the blend holds both a fuel and an oxidizer; as stored: "+cls.Stored.String()+" (limits in air, Le Chatelier).")
	}
	if sp := byClass[model.Toxic]; len(sp) > 0 {
		add("Toxic", sp, "harmful at low concentrations; use gas detection, exhausted enclosures and the exposure limits on the safety data sheet. GHS acute inhalation toxicity: "+cls.ToxVerdict()+".")
	}
	if sp := byClass[model.Corrosive]; len(sp) > 0 {
		add("Corrosive", sp, "attacks tissue and many metals, worse with moisture; use compatible materials and keep lines dry.")
	}
	// Any gas short of oxygen suffocates, whatever its classes; the list
	// names the species whose main harm is just that.
	if sp := byClass[model.Asphyxiant]; xO2 < oxygenDeficientX {
		add("Asphyxiant", sp, fmt.Sprintf("the blend holds %.3g %% O2, below the 19.5 %% of a safe breathing atmosphere; a release in a closed space can cause collapse without warning. Ventilate and monitor oxygen.", 100*xO2))
	}
	if xO2 > oxygenEnrichedX {
		add("Oxygen-enriched", []string{"O2"}, fmt.Sprintf("the blend holds %.3g %% O2, above 23.5 %%: materials ignite more easily and burn faster.", 100*xO2))
	}
	if presPa > highPressurePa {
		add("Pressure", nil, fmt.Sprintf("%.4g bar absolute holds stored energy; use equipment rated for it, with relief protection.", presPa/1e5))
	}
	return out
}

func without(list []string, drop string) []string {
	var out []string
	for _, s := range list {
		if s != drop {
			out = append(out, s)
		}
	}
	return out
}

func countIf(b bool) int {
	if b {
		return 1
	}
	return 0
}

// FormatCaution writes one caution as a line of text.
func FormatCaution(c Caution) string {
	if len(c.Species) == 0 {
		return c.Title + ": " + c.Text
	}
	return c.Title + " (" + strings.Join(c.Species, ", ") + "): " + c.Text
}

// SafetyParts are the mixture's species and fractions, as package safety
// takes them.
func SafetyParts(m *Mixture) []safety.Part {
	parts := make([]safety.Part, len(m.Components))
	for i, c := range m.Components {
		parts[i] = safety.Part{Species: c.Species, X: c.X}
	}
	return parts
}

// flammableCite is the flammability figures a Flammable caution cites:
// the blend's limits in air, its ISO 10156 result and its autoignition
// screen (package safety).
func flammableCite(r *safety.Result) string {
	var lim string
	switch {
	case !r.LimitsKnown:
		lim = "Flammable limits in air: not known (no LFL/UFL for " + strings.Join(r.FlammableNoLimits, ", ") + ")"
	case !r.ReachesLFL:
		lim = fmt.Sprintf("Its %.3g %% fuel is below the fuel's LFL in air, %.3g %% (Le Chatelier)", r.FuelPct, r.FuelLFLPct)
	default:
		lim = "Flammable " + r.BlendRange() + " (Le Chatelier)"
	}
	s := lim + "; ISO 10156: " + r.FlamVerdict() + "."
	if len(r.Ignition.Pyrophoric) == 0 { // else the Pyrophoric caution says more
		s += " Autoignition: " + r.Ignition.Verdict() + "."
	}
	if r.Recalled {
		s += " These rest on recalled figures: check the SDS."
	}
	return s
}
