package model

import (
	"math"
	"strings"
)

// Ladder is one vibrational mode given by its observed levels instead of a
// harmonic ladder, for the summed levels: NH3's umbrella mode ν2, whose
// levels come in inversion doublets (0/0.79, 932/968, 1597/1882 cm⁻¹)
// below the 2000 cm⁻¹ barrier and alternate unevenly above it, far from
// any harmonic ladder.
//
// Each listed level counts once, divided by Symmetry: a doublet's two
// components each carry half the rotational levels (the nuclear spins
// allow one of the two for each), so NH3's pair is one level at low T,
// as the harmonic ν2 and σ = 3 count it. Above the last listed level the
// ladder goes on with the spacing of the last two listed levels, up to
// the molecule's D0; that continuation is a stated approximation that
// only counts above about 2000 K.
type Ladder struct {
	ReplacesCm float64   // the fundamental in Vib that this ladder stands for
	Symmetry   int       // levels per counted level (2 for an inversion doublet)
	LevelsCm   []float64 // the levels from the lowest, rising
}

// maxLadderLevels bounds the listed levels of a ladder.
const maxLadderLevels = 200

// setLadder reads "950 2: 0 0.793 932.43 …": the vib_cm mode it replaces,
// the symmetry divisor, a colon, and the levels from 0, rising.
func setLadder(sp *Species, value string) error {
	const want = "the mode, the symmetry divisor, a colon and the levels from 0, rising, e.g. 950 2: 0 0.793 932.43 968.12"
	head, levels, ok := strings.Cut(value, ":")
	f := strings.Fields(head)
	if !ok || len(f) != 2 {
		return Errorf("model", "ladder %s: want %s", Quote(value), want)
	}
	mode, err := vibRange.parse(f[0])
	if err != nil {
		return Errorf("model", "ladder %s: %v", Quote(value), err)
	}
	sym, err := sigmaRange.parse(f[1])
	if err != nil {
		return Errorf("model", "ladder %s: %v", Quote(value), err)
	}
	es, err := parseNumbers(levels, elecRange, maxLadderLevels)
	if err != nil {
		return Errorf("model", "ladder %s: %v", Quote(value), err)
	}
	sp.Ladders = append(sp.Ladders, Ladder{ReplacesCm: mode, Symmetry: int(sym), LevelsCm: es})
	return nil
}

// check reports a ladder that does not start at 0, does not rise, or
// has too few levels to continue.
func (l Ladder) check(formula string) error {
	if len(l.LevelsCm) < 3 || l.LevelsCm[0] != 0 {
		return Errorf("model", "%s: a ladder lists at least 3 levels, the first at 0 cm⁻¹", formula)
	}
	for i := 1; i < len(l.LevelsCm); i++ {
		if l.LevelsCm[i] <= l.LevelsCm[i-1] {
			return Errorf("model", "%s: ladder level %g cm⁻¹ does not rise above %g", formula, l.LevelsCm[i], l.LevelsCm[i-1])
		}
	}
	if !sigmaRange.contains(float64(l.Symmetry)) {
		return Errorf("model", "%s: ladder symmetry %d; want %s", formula, l.Symmetry, sigmaRange)
	}
	return nil
}

// levels builds the ladder's level list up to limitCm.
func (l Ladder) levels(limitCm float64) *rovibLevels {
	lv := &rovibLevels{lnNorm: math.Log(float64(l.Symmetry))}
	add := func(e float64) {
		lv.thetaK = append(lv.thetaK, WavenumberToKelvin(e))
		lv.weight = append(lv.weight, 1)
		lv.class = append(lv.class, classRot0)
	}
	for _, e := range l.LevelsCm {
		if e > limitCm {
			break
		}
		add(e)
	}
	n := len(l.LevelsCm)
	step := l.LevelsCm[n-1] - l.LevelsCm[n-2]
	for e := l.LevelsCm[n-1] + step; e <= limitCm; e += step {
		add(e)
	}
	i := min(7, len(lv.thetaK)-1)
	lv.tableMinK = max(lv.thetaK[i]/40, MinTempK)
	return lv
}
