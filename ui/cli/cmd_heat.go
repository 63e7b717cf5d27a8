package cli

import (
	"io"
	"zmix/mixtures/process"
)

func (a *app) cmdHeat(g *globalOpts, args []string) error {
	cmd := newNestedFlags(g, "heat", "the blend: `SPEC` text, or @FILE for a saved blend file")
	fs := cmd.fs
	var tempText, toText, presText, rateText string
	fs.StringVar(&tempText, "temp", "", "inlet temperature `T1` with a unit")
	fs.StringVar(&toText, "to-temp", "", "outlet temperature `T2` with a unit")
	fs.StringVar(&presText, "pres", "", "the constant pressure `P`")
	fs.StringVar(&rateText, "rate", "", "the flow `\"VALUE UNIT\"`, for the duty as a power")
	if err := cmd.parse(args); err != nil {
		return err
	}
	src, t1, p, err := inletConditions(fs, cmd.blend, tempText, presText)
	if err != nil {
		return err
	}
	t2, err := needTemperature("--to-temp", toText)
	if err != nil {
		return err
	}
	cat, err := g.catalogue()
	if err != nil {
		return err
	}
	h := process.Heating{InletTempK: t1.kelvin, OutletTempK: t2.kelvin, PresPa: p.Pa}
	if h.Mixture, err = resolve(cat, "--blend", src, p.Pa); err != nil {
		return err
	}
	if h.RateMolPerSec, err = rateMolPerSec("--rate", rateText, h.Mixture, t1.kelvin, p.Pa); err != nil {
		return err
	}
	res, err := h.Solve()
	if err != nil {
		return processFailed(err)
	}
	return a.printProcess(src.label(), res, cmd.out, g.ascii)
}

func usageHeat(w io.Writer) {
	io.WriteString(w, `Usage: zmix heat --blend SPEC --temp T1 --to-temp T2 --pres P [--rate R] [--json | --csv]

The duty to take a blend from T1 to T2 at constant pressure: ΔH per mole
and per kg, and as a power for a flow, from the engine's own H(T); a
negative duty is cooling. Also the entropy change and the mean Cp over
the range.

Flags:
  --blend SPEC     the blend, as text or @FILE (required)
  --temp T1        inlet temperature (required unless the file has one)
  --to-temp T2     outlet temperature (required)
  --pres P         the pressure (required unless the file has one)
  --rate R         the flow, for the duty as a power (see zmix flow --help)
  --json           one JSON object: duty_J_mol, duty_J_kg, duty_W (with
                   --rate), ...
  --csv            CSV: one row per figure (section, row, name, value), as in
                   the JSON
`+sharedFlagsHelp+`
`+unitsHelp+"\n"+blendHelp+`
Examples:
  zmix heat --blend "N2 1" --temp 25C --to-temp 400C --pres 1atm --rate "300 Nm3/h"
  zmix heat --blend "H2 75%, N2 25%" --temp 450C --to-temp 40C --pres 30bar --json
`)
}
