package main

import (
	"bytes"
	"encoding/json"
	"fmt"
	"io"
	"strings"

	"zmix/mixtures"
	"zmix/model"
)

// stateConfig is everything `zmix state` needs, parsed and checked.
type stateConfig struct {
	src      *blendSource
	temp     temperature
	pres     pressure
	stdPa    float64
	format   outputFormat
	allNotes bool
	ascii    bool
}

func (a *app) cmdState(g *globalOpts, args []string) error {
	fs := newFlagSet("zmix state")
	var blendSpec, tempText, presText, stdText string
	var asJSON, asCSV, allNotes bool
	fs.StringVar(&blendSpec, "blend", "", "the blend: `SPEC` text, or @FILE for a saved blend file")
	fs.StringVar(&tempText, "temp", "", "temperature `T` with a unit: K, C, F or R")
	fs.StringVar(&presText, "pres", "", "total pressure `P` with a unit: Pa, kPa, MPa, bar, mbar, atm, Torr, psi, barg, psig")
	fs.StringVar(&stdText, "std", "", "standard pressure P° of μ°: `1bar` (default) or 1atm")
	fs.BoolVar(&asJSON, "json", false, "write one JSON object")
	fs.BoolVar(&asCSV, "csv", false, "write CSV: a header row and one row")
	fs.BoolVar(&allNotes, "all-notes", false, "list every validity figure, not only the cautions")
	g.register(fs, false)
	rest, err := parseFlags(fs, args, true)
	if err != nil {
		return err
	}
	if err := noArgs("state", rest); err != nil {
		return err
	}
	format, err := pickFormat(asJSON, asCSV)
	if err != nil {
		return err
	}
	src, err := readBlend(blendSpec)
	if err != nil {
		return err
	}
	given := flagsGiven(fs)
	cfg, err := stateConditions(src, src.pick(given, "temp", tempText), src.pick(given, "pres", presText), src.pick(given, "std", stdText))
	if err != nil {
		return err
	}
	cfg.format, cfg.allNotes, cfg.ascii = format, allNotes, g.ascii
	cat, err := g.catalogue()
	if err != nil {
		return err
	}
	return a.printState(cat, cfg)
}

// stateConditions parses the temperature, pressure and standard pressure
// of a state readout.
func stateConditions(src *blendSource, tempText, presText, stdText string) (stateConfig, error) {
	cfg := stateConfig{src: src}
	if strings.TrimSpace(tempText) == "" {
		return cfg, badInput("--temp is missing; give the temperature with a unit (%s), e.g. --temp 25C or --temp 300K", mixtures.TemperatureUnits)
	}
	var err error
	if cfg.temp, err = parseTemperature("--temp", tempText); err != nil {
		return cfg, err
	}
	if cfg.pres, err = totalPressure(src, presText); err != nil {
		return cfg, err
	}
	if cfg.stdPa, err = parseStd(stdText); err != nil {
		return cfg, err
	}
	return cfg, nil
}

// stateReport is one computed state with what is shown beside it.
type stateReport struct {
	cfg      stateConfig
	state    mixtures.State
	cautions []mixtures.Caution
	notes    []mixtures.StateNote
}

func computeState(cat *model.Catalogue, cfg stateConfig) (*stateReport, error) {
	mix, err := cfg.src.blend.Resolve(cat, cfg.pres.Pa)
	if err != nil {
		return nil, badInput("--blend: %v", err)
	}
	st, err := mix.State(cfg.temp.kelvin, cfg.pres.Pa, mixtures.Options{StdPresPa: cfg.stdPa})
	if err != nil {
		return nil, badInput("%v", err)
	}
	rec := st.Record(cfg.pres.Gauge)
	if err := checkFinite(rec); err != nil {
		return nil, err
	}
	return &stateReport{
		cfg:      cfg,
		state:    st,
		cautions: mixtures.Cautions(mix, cfg.pres.Pa),
		notes:    mixtures.Notes(&st, cfg.allNotes),
	}, nil
}

func (a *app) printState(cat *model.Catalogue, cfg stateConfig) error {
	rep, err := computeState(cat, cfg)
	if err != nil {
		return err
	}
	var out bytes.Buffer
	switch cfg.format {
	case formatJSON:
		err = writeStateJSON(&out, rep)
	case formatCSV:
		err = mixtures.WriteCSV(&out, []mixtures.State{rep.state}, cfg.pres.Gauge)
		if err == nil {
			// CSV has no room for them, and they must not be lost.
			a.cautionsToStderr(rep.cautions)
		}
	default:
		err = writeStateText(page(&out, cfg.ascii), rep)
	}
	if err != nil {
		return err
	}
	return a.emit(&out)
}

func (a *app) cautionsToStderr(cautions []mixtures.Caution) {
	if len(cautions) == 0 {
		return
	}
	for _, c := range cautions {
		fmt.Fprintln(a.stderr, "zmix: caution: "+mixtures.FormatCaution(c))
	}
	fmt.Fprintln(a.stderr, "zmix: caution: "+mixtures.DeferLine)
}

// stateJSON is the exported record with the cautions and validity notes
// as plain strings beside it.
type stateJSON struct {
	mixtures.Record
	Cautions []string `json:"cautions,omitempty"`
	Notes    []string `json:"notes,omitempty"`
}

func writeStateJSON(w io.Writer, rep *stateReport) error {
	doc := stateJSON{Record: rep.state.Record(rep.cfg.pres.Gauge)}
	for _, c := range rep.cautions {
		doc.Cautions = append(doc.Cautions, mixtures.FormatCaution(c))
	}
	if len(doc.Cautions) > 0 {
		doc.Cautions = append(doc.Cautions, mixtures.DeferLine)
	}
	for _, n := range rep.notes {
		doc.Notes = append(doc.Notes, noteText(n))
	}
	enc := json.NewEncoder(w)
	enc.SetIndent("", "  ")
	return enc.Encode(doc)
}

func noteText(n mixtures.StateNote) string {
	if n.Species == "" {
		return n.Severity.String() + ": " + n.Text
	}
	return n.Severity.String() + ": " + n.Species + ": " + n.Text
}

// pageWidth is where the prose of a readout wraps.
const pageWidth = 78

func writeStateText(w io.Writer, rep *stateReport) error {
	var n numbers
	st := &rep.state
	cfg := rep.cfg

	fmt.Fprintf(w, "Blend  %s\n\n", cfg.src.label())

	fmt.Fprintln(w, "Conditions")
	cond := newTable("  ", left, left)
	cond.row("temperature T", fmt.Sprintf("%s K  (%s °C)", n.short("temperature", st.TempK, 6), n.fixed("temperature", st.TempK-273.15, 2)))
	cond.row("pressure P", pressureText(&n, cfg.pres, st.PresPa))
	cond.row("standard pressure P°", stdLabel(st.StdPresPa)+", for μ°")
	cond.write(w)
	fmt.Fprintln(w)

	mm := st.MolarMassKgPerMol
	perKg := func(x float64) float64 { return x / mm }
	fmt.Fprintln(w, "Mixture")
	props := newTable("  ", left, right, left, right, left)
	props.row("", "per mole", "", "per kilogram", "")
	props.row("molar mass M", n.sig("molar mass", 1000*mm, 6), "g/mol")
	props.row("density ρ", n.sig("density", st.DensityKgPerM3, 5), "kg/m³")
	props.row("heat capacity Cp", n.sig("Cp", st.CpJPerMolK, 5), "J/(mol·K)", n.sig("Cp", perKg(st.CpJPerMolK), 5), "J/(kg·K)")
	props.row("heat capacity Cv", n.sig("Cv", st.CvJPerMolK, 5), "J/(mol·K)", n.sig("Cv", perKg(st.CvJPerMolK), 5), "J/(kg·K)")
	props.row("γ = Cp/Cv", n.sig("gamma", st.Gamma, 5), "")
	props.row("speed of sound c", n.sig("speed of sound", st.SoundSpeedMPerS, 5), "m/s")
	props.row("enthalpy H", n.fixed("H", st.HJPerMol/1000, 3), "kJ/mol", n.fixed("H", perKg(st.HJPerMol)/1000, 3), "kJ/kg")
	props.row("internal energy U", n.fixed("U", st.UJPerMol/1000, 3), "kJ/mol", n.fixed("U", perKg(st.UJPerMol)/1000, 3), "kJ/kg")
	props.row("entropy S", n.sig("S", st.SJPerMolK, 6), "J/(mol·K)", n.sig("S", perKg(st.SJPerMolK), 6), "J/(kg·K)")
	props.row("Gibbs energy G", n.fixed("G", st.GJPerMol/1000, 3), "kJ/mol", n.fixed("G", perKg(st.GJPerMol)/1000, 3), "kJ/kg")
	props.row("Helmholtz energy A", n.fixed("A", st.AJPerMol/1000, 3), "kJ/mol", n.fixed("A", perKg(st.AJPerMol)/1000, 3), "kJ/kg")
	props.write(w)
	fmt.Fprintf(w, "  mixing entropy  %s J/(mol·K)  (−R Σ xᵢ ln xᵢ, included in S)\n\n", n.sig("mixing entropy", st.SMixJPerMolK, 5))

	fmt.Fprintln(w, "Species, each at its partial pressure")
	sp := newTable("  ", left, right, right, right, right, right, right, right, right)
	sp.row("", "x", "mass", "p", "μ", "S", "Cp", "share", "share")
	sp.row("", "mol/mol", "kg/kg", "kPa", "kJ/mol", "J/(mol·K)", "J/(mol·K)", "of S", "of Cp")
	for _, t := range st.Species {
		f := t.Species.Formula
		sp.row(f,
			n.sig(f+" x", t.X, 4),
			n.sig(f+" mass fraction", t.MassFrac, 4),
			n.sig(f+" partial pressure", t.PartialPresPa/1000, 4),
			n.fixed(f+" μ", t.MuJPerMol/1000, 3),
			n.sig(f+" S", t.SJPerMolK, 5),
			n.sig(f+" Cp", t.CpJPerMolK, 4),
			percent(&n, f+" share of S", t.SShareJPerMolK, st.SJPerMolK),
			percent(&n, f+" share of Cp", t.CpShareJPerMolK, st.CpJPerMolK))
	}
	sp.write(w)
	fmt.Fprintf(w, "  μᵢ = μᵢ°(T) + RT ln(xᵢP/P°), on the scale of the elements at 0 K\n\n")

	writeNotes(w, rep.notes)
	fmt.Fprintln(w)
	writeCautions(w, rep.cautions)
	return n.err()
}

// pressureText shows the total pressure as entered, with its absolute
// value, and flags gauge input.
func pressureText(n *numbers, p pressure, presPa float64) string {
	bar := n.short("pressure", presPa/1e5, 6)
	abs := bar + " bar absolute"
	pa := n.short("pressure", presPa, 7) + " Pa"
	typed := strings.ToLower(strings.Join(strings.Fields(p.text), ""))
	switch {
	case p.text == "":
		return abs + "  (sum of the partial pressures)"
	case p.Gauge:
		return strings.TrimSpace(p.text) + " (gauge; " + abs + ")"
	case typed == bar+"bar" || typed == bar+"bara":
		return abs + " (" + pa + ")" // already in bar: say it once
	}
	return strings.TrimSpace(p.text) + " (" + abs + ", " + pa + ")"
}

func percent(n *numbers, what string, part, whole float64) string {
	if whole == 0 {
		return "-"
	}
	return n.fixed(what, 100*part/whole, 1) + " %"
}

func writeNotes(w io.Writer, notes []mixtures.StateNote) {
	fmt.Fprintln(w, "Validity")
	if len(notes) == 0 {
		fmt.Fprintln(w, "  no cautions from the model at this state (--all-notes lists n/nQ, T/Θrot and T/Θvib per species)")
		return
	}
	for _, note := range notes {
		writeWrapped(w, "  ", "    ", noteText(note))
	}
}

func writeCautions(w io.Writer, cautions []mixtures.Caution) {
	fmt.Fprintln(w, "Cautions")
	if len(cautions) == 0 {
		fmt.Fprintln(w, "  none flagged for these gases at this pressure.")
	}
	for _, c := range cautions {
		writeWrapped(w, "  ", "    ", mixtures.FormatCaution(c))
	}
	writeWrapped(w, "  ", "  ", mixtures.DeferLine)
}

// writeWrapped writes text wrapped at pageWidth, with the first line after
// first and the rest after rest.
func writeWrapped(w io.Writer, first, rest, text string) {
	text = forWriter(w, text)
	line := first
	width := len([]rune(first))
	lineHasWord := false
	for _, word := range strings.Fields(text) {
		wl := len([]rune(word))
		if lineHasWord && width+1+wl > pageWidth {
			fmt.Fprintln(w, line)
			line, width, lineHasWord = rest, len([]rune(rest)), false
		}
		if lineHasWord {
			line += " "
			width++
		}
		line += word
		width += wl
		lineHasWord = true
	}
	fmt.Fprintln(w, line)
}
