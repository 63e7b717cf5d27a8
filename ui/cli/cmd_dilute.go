package cli

import (
	"io"
	"strings"

	"zmix/mixtures/process"
)

func (a *app) cmdDilute(g *globalOpts, args []string) error {
	cmd := newNestedFlags(g, "dilute", "the parent blend: `SPEC` text, or @FILE")
	fs := cmd.fs
	var withSpec, targetText, ratioText, rateText string
	fs.StringVar(&withSpec, "with", "", "the diluent: a pure gas or a second blend, `SPEC` text or @FILE")
	fs.StringVar(&targetText, "target", "", "the level to reach, `\"SPECIES LEVEL\"`, e.g. \"SiH4 50ppm\"")
	fs.StringVar(&ratioText, "ratio", "", "instead of --target: moles of diluent per mole of parent, `R`; then --target names only the species (\"SiH4\")")
	fs.StringVar(&rateText, "rate", "", "the parent's flow `\"VALUE UNIT\"`, for the diluent and total flows")
	if err := cmd.parse(args); err != nil {
		return err
	}
	parentSrc, err := readBlend(cmd.blend)
	if err != nil {
		return err
	}
	if strings.TrimSpace(withSpec) == "" {
		return badInput("--with is missing; give the diluent as blend text, e.g. --with \"N2 1\"")
	}
	diluentB, err := streamBlend("--with", withSpec)
	if err != nil {
		return err
	}
	cat, err := g.catalogue()
	if err != nil {
		return err
	}
	d := process.Dilution{}
	if d.Parent, err = resolve(cat, "--blend", parentSrc, process.RefNormal.PresPa); err != nil {
		return err
	}
	if d.Diluent, err = diluentB.Resolve(cat, process.RefNormal.PresPa); err != nil {
		return badInput("--with: %v", err)
	}
	switch {
	case strings.TrimSpace(targetText) == "":
		return badInput("--target is missing; give %s", process.TargetForm)
	case ratioText != "":
		r, err := process.ParseDilutionRatio(ratioText)
		if err != nil {
			return badInput("--ratio: %v", err)
		}
		sp, err := process.ParseTargetSpecies(cat, targetText)
		if err != nil {
			return badInput("--target: %v", err)
		}
		d.Species, d.Ratio = sp, r
	default:
		t, err := process.ParseTarget(cat, targetText)
		if err != nil {
			return badInput("--target: %v", err)
		}
		d.Species, d.TargetX = t.Species, t.X
	}
	if d.ParentRateMolPerSec, err = rateMolPerSec("--rate", rateText, d.Parent, 0, 0); err != nil {
		return err
	}
	res, err := d.Solve()
	if err != nil {
		return processFailed(err)
	}
	return a.printProcess(parentSrc.plainLabel()+"  diluted with  "+diluentB.Text+namedNote(parentSrc.blend, diluentB), res, cmd.out, g.ascii)
}

func usageDilute(w io.Writer) {
	io.WriteString(w, `Usage: zmix dilute --blend PARENT --with DILUENT (--target "SPECIES LEVEL" | --target SPECIES --ratio R)
                   [--rate R] [--json | --csv]

The dilution that brings one species of a parent blend to a target level
with a diluent (a pure gas or a second blend), from the mole balance
x = (x_p + r·x_d)/(1 + r): the moles of diluent per mole of parent, by
mass too, the dilution factor, and the flows when the parent's flow is
given. With --ratio, the level a given ratio gives. This is how a lab
makes a low-ppm mixture from a parent cylinder, or a fab dilutes exhaust.

Flags:
  --blend SPEC     the parent, as text or @FILE (required)
  --with SPEC      the diluent, as text or @FILE (required)
  --target T       "SPECIES LEVEL" (ppm, ppb, %, fraction), or with --ratio
                   the species
  --ratio R        moles of diluent per mole of parent
  --rate R         the parent's flow (see zmix flow --help for units)
  --json           one JSON object: diluent_per_parent_mol_mol, final_level,
                   dilution_factor, species, ...
  --csv            CSV: one row per figure (section, row, name, value), as in
                   the JSON
`+sharedFlagsHelp+`
Examples:
  zmix dilute --blend "SiH4 2%, N2 bal" --with "N2 1" --target "SiH4 50ppm" --rate "20 sccm"
  zmix dilute --blend "NH3 1000ppm, N2 bal" --with "N2 1" --target NH3 --ratio 9
`)
}
