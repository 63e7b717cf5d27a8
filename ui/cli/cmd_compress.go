package cli

import (
	"io"
	"strconv"
	"strings"

	"zmix/mixtures/process"
)

func (a *app) cmdCompress(g *globalOpts, args []string) error {
	cmd := newNestedFlags(g, "compress", "the blend: `SPEC` text, or @FILE for a saved blend file")
	fs := cmd.fs
	var tempText, presText, toText, effText, stagesText, coolText, rateText string
	fs.StringVar(&tempText, "temp", "", "inlet temperature `T` with a unit")
	fs.StringVar(&presText, "pres", "", "inlet pressure `P` with a unit")
	fs.StringVar(&toText, "to", "", "outlet pressure `P2`; below --pres makes an expander")
	fs.StringVar(&effText, "eff", "", "isentropic efficiency `η`: 0.8 or 80% (default 1)")
	fs.StringVar(&stagesText, "stages", "", "number of compression stages `N`, equal pressure ratios (default 1)")
	fs.StringVar(&coolText, "intercool", "", "temperature `T` the gas is cooled to between stages (default the inlet's)")
	fs.StringVar(&rateText, "rate", "", "the flow `\"VALUE UNIT\"`, for the power")
	if err := cmd.parse(args); err != nil {
		return err
	}
	src, t1, p1, err := inletConditions(fs, cmd.blend, tempText, presText)
	if err != nil {
		return err
	}
	p2, err := needPressure("--to", toText)
	if err != nil {
		return err
	}
	c := process.Compression{InletTempK: t1.kelvin, InletPresPa: p1.Pa, OutletPresPa: p2.Pa}
	if effText != "" {
		if c.Efficiency, err = process.ParseEfficiency(effText); err != nil {
			return badInput("--eff: %v", err)
		}
	}
	if stagesText != "" {
		n, err := strconv.Atoi(strings.TrimSpace(stagesText))
		if err != nil || n < 1 || n > process.MaxStages {
			return badInput("--stages %q: want a whole number from 1 to %d", stagesText, process.MaxStages)
		}
		c.Stages = n
	}
	if coolText != "" {
		if c.Stages < 2 {
			return badInput("--intercool %q is for several stages; give --stages 2 or more", coolText)
		}
		t, err := parseTemperature("--intercool", coolText)
		if err != nil {
			return err
		}
		c.IntercoolTempK = t.kelvin
	}
	cat, err := g.catalogue()
	if err != nil {
		return err
	}
	if c.Mixture, err = resolve(cat, "--blend", src, p1.Pa); err != nil {
		return err
	}
	if c.RateMolPerSec, err = rateMolPerSec("--rate", rateText, c.Mixture, t1.kelvin, p1.Pa); err != nil {
		return err
	}
	res, err := c.Solve()
	if err != nil {
		return processFailed(err)
	}
	return a.printProcess(src.label(), res, cmd.out, g.ascii)
}

func usageCompress(w io.Writer) {
	io.WriteString(w, `Usage: zmix compress --blend SPEC --temp T --pres P --to P2 [--eff η]
                     [--stages N --intercool T] [--rate R] [--json | --csv]

Compresses a blend adiabatically in steady flow from (T, P) to P2, or
expands it when P2 is below P. The isentropic outlet comes from
S(T2s, P2) = S(T, P) on the engine's own S(T, P), with no constant-Cp
shortcut; the actual outlet from h2 = h1 + (h2s − h1)/η (compression) or
h1 − η(h1 − h2s) (expansion). Gives the work per mole and per kg (positive
when done on the gas), the power for a flow, the mean γ over the path and
the polytropic exponent. With --stages, N stages of equal pressure ratio
with intercooling between them, each stage and the total.

Flags:
  --blend SPEC     the blend, as text or @FILE (required)
  --temp T         inlet temperature (required unless the file has one)
  --pres P         inlet pressure (required unless the file has one)
  --to P2          outlet pressure (required)
  --eff η          isentropic efficiency, 0.8 or 80% (default 1)
  --stages N       compression stages, equal ratios (default 1)
  --intercool T    the temperature between stages (default the inlet's)
  --rate R         the flow, for the power (see zmix flow --help for units)
  --json           one JSON object: outlet_temperature_K,
                   isentropic_outlet_temperature_K, work_J_mol, work_J_kg,
                   power_W (with --rate), stages (a list), ...
  --csv            CSV: one row per figure (section, row, name, value), as in
                   the JSON
`+sharedFlagsHelp+`
`+unitsHelp+"\n"+blendHelp+`
Examples:
  zmix compress --blend "N2 78.08%, O2 20.95%, Ar 0.93%, CO2 0.04%" --temp 300K --pres 1bar --to 10bar
  zmix compress --blend "H2 1" --temp 25C --pres 20bar --to 200bar --eff 78% --stages 3 --intercool 35C --rate "500 Nm3/h"
  zmix compress --blend "N2 1" --temp 300K --pres 200bar --to 10bar --eff 0.85
`)
}
