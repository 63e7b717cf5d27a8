package cli

import (
	"fmt"
	"io"
	"strings"

	"zmix/mixtures"
	"zmix/mixtures/report"
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
	std        mixtures.StdPressure
	format     outputFormat
	ascii      bool
}

func (a *app) cmdSweep(g *globalOpts, args []string) error {
	fs := newFlagSet("zmix sweep")
	var blendSpec, tempText, presText, stdText string
	var asJSON, asCSV, logGrid bool
	steps := stepsFlag{n: defaultSweepSteps}
	fs.StringVar(&blendSpec, "blend", "", "the blend: `SPEC` text, or @FILE for a saved blend file")
	fs.StringVar(&tempText, "temp", "", "temperature: a range `A..B` to sweep (300..1500K), or the fixed value of a pressure sweep")
	fs.StringVar(&presText, "pres", "", "pressure: a range `A..B` to sweep (1..50bar), or the fixed value of a temperature sweep")
	fs.Var(&steps, "steps", "number of points `N`, end points included")
	fs.BoolVar(&logGrid, "log", false, "space a temperature sweep evenly in ln T (pressure sweeps always are in ln P)")
	fs.StringVar(&stdText, "std", "", "standard pressure P° of μ°: `1bar` (default) or 1atm")
	fs.BoolVar(&asJSON, "json", false, "write a JSON list of state objects, one per point")
	fs.BoolVar(&asCSV, "csv", false, "write CSV: a header row, then one row per point")
	g.register(fs, false)
	if err := parseOnlyFlags(fs, "sweep", args); err != nil {
		return err
	}
	format, err := pickFormat(asJSON, asCSV)
	if err != nil {
		return err
	}
	isRange := func(s string) bool {
		return strings.Contains(s, "..") || strings.Contains(s, "…") || mixtures.LooksLikeRange(s)
	}
	tempIsRange, presIsRange := isRange(tempText), isRange(presText)
	switch {
	case tempIsRange && presIsRange:
		return badInput("--temp %s and --pres %s are both ranges; sweep one and give the other as one value, e.g. --temp 300..1500K --pres 1atm", model.Quote(tempText), model.Quote(presText))
	case !tempIsRange && !presIsRange:
		return badInput("nothing to sweep; give --temp A..B (e.g. 300..1500K) with a fixed --pres, or --pres A..B (e.g. 1..50bar) with a fixed --temp")
	}
	src, err := readBlend(blendSpec)
	if err != nil {
		return err
	}
	given := flagsGiven(fs)
	cfg := sweepConfig{src: src, format: format, ascii: g.ascii}
	if cfg.std, err = parseStd(src.pick(given, "std", stdText)); err != nil {
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
	if steps.step != "" {
		return steps.stepError(cfg.sweep)
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
	r, err := mixtures.ParseSweepRange(mixtures.SweepTemperature, rangeText)
	if err != nil {
		return badInput("--temp: %v", err)
	}
	if cfg.fixedPres, err = totalPressure(cfg.src, presText); err != nil {
		return err
	}
	cfg.sweep = r.Sweep(cfg.sweep.Steps, cfg.sweep.Log)
	cfg.rangeText = rangeText
	return nil
}

func (cfg *sweepConfig) pressureSweep(rangeText, tempText string) error {
	r, err := mixtures.ParseSweepRange(mixtures.SweepPressure, rangeText)
	if err != nil {
		return badInput("--pres: %v", err)
	}
	if cfg.src.blend.HasPartialPressures() {
		return badInput("--blend gives partial pressures or dew points, which fix the total; a pressure sweep needs amounts as fractions (%%, ppm, mass %%, bal)")
	}
	if strings.TrimSpace(tempText) == "" {
		return badInput("--temp is missing; a pressure sweep holds the temperature fixed: give it with a unit (%s), e.g. --temp 25C", mixtures.TemperatureUnits)
	}
	if cfg.fixedTemp, err = parseTemperature("--temp", tempText); err != nil {
		return err
	}
	cfg.sweep = r.Sweep(cfg.sweep.Steps, cfg.sweep.Log)
	cfg.rangeText, cfg.rangeGauge = rangeText, r.Gauge
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
		return badInput("--blend: %s", model.UserMessage(err))
	}
	opts := mixtures.Options{Std: cfg.std}
	if err := mix.CheckSweep(cfg.sweep, cfg.fixedTemp.kelvin, cfg.fixedPres.Pa); err != nil {
		return badInput("%s", model.UserMessage(err))
	}
	highPa := cfg.fixedPres.Pa
	if cfg.sweep.Var == mixtures.SweepPressure {
		highPa = max(cfg.sweep.From, cfg.sweep.To)
	}
	rep := &report.SweepReport{
		Label: cfg.src.label(), Mix: mix, Sweep: cfg.sweep, RangeText: cfg.rangeText, RangeGauge: cfg.rangeGauge,
		FixedTempK: cfg.fixedTemp.kelvin, FixedPresText: cfg.fixedPres.text, FixedGauge: cfg.fixedPres.Gauge,
		FixedPresPa: cfg.fixedPres.Pa, StdPresPa: cfg.std.Pa(), Cautions: mixtures.Cautions(mix, highPa),
	}
	src := &report.SweepSource{Mix: mix, Sweep: cfg.sweep, FixedTempK: cfg.fixedTemp.kelvin, FixedPresPa: cfg.fixedPres.Pa, Opts: opts}
	// Rows go out as they are computed: a buffered writer over stdout.
	w := &errWriter{w: a.stdout}
	switch cfg.format {
	case formatJSON:
		err = report.WriteSweepJSON(w, rep.Gauge(), src)
	case formatCSV:
		err = report.WriteSweepCSV(w, rep.Gauge(), src)
	default:
		var out io.Writer = w
		if cfg.ascii {
			out = &report.ASCIIWriter{W: w}
		}
		err = report.WriteSweepText(out, rep, src)
	}
	if w.err != nil {
		return ioFailure(fmt.Errorf("writing the output: %v", w.err))
	}
	if err != nil {
		return badInput("%s", model.UserMessage(err))
	}
	if cfg.format != formatText {
		a.cautionsToStderr(rep.Cautions)
	}
	return nil
}

// errWriter remembers the first write error, so that a closed pipe is
// reported as an output failure and not as bad input.
type errWriter struct {
	w   io.Writer
	err error
}

func (e *errWriter) Write(p []byte) (int, error) {
	if e.err != nil {
		return 0, e.err
	}
	n, err := e.w.Write(p)
	e.err = err
	return n, err
}
