package cli

import (
	"fmt"
	"io"
	"strings"

	"zmix/mixtures/process"
)

func (a *app) cmdWeighed(g *globalOpts, args []string) error {
	fset := newFlagSet("zmix weighed")
	var parents, atomic streamsFlag
	var massUText string
	var outFmt formatFlags
	fset.Var(&parents, "add", "one parent gas weighed in, `\"MASS [± U] [of] GAS\"` (once per parent, in fill order)")
	fset.Var(&atomic, "atomic-weight", "an element's atomic weight `\"EL VALUE ± U\"` in g/mol, replacing the IUPAC one (repeatable)")
	fset.StringVar(&massUText, "mass-u", "", "the standard uncertainty `U` of each weighed mass (2mg)")
	outFmt.register(fset)
	g.register(fset, false)
	if err := parseOnlyFlags(fset, "weighed", args); err != nil {
		return err
	}
	if len(parents) == 0 {
		return badInput("give each parent gas weighed in as --add %s", process.ParentForm)
	}
	if strings.TrimSpace(massUText) == "" {
		return badInput("--mass-u is missing; give the standard uncertainty of each weighed mass (%s), e.g. --mass-u 2mg", process.WeighedMassUnits)
	}
	massU, err := process.ParseWeighedMass(massUText)
	if err != nil {
		return badInput("--mass-u: %v", err)
	}
	cat, err := g.catalogue()
	if err != nil {
		return err
	}
	w := process.Weighing{MassUKg: massU}
	for _, text := range atomic {
		aw, err := process.ParseAtomicWeight(text)
		if err != nil {
			return badInput("--atomic-weight: %v", err)
		}
		w.AtomicWeights = append(w.AtomicWeights, aw)
	}
	labels := make([]string, len(parents))
	for i, text := range parents {
		p, err := process.ParseParent(cat, text)
		if err != nil {
			return badInput("--add %d: %v", i+1, err)
		}
		w.Parents = append(w.Parents, p)
		labels[i] = p.Gas
	}
	res, err := w.Solve()
	if err != nil {
		return processFailed(err)
	}
	return a.printProcess(strings.Join(labels, "  +  "), res, outFmt, g.ascii)
}

func usageWeighed(w io.Writer) {
	fmt.Fprintf(w, `Usage: zmix weighed --add "MASS [± U] [of] GAS" --add ... --mass-u U
                    [--atomic-weight "EL VALUE ± U"] [--json | --csv]

The composition of a cylinder filled by weight, from the mass of each
parent gas weighed into it, with each mole fraction's standard
uncertainty (the gravimetric method of ISO 6142-1, propagated by the law
of the GUM, JCGM 100). A parent is a pure gas, a gas with its impurities
as analysed, or a premix:

  25.103 g CO2
  2461.20 g N2 with O2 <5ppm, H2O 10ppm ±2ppm
  10.0412 g of CH4 2.503%% ±0.002%%, N2 bal

An amount with ± carries that standard uncertainty; "<L" (below a
detection limit) is taken as L/2 with u = L/(2√3); an amount with
neither is taken as exact. A premix certified by mass gives its amounts
in wt%% or kg/kg ("CH4 2.013 wt%% ±0.004 wt%%, N2 bal"), all of one
parent on one basis. A mass may carry its own ± (a standard
uncertainty); otherwise --mass-u applies. ASCII "+-" or "+/-" may stand
for ±. The uncertainty of the molar masses comes from the IUPAC atomic
weights, or from --atomic-weight for an element whose source the lab
knows better (argon's standard interval, ±0.16 g/mol, spans every
source). The result lists the composition, u, U (k = 2) and the part of
u from the masses, the purities and the molar masses.

Flags:
  --add GAS        one parent gas: "MASS [± U] [of] GAS" (repeat, one per
                   parent)
  --mass-u U       standard uncertainty of each weighed mass: %s
                   (required)
  --atomic-weight A  an element's atomic weight and its standard uncertainty,
                   "Ar 39.9478 +- 0.0002" (g/mol), instead of IUPAC's
                   (repeatable)
  --json           one JSON object: parents, composition, budget, ...
  --csv            CSV: one row per figure (section, row, name, value), as in
                   the JSON
`+sharedFlagsHelp+`
Examples:
  zmix weighed --add "25.103 g CO2" --add "475.2 g N2" --mass-u 2mg
  zmix weighed --add "12.0391 g of CH4 2.503%% +-0.002%%, N2 bal" --add "498.77 g N2 with O2 <5ppm, H2O 3ppm +-1ppm" --mass-u 3mg --json
  zmix weighed --add "37.6 g CO2" --add "695.1 g Ar" --mass-u 2mg --atomic-weight "Ar 39.9478 +- 0.0002"
`, process.WeighedMassUnits)
}
