package cli

import (
	"bytes"
	"flag"
	"io"
	"strings"

	"zmix/mixtures"
	"zmix/mixtures/process"
	"zmix/mixtures/report"
	"zmix/model"
)

// What the process commands share: reading their values and writing a
// solved process. The calculations live in mixtures/process.

// printProcess writes a solved process as text, JSON or CSV, in one go.
func (a *app) printProcess(label string, res process.Result, outFmt formatFlags, ascii bool) error {
	rep := &report.ProcessReport{Label: label, Result: res}
	return a.printNested(outFmt, ascii,
		func(w io.Writer) error { return report.WriteProcessJSON(w, rep) },
		func(w io.Writer) error { return report.WriteProcessCSV(w, rep) },
		func(w io.Writer) error { return report.WriteProcessText(w, rep) })
}

// printNested writes a nested result (a process, a hazard classification,
// a release) in the format --json or --csv chose, text otherwise, in one
// go; a result that cannot be written is bad input, one line.
func (a *app) printNested(outFmt formatFlags, ascii bool, writeJSON, writeCSV, writeText func(io.Writer) error) error {
	format, err := outFmt.pick()
	if err != nil {
		return err
	}
	var out bytes.Buffer
	switch format {
	case formatJSON:
		err = writeJSON(&out)
	case formatCSV:
		err = writeCSV(&out)
	default:
		err = writeText(page(&out, ascii))
	}
	if err != nil {
		return badInput("%s", model.UserMessage(err))
	}
	return a.emit(&out)
}

// needTemperature parses a temperature flag that must be given.
func needTemperature(flagName, text string) (temperature, error) {
	if strings.TrimSpace(text) == "" {
		return temperature{}, badInput("%s is missing; give a temperature with a unit (%s), e.g. %s 25C", flagName, mixtures.TemperatureUnits, flagName)
	}
	return parseTemperature(flagName, text)
}

// needPressure parses a pressure flag that must be given.
func needPressure(flagName, text string) (pressure, error) {
	if strings.TrimSpace(text) == "" {
		return pressure{}, badInput("%s is missing; give a pressure with a unit (%s), e.g. %s 1atm", flagName, mixtures.PressureUnits, flagName)
	}
	return parsePressure(flagName, text)
}

// parseRate parses a flow flag.
func parseRate(flagName, text string) (process.Rate, error) {
	r, err := process.ParseRate(text)
	if err != nil {
		return process.Rate{}, badInput("%s: %v", flagName, err)
	}
	return r, nil
}

// resolve turns a blend source into a mixture at pressure presPa (used
// by partial-pressure amounts).
func resolve(cat *model.Catalogue, flagName string, src *blendSource, presPa float64) (*mixtures.Mixture, error) {
	mix, err := src.blend.Resolve(cat, presPa)
	if err != nil {
		return nil, badInput("%s: %v", flagName, err)
	}
	return mix, nil
}

// rateMolPerSec converts an optional rate flag for a gas at (T, P): 0 when
// the flag is empty.
func rateMolPerSec(flagName, text string, mix *mixtures.Mixture, tempK, presPa float64) (float64, error) {
	if strings.TrimSpace(text) == "" {
		return 0, nil
	}
	r, err := parseRate(flagName, text)
	if err != nil {
		return 0, err
	}
	n, err := r.MolPerSec(process.Ideal{}.Gas(mix), process.Conditions{TempK: tempK, PresPa: presPa})
	if err != nil {
		return 0, badInput("%s: %v", flagName, err)
	}
	return n, nil
}

// processFailed reports a calculation's error as bad input: the engine's
// errors describe what was asked.
func processFailed(err error) error {
	return badInput("%s", model.UserMessage(err))
}

// inletConditions reads the blend and the inlet temperature and pressure
// of a process command; a blend file's own conditions are the defaults of
// --temp and --pres.
func inletConditions(fs *flag.FlagSet, blendSpec, tempText, presText string) (*blendSource, temperature, pressure, error) {
	src, err := readBlend(blendSpec)
	if err != nil {
		return nil, temperature{}, pressure{}, err
	}
	given := flagsGiven(fs)
	t, err := needTemperature("--temp", src.pick(given, "temp", tempText))
	if err != nil {
		return nil, temperature{}, pressure{}, err
	}
	p, err := needPressure("--pres", src.pick(given, "pres", presText))
	if err != nil {
		return nil, temperature{}, pressure{}, err
	}
	return src, t, p, nil
}
