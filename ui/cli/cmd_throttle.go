package cli

import (
	"io"

	"zmix/mixtures/process"
)

func (a *app) cmdThrottle(g *globalOpts, args []string) error {
	cmd := newNestedFlags(g, "throttle", "the blend: `SPEC` text, or @FILE for a saved blend file")
	fs := cmd.fs
	var tempText, presText, toText string
	var ideal bool
	fs.StringVar(&tempText, "temp", "", "inlet temperature `T1` with a unit")
	fs.StringVar(&presText, "pres", "", "inlet pressure `P1`")
	fs.StringVar(&toText, "to-pres", "", "outlet pressure `P2`")
	fs.BoolVar(&ideal, "ideal", false, "use the ideal gas (the throttle is then isothermal)")
	if err := cmd.parse(args); err != nil {
		return err
	}
	src, t1, p1, err := inletConditions(fs, cmd.blend, tempText, presText)
	if err != nil {
		return err
	}
	p2, err := needPressure("--to-pres", toText)
	if err != nil {
		return err
	}
	if p2.Pa > p1.Pa {
		return badInput("--to-pres %s is above the inlet pressure: a valve only lowers it", toText)
	}
	cat, err := g.catalogue()
	if err != nil {
		return err
	}
	th := process.Throttle{InletTempK: t1.kelvin, InletPresPa: p1.Pa, OutletPresPa: p2.Pa}
	if ideal {
		th.Model = process.Ideal{}
	}
	if th.Mixture, err = resolve(cat, "--blend", src, p1.Pa); err != nil {
		return err
	}
	res, err := th.Solve()
	if err != nil {
		return processFailed(err)
	}
	return a.printProcess(src.label(), res, cmd.out, g.ascii)
}

func usageThrottle(w io.Writer) {
	io.WriteString(w, `Usage: zmix throttle --blend SPEC --temp T1 --pres P1 --to-pres P2 [--ideal] [--json | --csv]

The outlet temperature of a gas throttled across a valve: the enthalpy is
kept, H(T2, P2) = H(T1, P1), with the real-gas departures of zmix state
(virial or Peng-Robinson). Most gases cool (a positive Joule-Thomson
coefficient); H2 and He warm near room temperature. With --ideal the
throttle is isothermal, as the ideal gas's H does not depend on P.

Flags:
  --blend SPEC     the blend, as text or @FILE (required)
  --temp T1        inlet temperature (required unless the file has one)
  --pres P1        inlet pressure (required unless the file has one)
  --to-pres P2     outlet pressure (required)
  --ideal          the ideal gas instead of the real gas
  --json           one JSON object: outlet_temperature_K, delta_T_K,
                   mean_jt_K_per_Pa, ...
  --csv            CSV: one row per figure (section, row, name, value), as in
                   the JSON
`+sharedFlagsHelp+`
`+unitsHelp+"\n"+blendHelp+`
Examples:
  zmix throttle --blend "N2 1" --temp 20C --pres 200bar --to-pres 5bar
  zmix throttle --blend "CO2 1" --temp 25C --pres 50bar --to-pres 1atm --json
`)
}
