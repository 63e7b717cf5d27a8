package report

import (
	"math"
	"strconv"
	"strings"

	"zmix/mixtures"
)

// NotANumber is what any formatter writes for NaN or ±Inf. Outputs refuse
// such values before they are written; this is the one spelling if one
// slips through.
const NotANumber = "n/a"

// wideFixed is the magnitude from which a fixed-decimal figure is written
// in exponent form instead: 1e9 kJ/mol with three decimals is already 13
// characters, and a finite 1e300 would be 300 digits.
const wideFixed = 1e9

// Number writes x in display form with the quantity's digits.
func Number(x float64, d mixtures.Digits) string {
	if d.Decimals > 0 {
		return Fixed(x, d.Decimals)
	}
	return Sig(x, d.Sig)
}

// Sig writes x with n significant figures, keeping trailing zeros (see
// mixtures.FormatSig); very large and very small magnitudes take an
// exponent.
func Sig(x float64, n int) string {
	if !finite(x) {
		return NotANumber
	}
	return unsignZero(mixtures.FormatSig(x, n))
}

// Short writes x with up to n significant figures and no trailing zeros,
// for values the user typed or chose, such as a temperature.
func Short(x float64, n int) string {
	if !finite(x) {
		return NotANumber
	}
	return unsignZero(strconv.FormatFloat(x, 'g', n, 64))
}

// Fixed writes x with a fixed number of decimals, for energies, whose zero
// is a convention so that relative digits mislead. Past wideFixed it
// writes decimals+4 significant figures with an exponent.
func Fixed(x float64, decimals int) string {
	if !finite(x) {
		return NotANumber
	}
	if math.Abs(x) >= wideFixed {
		return strconv.FormatFloat(x, 'e', decimals+3, 64)
	}
	return unsignZero(strconv.FormatFloat(x, 'f', decimals, 64))
}

// unsignZero drops the sign of a figure that shows as zero: "-0.000"
// says nothing "0.000" does not, and reads as a different value.
func unsignZero(s string) string {
	if !strings.HasPrefix(s, "-") {
		return s
	}
	mant, _, _ := strings.Cut(s[1:], "e")
	if strings.Trim(mant, "0.") == "" {
		return s[1:]
	}
	return s
}

func finite(x float64) bool { return x-x == 0 }

// Percent writes part/whole as a percentage with one decimal, and "-"
// when whole is zero.
func Percent(part, whole float64) string {
	if whole == 0 {
		return "-"
	}
	return Fixed(100*part/whole, 1) + " %"
}
