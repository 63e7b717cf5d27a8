package process

import (
	"fmt"
	"strings"

	"zmix/mixtures"
	"zmix/model"
)

// Thresholds of the temperature cautions (common practice).
const (
	// HotGasK: surfaces above about 60 °C burn on contact.
	HotGasK = 333.15
	// ColdGasK: below 0 °C moisture freezes and frost forms on lines.
	ColdGasK = model.ZeroCelsiusK
)

// temperatureCautions are the reminders for a gas of mix that a process
// brings to tempK: hot gas, a flammable gas at or above its autoignition
// temperature (or hot with none in the catalogue), cold gas, and a species
// below its normal boiling point.
func temperatureCautions(mix *mixtures.Mixture, tempK float64, where string) []mixtures.Caution {
	var out []mixtures.Caution
	if tempK > HotGasK {
		out = append(out, mixtures.Caution{Title: "Hot gas", Text: fmt.Sprintf(
			"the %s reaches %.4g °C, above the 60 °C at which surfaces burn on contact; insulate or guard hot parts and check the rating of seals, lubricants and downstream equipment.",
			where, mixtures.KelvinToCelsius(tempK))})
		// A flammable gas made hot: against its autoignition temperature
		// where the catalogue has one, else a reminder to look it up.
		// One caution for every species above its autoignition
		// temperature, each named with its figure and source.
		var unknown, above, figures []string
		for _, c := range mix.Components {
			sp := c.Species
			if sp.Hazards&(model.Flammable|model.Pyrophoric) == 0 {
				continue
			}
			ait := sp.Safety.AutoIgnitionK
			switch {
			case ait <= 0:
				unknown = append(unknown, sp.Formula)
			case tempK >= ait:
				src := sp.Sources["autoign_K"]
				if src == "" {
					src = "the catalogue"
				}
				above = append(above, sp.Formula)
				figures = append(figures, fmt.Sprintf("%s, %.4g °C (%s)", sp.Formula, mixtures.KelvinToCelsius(ait), src))
			}
		}
		if len(above) > 0 {
			out = append(out, mixtures.Caution{Title: "Above autoignition", Species: above, Text: fmt.Sprintf(
				"the %s, %.4g °C, is at or above the autoignition temperature in air of %s: any air let in can ignite it without a spark.",
				where, mixtures.KelvinToCelsius(tempK), strings.Join(figures, "; of "))})
		}
		if len(unknown) > 0 {
			out = append(out, mixtures.Caution{Title: "Hot flammable gas", Species: unknown, Text: fmt.Sprintf(
				"the catalogue holds no autoignition temperature for these; compare the %s temperature, %.4g °C, with the one on the safety data sheet, and keep air out.",
				where, mixtures.KelvinToCelsius(tempK))})
		}
	}
	if tempK < ColdGasK {
		out = append(out, mixtures.Caution{Title: "Cold gas", Text: fmt.Sprintf(
			"the %s falls to %.4g °C: moisture freezes, lines frost, and some materials turn brittle; check their rating for the low temperature.",
			where, mixtures.KelvinToCelsius(tempK))})
	}
	var condense []string
	for _, c := range mix.Components {
		if c.Species.BoilingK > 0 && tempK < c.Species.BoilingK {
			condense = append(condense, c.Species.Formula)
		}
	}
	if len(condense) > 0 {
		out = append(out, mixtures.Caution{Title: "Condensation", Species: condense, Text: fmt.Sprintf(
			"the %s, %.4g K, is below the normal boiling point of these species: they may condense, and the ideal-gas figures do not hold there.",
			where, tempK)})
	}
	return out
}

// realGasCautions says, at each point a process takes the blend to, how
// far the ideal gas its figures assume is from the real one, where that
// is more than the state readout's 1 % in density or outside every
// model: the process figures are then estimates (the readout's own rule,
// mixtures.RealGasNote).
func realGasCautions(points ...processPoint) []mixtures.Caution {
	var parts []string
	var st mixtures.State
	for _, pt := range points {
		if pt.gas.State(&st, pt.tempK, pt.presPa) != nil {
			continue
		}
		if n, ok := mixtures.RealGasNote(&st); ok {
			parts = append(parts, fmt.Sprintf("at the %s, %.4g bar and %.4g K, %s", pt.where, pt.presPa/1e5, pt.tempK, strings.TrimSuffix(n.Text, ".")))
		}
	}
	if len(parts) == 0 {
		return nil
	}
	return []mixtures.Caution{{Title: "Real gas", Text: strings.Join(parts, "; ") +
		". The figures here assume the ideal gas; take them as estimates there."}}
}

// processPoint is a state a process passes through, named for cautions:
// the gas there (a mixer's streams differ from its outlet) at (T, P).
type processPoint struct {
	where         string
	gas           Gas
	tempK, presPa float64
}
