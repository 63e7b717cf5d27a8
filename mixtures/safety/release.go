package safety

import (
	"math"
	"strings"

	"zmix/model"
)

// Room air, as the release model takes it: 20.9 % oxygen, at 20 °C and
// 1 atm (common practice).
const (
	AirO2Frac     = 0.209
	RoomTempK     = model.ZeroCelsiusK + 20
	RoomPresPa    = model.StdPressureAtmPa
	O2DeficientPc = 19.5 // % O2: the usual oxygen-deficiency alarm (common practice)
)

// Alarm points of flammable-gas detection, % of LFL (common practice).
const (
	AlarmLowPctLFL  = 10
	AlarmHighPctLFL = 25
)

// MethodRelease names the release model.
const MethodRelease = "well-mixed room (common practice for oxygen-deficiency and gas-release assessments)"

// Release is a blend escaping into a room. Volumes are at room conditions
// (RoomTempK, RoomPresPa); RoomM3VolumeOf converts an amount of gas.
type Release struct {
	Parts  []Part
	RoomM3 float64
	// AmountM3 is the gas released at once (an instant release), or the
	// whole amount of a continuous one, which then lasts AmountM3/RateM3PerS;
	// 0 with a rate means a release that goes on.
	AmountM3   float64
	RateM3PerS float64 // 0 for an instant release
	VentM3PerS float64 // ventilation, fresh air in and room air out
}

// GasM3AtRoom is the volume of n mol of gas at room conditions.
func GasM3AtRoom(mol float64) float64 {
	return mol * model.GasConstant * RoomTempK / RoomPresPa
}

// SpeciesPeak is one species' worst concentration in the room.
type SpeciesPeak struct {
	Species *model.Species
	PeakPPM float64
	// PctOfLFL is the peak as % of the species' LFL; 0 if not flammable
	// or its LFL is not known.
	PctOfLFL float64
	// LC50PPM4h is the species' 4 h LC50 (0 if none); Category its GHS
	// inhalation category.
	LC50PPM4h float64
	Category  int
}

// TimePoint is the room's oxygen at one time of a continuous release.
type TimePoint struct {
	TimeS float64
	O2Pct float64
}

// ReleaseResult is what a release does to the room.
type ReleaseResult struct {
	Continuous bool
	// Instant release: the two closed forms, and the worst.
	O2ClosedPct, O2DisplacedPct float64
	// Continuous release: the time constant V/(q+v), the steady state and
	// the end of a release of limited amount (DurationS, 0 when unlimited).
	TauS, DurationS, O2SteadyPct float64
	// O2Pct is the worst oxygen level the model gives, % by volume.
	O2Pct float64
	// TimeToDeficientS is when a continuous release brings O2 to 19.5 %;
	// negative when it never does.
	TimeToDeficientS float64
	TimeCourse       []TimePoint
	Species          []SpeciesPeak
	// MixPctOfLFL is the flammable part's peak as % of its LFL by Le
	// Chatelier's rule, Σ xᵢ/LFLᵢ; 0 when nothing flammable or not known.
	MixPctOfLFL float64
	Recalled    bool
}

// peakFraction is how much of the blend the room holds at worst: the
// factor a species' blend fraction is multiplied by.
func (r *Release) peakFraction(res *ReleaseResult) (worst float64) {
	v := r.RoomM3
	if r.RateM3PerS == 0 {
		ratio := r.AmountM3 / v
		closed := ratio / (1 + ratio)    // gas added to a sealed room
		displaced := -math.Expm1(-ratio) // room air pushed out as it comes
		res.O2ClosedPct = 100 * mix(AirO2Frac, r.o2(), closed)
		res.O2DisplacedPct = 100 * mix(AirO2Frac, r.o2(), displaced)
		return math.Max(closed, displaced)
	}
	res.Continuous = true
	q, vent := r.RateM3PerS, r.VentM3PerS
	res.TauS = v / (q + vent)
	steady := q / (q + vent)
	res.O2SteadyPct = 100 * mix(AirO2Frac, r.o2(), steady)
	worst = steady
	if r.AmountM3 > 0 {
		res.DurationS = r.AmountM3 / q
		worst = steady * -math.Expm1(-res.DurationS/res.TauS)
	}
	end := res.DurationS
	if end == 0 {
		end = 5 * res.TauS
	}
	for i := 0; i <= 10; i++ {
		t := end * float64(i) / 10
		f := steady * -math.Expm1(-t/res.TauS)
		res.TimeCourse = append(res.TimeCourse, TimePoint{t, 100 * mix(AirO2Frac, r.o2(), f)})
	}
	// Time for the blend's share to reach the level that brings O2 to 19.5 %.
	res.TimeToDeficientS = -1
	if xo := r.o2(); xo < O2DeficientPc/100 {
		need := (AirO2Frac - O2DeficientPc/100) / (AirO2Frac - xo)
		if need < worst {
			res.TimeToDeficientS = -res.TauS * math.Log1p(-need/steady)
		}
	}
	return worst
}

// mix is the fraction of a quantity when the room holds share f of blend.
func mix(air, blend, f float64) float64 { return air*(1-f) + blend*f }

func (r *Release) o2() float64 {
	x := 0.0
	for _, p := range r.Parts {
		if p.Species.Formula == "O2" {
			x += p.X
		}
	}
	return x
}

// Solve applies the well-mixed model. The caller checks that the room,
// amount, rate and ventilation are finite and in range.
func (r *Release) Solve() ReleaseResult {
	var res ReleaseResult
	f := r.peakFraction(&res)
	if res.Continuous {
		res.O2Pct = 100 * mix(AirO2Frac, r.o2(), f)
	} else {
		res.O2Pct = math.Min(res.O2ClosedPct, res.O2DisplacedPct)
		if r.o2() > AirO2Frac {
			res.O2Pct = math.Max(res.O2ClosedPct, res.O2DisplacedPct)
		}
	}
	sumLFL, lflKnown, anyFuel := 0.0, true, false
	for _, p := range r.Parts {
		sp := p.Species
		if sp.Formula == "O2" || sp.Formula == "N2" || sp.Formula == "Ar" {
			// Air's own gases are in the room already; their peaks say
			// nothing a user acts on. O2 has its own figure.
			continue
		}
		pk := SpeciesPeak{Species: sp, PeakPPM: 1e6 * p.X * f}
		if sp.Hazards&model.Flammable != 0 {
			anyFuel = true
			if sp.Safety.LFLPct > 0 {
				pk.PctOfLFL = pk.PeakPPM / 1e4 / sp.Safety.LFLPct * 100
				sumLFL += pk.PctOfLFL
				res.Recalled = res.Recalled || recalled(sp, "lfl_pct")
			} else {
				lflKnown = false
			}
		}
		if sp.Safety.LC50.Known() {
			pk.LC50PPM4h, _ = sp.Safety.LC50.FourHourPPM()
			pk.Category = GHSCategory(pk.LC50PPM4h)
			res.Recalled = res.Recalled || recalled(sp, "lc50_ppm")
		}
		res.Species = append(res.Species, pk)
	}
	if anyFuel && lflKnown {
		res.MixPctOfLFL = sumLFL
	}
	return res
}

func recalled(sp *model.Species, field string) bool {
	return strings.Contains(sp.Sources[field], "from memory")
}
