package mixtures

import (
	"fmt"
	"strings"

	"zmix/mixtures/realgas"
	"zmix/model"
)

// A dew-point amount ("H2O dew -40C") gives a condensable species by the
// temperature at which it condenses, the way moisture in compressed air
// or a process gas is specified and measured: its partial pressure is the
// species' saturation pressure at that temperature, by the same methods
// the readouts' dew point uses (realgas.VapourPressure): IAPWS for water,
// over ice below its triple point (a frost point, as dew-point meters
// read there), Lee–Kesler from the critical constants for other species.
// The partial pressure holds whatever the total pressure, so the dew
// point typed is the pressure dew point at the line pressure.

// cutDewPoint reports whether an amount is a dew point, "dew -40C",
// "dew point -40C" or "dewpoint -40C", and returns the temperature text.
func cutDewPoint(s string) (string, bool) {
	for _, word := range []string{"dew point", "dewpoint", "dew"} {
		if rest, ok := cutWord(s, word); ok {
			return rest, true
		}
	}
	return "", false
}

// cutWord reports whether s starts with word (any case) followed by a
// space or a digit or sign, and returns the rest.
func cutWord(s, word string) (string, bool) {
	if len(s) <= len(word) || !strings.EqualFold(s[:len(word)], word) {
		return "", false
	}
	rest := s[len(word):]
	switch c := rest[0]; {
	case c == ' ' || c == '\t' || c == '-' || c == '+' || c == '.' || c >= '0' && c <= '9':
		return strings.TrimSpace(rest), true
	}
	return "", false
}

// dewPointPa is the partial pressure of the species of parts whose dew
// point is tempK: its saturation pressure there. A named mixture, a
// species with no vapour-pressure method, one above its critical
// temperature, and a temperature below the method's range have none.
func dewPointPa(parts itemParts, tempK float64) (float64, error) {
	if parts.named != "" {
		return 0, fmt.Errorf("%s is a mixture; a dew point is given for one species, such as H2O dew -40C", parts.named)
	}
	sp := parts.parts[0].Species
	sat := realgas.VapourPressure(sp, tempK)
	name := model.Printable(sp.Formula)
	switch {
	case sat.Supercritical:
		return 0, fmt.Errorf("a dew point of %.6g K for %s: above its critical temperature (%.5g K) it does not condense; give its amount instead", tempK, name, sat.CriticalK)
	case sat.Method == realgas.NoMethod:
		return 0, fmt.Errorf("a dew point for %s: the catalogue holds neither its critical constants nor its boiling point, so its vapour pressure is not known; give its amount instead", name)
	case sat.Method == realgas.TroutonRough:
		// Good enough to warn of condensation, not to set an amount.
		return 0, fmt.Errorf("a dew point for %s: only a rough estimate of its vapour pressure is known (%s, no critical constants); give its amount instead", name, sat.Method)
	case !(sat.Pa > 0):
		return 0, fmt.Errorf("a dew point of %.6g K for %s: below the range of its vapour-pressure equation (%s); give its amount instead", tempK, name, sat.Method)
	}
	return sat.Pa, nil
}
