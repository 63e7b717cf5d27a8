package cli

import (
	"io"
	"strings"

	"zmix/mixtures/process"
	"zmix/mixtures/report"
	"zmix/model"
)

func (a *app) cmdCylinder(g *globalOpts, args []string) error {
	cmd := newNestedFlags(g, "cylinder", "the blend: `SPEC` text, or @FILE for a saved blend file")
	fs := cmd.fs
	var volText, tempText, presText, massText, amountText, toText, refText, recipe, ratedText string
	fs.StringVar(&volText, "volume", "", "the cylinder's water volume `V` (50L, 0.05m3)")
	fs.StringVar(&tempText, "temp", "", "the gas temperature `T` with a unit")
	fs.StringVar(&presText, "pres", "", "the fill pressure `P` with a unit")
	fs.StringVar(&massText, "mass", "", "the mass of gas `M` (10kg, 500g)")
	fs.StringVar(&amountText, "amount", "", "the amount of gas `N` (120mol)")
	fs.StringVar(&toText, "to-temp", "", "a later temperature `T2`: the pressure it brings")
	fs.StringVar(&refText, "ref", "normal", "the reference condition `NAME` of the standard volume")
	fs.StringVar(&recipe, "recipe", "", "a fill recipe: `pressure` or weight")
	fs.StringVar(&ratedText, "rated", "", "the cylinder's rated pressure `PR`: a fill above it is refused")
	if err := cmd.parse(args); err != nil {
		return err
	}
	src, err := readBlend(cmd.blend)
	if err != nil {
		return err
	}
	given := flagsGiven(fs)
	t, err := needTemperature("--temp", src.pick(given, "temp", tempText))
	if err != nil {
		return err
	}
	c := process.Cylinder{TempK: t.kelvin, Recipe: recipe}
	if c.VolumeM3, err = cylinderQuantity("--volume", "volume", volText, true); err != nil {
		return err
	}
	n := 0
	for _, s := range []string{presText, massText, amountText} {
		if strings.TrimSpace(s) != "" {
			n++
		}
	}
	if n != 1 {
		return badInput("give exactly one of --pres, --mass and --amount (got %d)", n)
	}
	resolveAt := float64(model.StdPressureAtmPa)
	if strings.TrimSpace(presText) != "" {
		p, err := parsePressure("--pres", presText)
		if err != nil {
			return err
		}
		c.PresPa, resolveAt = p.Pa, p.Pa
	}
	if c.MassKg, err = cylinderQuantity("--mass", "mass", massText, false); err != nil {
		return err
	}
	if c.AmountMol, err = cylinderQuantity("--amount", "amount", amountText, false); err != nil {
		return err
	}
	if strings.TrimSpace(toText) != "" {
		t2, err := parseTemperature("--to-temp", toText)
		if err != nil {
			return err
		}
		c.ToTempK = t2.kelvin
	}
	if strings.TrimSpace(ratedText) != "" {
		p, err := parsePressure("--rated", ratedText)
		if err != nil {
			return err
		}
		c.RatedPresPa = p.Pa
	}
	if recipe != "" && recipe != "pressure" && recipe != "weight" {
		return badInput("--recipe %s: want pressure or weight", model.Quote(recipe))
	}
	if c.Ref, err = process.ParseReference(refText); err != nil {
		return badInput("--ref: %v", err)
	}
	cat, err := g.catalogue()
	if err != nil {
		return err
	}
	if c.Mixture, err = resolve(cat, "--blend", src, resolveAt); err != nil {
		return err
	}
	res, err := c.Solve()
	if err != nil {
		return processFailed(err)
	}
	return a.printProcess(src.label(), res, cmd.out, g.ascii)
}

// cylinderQuantity parses a volume, mass or amount flag; an empty
// optional flag is 0.
func cylinderQuantity(flagName, kind, text string, required bool) (float64, error) {
	if strings.TrimSpace(text) == "" {
		if required {
			return 0, badInput("%s is missing; give a %s with a unit, e.g. %s 50L", flagName, kind, flagName)
		}
		return 0, nil
	}
	x, err := process.ParseCylinderQuantity(kind, text)
	if err != nil {
		return 0, badInput("%s: %v", flagName, err)
	}
	return x, nil
}

func usageCylinder(w io.Writer) {
	io.WriteString(w, `Usage: zmix cylinder --blend SPEC --volume V --temp T (--pres P | --mass M | --amount N)
                     [--to-temp T2] [--ref NAME] [--recipe pressure|weight] [--rated PR] [--json | --csv]

A cylinder's contents: from its water volume, the gas temperature and one
of the fill pressure, the mass or the amount, the others, with the
compressibility Z of the blend (virial or Peng-Robinson, see zmix state)
and the ideal-gas amount beside it, and the standard volume at a named
reference. --to-temp gives the pressure after the cylinder warms or
cools. --recipe lists the fill: by partial pressure (the parent gases in
rising order of amount, each step's absolute pressure, gauge reading and
Z at the fill temperature; the cylinder is taken as well mixed) or by
weight (the mass of each parent gas). A fill that would condense a
component at the fill temperature, or exceed --rated, is refused.

The cylinder's rating and marking are yours to check; follow local codes
and licensed practice for filling.

Flags:
  --blend SPEC     the blend, as text or @FILE (required)
  --volume V       water volume: L, m3 or ft3 (required)
  --temp T         gas temperature (required unless the file has one)
  --pres P         fill pressure, or
  --mass M         mass of gas: kg, g or lb, or
  --amount N       amount of gas: mol or kmol
  --to-temp T2     a later temperature, for the pressure it brings
  --ref NAME       `+strings.Join(report.Wrap("reference of the standard volume: "+process.ReferenceForms, 61), "\n                   ")+`
  --recipe R       pressure or weight
  --rated PR       the cylinder's rated pressure: a fill above it is refused
  --json           one JSON object: amount_mol, mass_kg, z, pressure_Pa,
                   ref_m3, steps, ...
  --csv            CSV: one row per figure (section, row, name, value), as in
                   the JSON
`+sharedFlagsHelp+`
`+unitsHelp+"\n"+blendHelp+`
Examples:
  zmix cylinder --blend "H2 100%" --volume 50L --temp 15C --pres 200bar --to-temp 50C
  zmix cylinder --blend "CH4 2.5%, CO2 5%, N2 bal" --volume 10L --temp 20C --pres 150bar --recipe pressure
  zmix cylinder --blend "Ar 100%" --volume 50L --temp 20C --mass 10kg --json
`)
}
