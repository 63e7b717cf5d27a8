package cli

import (
	"bytes"
	"errors"
	"fmt"
	"strings"

	"zmix/mixtures"
	"zmix/mixtures/report"
	"zmix/model"
)

// stateConfig is everything `zmix state` needs, parsed and checked.
type stateConfig struct {
	src      *blendSource
	temp     temperature
	pres     pressure
	std      mixtures.StdPressure
	format   outputFormat
	allNotes bool
	anatomy  bool
	ascii    bool
}

func (a *app) cmdState(g *globalOpts, args []string) error {
	fs := newFlagSet("zmix state")
	var blendSpec, tempText, presText, stdText string
	var asJSON, asCSV, allNotes, anatomy bool
	fs.StringVar(&blendSpec, "blend", "", "the blend: `SPEC` text, or @FILE for a saved blend file")
	fs.StringVar(&tempText, "temp", "", "temperature `T` with a unit: K, C, F or R")
	fs.StringVar(&presText, "pres", "", "total pressure `P` with a unit: Pa, kPa, MPa, bar, mbar, atm, Torr, psi, barg, psig")
	fs.StringVar(&stdText, "std", "", "standard pressure P° of μ°: `1bar` (default) or 1atm")
	fs.BoolVar(&asJSON, "json", false, "write one JSON object")
	fs.BoolVar(&asCSV, "csv", false, "write CSV: a header row and one row")
	fs.BoolVar(&allNotes, "all-notes", false, "list every validity figure, not only the cautions")
	fs.BoolVar(&anatomy, "anatomy", false, "take each species apart: the S and Cp of translation, rotation, vibration and electronic levels, their treatment, the characteristic temperatures")
	g.register(fs, false)
	if err := parseOnlyFlags(fs, "state", args); err != nil {
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
	cfg.format, cfg.allNotes, cfg.anatomy, cfg.ascii = format, allNotes, anatomy, g.ascii
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
	if cfg.std, err = parseStd(stdText); err != nil {
		return cfg, err
	}
	return cfg, nil
}

func computeState(cat *model.Catalogue, cfg stateConfig) (*report.StateReport, error) {
	mix, err := cfg.src.blend.Resolve(cat, cfg.pres.Pa)
	if err != nil {
		return nil, badInput("--blend: %v", model.UserMessage(err))
	}
	st, err := mix.State(cfg.temp.kelvin, cfg.pres.Pa, mixtures.Options{Std: cfg.std})
	if err != nil {
		return nil, conditionError(err, cfg.temp.text, cfg.pres.text)
	}
	if err := report.CheckFinite(&st); err != nil {
		return nil, badInput("%s", model.UserMessage(err))
	}
	rep := &report.StateReport{
		Label:    cfg.src.label(),
		State:    &st,
		PresText: cfg.pres.text,
		Gauge:    cfg.pres.Gauge,
		Cautions: mixtures.Cautions(mix, cfg.pres.Pa),
		Notes:    mixtures.Notes(&st, cfg.allNotes),
	}
	if cfg.anatomy {
		rep.Anatomy = report.Anatomy(&st)
	}
	return rep, nil
}

func (a *app) printState(cat *model.Catalogue, cfg stateConfig) error {
	rep, err := computeState(cat, cfg)
	if err != nil {
		return err
	}
	var out bytes.Buffer
	switch cfg.format {
	case formatJSON:
		err = report.WriteStateJSON(&out, rep)
	case formatCSV:
		err = report.WriteStateCSV(&out, rep)
		if err == nil {
			// CSV has no room for them, and they must not be lost.
			a.cautionsToStderr(rep.Cautions)
		}
	default:
		err = report.WriteStateText(page(&out, cfg.ascii), rep)
	}
	if err != nil {
		return badInput("%s", model.UserMessage(err))
	}
	return a.emit(&out)
}

func (a *app) cautionsToStderr(cautions []mixtures.Caution) {
	for _, line := range report.CautionLines(cautions) {
		fmt.Fprintln(a.stderr, "zmix: caution: "+line)
	}
}

// conditionError names the flag and the text typed for a state the model
// cannot compute, instead of the converted value alone.
func conditionError(err error, tempText, presText string) error {
	switch {
	case errors.Is(err, model.ErrTemperature):
		return badInput("--temp %s: %s", model.Quote(strings.TrimSpace(tempText)), model.UserMessage(err))
	case errors.Is(err, model.ErrPressure) && strings.TrimSpace(presText) != "":
		return badInput("--pres %s: %s", model.Quote(strings.TrimSpace(presText)), model.UserMessage(err))
	}
	return badInput("%s", model.UserMessage(err))
}
