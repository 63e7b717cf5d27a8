package mixtures

import (
	"errors"
	"fmt"
	"math"
	"strconv"
	"strings"
)

// Pressure is a parsed pressure: the absolute value in Pa and whether the
// user gave it as gauge (barg, psig), converted with 101 325 Pa.
type Pressure struct {
	Pa    float64
	Gauge bool
}

// AtmospherePa is the ambient pressure assumed for gauge readings.
const AtmospherePa = 101325

// TemperatureUnits and PressureUnits list the accepted unit words, for
// error messages and help.
const (
	TemperatureUnits = "K, C (°C), F (°F), R (Rankine)"
	PressureUnits    = "Pa, kPa, MPa, bar, mbar, atm, Torr, psi (psia); gauge: barg, psig"
)

// ErrValue is wrapped by every value-parsing error.
var ErrValue = errors.New("mixtures: bad value")

// splitNumber splits "25 °C" or "1.5bar" into the number and the unit text.
func splitNumber(s string) (float64, string, error) {
	x, rest, err := splitNumberRaw(strings.TrimSpace(s))
	return x, strings.TrimSpace(rest), err
}

// splitNumberRaw reads the number that leads s and returns the rest of s
// untouched, spacing included.
func splitNumberRaw(s string) (float64, string, error) {
	end := 0
	for end < len(s) {
		c := s[end]
		if (c >= '0' && c <= '9') || c == '.' || c == '-' || c == '+' ||
			((c == 'e' || c == 'E') && end > 0 && end+1 < len(s) && (s[end+1] == '-' || s[end+1] == '+' || (s[end+1] >= '0' && s[end+1] <= '9'))) {
			end++
			continue
		}
		break
	}
	if end == 0 {
		return 0, "", fmt.Errorf("no number")
	}
	x, err := strconv.ParseFloat(s[:end], 64)
	if err != nil || math.IsNaN(x) || math.IsInf(x, 0) {
		return 0, "", fmt.Errorf("%q is not a number", s[:end])
	}
	return x, s[end:], nil
}

// ParseTemperature reads a temperature with its unit ("300 K", "25 C",
// "77°F", "540 R") and returns kelvin. It rejects values at or below
// absolute zero.
func ParseTemperature(s string) (float64, error) {
	x, unit, err := splitNumber(s)
	if err != nil {
		return 0, fmt.Errorf("%w: temperature %q: %v; want a number and a unit: %s", ErrValue, s, err, TemperatureUnits)
	}
	var k float64
	switch strings.TrimPrefix(strings.ToLower(unit), "°") {
	case "k":
		k = x
	case "c", "degc":
		k = x + celsiusZeroK
	case "f", "degf":
		k = (x + 459.67) * 5 / 9
	case "r", "degr":
		k = x * 5 / 9
	case "":
		return 0, fmt.Errorf("%w: temperature %q has no unit; want one of %s (e.g. %g K)", ErrValue, s, TemperatureUnits, x)
	default:
		return 0, fmt.Errorf("%w: temperature %q: unknown unit %q; want %s", ErrValue, s, unit, TemperatureUnits)
	}
	if !(k > 0) {
		return 0, fmt.Errorf("%w: temperature %q is at or below absolute zero; want a value above 0 K", ErrValue, s)
	}
	return k, nil
}

// pressureUnitPa holds the absolute pressure units and their size in Pa.
var pressureUnitPa = map[string]float64{
	"pa":   1,
	"kpa":  1e3,
	"mpa":  1e6,
	"bar":  1e5,
	"bara": 1e5,
	"mbar": 100,
	"atm":  101325,
	"torr": 101325.0 / 760,
	"psi":  6894.757293168361, // 1 lbf/in² (0.45359237 kg · 9.80665 m/s² / 0.0254² m²)
	"psia": 6894.757293168361,
}

var gaugeUnitPa = map[string]float64{
	"barg": 1e5,
	"psig": 6894.757293168361,
	"kpag": 1e3,
}

// pressureUnit returns the size in Pa of a unit word and whether it is
// gauge; ok is false for words that are not pressure units. Case does not
// matter, except that "mPa" is refused (see ambiguousPressureUnit).
func pressureUnit(unit string) (sizePa float64, gauge, ok bool) {
	if ambiguousPressureUnit(unit) != "" {
		return 0, false, false
	}
	u := strings.ToLower(unit)
	if v, ok := pressureUnitPa[u]; ok {
		return v, false, true
	}
	if v, ok := gaugeUnitPa[u]; ok {
		return v, true, true
	}
	return 0, false, false
}

// ambiguousPressureUnit explains why a unit is refused for its case, or
// returns "". Folding case would read millipascal as megapascal, 10⁹ times
// off, so a lower-case m before Pa is an error rather than a guess.
func ambiguousPressureUnit(unit string) string {
	if strings.EqualFold(unit, "mpa") && unit[0] == 'm' {
		return fmt.Sprintf("%q would be millipascal, which is not accepted; write MPa for megapascal", unit)
	}
	return ""
}

// ParsePressure reads a pressure with its unit ("1 bar", "14.7 psia",
// "2 barg", "760 Torr"). Gauge units add 101 325 Pa. The absolute result
// must be above 0 Pa.
func ParsePressure(s string) (Pressure, error) {
	x, unit, err := splitNumber(s)
	if err != nil {
		return Pressure{}, fmt.Errorf("%w: pressure %q: %v; want a number and a unit: %s", ErrValue, s, err, PressureUnits)
	}
	if unit == "" {
		return Pressure{}, fmt.Errorf("%w: pressure %q has no unit; want one of %s (e.g. %g bar)", ErrValue, s, PressureUnits, x)
	}
	if why := ambiguousPressureUnit(unit); why != "" {
		return Pressure{}, fmt.Errorf("%w: pressure %q: %s; want %s", ErrValue, s, why, PressureUnits)
	}
	size, gauge, ok := pressureUnit(unit)
	if !ok {
		return Pressure{}, fmt.Errorf("%w: pressure %q: unknown unit %q; want %s", ErrValue, s, unit, PressureUnits)
	}
	p := Pressure{Pa: x * size, Gauge: gauge}
	if gauge {
		p.Pa += AtmospherePa
	}
	if math.IsInf(p.Pa, 0) {
		return Pressure{}, fmt.Errorf("%w: pressure %q is too large to compute with; want a finite value above 0 Pa absolute", ErrValue, s)
	}
	if !(p.Pa > 0) {
		return Pressure{}, fmt.Errorf("%w: pressure %q is at or below zero absolute; want a value above 0 Pa absolute", ErrValue, s)
	}
	return p, nil
}

// ParseRange reads "A..B" where A and B are values of one kind; a unit
// written only after B applies to A too ("300..1500 K").
func ParseRange(s string) (from, to string, err error) {
	a, b, ok := strings.Cut(s, "..")
	a, b = strings.TrimSpace(a), strings.TrimSpace(b)
	if !ok || a == "" || b == "" {
		return "", "", fmt.Errorf("%w: range %q: want FROM..TO, e.g. 300..1500 K or 1 bar..50 bar", ErrValue, s)
	}
	// A unit written on one end only applies to both ("300..1500 K",
	// "300 K..1500").
	_, ua, errA := splitNumber(a)
	_, ub, errB := splitNumber(b)
	if errA == nil && errB == nil {
		switch {
		case ua == "" && ub != "":
			a += " " + ub
		case ub == "" && ua != "":
			b += " " + ua
		}
	}
	return a, b, nil
}

// celsiusZeroK is 0 °C in kelvin, by definition of the Celsius scale.
const celsiusZeroK = 273.15

// KelvinToCelsius converts a temperature for display in °C.
func KelvinToCelsius(tempK float64) float64 { return tempK - celsiusZeroK }

// FormatTemperature writes a temperature in kelvin with sensible digits.
func FormatTemperature(tempK float64) string {
	return strconv.FormatFloat(tempK, 'g', 6, 64) + " K"
}

// PressureUnit is a unit pressures are shown in: a size in Pa and a
// reading, absolute or gauge (above AtmospherePa). The workbench shows
// every total pressure in the unit the user typed and the reading chosen.
type PressureUnit struct {
	key    string // the unit's family in pressureUnitNames
	SizePa float64
	Gauge  bool
}

// pressureUnitNames are each unit family's names for an absolute and a
// gauge reading; "abs" marks units that would otherwise be read either way.
var pressureUnitNames = map[string][2]string{
	"pa": {"Pa abs", "Pa gauge"}, "kpa": {"kPa abs", "kPag"}, "mpa": {"MPa abs", "MPa gauge"},
	"bar": {"bar abs", "barg"}, "mbar": {"mbar abs", "mbar gauge"}, "atm": {"atm", "atm gauge"},
	"torr": {"Torr", "Torr gauge"}, "psi": {"psia", "psig"},
}

// pressureUnitFamily maps each accepted unit word to its family.
var pressureUnitFamily = map[string]string{
	"pa": "pa", "kpa": "kpa", "kpag": "kpa", "mpa": "mpa", "bar": "bar", "bara": "bar", "barg": "bar",
	"mbar": "mbar", "atm": "atm", "torr": "torr", "psi": "psi", "psia": "psi", "psig": "psi",
}

// BarAbsolute is the unit of pressures nobody typed: bar, absolute.
var BarAbsolute = PressureUnit{key: "bar", SizePa: 1e5}

// PressureUnitOf returns the unit of a typed pressure ("30 psig" gives
// psig), and false when the text names no unit zmix reads.
func PressureUnitOf(text string) (PressureUnit, bool) {
	_, unit, err := splitNumber(text)
	if err != nil {
		return PressureUnit{}, false
	}
	size, gauge, ok := pressureUnit(unit)
	if !ok {
		return PressureUnit{}, false
	}
	return PressureUnit{key: pressureUnitFamily[strings.ToLower(unit)], SizePa: size, Gauge: gauge}, true
}

// Reading returns the same unit read as gauge or as absolute.
func (u PressureUnit) Reading(gauge bool) PressureUnit {
	u.Gauge = gauge
	return u
}

// Name is the unit's name for its reading: "bar abs", "barg", "psig".
func (u PressureUnit) Name() string {
	names, ok := pressureUnitNames[u.key]
	if !ok {
		names = pressureUnitNames["bar"]
	}
	if u.Gauge {
		return names[1]
	}
	return names[0]
}

// FromPa converts an absolute pressure in Pa to this unit and reading.
func (u PressureUnit) FromPa(pa float64) float64 {
	if u.Gauge {
		pa -= AtmospherePa
	}
	return pa / u.size()
}

// ToPa converts a value in this unit and reading to absolute Pa.
func (u PressureUnit) ToPa(v float64) float64 {
	pa := v * u.size()
	if u.Gauge {
		pa += AtmospherePa
	}
	return pa
}

func (u PressureUnit) size() float64 {
	if u.SizePa > 0 {
		return u.SizePa
	}
	return 1e5
}
