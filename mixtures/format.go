package mixtures

import (
	"math"
	"strconv"
)

// FormatSig writes x with n significant figures, keeping trailing zeros
// so that the figures shown say how many are meant: 1.18385 → "1.1839",
// 0.0005 → "0.0005000". Very small and very large magnitudes use an
// exponent. The readout of the commands and of the workbench both use it,
// so that they show the same digits. Non-finite values give "n/a";
// callers should have refused them before.
func FormatSig(x float64, n int) string {
	n = max(n, 1)
	switch {
	case math.IsNaN(x) || math.IsInf(x, 0):
		return "n/a"
	case x == 0:
		return strconv.FormatFloat(0, 'f', n-1, 64)
	}
	ax := math.Abs(x)
	if ax < 1e-4 || ax >= 1e7 {
		return strconv.FormatFloat(x, 'e', n-1, 64)
	}
	exp := int(math.Floor(math.Log10(ax)))
	// Rounding may carry into the next power of ten (9.99996 → 10.0000):
	// then one decimal fewer keeps the count of figures.
	if r, _ := strconv.ParseFloat(strconv.FormatFloat(ax, 'e', n-1, 64), 64); r >= math.Pow(10, float64(exp+1)) {
		exp++
	}
	return strconv.FormatFloat(x, 'f', max(n-1-exp, 0), 64)
}
