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

// mixtureNames are mixtures a person may type where a species goes, each
// with what to write instead: zmix does not carry a mixture as a species,
// since its figures would then hide which species are in it.
var mixtureNames = []struct {
	names []string
	what  string
}{
	{
		names: []string{"air", "dry air", "dry-air"},
		// Dry air by volume, rounded (the US Standard Atmosphere 1976 gives
		// N2 78.084, O2 20.9476, Ar 0.934 %; CO2 is about 420 ppm today),
		// from memory. The README's first example is the same blend.
		what: "air is a mixture, not a species: write its components, e.g. N2 78.08%, O2 20.95%, Ar 0.93%, CO2 0.04% " +
			"(dry air, rounded), and scale them for a blend in air",
	},
}

// MixtureHint says what to write instead when key names a mixture (air)
// rather than a species.
func MixtureHint(key string) (string, bool) {
	key = strings.TrimSpace(key)
	for _, m := range mixtureNames {
		for _, n := range m.names {
			if strings.EqualFold(n, key) {
				return m.what, true
			}
		}
	}
	return "", false
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

// NotCarriedHint says why key, which c does not carry, will not be
// offered under a look-alike name: it names a mixture (air), or a gas
// the catalogue is known to lack (AbsentHint).
func (c *Catalogue) NotCarriedHint(key string) (string, bool) {
	if h, ok := MixtureHint(key); ok {
		return h, true
	}
	return c.AbsentHint(key)
}

// UnknownHint says what to do about key, a species c does not carry: the
// components of a mixture typed as a species (air), the isomers to
// choose from, why a known gas is missing, or the nearest names ("did you mean …?"); "" when none of these apply, so that the
// caller adds its own default.
func (c *Catalogue) UnknownHint(key string) string {
	if h, ok := c.IsomerHint(key); ok {
		return h
	}
	if h, ok := c.NotCarriedHint(key); ok {
		return h
	}
	if sug := c.Suggest(key, 3); len(sug) > 0 {
		return "did you mean " + strings.Join(sug, ", ") + "?"
	}
	return ""
}
