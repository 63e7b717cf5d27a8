package model

import "strings"

// absentSpecies are gases the trade uses that the built-in catalogue does
// not carry for want of sourced data, each with its reason, so that a
// person who types one learns why it is missing and how to add it, rather
// than being offered a look-alike. zmix does not guess constants.
var absentSpecies = []struct {
	names []string // formula, isomer-prefixed formula, names, trade names
	why   string
}{
	{
		names: []string{"c-C4F8", "C4F8", "octafluorocyclobutane", "perfluorocyclobutane", "RC318", "R-C318"},
		// The published assignments are partly in doubt, and the ring's
		// puckering mode was never observed.
		why: "c-C4F8 (octafluorocyclobutane) is not in the built-in catalogue: no sourced set of its vibrational " +
			"fundamentals was at hand, and zmix does not guess them; --species FILE can add it",
	},
}

// AbsentHint returns the reason a species that key names is missing, if
// it is one of absentSpecies and c does not carry it (a species file may
// have added it).
func (c *Catalogue) AbsentHint(key string) (string, bool) {
	key = strings.TrimSpace(key)
	for _, a := range absentSpecies {
		for _, n := range a.names {
			if strings.EqualFold(n, key) {
				if _, ok := c.Lookup(a.names[0]); ok {
					return "", false
				}
				return a.why, true
			}
		}
	}
	return "", false
}

// UnknownHint says what to do about key, a species c does not carry: the
// isomers to choose from, why a known gas is missing, or the nearest
// names ("did you mean …?"); "" when none of these apply, so that the
// caller adds its own default.
func (c *Catalogue) UnknownHint(key string) string {
	if h, ok := c.IsomerHint(key); ok {
		return h
	}
	if h, ok := c.AbsentHint(key); ok {
		return h
	}
	if sug := c.Suggest(key, 3); len(sug) > 0 {
		return "did you mean " + strings.Join(sug, ", ") + "?"
	}
	return ""
}
