package cli

import (
	"fmt"
	"io"
	"strings"

	"zmix/mixtures/process"
	"zmix/mixtures/report"
)

func (a *app) cmdFlow(g *globalOpts, args []string) error {
	cmd := newNestedFlags(g, "flow", "the blend: `SPEC` text, or @FILE for a saved blend file")
	fs := cmd.fs
	var rateText, tempText, presText, refText string
	fs.StringVar(&rateText, "rate", "", "the flow `\"VALUE UNIT\"`: mol/s, kmol/h, kg/h, lb/h, m3/h, L/min, ACFM, Nm3/h, Sm3/h, SLPM, sccm, SCFH, SCFM")
	fs.StringVar(&tempText, "temp", "", "the line temperature `T`, for actual volumes")
	fs.StringVar(&presText, "pres", "", "the line pressure `P`, for actual volumes")
	fs.StringVar(&refText, "ref", "", "the reference of standard volumes: `normal` (default), 15C, 20C, 60F, or \"T, P\"")
	if err := cmd.parse(args); err != nil {
		return err
	}
	src, err := readBlend(cmd.blend)
	if err != nil {
		return err
	}
	if rateText == "" {
		return badInput("--rate is missing; give the flow with a unit, e.g. --rate \"120 Nm3/h\"; the units are %s", process.RateUnits)
	}
	rate, err := parseRate("--rate", rateText)
	if err != nil {
		return err
	}
	given := flagsGiven(fs)
	tempText, presText = src.pick(given, "temp", tempText), src.pick(given, "pres", presText)
	f := process.Flow{Rate: rate}
	if (tempText == "") != (presText == "") {
		return badInput("give both --temp and --pres for the line's conditions, or neither (they are needed only for actual volumes)")
	}
	if tempText != "" {
		t, err := parseTemperature("--temp", tempText)
		if err != nil {
			return err
		}
		p, err := parsePressure("--pres", presText)
		if err != nil {
			return err
		}
		f.LineTempK, f.LinePresPa = t.kelvin, p.Pa
	}
	if refText != "" {
		if f.Ref, err = process.ParseReference(refText); err != nil {
			return badInput("--ref: %v", err)
		}
	}
	cat, err := g.catalogue()
	if err != nil {
		return err
	}
	presForBlend := f.LinePresPa
	if presForBlend == 0 {
		presForBlend = process.RefNormal.PresPa
	}
	if f.Mixture, err = resolve(cat, "--blend", src, presForBlend); err != nil {
		return err
	}
	res, err := f.Solve()
	if err != nil {
		return processFailed(err)
	}
	return a.printProcess(src.label(), res, cmd.out, g.ascii)
}

// rateHelp lists the flow units from the process package's table, the
// standard volumes grouped by the reference their name fixes or defaults
// to, so that a unit added there is listed here too.
var rateHelp = func() string {
	var b strings.Builder
	b.WriteString("Rates: \"VALUE UNIT\"\n")
	row := func(head, text string) {
		for i, line := range report.Wrap(text, 66) {
			if i > 0 {
				head = ""
			}
			fmt.Fprintf(&b, "  %-10s%s\n", head, line)
		}
	}
	row("molar", strings.Join(process.RateUnitNames(process.BasisMolar), ", "))
	row("mass", strings.Join(process.RateUnitNames(process.BasisMass), ", "))
	row("actual", strings.Join(process.RateUnitNames(process.BasisActual), ", ")+" (at the line's T and P)")
	groups := process.StandardUnitGroups()
	for _, fixed := range []bool{true, false} {
		if fixed {
			row("standard", "tied to a reference by the name:")
		} else {
			row("", "at a reference --ref may change, by default:")
		}
		for _, g := range groups {
			if g.Fixed == fixed {
				_, cond, _ := strings.Cut(g.Ref.Label, ": ")
				fmt.Fprintf(&b, "%12s%-30s %s\n", "", strings.Join(g.Names, ", "), cond)
			}
		}
	}
	row("", "/hr reads as /h (lb/hr, Nm3/hr)")
	return b.String()
}()

const referenceHelp = `References (--ref): normal (0 °C, 101.325 kPa), 15C (15 °C, 101.325 kPa,
  ISO 13443), 20C (20 °C, 101.325 kPa), 60F (60 °F, 14.696 psia), or any
  "T, P" such as "25C, 1 bar". The reference is printed beside every
  standard volume.
`

func usageFlow(w io.Writer) {
	io.WriteString(w, `Usage: zmix flow --blend SPEC --rate "VALUE UNIT" [--temp T --pres P] [--ref NAME] [--json | --csv]

Converts a flow of a blend between molar, mass, actual-volume and
standard-volume units, and gives the density at the reference, the
relative density to dry air, and the gas correction factor of a thermal
mass-flow instrument calibrated on N2 (common-practice formula; the
instrument maker's factor governs).

Flags:
  --blend SPEC     the blend, as text or @FILE (required)
  --rate R         the flow with its unit (required)
  --temp T         the line temperature, for actual volumes
  --pres P         the line pressure, for actual volumes
  --ref NAME       the reference of standard volumes (default normal)
  --json           one JSON object: mol_s, kg_s, ref_m3_s, ref_temperature_K,
                   ref_pressure_Pa, actual_m3_s, gas_correction_factor, ...
  --csv            CSV: one row per figure (section, row, name, value), as in
                   the JSON
`+sharedFlagsHelp+`
`+rateHelp+"\n"+referenceHelp+"\n"+unitsHelp+`
Examples:
  zmix flow --blend "N2 1" --rate "120 Nm3/h" --temp 25C --pres 8barg
  zmix flow --blend "SiH4 2%, N2 bal" --rate "500 sccm" --ref 20C --json
  zmix flow --blend "CH4 0.95, C2H6 0.05" --rate "2 kmol/h" --ref 60F
`)
}
