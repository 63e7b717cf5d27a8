package main

import (
	"bytes"
	"fmt"
	"io"
	"strings"

	"zmix/mixtures"
	"zmix/model"
)

// defaultSweepSteps is the number of points when --steps is not given: ten
// intervals, which reads well as a table.
const defaultSweepSteps = 11

// sweepConfig is everything `zmix sweep` needs, parsed and checked.
type sweepConfig struct {
	src        *blendSource
	sweep      mixtures.Sweep
	fixedTemp  temperature // used by a pressure sweep
	fixedPres  pressure    // used by a temperature sweep
	rangeText  string
	rangeGauge bool // a pressure range given in barg or psig
	stdPa      float64
	format     outputFormat
	ascii      bool
}

func (a *app) cmdSweep(g *globalOpts, args []string) error {
	fs := newFlagSet("zmix sweep")
	var blendSpec, tempText, presText, stdText string
	var asJSON, asCSV, logGrid bool
	steps := stepsFlag{defaultSweepSteps}
	fs.StringVar(&blendSpec, "blend", "", "the blend: `SPEC` text, or @FILE for a saved blend file")
	fs.StringVar(&tempText, "temp", "", "temperature: a range `A..B` to sweep (300..1500K), or the fixed value of a pressure sweep")
	fs.StringVar(&presText, "pres", "", "pressure: a range `A..B` to sweep (1..50bar), or the fixed value of a temperature sweep")
	fs.Var(&steps, "steps", "number of points `N`, end points included")
	fs.BoolVar(&logGrid, "log", false, "space a temperature sweep evenly in ln T (pressure sweeps always are in ln P)")
	fs.StringVar(&stdText, "std", "", "standard pressure P° of μ°: `1bar` (default) or 1atm")
	fs.BoolVar(&asJSON, "json", false, "write a JSON list of state objects, one per point")
	fs.BoolVar(&asCSV, "csv", false, "write CSV: a header row, then one row per point")
	g.register(fs, false)
	rest, err := parseFlags(fs, args, true)
	if err != nil {
		return err
	}
	if err := noArgs("sweep", rest); err != nil {
		return err
	}
	format, err := pickFormat(asJSON, asCSV)
	if err != nil {
		return err
	}
	tempIsRange, presIsRange := strings.Contains(tempText, ".."), strings.Contains(presText, "..")
	switch {
	case tempIsRange && presIsRange:
		return badInput("--temp %q and --pres %q are both ranges; sweep one and give the other as one value, e.g. --temp 300..1500K --pres 1atm", tempText, presText)
	case !tempIsRange && !presIsRange:
		return badInput("nothing to sweep; give --temp A..B (e.g. 300..1500K) with a fixed --pres, or --pres A..B (e.g. 1..50bar) with a fixed --temp")
	}
	src, err := readBlend(blendSpec)
	if err != nil {
		return err
	}
	given := flagsGiven(fs)
	cfg := sweepConfig{src: src, format: format, ascii: g.ascii}
	if cfg.stdPa, err = parseStd(src.pick(given, "std", stdText)); err != nil {
		return err
	}
	cfg.sweep = mixtures.Sweep{Steps: steps.n, Log: logGrid}
	if tempIsRange {
		err = cfg.temperatureSweep(tempText, src.pick(given, "pres", presText))
	} else {
		err = cfg.pressureSweep(presText, src.pick(given, "temp", tempText))
	}
	if err != nil {
		return err
	}
	if err := cfg.sweep.Check(); err != nil {
		return badInput("%v", err)
	}
	cat, err := g.catalogue()
	if err != nil {
		return err
	}
	return a.printSweep(cat, cfg)
}

func (cfg *sweepConfig) temperatureSweep(rangeText, presText string) error {
	from, to, err := mixtures.ParseRange(rangeText)
	if err != nil {
		return badInput("--temp: %v", err)
	}
	t1, err := parseTemperature("--temp", from)
	if err != nil {
		return err
	}
	t2, err := parseTemperature("--temp", to)
	if err != nil {
		return err
	}
	if cfg.fixedPres, err = totalPressure(cfg.src, presText); err != nil {
		return err
	}
	cfg.sweep.Var, cfg.sweep.From, cfg.sweep.To = mixtures.SweepTemperature, t1.kelvin, t2.kelvin
	cfg.rangeText = rangeText
	return nil
}

func (cfg *sweepConfig) pressureSweep(rangeText, tempText string) error {
	from, to, err := mixtures.ParseRange(rangeText)
	if err != nil {
		return badInput("--pres: %v", err)
	}
	p1, err := parsePressure("--pres", from)
	if err != nil {
		return err
	}
	p2, err := parsePressure("--pres", to)
	if err != nil {
		return err
	}
	if p1.Gauge != p2.Gauge {
		return badInput("--pres %q mixes gauge and absolute end points; give both as gauge (1..10barg) or both absolute (1..10bar)", rangeText)
	}
	if cfg.src.blend.HasPartialPressures() {
		return badInput("--blend gives partial pressures, which fix the total; a pressure sweep needs amounts as fractions (%%, ppm, mass %%, bal)")
	}
	if strings.TrimSpace(tempText) == "" {
		return badInput("--temp is missing; a pressure sweep holds the temperature fixed: give it with a unit (%s), e.g. --temp 25C", mixtures.TemperatureUnits)
	}
	if cfg.fixedTemp, err = parseTemperature("--temp", tempText); err != nil {
		return err
	}
	cfg.sweep.Var, cfg.sweep.From, cfg.sweep.To = mixtures.SweepPressure, p1.Pa, p2.Pa
	cfg.rangeText, cfg.rangeGauge = rangeText, p1.Gauge
	return nil
}

// gauge says whether the sweep's pressures were entered as gauge.
func (cfg *sweepConfig) gauge() bool {
	if cfg.sweep.Var == mixtures.SweepPressure {
		return cfg.rangeGauge
	}
	return cfg.fixedPres.Gauge
}

func (a *app) printSweep(cat *model.Catalogue, cfg sweepConfig) error {
	// The composition is fixed over the sweep; partial pressures, allowed
	// in temperature sweeps only, are taken at the fixed total.
	resolvePa := cfg.fixedPres.Pa
	if cfg.sweep.Var == mixtures.SweepPressure {
		resolvePa = cfg.sweep.From
	}
	mix, err := cfg.src.blend.Resolve(cat, resolvePa)
	if err != nil {
		return badInput("--blend: %v", err)
	}
	res, err := mix.Run(cfg.sweep, cfg.fixedTemp.kelvin, cfg.fixedPres.Pa, mixtures.Options{StdPresPa: cfg.stdPa})
	if err != nil {
		return badInput("%v", err)
	}
	gauge := cfg.gauge()
	for i := range res.Points {
		if err := checkFinite(res.Points[i].Record(gauge)); err != nil {
			return badInput("at point %d of the sweep: %v", i+1, err)
		}
	}
	highPa := res.Points[0].PresPa
	for i := range res.Points {
		highPa = max(highPa, res.Points[i].PresPa)
	}
	cautions := mixtures.Cautions(mix, highPa)

	var out bytes.Buffer
	switch cfg.format {
	case formatJSON:
		err = mixtures.WriteSweepJSON(&out, res, gauge)
	case formatCSV:
		err = mixtures.WriteCSV(&out, res.Points, gauge)
	default:
		err = writeSweepText(page(&out, cfg.ascii), cfg, mix, res, cautions)
	}
	if err != nil {
		return err
	}
	if cfg.format != formatText {
		a.cautionsToStderr(cautions)
	}
	return a.emit(&out)
}

func writeSweepText(w io.Writer, cfg sweepConfig, mix *mixtures.Mixture, res *mixtures.SweepResult, cautions []mixtures.Caution) error {
	var n numbers
	fmt.Fprintf(w, "Blend  %s\n", cfg.src.label())
	fmt.Fprintf(w, "       M = %s g/mol\n", n.sig("molar mass", 1000*mix.MolarMassKgPerMol, 6))
	grid := "linear grid"
	if cfg.sweep.Log || cfg.sweep.Var == mixtures.SweepPressure {
		grid = "log grid"
	}
	if cfg.sweep.Var == mixtures.SweepTemperature {
		fmt.Fprintf(w, "Sweep  T %s (%s to %s K), %d points, %s; P = %s\n",
			strings.TrimSpace(cfg.rangeText), n.short("T", cfg.sweep.From, 6), n.short("T", cfg.sweep.To, 6),
			cfg.sweep.Steps, grid, pressureText(&n, cfg.fixedPres, cfg.fixedPres.Pa))
	} else {
		kind := "absolute"
		if cfg.rangeGauge {
			kind = "entered as gauge"
		}
		fmt.Fprintf(w, "Sweep  P %s (%s to %s bar %s), %d points, %s; T = %s K\n",
			strings.TrimSpace(cfg.rangeText), n.short("P", cfg.sweep.From/1e5, 6), n.short("P", cfg.sweep.To/1e5, 6), kind,
			cfg.sweep.Steps, grid, n.short("T", cfg.fixedTemp.kelvin, 6))
	}
	fmt.Fprintf(w, "       P° = %s; μ = μ°(T) + RT ln(xP/P°), on the scale of the elements at 0 K\n\n", stdLabel(cfg.stdPa))

	aligns := []align{}
	for range 9 + len(mix.Components) {
		aligns = append(aligns, right)
	}
	t := newTable("  ", aligns...)
	names := []string{"T", "P", "ρ", "Cp", "γ", "c", "H", "S", "G"}
	units := []string{"K", "bar", "kg/m³", "J/(mol·K)", "", "m/s", "kJ/mol", "J/(mol·K)", "kJ/mol"}
	for _, c := range mix.Components {
		names = append(names, "μ "+c.Species.Formula)
		units = append(units, "kJ/mol")
	}
	t.row(names...)
	t.row(units...)
	for i := range res.Points {
		p := &res.Points[i]
		cells := []string{
			n.short("T", p.TempK, 6),
			n.sig("P", p.PresPa/1e5, 5),
			n.sig("density", p.DensityKgPerM3, 5),
			n.sig("Cp", p.CpJPerMolK, 5),
			n.sig("gamma", p.Gamma, 5),
			n.sig("speed of sound", p.SoundSpeedMPerS, 5),
			n.fixed("H", p.HJPerMol/1000, 3),
			n.sig("S", p.SJPerMolK, 6),
			n.fixed("G", p.GJPerMol/1000, 3),
		}
		for _, sp := range p.Species {
			cells = append(cells, n.fixed("μ "+sp.Species.Formula, sp.MuJPerMol/1000, 3))
		}
		t.row(cells...)
	}
	t.write(w)
	fmt.Fprintln(w)

	// Validity is worst at one end or the other of a monotone sweep.
	first, last := &res.Points[0], &res.Points[len(res.Points)-1]
	fmt.Fprintln(w, "Validity at the end points")
	noted := false
	for _, end := range []*mixtures.State{first, last} {
		for _, note := range mixtures.Notes(end, false) {
			writeWrapped(w, "  ", "    ", fmt.Sprintf("at %s K, %s bar: %s", n.short("T", end.TempK, 6), n.short("P", end.PresPa/1e5, 6), noteText(note)))
			noted = true
		}
	}
	if !noted {
		fmt.Fprintln(w, "  no cautions from the model at either end of the sweep")
	}
	fmt.Fprintln(w)
	writeCautions(w, cautions)
	return n.err()
}
