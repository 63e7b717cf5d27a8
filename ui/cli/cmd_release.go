package cli

import (
	"io"
	"math"
	"strings"

	"zmix/mixtures/process"
	"zmix/mixtures/report"
	"zmix/mixtures/safety"
	"zmix/model"
)

func (a *app) cmdRelease(g *globalOpts, args []string) error {
	fs := newFlagSet("zmix release")
	var blendSpec, presText, amountText, rateText, roomText, achText, ventText string
	var outFmt formatFlags
	fs.StringVar(&blendSpec, "blend", "", "the blend: `SPEC` text, or @FILE for a saved blend file")
	fs.StringVar(&amountText, "amount", "", "the amount `Q` released: 2 Nm3, 5 kg, 300 scf, 40 mol")
	fs.StringVar(&rateText, "rate", "", "a continuous release `R`: 10 SLPM, 2 Nm3/h, 0.1 kg/h")
	fs.StringVar(&roomText, "room", "", "the room volume `V`: 60 m3, 2000 ft3")
	fs.StringVar(&achText, "ach", "", "ventilation in air changes per hour `N`")
	fs.StringVar(&ventText, "vent", "", "ventilation as a flow `FLOW`: 360 m3/h, 200 ACFM")
	fs.StringVar(&presText, "pres", "", "total pressure `P`, only to turn partial pressures into fractions")
	outFmt.register(fs)
	g.register(fs, false)
	if err := parseOnlyFlags(fs, "release", args); err != nil {
		return err
	}
	src, parts, err := safetyBlend(g, fs, blendSpec, presText)
	if err != nil {
		return err
	}
	rel := safety.Release{Parts: parts}
	if strings.TrimSpace(roomText) == "" {
		return badInput("--room is missing; give the room volume with a unit (%s), e.g. --room 60m3", process.VolumeUnits)
	}
	if rel.RoomM3, err = process.ParseVolume(roomText); err != nil {
		return badInput("--room: %v", err)
	}
	molarMass := 0.0
	for _, p := range parts {
		molarMass += p.X * p.Species.MolarMassKgPerMol
	}
	var what []string
	if strings.TrimSpace(amountText) == "" && strings.TrimSpace(rateText) == "" {
		return badInput("give --amount (released at once) or --rate (a continuous release), e.g. --amount 2Nm3 or --rate 10SLPM")
	}
	if strings.TrimSpace(amountText) != "" {
		q, err := safety.ParseAmount(amountText)
		if err != nil {
			return badInput("--amount: %v", err)
		}
		rel.AmountM3 = safety.GasM3AtRoom(q.Mol(molarMass))
		what = append(what, q.Text)
	}
	if strings.TrimSpace(rateText) != "" {
		r, err := process.ParseRate(rateText)
		if err != nil {
			return badInput("--rate: %v", err)
		}
		if rel.RateM3PerS, err = process.RoomFlow(r, molarMass); err != nil {
			return badInput("--rate %s: %v", model.Quote(rateText), err)
		}
		what = append(what, "at "+r.Text)
	} else {
		what = append(what, "at once")
	}
	vent := ""
	switch {
	case strings.TrimSpace(achText) != "" && strings.TrimSpace(ventText) != "":
		return badInput("--ach and --vent both give the ventilation; give one")
	case strings.TrimSpace(achText) != "":
		n, err := process.ParseACH(achText)
		if err != nil {
			return badInput("--ach: %v", err)
		}
		rel.VentM3PerS = n * rel.RoomM3 / 3600
		vent = strings.TrimSpace(achText) + " air changes per hour"
	case strings.TrimSpace(ventText) != "":
		r, err := process.ParseRate(ventText)
		if err != nil {
			return badInput("--vent: %v", err)
		}
		if r.Unit.Basis == process.BasisMass {
			return badInput("--vent %s: give the ventilation as a volume or molar flow (%s)", model.Quote(ventText), process.RateUnits)
		}
		if rel.VentM3PerS, err = process.RoomFlow(r, 0); err != nil {
			return badInput("--vent %s: %v", model.Quote(ventText), err)
		}
		vent = r.Text
	}
	if math.IsInf(rel.AmountM3, 0) || math.IsInf(rel.RateM3PerS, 0) || math.IsInf(rel.VentM3PerS, 0) {
		return badInput("the amount, rate or ventilation is too large to compute with")
	}
	rep := &report.ReleaseReport{Label: src.label(), Release: rel, Result: rel.Solve(), What: strings.Join(what, " "), Vent: vent}
	return a.printNested(outFmt, g.ascii,
		func(w io.Writer) error { return report.WriteReleaseJSON(w, rep) },
		func(w io.Writer) error { return report.WriteReleaseCSV(w, rep) },
		func(w io.Writer) error { return report.WriteReleaseText(w, rep) })
}
