package process

import (
	"fmt"
	"math"
	"strings"

	"zmix/mixtures"
	"zmix/mixtures/safety"
	"zmix/model"
)

// RoomRelease is a blend released into a room, for the workbench's
// Process pane: it reads its inputs as the release command does and
// solves with the well-mixed model of package safety, whose figures it
// lays out as a Result.
type RoomRelease struct {
	Mixture *mixtures.Mixture
	// Amount and Rate as typed; one or both. Room is a volume; ACH the
	// air changes per hour ("" for none).
	Amount, Rate, Room, ACH string
	// Cylinder, in place of Amount, is a cylinder's water volume as
	// typed: it releases its contents at (FillTempK, FillPresPa) less
	// what stays at 1 atm (Cylinder.Release).
	Cylinder              string
	FillTempK, FillPresPa float64
}

// MaxACH bounds the air changes an hour: a few hundred is already a fume
// cupboard's; more is a typing slip.
const MaxACH = 1000

// RoomFlow converts a flow to m³/s of gas at the room's 20 °C and 1 atm,
// as ideal gas: an actual volume is taken at the room's conditions, a
// standard volume at its reference, a mass flow through the molar mass
// (0 refuses one).
func RoomFlow(r Rate, molarMassKgPerMol float64) (float64, error) {
	v := r.Value * r.Unit.SI
	switch r.Unit.Basis {
	case BasisMolar:
		return safety.GasM3AtRoom(v), nil
	case BasisMass:
		if molarMassKgPerMol <= 0 {
			return 0, model.Errorf("process", "flow %s: want a volume or molar flow", model.Quote(r.Text))
		}
		return safety.GasM3AtRoom(v / molarMassKgPerMol), nil
	case BasisStandard:
		ref := r.Reference(Conditions{})
		return v * safety.RoomTempK / ref.TempK * ref.PresPa / safety.RoomPresPa, nil
	}
	return v, nil
}

// ReleaseResult is a solved RoomRelease.
type ReleaseResult struct {
	base
	Release safety.Release
	Room    safety.ReleaseResult
}

var (
	figRoom     = &Figure{Key: "room", Label: "room volume", Symbol: "V", SymbolASCII: "V", Unit: "m³", UnitASCII: "m3", Scale: 1, Name: "room_m3", Digits: mixtures.Digits{Sig: 4}}
	figReleased = &Figure{Key: "q", Label: "released, gas at 20 °C", Symbol: "Q", SymbolASCII: "Q", Unit: "m³", UnitASCII: "m3", Scale: 1, Name: "released_m3", Digits: mixtures.Digits{Sig: 4}}
	figRelRate  = &Figure{Key: "qdot", Label: "release rate, gas at 20 °C", Symbol: "q", SymbolASCII: "q", Unit: "m³/h", UnitASCII: "m3/h", Scale: 3600, Name: "rate_m3_s", Digits: mixtures.Digits{Sig: 4}}
	figVent     = &Figure{Key: "vent", Label: "ventilation", Symbol: "v", SymbolASCII: "v", Unit: "m³/h", UnitASCII: "m3/h", Scale: 3600, Name: "vent_m3_s", Digits: mixtures.Digits{Sig: 4}}
	figO2Worst  = &Figure{Key: "o2", Label: "worst oxygen", Symbol: "x(O₂)", SymbolASCII: "x(O2)", Unit: "%", UnitASCII: "%", Scale: 1, Name: "o2_percent", Digits: mixtures.Digits{Decimals: 2}}
	figO2Closed = &Figure{Key: "o2c", Label: "oxygen, closed room", Symbol: "x(O₂)", SymbolASCII: "x(O2)", Unit: "%", UnitASCII: "%", Scale: 1, Name: "o2_closed_room_percent", Digits: mixtures.Digits{Decimals: 2}}
	figO2Displ  = &Figure{Key: "o2d", Label: "oxygen, air displaced", Symbol: "x(O₂)", SymbolASCII: "x(O2)", Unit: "%", UnitASCII: "%", Scale: 1, Name: "o2_displaced_percent", Digits: mixtures.Digits{Decimals: 2}}
	figO2Steady = &Figure{Key: "o2s", Label: "oxygen, steady state", Symbol: "x(O₂)", SymbolASCII: "x(O2)", Unit: "%", UnitASCII: "%", Scale: 1, Name: "o2_steady_percent", Digits: mixtures.Digits{Decimals: 2}}
	figTau      = &Figure{Key: "tau", Label: "time constant V/(q+v)", Symbol: "τ", SymbolASCII: "tau", Unit: "min", UnitASCII: "min", Scale: 1.0 / 60, Name: "time_constant_s", Digits: mixtures.Digits{Sig: 4}}
	figDuration = &Figure{Key: "dur", Label: "release lasts", Symbol: "t", SymbolASCII: "t", Unit: "min", UnitASCII: "min", Scale: 1.0 / 60, Name: "duration_s", Digits: mixtures.Digits{Sig: 4}}
	figTo195    = &Figure{Key: "t195", Label: "time to 19.5 % O₂", Symbol: "t", SymbolASCII: "t", Unit: "min", UnitASCII: "min", Scale: 1.0 / 60, Name: "time_to_19_5_percent_o2_s", Digits: mixtures.Digits{Sig: 3}}
	figMixLFL   = &Figure{Key: "lfl", Label: "flammables, % of LFL", Symbol: "LFL", SymbolASCII: "LFL", Unit: "%", UnitASCII: "%", Scale: 1, Name: "mixture_percent_of_lfl", Digits: mixtures.Digits{Sig: 3}}
	figPeakPPM  = &Figure{Key: "ppm", Label: "peak", Symbol: "x", SymbolASCII: "x", Unit: "ppm", UnitASCII: "ppm", Scale: 1, Name: "peak_ppm", Digits: mixtures.Digits{Sig: 4}}
	figPctLFL   = &Figure{Key: "plfl", Label: "of LFL", Symbol: "LFL", SymbolASCII: "LFL", Unit: "%", UnitASCII: "%", Scale: 1, Name: "percent_of_lfl", Digits: mixtures.Digits{Sig: 3}}
	figPctLC50  = &Figure{Key: "plc50", Label: "of LC50 (4 h)", Symbol: "LC50", SymbolASCII: "LC50", Unit: "%", UnitASCII: "%", Scale: 1, Name: "percent_of_lc50", Digits: mixtures.Digits{Sig: 3}}
)

// Solve reads the inputs and applies the model.
func (rr RoomRelease) Solve() (*ReleaseResult, error) {
	if rr.Mixture == nil {
		return nil, model.Errorf("process", "release: no blend given")
	}
	rel := safety.Release{}
	for _, c := range rr.Mixture.Components {
		rel.Parts = append(rel.Parts, safety.Part{Species: c.Species, X: c.X})
	}
	var err error
	cylNote := ""
	if strings.TrimSpace(rr.Room) == "" {
		return nil, model.Errorf("process", "room: give the room volume with a unit (%s), e.g. 60 m3", VolumeUnits)
	}
	if rel.RoomM3, err = ParseVolume(rr.Room); err != nil {
		return nil, model.Errorf("process", "room: %w", err)
	}
	m := rr.Mixture.MolarMassKgPerMol
	if strings.TrimSpace(rr.Amount) == "" && strings.TrimSpace(rr.Rate) == "" && strings.TrimSpace(rr.Cylinder) == "" {
		return nil, model.Errorf("process", "give an amount (released at once), a cylinder or a rate (a continuous release), e.g. 2 Nm3, 50 L or 10 SLPM")
	}
	if strings.TrimSpace(rr.Cylinder) != "" {
		if strings.TrimSpace(rr.Amount) != "" {
			return nil, model.Errorf("process", "an amount and a cylinder both give what is released; give one")
		}
		vol, err := ParseCylinderQuantity("volume", rr.Cylinder)
		if err != nil {
			return nil, model.Errorf("process", "cylinder: %w", err)
		}
		cr, err := Cylinder{Mixture: rr.Mixture, VolumeM3: vol, TempK: rr.FillTempK, PresPa: rr.FillPresPa}.Release()
		if err != nil {
			return nil, model.Errorf("process", "cylinder: %w", err)
		}
		rel.AmountM3 = safety.GasM3AtRoom(cr.ReleasedMol)
		cylNote = fmt.Sprintf("a %.4g L cylinder at %.4g bar abs and %.5g K holds %.4g mol (Z %.4g); %.3g mol stay at 1 atm, %.4g mol are released",
			vol*1e3, rr.FillPresPa/1e5, rr.FillTempK, cr.Full.AmountMol, cr.Full.Z, cr.LeftMol, cr.ReleasedMol)
	}
	if strings.TrimSpace(rr.Amount) != "" {
		q, err := safety.ParseAmount(rr.Amount)
		if err != nil {
			return nil, model.Errorf("process", "amount: %w", err)
		}
		rel.AmountM3 = safety.GasM3AtRoom(q.Mol(m))
	}
	if strings.TrimSpace(rr.Rate) != "" {
		r, err := ParseRate(rr.Rate)
		if err != nil {
			return nil, model.Errorf("process", "rate: %w", err)
		}
		if rel.RateM3PerS, err = RoomFlow(r, m); err != nil {
			return nil, model.Errorf("process", "rate: %w", err)
		}
	}
	if a := strings.TrimSpace(rr.ACH); a != "" {
		n, err := ParseACH(a)
		if err != nil {
			return nil, err
		}
		rel.VentM3PerS = n * rel.RoomM3 / 3600
	}
	if math.IsInf(rel.AmountM3, 0) || math.IsInf(rel.RateM3PerS, 0) || math.IsInf(rel.VentM3PerS, 0) {
		return nil, model.Errorf("process", "the amount, rate or ventilation is too large to compute with")
	}
	res := newReleaseResult(rel)
	if cylNote != "" {
		res.note(cylNote)
	}
	return res, nil
}

// achUnits are the ways the trade writes air changes per hour after the
// number, and their size in changes per hour.
var achUnits = map[string]float64{"": 1, "/h": 1, "/hr": 1, "ach": 1, "h-1": 1, "h⁻¹": 1, "perhour": 1, "/min": 60}

// ParseACH reads air changes per hour, 0 to MaxACH: "6", "6/h", "6 ACH",
// "6 h-1", or "0.1/min".
func ParseACH(s string) (float64, error) {
	x, unit, ok := splitValue(strings.TrimSpace(s))
	size, known := achUnits[strings.ToLower(strings.ReplaceAll(unit, " ", ""))]
	if !ok || !known || !(x*size >= 0) || x*size > MaxACH {
		return 0, model.Errorf("process", "air changes per hour %s: want a number from 0 to %d, e.g. 6 (6/h and 6 ACH read too)", model.Quote(s), MaxACH)
	}
	return x * size, nil
}

func newReleaseResult(rel safety.Release) *ReleaseResult {
	res := rel.Solve()
	r := &ReleaseResult{Release: rel, Room: res}
	r.kind = "release"
	r.assumptions = safety.MethodRelease + "; volumes of gas at 20 °C and 1 atm; alarm points common practice"
	r.in(figRoom, rel.RoomM3)
	if rel.AmountM3 > 0 {
		r.in(figReleased, rel.AmountM3)
	}
	if rel.RateM3PerS > 0 {
		r.in(figRelRate, rel.RateM3PerS)
	}
	r.in(figVent, rel.VentM3PerS)
	r.out(figO2Worst, res.O2Pct)
	if res.Continuous {
		r.out(figO2Steady, res.O2SteadyPct)
		r.out(figTau, res.TauS)
		if res.DurationS > 0 {
			r.out(figDuration, res.DurationS)
		}
		if res.TimeToDeficientS >= 0 {
			r.out(figTo195, res.TimeToDeficientS)
		}
	} else {
		r.out(figO2Closed, res.O2ClosedPct)
		r.out(figO2Displ, res.O2DisplacedPct)
	}
	if res.MixPctOfLFL > 0 {
		r.out(figMixLFL, res.MixPctOfLFL)
	}
	if len(res.Species) > 0 {
		tb := Table{Name: "species", Title: "Peak in the room", RowName: "species"}
		for _, p := range res.Species {
			row := []Value{{figPeakPPM, p.PeakPPM}, {figPctLFL, p.PctOfLFL}, {figPctLC50, 0}}
			if p.LC50PPM4h > 0 {
				row[2].SI = 100 * p.PeakPPM / p.LC50PPM4h
			}
			tb.RowLabels = append(tb.RowLabels, p.Species.Formula)
			tb.Rows = append(tb.Rows, row)
		}
		r.tables = append(r.tables, tb)
		r.note("a 0 % of LFL or of LC50 means not flammable, not toxic, or the figure is not known: zmix release lists which")
	}
	if res.O2Pct < safety.O2DeficientPc {
		r.caution(mixtures.Caution{Title: "Oxygen-deficient", Text: "the room falls below 19.5 % O2 (common practice): a release can cause collapse without warning. Ventilate and monitor oxygen."})
	}
	if res.MixPctOfLFL >= safety.AlarmLowPctLFL {
		r.caution(mixtures.Caution{Title: "Flammable atmosphere", Text: "the flammables reach the 10 % LFL alarm point (common practice) or more."})
	}
	var toxic []string
	for _, p := range res.Species {
		el := p.Species.Safety.Exposure
		if p.LC50PPM4h > 0 && p.PeakPPM >= 0.01*p.LC50PPM4h || el.Known() && p.PeakPPM > el.PPM {
			toxic = append(toxic, p.Species.Formula)
		}
	}
	if len(toxic) > 0 {
		r.caution(mixtures.Caution{Title: "Toxic atmosphere", Species: toxic, Text: "the peak reaches 1 % of the 4 h LC50, or exceeds the exposure limit shown: far above what anyone may breathe. Gas detection, exhausted enclosures and the SDS decide."})
	}
	if res.Recalled {
		r.note("rests on figures recalled, not read: check them against the SDS")
	}
	return r
}
