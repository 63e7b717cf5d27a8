package mixtures

import (
	"math"
	"strconv"
	"strings"

	"zmix/model"
)

// The one syntax of a sweep range, for the commands (--temp, --pres) and
// the workbench's sweep fields alike:
//
//	FROM..TO UNIT         300..900 K, 5..150 psig
//	FROM UNIT..TO UNIT    300 K..900 K, 0 C..500 K
//	FROM UNIT..TO         a unit on one end applies to both
//
// The number of points is given apart from the range: --steps N in the
// commands, the points field in the workbench (ParseSteps reads both).

// rangeForms is what a range error says is accepted; sweepRangeForms adds
// where a sweep's number of points goes.
const (
	rangeForms      = "want FROM..TO with a unit, such as 300..900 K, 300 K..900 K or 5..150 psig"
	sweepRangeForms = rangeForms + "; the number of points is given on its own (--steps N, or the points field)"
)

// LooksLikeRange reports whether s was meant as a range but not written
// in the range syntax: "300 to 900 K", "300-900 K". (An ellipsis,
// "300…900 K", as editors write "...", reads as ".." in ParseRange.)
func LooksLikeRange(s string) bool {
	if strings.Contains(s, "..") || strings.Contains(s, "…") {
		return false
	}
	if strings.Contains(strings.ToLower(s), " to ") {
		return true
	}
	// A minus between two digits: 300-900.
	for i := 1; i+1 < len(s); i++ {
		if s[i] == '-' && isDigit(s[i-1]) && isDigit(s[i+1]) {
			return true
		}
	}
	return false
}

// ParseRange splits "A..B" into its two ends, each with its unit: a unit
// written on one end only applies to the other too ("300..1500 K" gives
// "300 K" and "1500 K").
func ParseRange(s string) (from, to string, err error) {
	s = strings.ReplaceAll(s, "…", "..")
	if n := strings.Count(s, ".."); n > 1 {
		return "", "", model.KindErrorf("mixtures", ErrValue, "range %s has %d parts; %s", model.Quote(s), n+1, rangeForms)
	}
	a, b, ok := strings.Cut(s, "..")
	a, b = strings.TrimSpace(a), strings.TrimSpace(b)
	if !ok || a == "" || b == "" {
		return "", "", model.KindErrorf("mixtures", ErrValue, "range %s: %s", model.Quote(s), rangeForms)
	}
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

// Range is a parsed sweep range: the variable, its end points in K or Pa
// absolute, and each end as it reads with its unit ("300 K").
type Range struct {
	Var              SweepVar
	From, To         float64
	FromText, ToText string
	Gauge            bool // pressure ends typed as gauge (barg, psig)
}

// ParseSweepRange reads a range of the variable v in the one range
// syntax. Errors quote what was typed and say what is accepted.
func ParseSweepRange(v SweepVar, s string) (Range, error) {
	if LooksLikeRange(s) {
		return Range{}, model.KindErrorf("mixtures", ErrValue, "range %s: %s", model.Quote(s), rangeForms)
	}
	if n := strings.Count(strings.ReplaceAll(s, "…", ".."), ".."); n > 1 {
		// Most likely a step written into the range, 300..600..900 K.
		return Range{}, model.KindErrorf("mixtures", ErrValue, "range %s has %d parts; %s", model.Quote(s), n+1, sweepRangeForms)
	}
	from, to, err := ParseRange(s)
	if err != nil {
		return Range{}, err
	}
	r, err := ParseSweepEnds(v, from, to)
	if err != nil {
		// Name the range as typed: the end alone may read as a unit
		// the user never wrote ("300..900" has no unit at all).
		return Range{}, model.KindErrorf("mixtures", ErrValue, "range %s: %w", model.Quote(s), err)
	}
	return r, nil
}

// ParseSweepEnds reads the two ends of a range typed apart (the
// workbench's from and to fields). A pressure range is all gauge or all
// absolute.
func ParseSweepEnds(v SweepVar, fromText, toText string) (Range, error) {
	r := Range{Var: v, FromText: strings.TrimSpace(fromText), ToText: strings.TrimSpace(toText)}
	if v == SweepTemperature {
		var err error
		if r.From, err = ParseTemperature(fromText); err != nil {
			return Range{}, err
		}
		if r.To, err = ParseTemperature(toText); err != nil {
			return Range{}, err
		}
		return r, nil
	}
	p1, err := ParsePressure(fromText)
	if err != nil {
		return Range{}, err
	}
	p2, err := ParsePressure(toText)
	if err != nil {
		return Range{}, err
	}
	if p1.Gauge != p2.Gauge {
		return Range{}, model.KindErrorf("mixtures", ErrValue, "range %s..%s mixes gauge and absolute end points; give both as gauge (1..10 barg) or both absolute (1..10 bar)",
			model.Quote(r.FromText), model.Quote(r.ToText))
	}
	r.From, r.To, r.Gauge = p1.Pa, p2.Pa, p1.Gauge
	return r, nil
}

// Sweep returns the sweep over the range with steps points; logGrid asks
// for a log grid of a temperature range (pressure is always log).
func (r Range) Sweep(steps int, logGrid bool) Sweep {
	return Sweep{Var: r.Var, From: r.From, To: r.To, Steps: steps, Log: logGrid || r.Var == SweepPressure}
}

// PointsForStep returns the number of points, end points included, that
// spaces the sweep s by the step typed, a temperature difference ("50 K",
// "50 C", "90 F"), for the message that answers a step typed where the
// number of points goes. ok is false for a pressure or ln T grid (not
// evenly spaced in the variable), or where no whole number of points
// gives that step.
func (s Sweep) PointsForStep(step string) (n int, ok bool) {
	if s.Var != SweepTemperature || s.Log {
		return 0, false
	}
	x, unit, err := splitNumber(step)
	if err != nil || !(x > 0) {
		return 0, false
	}
	var deltaK float64
	switch strings.TrimPrefix(strings.ToLower(unit), "°") {
	case "k", "c", "degc":
		deltaK = x
	case "f", "r", "degf", "degr":
		deltaK = x * 5 / 9
	default:
		return 0, false
	}
	f := math.Abs(s.To-s.From)/deltaK + 1
	r := math.Round(f)
	if math.Abs(f-r) > 1e-6*r || r < 2 || r > MaxSweepSteps {
		return 0, false
	}
	return int(r), true
}

// ParseSteps reads a number of points, end points included: a whole
// number from 2 to MaxSweepSteps, its digits optionally grouped by
// spaces, commas or underscores ("20 000"), or written exactly as a
// power of ten ("1e5").
func ParseSteps(s string) (int, error) {
	clean := strings.Map(func(r rune) rune {
		if r == ' ' || r == ',' || r == '_' || r == '\u202f' || r == '\u00a0' {
			return -1
		}
		return r
	}, s)
	n, err := strconv.Atoi(clean)
	if err != nil {
		f, ferr := strconv.ParseFloat(clean, 64)
		if ferr != nil || f != math.Trunc(f) || f > MaxSweepSteps || f < 0 {
			n = -1
		} else {
			n = int(f)
		}
	}
	if n < 2 || n > MaxSweepSteps {
		return 0, model.KindErrorf("mixtures", ErrSweep, "points %s: want a whole number from 2 to %d", model.Quote(s), MaxSweepSteps)
	}
	return n, nil
}
