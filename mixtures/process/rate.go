package process

import (
	"slices"
	"strconv"
	"strings"
	"unicode/utf8"

	"zmix/mixtures"
	"zmix/model"
)

// Reference is a named reference condition for standard volumes.
type Reference struct {
	Key    string // how it is chosen: "normal", "15C", "20C", "60F"; "" for one the user gave
	Label  string // how it is shown: "normal (0 °C, 101.325 kPa)"
	TempK  float64
	PresPa float64
}

// psiPa is 1 lbf/in² in Pa (0.45359237 kg × 9.80665 m/s² / (0.0254 m)²,
// exact by the definitions of the pound, standard gravity and the inch).
const psiPa = 0.45359237 * 9.80665 / (0.0254 * 0.0254)

// The references the trade names. Their values are definitions.
var (
	RefNormal = Reference{Key: "normal", Label: "normal: 0 °C and 101.325 kPa", TempK: model.ZeroCelsiusK, PresPa: model.StdPressureAtmPa}
	RefISO    = Reference{Key: "15C", Label: "standard: 15 °C and 101.325 kPa (ISO 13443)", TempK: model.ZeroCelsiusK + 15, PresPa: model.StdPressureAtmPa}
	Ref20C    = Reference{Key: "20C", Label: "standard: 20 °C and 101.325 kPa", TempK: model.ZeroCelsiusK + 20, PresPa: model.StdPressureAtmPa}
	Ref60F    = Reference{Key: "60F", Label: "standard: 60 °F and 14.696 psia", TempK: (60 + 459.67) * 5 / 9, PresPa: 14.696 * psiPa}
)

// References lists the named references, in the order help shows them.
var References = []Reference{RefNormal, RefISO, Ref20C, Ref60F}

// ReferenceForms lists what ParseReference accepts, for messages.
const ReferenceForms = `normal (0 °C, 101.325 kPa), 15C (ISO 13443), 20C, 60F (14.696 psia), or "T, P" such as "25C, 1 bar"`

// referenceAliases maps accepted spellings to the named references.
var referenceAliases = map[string]*Reference{
	"normal": &RefNormal, "n": &RefNormal, "0c": &RefNormal, "ntp": &RefNormal,
	"15c": &RefISO, "iso": &RefISO, "iso13443": &RefISO, "iso 13443": &RefISO,
	"20c": &Ref20C,
	"60f": &Ref60F,
}

// maxInputChars bounds any text a calculation parses, before any work.
const maxInputChars = 200

func tooLong(what, s string) error {
	if n := utf8.RuneCountInString(s); n > maxInputChars {
		return model.Errorf("process", "%s of %d characters; want at most %d", what, n, maxInputChars)
	}
	return nil
}

// ParseReference reads a reference condition: a name, or "T, P" with
// units.
func ParseReference(s string) (Reference, error) {
	if err := tooLong("a reference", s); err != nil {
		return Reference{}, err
	}
	low := strings.ToLower(strings.Join(strings.Fields(s), " "))
	if r, ok := referenceAliases[low]; ok {
		return *r, nil
	}
	if r, ok := referenceAliases[strings.ReplaceAll(low, " ", "")]; ok {
		return *r, nil
	}
	ts, ps, ok := strings.Cut(s, ",")
	if !ok {
		return Reference{}, model.Errorf("process", "reference %s: want %s", model.Quote(s), ReferenceForms)
	}
	t, err := mixtures.ParseTemperature(strings.TrimSpace(ts))
	if err != nil {
		return Reference{}, model.Errorf("process", "reference %s: %v", model.Quote(s), err)
	}
	p, err := mixtures.ParsePressure(strings.TrimSpace(ps))
	if err != nil {
		return Reference{}, model.Errorf("process", "reference %s: %v", model.Quote(s), err)
	}
	return Reference{
		Label:  "given: " + strconv.FormatFloat(t, 'g', 6, 64) + " K and " + strconv.FormatFloat(p.Pa/1e3, 'g', 6, 64) + " kPa",
		TempK:  t,
		PresPa: p.Pa,
	}, nil
}

// Basis says what a flow unit measures.
type Basis int

const (
	BasisMolar    Basis = iota // amount of substance per time
	BasisMass                  // mass per time
	BasisActual                // volume at the line's own T and P
	BasisStandard              // volume at a reference condition
)

// RateUnit is one flow unit: its size in SI (mol/s, kg/s or m³/s) and,
// for a standard volume, the reference it is tied to by name.
type RateUnit struct {
	Name  string  // as written in help: "Nm3/h"
	Basis Basis   //
	SI    float64 // one unit in mol/s, kg/s or m³/s
	// Ref is the unit's reference: fixed by its name when RefSet (Nm³ is
	// normal, SCF is 60 °F), otherwise the default when the caller names
	// none (SLPM and sccm 0 °C, Sm³ 15 °C, as the trade most often reads
	// them).
	Ref    *Reference
	RefSet bool
}

const (
	perHour   = 1.0 / 3600
	perDay    = 1.0 / 86400
	perMinute = 1.0 / 60
	cubicFoot = 0.3048 * 0.3048 * 0.3048 // m³, exact
	pound     = 0.45359237               // kg, exact
)

// rateUnitList holds the accepted flow units, in the order help and
// messages list them; rateUnits finds them by lower-case spelling.
var rateUnitList = []RateUnit{
	{Name: "mol/s", Basis: BasisMolar, SI: 1},
	{Name: "mol/min", Basis: BasisMolar, SI: perMinute},
	{Name: "mol/h", Basis: BasisMolar, SI: perHour},
	{Name: "kmol/h", Basis: BasisMolar, SI: 1000 * perHour},
	{Name: "kmol/s", Basis: BasisMolar, SI: 1000},
	{Name: "kg/s", Basis: BasisMass, SI: 1},
	{Name: "kg/min", Basis: BasisMass, SI: perMinute},
	{Name: "kg/h", Basis: BasisMass, SI: perHour},
	{Name: "t/h", Basis: BasisMass, SI: 1000 * perHour},
	{Name: "g/s", Basis: BasisMass, SI: 1e-3},
	{Name: "g/min", Basis: BasisMass, SI: 1e-3 * perMinute},
	{Name: "lb/h", Basis: BasisMass, SI: pound * perHour},
	{Name: "lb/min", Basis: BasisMass, SI: pound * perMinute},
	{Name: "m3/s", Basis: BasisActual, SI: 1},
	{Name: "m3/min", Basis: BasisActual, SI: perMinute},
	{Name: "m3/h", Basis: BasisActual, SI: perHour},
	{Name: "L/s", Basis: BasisActual, SI: 1e-3},
	{Name: "L/min", Basis: BasisActual, SI: 1e-3 * perMinute},
	{Name: "ACFM", Basis: BasisActual, SI: cubicFoot * perMinute},
	{Name: "ACFH", Basis: BasisActual, SI: cubicFoot * perHour},
	{Name: "Nm3/s", Basis: BasisStandard, SI: 1, Ref: &RefNormal, RefSet: true},
	{Name: "Nm3/min", Basis: BasisStandard, SI: perMinute, Ref: &RefNormal, RefSet: true},
	{Name: "Nm3/h", Basis: BasisStandard, SI: perHour, Ref: &RefNormal, RefSet: true},
	{Name: "Nm3/d", Basis: BasisStandard, SI: perDay, Ref: &RefNormal, RefSet: true},
	{Name: "SCFM", Basis: BasisStandard, SI: cubicFoot * perMinute, Ref: &Ref60F, RefSet: true},
	{Name: "SCFH", Basis: BasisStandard, SI: cubicFoot * perHour, Ref: &Ref60F, RefSet: true},
	{Name: "MMSCFD", Basis: BasisStandard, SI: 1e6 * cubicFoot * perDay, Ref: &Ref60F, RefSet: true},
	{Name: "Sm3/s", Basis: BasisStandard, SI: 1, Ref: &RefISO},
	{Name: "Sm3/h", Basis: BasisStandard, SI: perHour, Ref: &RefISO},
	{Name: "Sm3/d", Basis: BasisStandard, SI: perDay, Ref: &RefISO},
	{Name: "SLPM", Basis: BasisStandard, SI: 1e-3 * perMinute, Ref: &RefNormal},
	{Name: "slm", Basis: BasisStandard, SI: 1e-3 * perMinute, Ref: &RefNormal}, // the fab's spelling of SLPM
	{Name: "sccm", Basis: BasisStandard, SI: 1e-6 * perMinute, Ref: &RefNormal},
}

var rateUnits = func() map[string]RateUnit {
	m := make(map[string]RateUnit, len(rateUnitList))
	for _, u := range rateUnitList {
		m[strings.ToLower(u.Name)] = u
	}
	return m
}()

// RateUnitNames returns the names of the flow units of one basis, in
// the order help lists them.
func RateUnitNames(b Basis) []string {
	var names []string
	for _, u := range rateUnitList {
		if u.Basis == b {
			names = append(names, u.Name)
		}
	}
	return names
}

// RateUnits lists the accepted flow units, for messages.
var RateUnits = strings.Join([]string{
	strings.Join(RateUnitNames(BasisMolar), ", "),
	strings.Join(RateUnitNames(BasisMass), ", "),
	"actual " + strings.Join(RateUnitNames(BasisActual), ", "),
	"standard " + strings.Join(RateUnitNames(BasisStandard), ", "),
	"/hr reads as /h",
}, "; ")

// StandardUnitGroups returns the standard-volume units grouped by their
// reference, in list order, and whether the name fixes the reference
// (Nm3, SCF) or only gives the default that --ref may change (SLPM, Sm3).
func StandardUnitGroups() []StandardUnitGroup {
	var groups []StandardUnitGroup
	for _, u := range rateUnitList {
		if u.Basis != BasisStandard {
			continue
		}
		i := slices.IndexFunc(groups, func(g StandardUnitGroup) bool { return g.Ref == *u.Ref && g.Fixed == u.RefSet })
		if i < 0 {
			groups = append(groups, StandardUnitGroup{Ref: *u.Ref, Fixed: u.RefSet})
			i = len(groups) - 1
		}
		groups[i].Names = append(groups[i].Names, u.Name)
	}
	return groups
}

// StandardUnitGroup is the standard-volume units that share a reference.
type StandardUnitGroup struct {
	Names []string
	Ref   Reference
	Fixed bool // fixed by the unit's name; otherwise the default --ref may change
}

// Rate is a parsed flow with its unit.
type Rate struct {
	Value float64
	Unit  RateUnit
	Text  string // as typed
}

// MaxRateValue bounds the number of a rate in its own unit, as the
// released amounts of the safety package are bounded: far beyond any
// plant's flow in any unit, so that a slip of the exponent (1e300 kg/h)
// is refused rather than computed.
const MaxRateValue = 1e12

// ParseRate reads a flow with its unit: "120 Nm3/h", "2.5 kg/h",
// "500 sccm". Superscript ³ and "m^3" are accepted for m3. A rate must
// be above zero and at most MaxRateValue in its unit.
func ParseRate(s string) (Rate, error) {
	if err := tooLong("a rate", s); err != nil {
		return Rate{}, err
	}
	text := strings.TrimSpace(s)
	x, unitText, err := mixtures.SplitNumber(text)
	if err != nil {
		return Rate{}, model.Errorf("process", "rate %s: %v; want a number and a unit, e.g. 120 Nm3/h; the units are %s", model.Quote(s), err, RateUnits)
	}
	key := strings.ToLower(strings.NewReplacer("³", "3", "^3", "3", " ", "").Replace(unitText))
	if k, ok := strings.CutSuffix(key, "/hr"); ok {
		key = k + "/h" // lb/hr, Nm3/hr
	}
	u, ok := rateUnits[key]
	if !ok {
		if unitText == "" {
			return Rate{}, model.Errorf("process", "rate %s has no unit; want one of %s", model.Quote(s), RateUnits)
		}
		return Rate{}, model.Errorf("process", "rate %s: unknown unit %s; want %s", model.Quote(s), model.Quote(unitText), RateUnits)
	}
	if !(x > 0) || x > MaxRateValue {
		return Rate{}, model.Errorf("process", "rate %s: want a flow above zero and at most 1e12 %s", model.Quote(s), unitText)
	}
	return Rate{Value: x, Unit: u, Text: text}, nil
}

// splitValue splits "120 Nm3/h" into 120 and "Nm3/h", with the engine's
// one reader of a number and its unit.
func splitValue(s string) (float64, string, bool) {
	x, unit, err := mixtures.SplitNumber(s)
	return x, unit, err == nil
}

// Conditions say where a flow is measured: the line's T and P, when known
// (zero when not), and the reference for standard volumes whose unit does
// not name one.
type Conditions struct {
	TempK, PresPa float64
	Ref           Reference
}

// MolPerSec converts the rate to mol/s for the gas g. An actual volume
// needs the line's T and P; a standard volume uses its unit's reference,
// or cond.Ref. Volumes go through the gas's own density, so that a
// real-gas model changes them too.
func (r Rate) MolPerSec(g Gas, cond Conditions) (float64, error) {
	v := r.Value * r.Unit.SI
	switch r.Unit.Basis {
	case BasisMolar:
		return v, nil
	case BasisMass:
		return v / g.Mixture().MolarMassKgPerMol, nil
	case BasisActual:
		if !(cond.TempK > 0 && cond.PresPa > 0) {
			return 0, model.Errorf("process", "rate %s is an actual volume; give the line's temperature and pressure too, or use a molar, mass or standard unit", model.Quote(r.Text))
		}
		c, err := molarDensity(g, cond.TempK, cond.PresPa)
		return v * c, err
	default:
		ref := r.Reference(cond)
		c, err := molarDensity(g, ref.TempK, ref.PresPa)
		return v * c, err
	}
}

// Reference is the reference a standard-volume rate is read at: the one
// its unit names, else cond.Ref, else the unit's default.
func (r Rate) Reference(cond Conditions) Reference {
	switch {
	case r.Unit.RefSet:
		return *r.Unit.Ref
	case cond.Ref.TempK > 0:
		return cond.Ref
	case r.Unit.Ref != nil:
		return *r.Unit.Ref
	}
	return RefNormal
}

// molarDensity is the gas's amount per volume at (T, P), in mol/m³.
func molarDensity(g Gas, tempK, presPa float64) (float64, error) {
	var st mixtures.State
	if err := g.State(&st, tempK, presPa); err != nil {
		return 0, err
	}
	return st.DensityKgPerM3 / st.MolarMassKgPerMol, nil
}
