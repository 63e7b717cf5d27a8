package mixtures

import (
	"zmix/model"

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
const AtmospherePa = model.StdPressureAtmPa

// TemperatureUnits lists the accepted temperature units, for messages
// and help.
const (
	TemperatureUnits = "K, C (°C), F (°F), R (Rankine)"
)

// PressureUnits lists the pressure units accepted, for messages and help.
var PressureUnits = pressureUnitsText()

// ErrValue is wrapped by every value-parsing error.
var ErrValue = errors.New("bad value")

// SplitNumber splits a value with a unit, "25 °C" or "1.5bar", into the
// finite number that leads it and the unit text after it, trimmed. Every
// parser of values with units (temperatures, pressures, amounts, rates)
// reads its number this way.
func SplitNumber(s string) (float64, string, error) { return splitNumber(s) }

// splitNumber splits "25 °C" or "1.5bar" into the number and the unit text.
func splitNumber(s string) (float64, string, error) {
	x, rest, err := model.LeadingNumber(strings.TrimSpace(s))
	if err == nil && len(rest) > 1 && rest[0] == ',' && rest[1] >= '0' && rest[1] <= '9' {
		// "1,5 bar" or "1,000 SLPM", which would read as 1 and a unit
		// ",5 bar".
		n := len(s) - len(rest)
		for n < len(s) && (s[n] == ',' || s[n] >= '0' && s[n] <= '9') {
			n++
		}
		t := strings.TrimSpace(s[:n])
		// Not guessed: "1,5" is 1.5 in much of Europe, "1,000" is 1000.
		return 0, "", errors.New(model.Quote(t) + " has a comma in it: write decimals with a point (1.5) and numbers without thousands separators (1000)")
	}
	return x, strings.TrimSpace(rest), err
}

// ParseTemperature reads a temperature with its unit ("300 K", "25 C",
// "77°F", "540 R") and returns kelvin. It rejects values at or below
// absolute zero.
func ParseTemperature(s string) (float64, error) {
	if isRangeText(s) {
		return 0, model.KindErrorf("mixtures", ErrValue, "temperature %s is a range; one value is wanted here (zmix sweep and the Sweep pane take a range)", model.Quote(s))
	}
	x, unit, err := splitNumber(s)
	if err != nil {
		return 0, model.KindErrorf("mixtures", ErrValue, "temperature %s: %v; want a number and a unit: %s", model.Quote(s), err, TemperatureUnits)
	}
	var k float64
	// "deg C" and "° C" read as "degC" and "°C".
	switch strings.TrimPrefix(strings.ToLower(strings.ReplaceAll(unit, " ", "")), "°") {
	case "k":
		k = x
	case "c", "degc":
		k = x + celsiusZeroK
	case "f", "degf":
		k = (x + 459.67) * 5 / 9
	case "r", "degr":
		k = x * 5 / 9
	case "":
		return 0, model.KindErrorf("mixtures", ErrValue, "temperature %s has no unit; want one of %s (e.g. %g K)", model.Quote(s), TemperatureUnits, x)
	default:
		return 0, model.KindErrorf("mixtures", ErrValue, "temperature %s: unknown unit %s; want %s", model.Quote(s), model.Quote(unit), TemperatureUnits)
	}
	if !(k > 0) {
		return 0, model.KindErrorf("mixtures", ErrValue, "temperature %s is at or below absolute zero; want a value above 0 K", model.Quote(s))
	}
	return k, nil
}

// poundPerSqInchPa is 1 lbf/in² (0.45359237 kg · 9.80665 m/s² / 0.0254² m²).
const poundPerSqInchPa = 6894.757293168361

// pressureUnitTable lists each pressure unit once: its size in Pa and
// whether the trade writes it with a g (gauge) or a (absolute) suffix.
// Every other list of pressure units is made from it.
var pressureUnitTable = []struct {
	name      string
	sizePa    float64
	suffixes  bool // accepts NAMEg (gauge) and NAMEa (absolute)
	helpGauge bool // named among the gauge forms in PressureUnits
	aliases   []string
}{
	{"Pa", 1, false, false, nil},
	{"hPa", 100, false, false, nil},
	{"kPa", 1e3, true, true, nil},
	{"MPa", 1e6, true, true, nil},
	{"GPa", 1e9, false, false, nil}, // for the dense-gas limits of the real-gas models
	{"bar", 1e5, true, true, nil},
	{"mbar", 100, true, true, nil},
	{"atm", model.StdPressureAtmPa, false, false, nil},
	{"Torr", model.StdPressureAtmPa / 760.0, false, false, nil},
	// The conventional millimetre and inch of mercury: a column of
	// 13 595.1 kg/m³ under 9.806 65 m/s², 133.322 387 415 Pa and
	// 3386.388 640 341 Pa (from memory; the Torr differs from the mmHg
	// by 1.4e-7 of itself).
	{"mmHg", 133.322387415, false, false, nil},
	{"inHg", 3386.388640341, false, false, nil},
	{"psi", poundPerSqInchPa, true, true, nil},
	// The kilogram-force per square centimetre (the technical atmosphere,
	// 98 066.5 Pa exactly), still on older plants' gauges.
	{"kgf/cm2", 98066.5, true, true, []string{"kg/cm2", "kgf/cm²", "kg/cm²"}},
}

// PressureUnitNames returns every pressure unit word accepted, absolute
// forms first, then gauge, for help text.
func PressureUnitNames() []string {
	var abs, gauge []string
	for _, u := range pressureUnitTable {
		abs = append(abs, u.name)
		if u.suffixes {
			abs = append(abs, u.name+"a")
			gauge = append(gauge, u.name+"g")
		}
	}
	return append(abs, gauge...)
}

// pressureUnitsText is PressureUnits, made from the table.
func pressureUnitsText() string {
	var abs, gauge []string
	for _, u := range pressureUnitTable {
		abs = append(abs, u.name)
		if u.suffixes {
			gauge = append(gauge, u.name+"g")
		}
	}
	return strings.Join(abs, ", ") + " (an a suffix, as in psia or bara, says absolute); gauge: " + strings.Join(gauge, ", ")
}

// pressureUnit returns the size in Pa of a unit word and whether it is
// gauge; ok is false for words that are not pressure units. Case does not
// matter, except that "mPa" is refused (see ambiguousPressureUnit).
func pressureUnit(unit string) (sizePa float64, gauge, ok bool) {
	i, gauge, ok := lookupPressureUnit(unit)
	if !ok {
		return 0, false, false
	}
	return pressureUnitTable[i].sizePa, gauge, true
}

// lookupPressureUnit finds a unit word's row of pressureUnitTable, by its
// name or an alias, bare or with a gauge or absolute mark.
func lookupPressureUnit(unit string) (row int, gauge, ok bool) {
	unit = plainPressureUnit(unit)
	if ambiguousPressureUnit(unit) != "" {
		return 0, false, false
	}
	for i, u := range pressureUnitTable {
		for _, name := range append([]string{u.name}, u.aliases...) {
			if strings.EqualFold(unit, name) {
				return i, false, true
			}
			if !u.suffixes || len(unit) != len(name)+1 || !strings.EqualFold(unit[:len(name)], name) {
				continue
			}
			switch unit[len(name)] {
			case 'g', 'G':
				return i, true, true
			case 'a', 'A':
				return i, false, true
			}
		}
	}
	return 0, false, false
}

// plainPressureUnit writes the gauge and absolute marks of drawings and
// datasheets as the suffix this package reads: "bar(g)", "bar (g)" and
// "bar g" are barg, "kPa(a)" is kPaa.
func plainPressureUnit(unit string) string {
	u := strings.ReplaceAll(unit, " ", "")
	for _, mark := range []string{"(g)", "(G)", "(a)", "(A)"} {
		if strings.HasSuffix(u, mark) {
			return strings.TrimSuffix(u, mark) + mark[1:2]
		}
	}
	return u
}

// ambiguousPressureUnit explains why a unit is refused for its case, or
// returns "". Folding case would read millipascal as megapascal, 10⁹ times
// off, so a lower-case m before Pa is an error rather than a guess.
func ambiguousPressureUnit(unit string) string {
	base := unit
	if len(base) == 4 && strings.ContainsRune("gGaA", rune(base[3])) {
		base = base[:3] // mPag, mPaa
	}
	if strings.EqualFold(base, "mpa") && base[0] == 'm' {
		return fmt.Sprintf("%s would be millipascal, which is not accepted; write MPa for megapascal", model.Quote(unit))
	}
	return ""
}

// isRangeText reports whether a value was typed as a range: in the range
// syntax (300..900 K) or in words (300 to 900 K). A dash between digits
// is not taken for one here: "3-00 K" is a typo of one value.
func isRangeText(s string) bool {
	return strings.Contains(s, "..") || strings.Contains(s, "…") || strings.Contains(strings.ToLower(s), " to ")
}

// ParsePressure reads a pressure with its unit ("1 bar", "14.7 psia",
// "2 barg", "760 Torr"). Gauge units add 101 325 Pa. The absolute result
// must be above 0 Pa.
func ParsePressure(s string) (Pressure, error) {
	if isRangeText(s) {
		return Pressure{}, model.KindErrorf("mixtures", ErrValue, "pressure %s is a range; one value is wanted here (zmix sweep and the Sweep pane take a range)", model.Quote(s))
	}
	x, unit, err := splitNumber(s)
	if err != nil {
		return Pressure{}, model.KindErrorf("mixtures", ErrValue, "pressure %s: %v; want a number and a unit: %s", model.Quote(s), err, PressureUnits)
	}
	if unit == "" {
		return Pressure{}, model.KindErrorf("mixtures", ErrValue, "pressure %s has no unit; want one of %s (e.g. %g bar)", model.Quote(s), PressureUnits, x)
	}
	if why := ambiguousPressureUnit(plainPressureUnit(unit)); why != "" {
		return Pressure{}, model.KindErrorf("mixtures", ErrValue, "pressure %s: %s; want %s", model.Quote(s), why, PressureUnits)
	}
	size, gauge, ok := pressureUnit(unit)
	if !ok {
		return Pressure{}, model.KindErrorf("mixtures", ErrValue, "pressure %s: unknown unit %s; want %s", model.Quote(s), model.Quote(unit), PressureUnits)
	}
	p := Pressure{Pa: x * size, Gauge: gauge}
	if gauge {
		p.Pa += AtmospherePa
	}
	if math.IsInf(p.Pa, 0) {
		return Pressure{}, model.KindErrorf("mixtures", ErrValue, "pressure %s is too large to compute with; want a finite value above 0 Pa absolute", model.Quote(s))
	}
	if !(p.Pa > 0) {
		return Pressure{}, model.KindErrorf("mixtures", ErrValue, "pressure %s is at or below zero absolute; want a value above 0 Pa absolute", model.Quote(s))
	}
	return p, nil
}

// StdPressure is the standard pressure P° that μ° and the standard
// tables refer to: 1 bar (the zero value, IUPAC's standard since 1982) or
// 1 atm (older tables). It is the one representation of that choice in
// the engine, the commands and the workbench.
type StdPressure int

const (
	StdBar StdPressure = iota
	StdAtm
)

// Pa is the standard pressure in pascals.
func (p StdPressure) Pa() float64 {
	if p == StdAtm {
		return model.StdPressureAtmPa
	}
	return model.StdPressureBarPa
}

// String is how settings and blend files write it: "1 bar" or "1 atm".
func (p StdPressure) String() string {
	if p == StdAtm {
		return "1 atm"
	}
	return "1 bar"
}

// Label names it with its value: "1 bar (100000 Pa)".
func (p StdPressure) Label() string {
	if p == StdAtm {
		return "1 atm (101325 Pa)"
	}
	return "1 bar (100000 Pa)"
}

// MarshalText writes String.
func (p StdPressure) MarshalText() ([]byte, error) { return []byte(p.String()), nil }

// UnmarshalText reads what ParseStdPressure reads.
func (p *StdPressure) UnmarshalText(b []byte) error {
	got, err := ParseStdPressure(string(b))
	if err != nil {
		return err
	}
	*p = got
	return nil
}

// ParseStdPressure reads "1 bar" or "1 atm" (any case and spacing); empty
// text, as in a blend file that does not say, means 1 bar.
func ParseStdPressure(s string) (StdPressure, error) {
	switch strings.Join(strings.Fields(strings.ToLower(s)), "") {
	case "", "1bar", "bar":
		return StdBar, nil
	case "1atm", "atm":
		return StdAtm, nil
	}
	return StdBar, model.KindErrorf("mixtures", ErrValue, "standard pressure %s; want 1 bar or 1 atm", model.Quote(s))
}

// celsiusZeroK is 0 °C in kelvin.
const celsiusZeroK = model.ZeroCelsiusK

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
	key    string // the unit's name in pressureUnitTable
	SizePa float64
	Gauge  bool
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
	i, gauge, ok := lookupPressureUnit(unit)
	if !ok {
		return PressureUnit{}, false
	}
	u := pressureUnitTable[i]
	return PressureUnit{key: u.name, SizePa: u.sizePa, Gauge: gauge}, true
}

// Reading returns the same unit read as gauge or as absolute.
func (u PressureUnit) Reading(gauge bool) PressureUnit {
	u.Gauge = gauge
	return u
}

// Name is the unit's name for its reading: "bar abs", "barg", "psia",
// "psig", "atm", "Torr gauge". Units the trade writes with a g take it for
// gauge; an absolute reading says "abs" where the bare name could be read
// either way.
func (u PressureUnit) Name() string {
	name, suffixes := "bar", true
	for _, t := range pressureUnitTable {
		if t.name == u.key {
			name, suffixes = t.name, t.suffixes
		}
	}
	switch {
	case u.Gauge && suffixes:
		return name + "g"
	case u.Gauge:
		return name + " gauge"
	case name == "psi":
		return "psia"
	case suffixes:
		return name + " abs"
	}
	return name
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
