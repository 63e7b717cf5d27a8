package safety

import (
	"fmt"
	"math"
	"sort"
	"strconv"
	"strings"

	"zmix/model"
)

// Part is one species of a blend and its mole fraction.
type Part struct {
	Species *model.Species
	X       float64
}

// Method names, as every result cites them.
const (
	MethodLeChatelier = "Le Chatelier's rule over the flammable components (Zabetakis, US Bureau of Mines Bulletin 627, 1965)"
	MethodISOFlam     = "ISO 10156 calculation: flammable in air when the sum of A'i/Tci (inert gases as nitrogen equivalents, Ki) exceeds 1"
	MethodTciBound    = "A missing Tci bounded by the gas's LFL in air below and 100 % above: a mix of the gas in nitrogen below its LFL stays below it in any amount of air, and a flammable gas burns in air undiluted (bounds zmix applies; not part of ISO 10156)"
	MethodISOOx       = "ISO 10156 calculation: more oxidizing than air when the sum of xi*Ci exceeds 0.235"
	MethodGHSTox      = "GHS additivity formula, 100/LC50mix = sum of Ci/LC50i, 4 h rat LC50 (UN GHS chapter 3.1)"
)

// OxidizingThreshold is ISO 10156's oxidizing power of air: 0.235.
const OxidizingThreshold = 0.235

// Stored says where the blend as stored lies against its flammable range.
type Stored int

const (
	StoredNoFuel     Stored = iota // nothing flammable
	StoredNoOxidizer               // fuel, but nothing to burn it with
	StoredBelow                    // fuel below its lower limit
	StoredInside                   // fuel and oxidizer within the limits in air
	StoredAbove                    // fuel above its upper limit in air
	StoredNotKnown                 // a fuel's limits are not known
)

func (s Stored) String() string {
	switch s {
	case StoredNoFuel:
		return "no flammable component"
	case StoredNoOxidizer:
		return "no oxidizer in the blend: it cannot burn as stored"
	case StoredBelow:
		return "fuel below its lower flammable limit: not flammable as stored"
	case StoredInside:
		return "FUEL AND OXIDIZER WITHIN THE FLAMMABLE RANGE: the blend can burn as stored"
	case StoredAbove:
		return "fuel above its upper limit in air; with more oxygen than air the range widens, so treat it as possibly flammable"
	}
	return "not known: a fuel's flammable limits are not known"
}

// Result is the classification of a blend.
type Result struct {
	Flammables, Oxidizers, Toxics, Pyrophorics, Corrosives []string

	// Le Chatelier. FuelPct is the flammable part of the blend, % by mole.
	// LimitsKnown is false when a flammable component has no limits, or
	// when there is no fuel.
	FuelPct                float64
	LimitsKnown            bool
	FuelLFLPct, FuelUFLPct float64 // of the fuel part alone, in air
	LFLPct, UFLPct         float64 // of the blend in air; UFL capped at 100
	ReachesLFL             bool    // some mixture of the blend with air reaches LFL
	AirToLFL               float64 // volumes of air per volume of blend to reach LFL
	Stored                 Stored
	FlammableNoLimits      []string // flammable components with no LFL/UFL

	// ISO 10156, flammable in air. FlamKnown is false when the answer
	// depends on a missing Tci; FlamSum then holds the known part,
	// FlamSumMin the sum with each missing Tci at 100 %, which no Tci
	// reaches (the sum is above it), and FlamSumMax, when
	// FlamSumMaxKnown, the sum with each missing Tci replaced by the
	// gas's LFL, which no Tci can be below.
	FlamSum         float64
	FlamSumKnown    bool
	FlamSumMin      float64
	FlamSumMax      float64
	FlamSumMaxKnown bool
	FlamKnown       bool
	FlamInAir       bool
	NoTci           []string // flammable components with no Tci
	NotDiluents     []string // neither fuels nor inert gases with a Ki
	OxidizerInMix   bool     // fuels with oxidizers: ISO 10156 asks for a test

	// ISO 10156, oxidizing.
	OxSum      float64
	OxSumKnown bool
	OxKnown    bool
	Oxidizing  bool
	NoCi       []string

	// GHS additivity.
	LC50PPM       float64 // 0 when no component is toxic or none has an LC50
	LC50Known     bool
	Category      int      // 1–4; 0 when not classified
	UnknownToxPct float64  // share of toxic components with no LC50, %
	NoLC50        []string // toxic components with no LC50
	Converted     []string // components whose 1 h LC50 was halved

	// Ignition is the autoignition screen of the flammable components.
	Ignition Ignition

	// Figures are each component's figures, in the blend's order.
	Figures []SpeciesFigures

	// Sources lists every figure used or shown, with its source, and the
	// methods.
	Sources []string
	// Recalled is true when a figure used was recalled, not read.
	Recalled bool
}

// Classify computes the blend's flammable limits and its ISO 10156 and
// GHS classification. The fractions need not sum to 1 exactly; they are
// used as given.
func Classify(parts []Part) Result {
	var r Result
	used := map[string]bool{}
	cite := func(sp *model.Species, field string) {
		src := sp.Sources[field]
		if src == "" {
			src = "no source given"
		}
		if strings.Contains(src, "from memory") {
			r.Recalled = true
		}
		used[sp.Formula+" "+field+": "+src] = true
	}
	for _, p := range parts {
		h := p.Species.Hazards
		f := p.Species.Formula
		if h&model.Flammable != 0 {
			r.Flammables = append(r.Flammables, f)
		}
		if h&model.Oxidizer != 0 {
			r.Oxidizers = append(r.Oxidizers, f)
		}
		if h&model.Toxic != 0 {
			r.Toxics = append(r.Toxics, f)
		}
		if h&model.Pyrophoric != 0 {
			r.Pyrophorics = append(r.Pyrophorics, f)
		}
		if h&model.Corrosive != 0 {
			r.Corrosives = append(r.Corrosives, f)
		}
	}
	r.leChatelier(parts, cite)
	r.isoFlammable(parts, cite)
	r.isoOxidizing(parts, cite)
	r.ghsToxicity(parts, cite)
	r.ignition(parts, cite)
	r.figures(parts, cite)
	for s := range used {
		r.Sources = append(r.Sources, s)
	}
	sort.Strings(r.Sources)
	methods := []string{}
	if len(r.Flammables) > 0 {
		methods = append(methods, MethodLeChatelier, MethodISOFlam)
		if len(r.NoTci) > 0 && (r.FlamSumMaxKnown && !r.FlamInAir || r.FlamInAir && r.FlamSum <= 1) {
			methods = append(methods, MethodTciBound)
		}
		if r.Ignition.LowestK > 0 && len(r.Ignition.Pyrophoric) == 0 {
			methods = append(methods, MethodLowestAIT, MethodTClass)
		}
	}
	if len(r.Oxidizers) > 0 {
		methods = append(methods, MethodISOOx)
	}
	if len(r.Toxics) > 0 {
		methods = append(methods, MethodGHSTox)
	}
	r.Sources = append(methods, r.Sources...)
	return r
}

func (r *Result) leChatelier(parts []Part, cite func(*model.Species, string)) {
	var fuel, sumL, sumU float64
	for _, p := range parts {
		if p.Species.Hazards&model.Flammable == 0 {
			continue
		}
		fuel += p.X
		sd := p.Species.Safety
		if sd.LFLPct == 0 {
			r.FlammableNoLimits = append(r.FlammableNoLimits, p.Species.Formula)
			continue
		}
		cite(p.Species, "lfl_pct")
		cite(p.Species, "ufl_pct")
		sumL += p.X / sd.LFLPct
		sumU += p.X / sd.UFLPct
	}
	r.FuelPct = 100 * fuel
	switch {
	case fuel == 0:
		r.Stored = StoredNoFuel
		return
	case len(r.FlammableNoLimits) > 0:
		r.Stored = StoredNotKnown
		return
	}
	r.LimitsKnown = true
	r.FuelLFLPct, r.FuelUFLPct = fuel/sumL, fuel/sumU
	// The blend makes b % of its mixture with air when its fuel makes
	// b·F: the fuel reaches LFL_fuel at b = LFL_fuel/F.
	r.LFLPct = r.FuelLFLPct / fuel
	r.UFLPct = math.Min(100, r.FuelUFLPct/fuel)
	r.ReachesLFL = r.LFLPct <= 100
	if r.ReachesLFL {
		r.AirToLFL = 100/r.LFLPct - 1
	} else {
		r.LFLPct, r.UFLPct = 0, 0
	}
	oxidizer := false
	for _, p := range parts {
		if p.Species.Hazards&model.Oxidizer != 0 && p.X > 0 {
			oxidizer = true
		}
	}
	switch {
	case !oxidizer:
		r.Stored = StoredNoOxidizer
	case r.FuelPct < r.FuelLFLPct:
		r.Stored = StoredBelow
	case r.FuelPct <= r.FuelUFLPct:
		r.Stored = StoredInside
	default:
		r.Stored = StoredAbove
	}
}

func (r *Result) isoFlammable(parts []Part, cite func(*model.Species, string)) {
	var fuel, diluent float64
	for _, p := range parts {
		sp := p.Species
		switch {
		case sp.Hazards&model.Flammable != 0:
			fuel += p.X
		case sp.Safety.Ki > 0:
			diluent += sp.Safety.Ki * p.X
		default:
			if sp.Hazards&model.Oxidizer != 0 {
				r.OxidizerInMix = true
			}
			r.NotDiluents = append(r.NotDiluents, sp.Formula)
		}
	}
	if fuel == 0 {
		r.FlamKnown, r.FlamSumKnown = true, true
		r.NotDiluents = nil
		r.OxidizerInMix = false
		return
	}
	r.FlamSumMaxKnown = true
	for _, p := range parts {
		sp := p.Species
		if sp.Hazards&model.Flammable == 0 {
			if sp.Safety.Ki > 0 {
				cite(sp, "ki")
			}
			continue
		}
		share := 100 * p.X / (fuel + diluent) // A'i, %
		if sp.Safety.TciPct == 0 {
			r.NoTci = append(r.NoTci, sp.Formula)
			r.FlamSumMin += share / 100
			if sp.Safety.LFLPct > 0 {
				r.FlamSumMax += share / sp.Safety.LFLPct
			} else {
				r.FlamSumMaxKnown = false
			}
			continue
		}
		cite(sp, "tci_pct")
		r.FlamSum += share / sp.Safety.TciPct
		r.FlamSumMin += share / sp.Safety.TciPct
		r.FlamSumMax += share / sp.Safety.TciPct
	}
	r.FlamSumKnown = len(r.NoTci) == 0
	r.FlamInAir = r.FlamSum > 1
	// A missing Tci only adds to the sum: above 1 the answer stands.
	r.FlamKnown = r.FlamSumKnown || r.FlamInAir
	// Nor can a missing Tci reach 100 %: a flammable gas burns in air
	// undiluted, so a mix of it in nitrogen that is not flammable in air
	// holds less than all of it. Each missing term A'i/Tci is therefore
	// above A'i/100, and a sum that reaches 1 so is above 1: pure silane,
	// whose Tci no source here gives, is flammable in air.
	if !r.FlamKnown && r.FlamSumMin >= 1 {
		r.FlamKnown, r.FlamInAir = true, true
	}
	// Nor can a missing Tci be below the gas's LFL in air: a mix of the
	// gas with nitrogen that holds less of it than its LFL stays below
	// the LFL however much air is added, so it is not flammable in air.
	// With the LFL in place of each missing Tci the sum is therefore an
	// upper bound, and at or below 1 it decides too.
	if !r.FlamKnown && r.FlamSumMaxKnown && r.FlamSumMax <= 1 {
		r.FlamKnown = true
		for _, p := range parts {
			if p.Species.Hazards&model.Flammable != 0 && p.Species.Safety.TciPct == 0 {
				cite(p.Species, "lfl_pct") // as the Le Chatelier limits do
			}
		}
	}
}

func (r *Result) isoOxidizing(parts []Part, cite func(*model.Species, string)) {
	for _, p := range parts {
		sp := p.Species
		if sp.Hazards&model.Oxidizer == 0 {
			continue
		}
		if sp.Safety.Ci == 0 {
			r.NoCi = append(r.NoCi, sp.Formula)
			continue
		}
		cite(sp, "ci")
		r.OxSum += p.X * sp.Safety.Ci
	}
	r.OxSumKnown = len(r.NoCi) == 0
	r.Oxidizing = r.OxSum > OxidizingThreshold
	r.OxKnown = r.OxSumKnown || r.Oxidizing
}

func (r *Result) ghsToxicity(parts []Part, cite func(*model.Species, string)) {
	var sum, unknown float64
	known := false
	for _, p := range parts {
		sp := p.Species
		if sp.Hazards&model.Toxic == 0 {
			continue
		}
		if !sp.Safety.LC50.Known() {
			r.NoLC50 = append(r.NoLC50, sp.Formula)
			unknown += 100 * p.X
			continue
		}
		cite(sp, "lc50_ppm")
		ppm, conv := sp.Safety.LC50.FourHourPPM()
		if conv {
			r.Converted = append(r.Converted, sp.Formula)
		}
		sum += 100 * p.X / ppm
		known = true
	}
	r.UnknownToxPct = unknown
	if !known || sum == 0 {
		return
	}
	left := 100.0
	if unknown >= 10 {
		// GHS: with 10 % or more of unknown toxicity, the known part
		// alone carries the formula.
		left -= unknown
	}
	r.LC50PPM = left / sum
	r.LC50Known = true
	r.Category = GHSCategory(r.LC50PPM)
}

// GHSCategory is the acute inhalation toxicity category of a gas with a
// 4 h LC50 in ppm by volume (UN GHS, Table 3.1.1): 1 to 4, or 0 when the
// LC50 is above 20 000 ppm and the gas is not classified.
func GHSCategory(lc50PPM float64) int {
	switch {
	case lc50PPM <= 100:
		return 1
	case lc50PPM <= 500:
		return 2
	case lc50PPM <= 2500:
		return 3
	case lc50PPM <= 20000:
		return 4
	}
	return 0
}

// Summary is the one-line verdict of each part of the classification,
// for cautions and the workbench's safety details.
func (r *Result) Summary() []string {
	var out []string
	if len(r.Flammables) > 0 {
		switch {
		case !r.LimitsKnown:
			out = append(out, "Flammable limits in air: not known ("+strings.Join(r.FlammableNoLimits, ", ")+" has none in the catalogue).")
		case !r.ReachesLFL:
			out = append(out, fmt.Sprintf("Flammable limits: the blend's %.3g %% fuel is below the fuel's LFL of %.3g %%: no mixture with air reaches it (Le Chatelier).", r.FuelPct, r.FuelLFLPct))
		default:
			out = append(out, fmt.Sprintf("Flammable limits of the blend in air: %s (Le Chatelier; inert components not counted); %.3g volumes of air bring a release to its LFL.", r.BlendRange(), r.AirToLFL))
		}
		out = append(out, "As stored: "+r.Stored.String()+".")
		out = append(out, "ISO 10156 flammability: "+r.FlamVerdict()+".")
		out = append(out, "Autoignition: "+r.Ignition.Verdict()+".")
	}
	if len(r.Oxidizers) > 0 {
		out = append(out, "ISO 10156 oxidizing power: "+r.OxVerdict()+".")
	}
	if len(r.Toxics) > 0 {
		out = append(out, "GHS acute inhalation toxicity: "+r.ToxVerdict()+".")
	}
	if r.Recalled && len(out) > 0 {
		out = append(out, "These figures rest on data recalled from the named compilations, not read from them: check them against the SDS.")
	}
	return out
}

// FlamVerdict is the ISO 10156 flammability result in words.
func (r *Result) FlamVerdict() string {
	var s string
	switch {
	case !r.FlamKnown && r.FlamSumMaxKnown:
		s = fmt.Sprintf("not known: no Tci for %s; the sum of A'i/Tci lies between %.3g and %.3g (a missing Tci taken at 100 %% and at its least, the LFL)", strings.Join(r.NoTci, ", "), r.FlamSumMin, r.FlamSumMax)
	case !r.FlamKnown:
		s = fmt.Sprintf("not known: no Tci for %s; the sum of A'i/Tci is above %.3g (a missing Tci taken at 100 %%)", strings.Join(r.NoTci, ", "), r.FlamSumMin)
	case r.FlamInAir:
		s = fmt.Sprintf("FLAMMABLE IN AIR, sum of A'i/Tci = %.3g > 1", r.FlamSum)
		switch {
		case !r.FlamSumKnown && r.FlamSum > 1:
			s = fmt.Sprintf("FLAMMABLE IN AIR, sum of A'i/Tci at least %.3g > 1 (no Tci for %s)", r.FlamSum, strings.Join(r.NoTci, ", "))
		case !r.FlamSumKnown:
			s = fmt.Sprintf("FLAMMABLE IN AIR, sum of A'i/Tci above %.3g >= 1 (no Tci for %s: taken at 100 %%, which a flammable gas's Tci is below)", r.FlamSumMin, strings.Join(r.NoTci, ", "))
		}
	case !r.FlamSumKnown:
		s = fmt.Sprintf("not flammable in air, sum of A'i/Tci at most %.3g <= 1 (no Tci for %s: taken at its least, the LFL)", r.FlamSumMax, strings.Join(r.NoTci, ", "))
	default:
		s = fmt.Sprintf("not flammable in air, sum of A'i/Tci = %.3g <= 1", r.FlamSum)
	}
	if r.OxidizerInMix {
		s += "; the blend holds an oxidizer, for which ISO 10156 asks for a test"
	}
	return s
}

// OxVerdict is the ISO 10156 oxidizing result in words.
func (r *Result) OxVerdict() string {
	switch {
	case !r.OxKnown && r.OxSum == 0:
		return "not known: no Ci for " + strings.Join(r.NoCi, ", ")
	case !r.OxKnown:
		return fmt.Sprintf("not known: no Ci for %s (the others sum to %.3g)", strings.Join(r.NoCi, ", "), r.OxSum)
	case r.Oxidizing && !r.OxSumKnown:
		return fmt.Sprintf("MORE OXIDIZING THAN AIR, sum of xi*Ci at least %.3g > 0.235", r.OxSum)
	case r.Oxidizing:
		return fmt.Sprintf("MORE OXIDIZING THAN AIR, sum of xi*Ci = %.3g > 0.235", r.OxSum)
	}
	return fmt.Sprintf("not more oxidizing than air, sum of xi*Ci = %.3g <= 0.235", r.OxSum)
}

// maxShownLC50PPM is the largest blend LC50 ToxVerdict prints: a
// million times the undiluted blend.
const maxShownLC50PPM = 1e12

// ToxVerdict is the GHS result in words.
func (r *Result) ToxVerdict() string {
	if !r.LC50Known {
		return "not known: no LC50 for " + strings.Join(r.NoLC50, ", ")
	}
	lc := ppm(r.LC50PPM)
	if !(r.LC50PPM <= maxShownLC50PPM) {
		// A trace of a toxic gas (1e-300 ppm) gives an LC50 past any
		// number worth printing, or past the floats.
		lc = "above 1e12"
	}
	s := "LC50 of the blend " + lc + " ppm (4 h)"
	if r.Category > 0 {
		s += fmt.Sprintf(", Category %d", r.Category)
	} else {
		s += ", not classified (above 20 000 ppm)"
	}
	if len(r.Converted) > 0 {
		s += "; 1 h LC50 of " + strings.Join(r.Converted, ", ") + " halved to 4 h as GHS prescribes"
	}
	if len(r.NoLC50) > 0 {
		s += fmt.Sprintf("; %.3g %% of the blend is of unknown acute toxicity (%s)", r.UnknownToxPct, strings.Join(r.NoLC50, ", "))
	}
	return s
}

// ppm writes a concentration to 4 significant figures without an exponent.
func ppm(x float64) string {
	if x >= 1e4 {
		return strconv.FormatFloat(math.Round(x/10)*10, 'f', 0, 64)
	}
	return strconv.FormatFloat(x, 'g', 4, 64)
}

// BlendRange says the blend's flammable range in air. Where the fuel's
// UFL lies beyond the undiluted blend (a lean fuel in an inert balance),
// the range runs up to the blend itself, and "100 %" alone would read as
// a measured limit; the text says so instead.
func (r *Result) BlendRange() string {
	if r.UFLPct >= 100 {
		return fmt.Sprintf("from %.3g %% of blend in air up to the undiluted blend", r.LFLPct)
	}
	return fmt.Sprintf("%.3g-%.3g %% of blend in air", r.LFLPct, r.UFLPct)
}
