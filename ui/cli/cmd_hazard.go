package cli

import (
	"flag"
	"io"
	"strings"

	"zmix/mixtures"
	"zmix/mixtures/report"
	"zmix/mixtures/safety"
	"zmix/model"
)

func (a *app) cmdHazard(g *globalOpts, args []string) error {
	cmd := newNestedFlags(g, "hazard", "the blend: `SPEC` text, or @FILE for a saved blend file")
	fs := cmd.fs
	var presText string
	fs.StringVar(&presText, "pres", "", "total pressure `P`, needed only to turn partial pressures into fractions")
	if err := cmd.parse(args); err != nil {
		return err
	}
	src, _, parts, err := safetyBlend(g, fs, cmd.blend, presText)
	if err != nil {
		return err
	}
	rep := &report.HazardReport{Label: src.label(), Result: safety.Classify(parts)}
	return a.printNested(cmd.out, g.ascii,
		func(w io.Writer) error { return report.WriteHazardJSON(w, rep) },
		func(w io.Writer) error { return report.WriteHazardCSV(w, rep) },
		func(w io.Writer) error { return report.WriteHazardText(w, rep) })
}

// safetyBlend reads the blend of a safety command (hazard, release) into
// its mixture and its parts: species and mole fractions.
func safetyBlend(g *globalOpts, fs *flag.FlagSet, blendSpec, presText string) (*blendSource, *mixtures.Mixture, []safety.Part, error) {
	src, err := readBlend(blendSpec)
	if err != nil {
		return nil, nil, nil, err
	}
	cat, err := g.catalogue()
	if err != nil {
		return nil, nil, nil, err
	}
	mix, err := safetyMixture(cat, src, src.pick(flagsGiven(fs), "pres", presText))
	if err != nil {
		return nil, nil, nil, err
	}
	return src, mix, mixtures.SafetyParts(mix), nil
}

// safetyMixture resolves a blend for the safety calculations. They need
// no pressure, unless amounts are partial pressures: then the total is
// --pres, or their sum.
func safetyMixture(cat *model.Catalogue, src *blendSource, presText string) (*mixtures.Mixture, error) {
	presPa := float64(mixtures.AtmospherePa)
	if strings.TrimSpace(presText) != "" || src.blend.HasPartialPressures() {
		p, err := totalPressure(src, presText)
		if err != nil {
			return nil, err
		}
		presPa = p.Pa
	}
	mix, err := src.blend.Resolve(cat, presPa)
	if err != nil {
		return nil, badInput("--blend: %v", model.UserMessage(err))
	}
	return mix, nil
}
