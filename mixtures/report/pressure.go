package report

import (
	"math"
	"strings"

	"zmix/mixtures"
	"zmix/model"
)

// PressureAuto writes a pressure in Pa with a unit chosen by its size:
// "1.4 bar", "350 kPa", "12 MPa", "80 Pa".
func PressureAuto(pa float64) string {
	a := math.Abs(pa)
	switch {
	case a >= 1e6:
		return Short(pa/1e6, 5) + " MPa"
	case a >= 1e4:
		return Short(pa/1e5, 5) + " bar"
	case a >= 1e3:
		return Short(pa/1e3, 5) + " kPa"
	}
	return Short(pa, 5) + " Pa"
}

// PressureTyped describes a total pressure as the user typed it, with its
// absolute value beside it: "1atm (1.01325 bar absolute, 101325 Pa)",
// "30 psig (gauge; 3.0817 bar absolute)". An empty text means the total is
// the sum of the blend's partial pressures.
func PressureTyped(text string, gauge bool, presPa float64) string {
	bar := Short(presPa/1e5, 6)
	abs := bar + " bar absolute"
	pa := Short(presPa, 7) + " Pa"
	text = model.Printable(strings.TrimSpace(text))
	typed := strings.ToLower(strings.Join(strings.Fields(text), ""))
	switch {
	case text == "":
		return abs + "  (sum of the partial pressures)"
	case gauge:
		return text + " (gauge; " + abs + ")"
	case typed == bar+"bar" || typed == bar+"bara":
		return abs + " (" + pa + ")" // already in bar: say it once
	}
	return text + " (" + abs + ", " + pa + ")"
}

// StdPressure names a standard pressure P° the way the user chooses it.
func StdPressure(pa float64) string {
	if pa == model.StdPressureAtmPa {
		return "1 atm (101325 Pa)"
	}
	return "1 bar (100000 Pa)"
}

// Temperature writes a temperature in kelvin with its Celsius value:
// "298.15 K (25.00 °C)".
func Temperature(tempK float64) string {
	return Short(tempK, 6) + " K  (" + Fixed(mixtures.KelvinToCelsius(tempK), 2) + " °C)"
}

// PressureIn writes an absolute pressure in the unit and reading the user
// chose: "1.4 bar abs", "5.6 psig", "38.675 kPag".
func PressureIn(pa float64, u mixtures.PressureUnit) string {
	return Short(u.FromPa(pa), 5) + " " + u.Name()
}
