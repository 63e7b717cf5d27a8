package cli

import (
	"fmt"
	"io"
	"math"
	"strconv"
	"strings"

	"zmix/mixtures"
	"zmix/mixtures/process"
	"zmix/mixtures/report"
	"zmix/mixtures/safety"
	"zmix/model"
)

func (a *app) cmdRelease(g *globalOpts, args []string) error {
	cmd := newNestedFlags(g, "release", "the blend: `SPEC` text, or @FILE for a saved blend file")
	fs := cmd.fs
	var presText, amountText, rateText, roomText, achText, ventText string
	var cylText, fillText, fillTempText string
	fs.StringVar(&amountText, "amount", "", "the amount `Q` released: 2 Nm3, 5 kg, 300 scf, 40 mol")
	fs.StringVar(&cylText, "cylinder", "", "a cylinder's water volume `V` (50L): its contents, less what stays at 1 atm, are released")
	fs.StringVar(&fillText, "fill", "", "the cylinder's fill pressure `P` with a unit (150bar, 2200psig)")
	fs.StringVar(&fillTempText, "fill-temp", "", "the cylinder's temperature `T` (default 20C, the room's)")
	fs.StringVar(&rateText, "rate", "", "a continuous release `R`: 10 SLPM, 2 Nm3/h, 0.1 kg/h")
	fs.StringVar(&roomText, "room", "", "the room volume `V`: 60 m3, 2000 ft3")
	fs.StringVar(&achText, "ach", "", "ventilation in air changes per hour `N`")
	fs.StringVar(&ventText, "vent", "", "ventilation as a flow `FLOW`: 360 m3/h, 200 ACFM")
	fs.StringVar(&presText, "pres", "", "total pressure `P`, only to turn partial pressures into fractions")
	if err := cmd.parse(args); err != nil {
		return err
	}
	src, mix, parts, err := safetyBlend(g, fs, cmd.blend, presText)
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
	molarMass := mix.MolarMassKgPerMol
	var what []string
	var cyl *report.ReleaseCylinder
	cylinder := strings.TrimSpace(cylText) != "" || strings.TrimSpace(fillText) != "" || strings.TrimSpace(fillTempText) != ""
	if strings.TrimSpace(amountText) == "" && strings.TrimSpace(rateText) == "" && !cylinder {
		return badInput("give --amount (released at once), --cylinder with --fill (a cylinder's contents) or --rate (a continuous release), e.g. --amount 2Nm3 or --rate 10SLPM")
	}
	if cylinder {
		if strings.TrimSpace(amountText) != "" {
			return badInput("--amount and --cylinder both give the amount released; give one")
		}
		cr, text, err := cylinderContents(mix, cylText, fillText, fillTempText)
		if err != nil {
			return err
		}
		rel.AmountM3 = safety.GasM3AtRoom(cr.ReleasedMol)
		what = append(what, text)
		cyl = cr
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
		vent = strconv.FormatFloat(n, 'g', -1, 64) + " air changes per hour"
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
	rep := &report.ReleaseReport{Label: src.label(), Release: rel, Result: rel.Solve(), What: strings.Join(what, " "), Vent: vent, Cylinder: cyl}
	return a.printNested(cmd.out, g.ascii,
		func(w io.Writer) error { return report.WriteReleaseJSON(w, rep) },
		func(w io.Writer) error { return report.WriteReleaseCSV(w, rep) },
		func(w io.Writer) error { return report.WriteReleaseText(w, rep) })
}

// cylinderContents is what a cylinder of water volume volText filled to
// fillText at fillTempText (default the room's 20 °C) releases down to
// 1 atm, with the blend's real-gas Z, and how the readout names it.
func cylinderContents(mix *mixtures.Mixture, volText, fillText, fillTempText string) (*report.ReleaseCylinder, string, error) {
	vol, err := cylinderQuantity("--cylinder", "volume", volText, true)
	if err != nil {
		return nil, "", err
	}
	if strings.TrimSpace(fillText) == "" {
		return nil, "", badInput("--fill is missing; give the cylinder's pressure with a unit, e.g. --fill 150bar or --fill 2200psig")
	}
	p, err := parsePressure("--fill", fillText)
	if err != nil {
		return nil, "", err
	}
	tempK := safety.RoomTempK
	if strings.TrimSpace(fillTempText) != "" {
		t, err := parseTemperature("--fill-temp", fillTempText)
		if err != nil {
			return nil, "", err
		}
		tempK = t.kelvin
	}
	c := process.Cylinder{Mixture: mix, VolumeM3: vol, TempK: tempK, PresPa: p.Pa}
	r, err := c.Release()
	if err != nil {
		return nil, "", badInput("--cylinder %s at --fill %s: %v (for a liquefied gas, give the weight of its contents with --amount)", model.Quote(volText), model.Quote(fillText), model.UserMessage(err))
	}
	text := fmt.Sprintf("the contents of a %s cylinder at %s and %s (%s mol, Z %s; %s mol stay at 1 atm)",
		strings.TrimSpace(volText), strings.TrimSpace(fillText), report.Short(tempK-model.ZeroCelsiusK, 4)+" °C",
		report.Short(r.ReleasedMol, 4), report.Short(r.Full.Z, 4), report.Short(r.LeftMol, 3))
	return &report.ReleaseCylinder{VolumeM3: vol, FillPresPa: p.Pa, FillTempK: tempK, Z: r.Full.Z,
		ContentsMol: r.Full.AmountMol, LeftAt1AtmMol: r.LeftMol, ReleasedMol: r.ReleasedMol}, text, nil
}
