package ui

import (
	"math"
	"strconv"
	"strings"
)

// plotNiceStep returns 1, 2 or 5 times a power of ten, near raw.
func plotNiceStep(raw float64) float64 {
	mag := math.Pow(10, math.Floor(math.Log10(raw)))
	switch f := raw / mag; {
	case f < 1.5:
		return mag
	case f < 3.5:
		return 2 * mag
	case f < 7.5:
		return 5 * mag
	}
	return 10 * mag
}

// plotLinearTicks returns about target ticks over [lo, hi] at a nice
// step. With loose set, the range grows to whole steps and is returned;
// otherwise the ticks lie inside [lo, hi], which is returned unchanged.
func plotLinearTicks(lo, hi float64, target int, loose bool) (ticks []float64, step, lo2, hi2 float64) {
	if hi < lo {
		lo, hi = hi, lo
	}
	if span := hi - lo; !(span > 1e-12*math.Max(1, math.Abs(hi))) {
		// A flat curve: open a small window around it.
		d := 0.01 * math.Abs(hi)
		if d == 0 {
			d = 1
		}
		lo, hi = lo-d, hi+d
	}
	step = plotNiceStep((hi - lo) / float64(max(target-1, 1)))
	k0, k1 := math.Ceil(lo/step-1e-9), math.Floor(hi/step+1e-9)
	lo2, hi2 = lo, hi
	if loose {
		k0, k1 = math.Floor(lo/step+1e-9), math.Ceil(hi/step-1e-9)
		lo2, hi2 = k0*step, k1*step
	}
	for k := k0; k <= k1; k++ {
		ticks = append(ticks, k*step)
	}
	return ticks, step, lo2, hi2
}

// plotLogTicks returns ticks at 1-2-5 (or 1..9, or whole decades) times
// powers of ten inside [lo, hi], at most maxN of them; nil when fewer
// than two such values fall inside (a range within one decade step).
func plotLogTicks(lo, hi float64, maxN int) []float64 {
	if !(lo > 0) || !(hi > lo) {
		return nil
	}
	k0, k1 := int(math.Floor(math.Log10(lo))), int(math.Ceil(math.Log10(hi)))
	in := func(v float64) bool { return v >= lo*(1-1e-9) && v <= hi*(1+1e-9) }
	for _, mantissas := range [][]int{{1, 2, 3, 4, 5, 6, 7, 8, 9}, {1, 2, 5}, {1}} {
		var ts []float64
		for k := k0; k <= k1; k++ {
			for _, m := range mantissas {
				if v := plotDecimal(m, k); in(v) {
					ts = append(ts, v)
				}
			}
		}
		if len(ts) <= maxN {
			if len(ts) < 2 {
				return nil
			}
			return ts
		}
	}
	// More decades than ticks: every few decades.
	every := int(math.Ceil(float64(k1-k0+1) / float64(max(maxN, 1))))
	var ts []float64
	for k := k0; k <= k1; k++ {
		if v := plotDecimal(1, k); in(v) && k%every == 0 {
			ts = append(ts, v)
		}
	}
	if len(ts) < 2 {
		return nil
	}
	return ts
}

// plotDecimal is m×10^k as the nearest float64, so that 3×10⁻¹ is 0.3.
func plotDecimal(m, k int) float64 {
	v, _ := strconv.ParseFloat(strconv.Itoa(m)+"e"+strconv.Itoa(k), 64)
	return v
}

// plotTickLabel writes tick v of a linear axis with step step, with as
// few digits as tell neighbouring ticks apart.
func plotTickLabel(v, step, maxAbs float64) string {
	if math.Abs(v) < step*1e-6 {
		return "0"
	}
	if maxAbs >= 1e6 || maxAbs < 1e-3 {
		digits := int(math.Floor(math.Log10(maxAbs))) - int(math.Floor(math.Log10(step)+1e-9))
		return plotCompactExp(strconv.FormatFloat(v, 'e', min(max(digits, 0), 8), 64))
	}
	decimals := max(0, -int(math.Floor(math.Log10(step)+1e-9)))
	return strconv.FormatFloat(v, 'f', decimals, 64)
}

// plotCompactNumber writes v in as few characters as keep its value.
func plotCompactNumber(v float64) string {
	return plotCompactExp(strconv.FormatFloat(v, 'g', -1, 64))
}

// plotCompactExp shortens an exponent: 1.5e+06 → 1.5e6, 2e-05 → 2e-5.
func plotCompactExp(s string) string {
	i := strings.IndexByte(s, 'e')
	if i < 0 {
		return s
	}
	mant, exp := s[:i], s[i+1:]
	sign := ""
	if exp[0] == '-' {
		sign = "-"
	}
	exp = strings.TrimLeft(exp, "+-")
	exp = strings.TrimLeft(exp, "0")
	if exp == "" {
		return mant
	}
	return mant + "e" + sign + exp
}
