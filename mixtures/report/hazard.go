package report

import (
	"encoding/json"
	"fmt"
	"io"
	"math"
	"slices"
	"strings"

	"zmix/mixtures"
	"zmix/mixtures/safety"
	"zmix/model"
)

// HazardReport is a blend's safety classification as `zmix hazard` and
// the workbench show it.
type HazardReport struct {
	Label  string
	Result safety.Result
}

// ScreeningLine says what these figures are, under every hazard and
// release readout.
const ScreeningLine = "Screening calculations: they do not replace the safety data sheet, the applicable codes, gas-detection design or a qualified assessment."

func listOrNone(l []string) string {
	if len(l) == 0 {
		return "none"
	}
	return strings.Join(l, ", ")
}

// HazardLines are the classification as label–value rows, for the text
// readout and the workbench's safety details.
func HazardLines(r *safety.Result) [][2]string {
	var rows [][2]string
	add := func(k, v string) { rows = append(rows, [2]string{k, v}) }
	add("flammable", listOrNone(r.Flammables))
	if len(r.Flammables) > 0 {
		add("fuel in the blend", Sig(r.FuelPct, 4)+" %")
		switch {
		case !r.LimitsKnown:
			add("flammable limits", "not known: no LFL/UFL for "+strings.Join(r.FlammableNoLimits, ", "))
		default:
			add("LFL-UFL of the fuel", Sig(r.FuelLFLPct, 3)+"-"+Sig(r.FuelUFLPct, 3)+" % in air (Le Chatelier)")
			if r.ReachesLFL {
				add("LFL-UFL of the blend", r.BlendRange()+" (inert components not counted; see ISO 10156)")
				add("air to reach LFL", Sig(r.AirToLFL, 3)+" volumes per volume of blend")
			} else {
				add("LFL of the blend", "not reached: the fuel is below its LFL even undiluted")
			}
		}
		add("as stored", r.Stored.String())
		add("ISO 10156 flammability", r.FlamVerdict())
		add("autoignition", r.Ignition.Verdict())
		if len(r.NotDiluents) > 0 {
			add("not counted as diluents", strings.Join(r.NotDiluents, ", ")+" (no Ki: conservative)")
		}
	}
	add("oxidizers", listOrNone(r.Oxidizers))
	if len(r.Oxidizers) > 0 {
		add("ISO 10156 oxidizing", r.OxVerdict())
	}
	add("toxic", listOrNone(r.Toxics))
	if len(r.Toxics) > 0 {
		add("GHS inhalation", r.ToxVerdict())
	}
	add("pyrophoric", listOrNone(r.Pyrophorics))
	add("corrosive", listOrNone(r.Corrosives))
	return rows
}

// WriteHazardText writes the classification as text.
func WriteHazardText(w io.Writer, rep *HazardReport) error {
	r := &rep.Result
	fmt.Fprintf(w, "Blend  %s\n\n", model.Printable(rep.Label))
	fmt.Fprintln(w, "Hazard classification")
	t := NewTable("  ", Left, Left)
	for _, row := range HazardLines(r) {
		t.Row(row[0], row[1])
	}
	t.Write(w)
	writeSpeciesFigures(w, r.Figures)
	writeSafetyFooter(w, r.Recalled, r.Sources)
	return nil
}

// writeSpeciesFigures writes each component's safety figures, so that a
// verdict can be traced to the numbers behind it.
func writeSpeciesFigures(w io.Writer, figs []safety.SpeciesFigures) {
	lines := SpeciesFigureLines(figs)
	if len(lines) == 0 {
		return
	}
	fmt.Fprintln(w)
	for _, l := range lines {
		fmt.Fprintln(w, l)
	}
}

// SpeciesFigureLines is the table of each component's safety figures,
// with its heading and footnote, for zmix hazard and the workbench's
// safety details; none when no figure applies to any component.
func SpeciesFigureLines(figs []safety.SpeciesFigures) []string {
	if !slices.ContainsFunc(figs, func(f safety.SpeciesFigures) bool { return f.Flammable || f.Oxidizer || f.Toxic }) {
		return nil // no figure of any component applies
	}
	cell := func(applies bool, v float64, format func(float64) string) string {
		switch {
		case !applies:
			return "-"
		case v <= 0:
			return "?"
		}
		return format(v)
	}
	short := func(n int) func(float64) string { return func(v float64) string { return Short(v, n) } }
	celsius := func(k float64) string { return Fixed(k-model.ZeroCelsiusK, 0) }
	t := NewTable("  ", Left, Right, Right, Right, Right, Right, Right, Right)
	t.Row("", "x", "LFL-UFL", "autoign.", "Tci", "Ki", "Ci", "LC50 4 h")
	t.Row("", "%", "% in air", "°C", "% in N2", "", "", "ppm")
	converted := false
	for _, f := range figs {
		limits := "-"
		if f.Flammable {
			limits = "?"
			if f.LFLPct > 0 {
				limits = Short(f.LFLPct, 3) + "-" + Short(f.UFLPct, 3)
			}
		}
		lc50 := cell(f.Toxic, f.LC50FourHourPPM, short(4))
		if f.LC50Converted {
			lc50 += "*"
			converted = true
		}
		t.Row(f.Formula, Sig(100*f.X, 4), limits,
			cell(f.Flammable, f.AutoIgnitionK, celsius),
			cell(f.Flammable, f.TciPct, short(3)),
			cell(f.Diluent, f.Ki, short(3)),
			cell(f.Oxidizer, f.Ci, short(3)),
			lc50)
	}
	var b strings.Builder
	t.Write(&b)
	lines := append([]string{"Species figures (? not in the catalogue, - does not apply)"}, strings.Split(strings.TrimRight(b.String(), "\n"), "\n")...)
	if converted {
		lines = append(lines, "  * a 1 h LC50, halved to 4 h as GHS prescribes")
	}
	return lines
}

// writeSafetyFooter ends a safety readout (hazard, release): whether it
// rests on recalled figures, its methods and sources, and the line that
// defers to the data sheets, codes and a qualified assessment.
func writeSafetyFooter(w io.Writer, recalled bool, sources []string) {
	if recalled {
		fmt.Fprintln(w, "\n  Rests on figures recalled from the named compilations (\"from memory\"), not read from them.")
	}
	if len(sources) > 0 {
		fmt.Fprintln(w, "\nMethods and sources")
		for _, s := range sources {
			for i, l := range Wrap(s, 76) {
				if i == 0 {
					fmt.Fprintln(w, "  "+l)
				} else {
					fmt.Fprintln(w, "    "+l)
				}
			}
		}
	}
	fmt.Fprintln(w)
	for _, l := range Wrap(ScreeningLine+" "+mixtures.DeferLine, 78) {
		fmt.Fprintln(w, l)
	}
}

// hazardJSON is the JSON of `zmix hazard`; a null is a figure that does
// not apply or is not known, and "notes" says which.
type hazardJSON struct {
	Blend                  string              `json:"blend"`
	Flammable              []string            `json:"flammable"`
	FuelPercent            float64             `json:"fuel_percent"`
	LFLPercent             *float64            `json:"lfl_percent"`
	UFLPercent             *float64            `json:"ufl_percent"`
	FuelLFLPercent         *float64            `json:"fuel_lfl_percent"`
	FuelUFLPercent         *float64            `json:"fuel_ufl_percent"`
	AirToLFL               *float64            `json:"air_volumes_to_lfl"`
	AsStored               string              `json:"as_stored"`
	InsideRangeAsStored    *bool               `json:"inside_flammable_range_as_stored"`
	FlammableInAir         *bool               `json:"flammable_in_air"`
	FlammabilitySum        *float64            `json:"flammability_sum"`
	FlammabilitySumPartial *float64            `json:"flammability_sum_known_part"`
	FlammabilitySumAtLeast *float64            `json:"flammability_sum_at_least"`
	FlammabilitySumAtMost  *float64            `json:"flammability_sum_at_most"`
	Oxidizers              []string            `json:"oxidizers"`
	Oxidizing              *bool               `json:"oxidizing"`
	OxidizingSum           *float64            `json:"oxidizing_sum"`
	Toxic                  []string            `json:"toxic"`
	LC50PPM                *float64            `json:"lc50_ppm"`
	GHSCategory            *int                `json:"ghs_inhalation_category"`
	UnknownToxicityPercent float64             `json:"unknown_toxicity_percent"`
	LC50HalvedFrom1h       []string            `json:"lc50_converted_from_1h"`
	AutoignitionLowestK    *float64            `json:"autoignition_lowest_K"`
	AutoignitionSpecies    *string             `json:"autoignition_lowest_species"`
	TemperatureClass       *string             `json:"temperature_class"`
	Pyrophoric             []string            `json:"pyrophoric"`
	Corrosive              []string            `json:"corrosive"`
	Species                []hazardSpeciesJSON `json:"species"`
	Recalled               bool                `json:"rests_on_recalled_figures"`
	Notes                  []string            `json:"notes"`
	Sources                []string            `json:"sources"`
	Screening              string              `json:"screening"`
}

// hazardSpeciesJSON is one component's figures; null is a figure the
// catalogue does not hold or that does not apply (the three flags say
// which apply).
type hazardSpeciesJSON struct {
	Formula          string   `json:"formula"`
	MoleFraction     float64  `json:"mole_fraction"`
	Flammable        bool     `json:"flammable"`
	Oxidizer         bool     `json:"oxidizer"`
	Toxic            bool     `json:"toxic"`
	LFLPercent       *float64 `json:"lfl_percent"`
	UFLPercent       *float64 `json:"ufl_percent"`
	AutoignitionK    *float64 `json:"autoignition_K"`
	TciPercent       *float64 `json:"tci_percent"`
	Ki               *float64 `json:"ki"`
	Ci               *float64 `json:"ci"`
	LC50PPM4h        *float64 `json:"lc50_ppm_4h"`
	LC50HalvedFrom1h bool     `json:"lc50_converted_from_1h"`
}

// known is a figure for the JSON: null when it does not apply or is not
// held (zero).
func known(applies bool, v float64) *float64 {
	if !applies || v <= 0 {
		return nil
	}
	return fptr(v)
}

func fptr(x float64) *float64 {
	if math.IsNaN(x) || math.IsInf(x, 0) {
		return nil
	}
	return &x
}

func bptr(b bool) *bool { return &b }

func nonNil(l []string) []string {
	if l == nil {
		return []string{}
	}
	return l
}

// WriteHazardJSON writes the classification as one JSON object.
func WriteHazardJSON(w io.Writer, rep *HazardReport) error {
	r := &rep.Result
	j := hazardJSON{
		Blend:                  model.Printable(rep.Label),
		Flammable:              nonNil(r.Flammables),
		FuelPercent:            r.FuelPct,
		AsStored:               r.Stored.String(),
		Oxidizers:              nonNil(r.Oxidizers),
		Toxic:                  nonNil(r.Toxics),
		UnknownToxicityPercent: r.UnknownToxPct,
		LC50HalvedFrom1h:       nonNil(r.Converted),
		Pyrophoric:             nonNil(r.Pyrophorics),
		Corrosive:              nonNil(r.Corrosives),
		Recalled:               r.Recalled,
		Notes:                  nonNil(r.Summary()),
		Sources:                nonNil(r.Sources),
		Screening:              ScreeningLine,
	}
	j.Species = []hazardSpeciesJSON{}
	for _, f := range r.Figures {
		j.Species = append(j.Species, hazardSpeciesJSON{
			Formula: f.Formula, MoleFraction: f.X,
			Flammable: f.Flammable, Oxidizer: f.Oxidizer, Toxic: f.Toxic,
			LFLPercent:       known(f.Flammable, f.LFLPct),
			UFLPercent:       known(f.Flammable, f.UFLPct),
			AutoignitionK:    known(f.Flammable, f.AutoIgnitionK),
			TciPercent:       known(f.Flammable, f.TciPct),
			Ki:               known(f.Diluent, f.Ki),
			Ci:               known(f.Oxidizer, f.Ci),
			LC50PPM4h:        known(f.Toxic, f.LC50FourHourPPM),
			LC50HalvedFrom1h: f.LC50Converted,
		})
	}
	if ig := r.Ignition; ig.LowestK > 0 && len(ig.Pyrophoric) == 0 {
		j.AutoignitionLowestK = fptr(ig.LowestK)
		sp := ig.Species
		j.AutoignitionSpecies = &sp
		if class, ok := ig.Class(); ok {
			j.TemperatureClass = &class
		}
	}
	if r.LimitsKnown {
		j.FuelLFLPercent, j.FuelUFLPercent = fptr(r.FuelLFLPct), fptr(r.FuelUFLPct)
		if r.ReachesLFL {
			j.LFLPercent, j.UFLPercent, j.AirToLFL = fptr(r.LFLPct), fptr(r.UFLPct), fptr(r.AirToLFL)
		}
	}
	switch r.Stored {
	case safety.StoredInside:
		j.InsideRangeAsStored = bptr(true)
	case safety.StoredNoFuel, safety.StoredNoOxidizer, safety.StoredBelow:
		j.InsideRangeAsStored = bptr(false)
	}
	if r.FlamKnown {
		j.FlammableInAir = bptr(r.FlamInAir)
	}
	if r.FlamSumKnown {
		j.FlammabilitySum = fptr(r.FlamSum)
	} else {
		j.FlammabilitySumPartial = fptr(r.FlamSum)
		j.FlammabilitySumAtLeast = fptr(r.FlamSumMin)
		if r.FlamSumMaxKnown {
			j.FlammabilitySumAtMost = fptr(r.FlamSumMax)
		}
	}
	if r.OxKnown {
		j.Oxidizing = bptr(r.Oxidizing)
	}
	if r.OxSumKnown {
		j.OxidizingSum = fptr(r.OxSum)
	}
	if r.LC50Known {
		j.LC50PPM = fptr(r.LC50PPM)
		if r.Category > 0 {
			c := r.Category
			j.GHSCategory = &c
		}
	}
	enc := json.NewEncoder(w)
	enc.SetIndent("", "  ")
	return enc.Encode(j)
}

// writeSpeciesSafety writes a species' safety figures with their sources
// for `zmix catalog FORMULA`: the figures its classes call for say "not
// known" when the catalogue has none.
func writeSpeciesSafety(w io.Writer, sp *model.Species) {
	sd := sp.Safety
	h := sp.Hazards
	type row struct {
		label, field  string
		known, wanted bool
		value         string
	}
	rows := []row{
		{"flammable limits in air", "lfl_pct", sd.LFLPct > 0, h&model.Flammable != 0, Short(sd.LFLPct, 4) + "-" + Short(sd.UFLPct, 4) + " % by volume"},
		{"autoignition", "autoign_K", sd.AutoIgnitionK > 0, false, Short(sd.AutoIgnitionK, 5) + " K"},
		{"ISO 10156 Tci", "tci_pct", sd.TciPct > 0, h&model.Flammable != 0, Short(sd.TciPct, 4) + " % in N2"},
		{"ISO 10156 Ki", "ki", sd.Ki > 0, false, Short(sd.Ki, 4)},
		{"ISO 10156 Ci", "ci", sd.Ci > 0, h&model.Oxidizer != 0, Short(sd.Ci, 4)},
		{"LC50, rat", "lc50_ppm", sd.LC50.Known(), h&model.Toxic != 0, sd.LC50.String()},
		{"exposure limit", "oel_ppm", sd.Exposure.Known(), false, sd.Exposure.String()},
	}
	shown := false
	for _, r := range rows {
		shown = shown || r.known || r.wanted
	}
	if !shown {
		return
	}
	fmt.Fprintln(w, "\nSafety figures (zmix hazard and zmix release use them)")
	t := NewTable("  ", Left, Left)
	for _, r := range rows {
		switch {
		case r.known:
			v := r.value
			if src := sp.Sources[r.field]; src != "" {
				v += "  [" + model.Printable(src) + "]"
			}
			t.Row(r.label, v)
		case r.wanted:
			t.Row(r.label, "not known")
		}
	}
	t.Write(w)
}
