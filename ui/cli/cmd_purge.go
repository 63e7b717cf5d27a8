package cli

import (
	"io"
	"strings"

	"zmix/mixtures"
	"zmix/mixtures/process"
)

func (a *app) cmdPurge(g *globalOpts, args []string) error {
	fs := newFlagSet("zmix purge")
	var startSpec, purgeSpec, targetText, swingText, vacText, volText, rateText, tempText, presText string
	var outFmt formatFlags
	fs.StringVar(&startSpec, "start", "", "the gas in the volume at the start: `SPEC` text or @FILE")
	fs.StringVar(&purgeSpec, "purge", "", "the purge gas: `SPEC` text or @FILE")
	fs.StringVar(&targetText, "target", "", "the level to reach, `\"SPECIES LEVEL\"`, e.g. \"O2 10ppm\"")
	fs.StringVar(&swingText, "swing", "", "pressure-swing purge between two absolute pressures, `P_LOW..P_HIGH`")
	fs.StringVar(&vacText, "vacuum", "", "vacuum purge: evacuate to the first pressure, refill to the second, `P_VAC..P_FILL`")
	fs.StringVar(&volText, "volume", "", "the volume `V` (m3, L, ft3): for a flow purge, or the gas used by a swing")
	fs.StringVar(&rateText, "rate", "", "the purge flow `\"VALUE UNIT\"`, for a flow purge")
	fs.StringVar(&tempText, "temp", "", "the gas temperature `T` in the volume")
	fs.StringVar(&presText, "pres", "", "the pressure `P` in the volume during a flow purge")
	outFmt.register(fs)
	g.register(fs, false)
	if err := parseOnlyFlags(fs, "purge", args); err != nil {
		return err
	}
	if strings.TrimSpace(startSpec) == "" || strings.TrimSpace(purgeSpec) == "" {
		return badInput("give both --start (the gas in the volume) and --purge (the purge gas), e.g. --start \"N2 79%%, O2 21%%\" --purge \"N2 1\"")
	}
	startB, err := streamBlend("--start", startSpec)
	if err != nil {
		return err
	}
	purgeB, err := streamBlend("--purge", purgeSpec)
	if err != nil {
		return err
	}
	methods := 0
	for _, s := range []string{swingText, vacText, rateText} {
		if s != "" {
			methods++
		}
	}
	if methods != 1 {
		return badInput("choose one way to purge: --swing P_LOW..P_HIGH, --vacuum P_VAC..P_FILL, or --volume V with --rate R")
	}
	if strings.TrimSpace(targetText) == "" {
		return badInput("--target is missing; give %s", process.TargetForm)
	}
	cat, err := g.catalogue()
	if err != nil {
		return err
	}
	p := process.Purge{}
	if p.Target, err = process.ParseTarget(cat, targetText); err != nil {
		return badInput("--target: %v", err)
	}
	if p.Start, err = startB.Resolve(cat, mixtures.AtmospherePa); err != nil {
		return badInput("--start: %v", err)
	}
	if p.PurgeGas, err = purgeB.Resolve(cat, mixtures.AtmospherePa); err != nil {
		return badInput("--purge: %v", err)
	}
	if volText != "" {
		if p.VolumeM3, err = process.ParseVolume(volText); err != nil {
			return badInput("--volume: %v", err)
		}
	}
	if tempText != "" {
		t, err := parseTemperature("--temp", tempText)
		if err != nil {
			return err
		}
		p.TempK = t.kelvin
	}
	if presText != "" {
		pr, err := parsePressure("--pres", presText)
		if err != nil {
			return err
		}
		p.PresPa = pr.Pa
	}
	switch {
	case swingText != "" || vacText != "":
		flag, text := "--swing", swingText
		p.Method = process.PurgeSwing
		if vacText != "" {
			flag, text, p.Method = "--vacuum", vacText, process.PurgeVacuum
		}
		lo, hi, err := mixtures.ParseRange(text)
		if err != nil {
			return badInput("%s: %v", flag, err)
		}
		plo, err := parsePressure(flag, lo)
		if err != nil {
			return err
		}
		phi, err := parsePressure(flag, hi)
		if err != nil {
			return err
		}
		if !(phi.Pa > plo.Pa) {
			return badInput("%s %q: want the low pressure first, then a higher one, e.g. 1..7 bar", flag, text)
		}
		p.PLowPa, p.PHighPa = plo.Pa, phi.Pa
	default:
		if p.VolumeM3 == 0 {
			return badInput("a flow purge needs --volume V as well as --rate, e.g. --volume 2m3 --rate \"10 Nm3/h\"")
		}
		p.Method = process.PurgeFlow
		if p.Rate, err = parseRate("--rate", rateText); err != nil {
			return err
		}
	}
	res, err := p.Solve()
	if err != nil {
		return processFailed(err)
	}
	return a.printProcess(startB.Text+"  purged with  "+purgeB.Text+namedNote(startB, purgeB), res, outFmt, g.ascii)
}

func usagePurge(w io.Writer) {
	io.WriteString(w, `Usage: zmix purge --start SPEC --purge SPEC --target "SPECIES LEVEL"
                  (--swing P_LOW..P_HIGH | --vacuum P_VAC..P_FILL | --volume V --rate R [--temp T --pres P])
                  [--volume V --temp T] [--json | --csv]

Purging a line or vessel of one species, on the common-practice ideal-mixing
model, counting the purge gas's own content of that species:
  --swing   fill with purge gas to P_HIGH, vent to P_LOW, repeat: cycles
            k ≥ ln((x0 − y)/(xt − y)) / ln(P_HIGH/P_LOW), rounded up
  --vacuum  evacuate to P_VAC, refill to P_FILL: the same count
  --rate    flow-through purge of a well-mixed volume: N = ln((x0 − y)/(xt − y))
            volume exchanges, in the time N·V/Q at the volume's T and P
Pressures are absolute (barg and psig are converted). With --volume and
--temp, a swing or vacuum purge also gives the purge gas used.

Flags:
  --start SPEC     the gas in the volume at the start, text or @FILE (required)
  --purge SPEC     the purge gas, text or @FILE (required)
  --target T       the level to reach, "SPECIES LEVEL" (required)
  --swing A..B     pressure-swing purge between two pressures
  --vacuum A..B    vacuum purge between a vacuum and the refill pressure
  --volume V       the volume: m3, L or ft3
  --rate R         the purge flow, for a flow purge (see zmix flow --help)
  --temp T         the gas temperature in the volume
  --pres P         the pressure in the volume during a flow purge
  --json           one JSON object: cycles (swing), time_s and
                   volume_exchanges (flow), final_level, ...
  --csv            CSV: one row per figure (section, row, name, value), as in
                   the JSON
`+sharedFlagsHelp+`
A purge gas short of oxygen is an asphyxiant: vent to a safe place, and
never enter a purged vessel without confined-space entry procedures.

Examples:
  zmix purge --start "N2 78.08%, O2 20.95%, Ar 0.97%" --purge "N2 1" --target "O2 10ppm" --swing 1..7bar
  zmix purge --start "SiH4 2%, N2 bal" --purge "N2 1" --target "SiH4 1ppm" --vacuum 5mbar..1atm
  zmix purge --start "N2 79%, O2 21%" --purge "N2 1" --target "O2 100ppm" --volume 2m3 --rate "10 Nm3/h" --temp 20C --pres 1atm
`)
}
