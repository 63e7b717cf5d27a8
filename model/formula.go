package model

import "strconv"

// ParseFormula splits a molecular formula such as "SiH4" or "C2H6" into
// element counts. Elements are an upper-case letter and an optional
// lower-case one, each followed by an optional count. An isomer prefix
// (n-C4H10, i-C4H10, c-C4F8; see isomer.go) is set aside, and so is a
// spin modification's (eH2, nH2, pH2, eD2, nD2, oD2; see spinmod.go).
func ParseFormula(formula string) (map[string]int, error) {
	whole := formula
	_, formula = splitIsomer(formula)
	if formula == "" {
		if whole != "" {
			return nil, Errorf("model", "formula %s: nothing after the isomer prefix", Quote(whole))
		}
		return nil, Errorf("model", "empty formula")
	}
	_, formula = splitSpinPrefix(formula)
	counts := make(map[string]int)
	i := 0
	for i < len(formula) {
		c := formula[i]
		if c < 'A' || c > 'Z' {
			return nil, Errorf("model", "formula %s: unexpected %q at position %d (want an element symbol such as N or Cl)", Quote(formula), c, i+1)
		}
		j := i + 1
		if j < len(formula) && formula[j] >= 'a' && formula[j] <= 'z' {
			j++
		}
		sym := formula[i:j]
		if _, ok := atomicWeights[sym]; !ok {
			return nil, Errorf("model", "formula %s: unknown element %q", Quote(formula), sym)
		}
		k := j
		for k < len(formula) && formula[k] >= '0' && formula[k] <= '9' {
			k++
		}
		n := 1
		if k > j {
			v, err := strconv.Atoi(formula[j:k])
			if err != nil || v < 1 || v > 1000 {
				return nil, Errorf("model", "formula %s: bad count %s for %s (want 1 to 1000)", Quote(formula), Quote(formula[j:k]), sym)
			}
			n = v
		}
		counts[sym] += n
		i = k
	}
	return counts, nil
}

// MolarMassKgPerMol returns the molar mass of a formula from the IUPAC
// standard atomic weights.
func MolarMassKgPerMol(formula string) (float64, error) {
	counts, err := ParseFormula(formula)
	if err != nil {
		return 0, err
	}
	gPerMol := 0.0
	for sym, n := range counts {
		gPerMol += float64(n) * atomicWeights[sym]
	}
	return gPerMol / 1000, nil
}
