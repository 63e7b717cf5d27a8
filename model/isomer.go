package model

import "strings"

// Isomers share a formula, so the catalogue tells them apart by a prefix
// on the formula, as chemists write them and as they read in blend text:
//
//	n-C4H10   n-butane (normal: the straight chain)
//	i-C4H10   isobutane (iso: the branched chain)
//	c-C4F8    octafluorocyclobutane (cyclo: the ring)
//
// The prefix is part of how the species is addressed ("n-C4H10 5%, N2
// bal"); the formula after it gives the atoms and the molar mass. A
// species with no isomer in the catalogue takes no prefix.
var isomerPrefixes = []string{"n-", "i-", "c-"}

// IsomerPrefixes lists the accepted prefixes, for messages and help.
const IsomerPrefixes = "n- (normal), i- (iso), c- (cyclo)"

// splitIsomer returns the isomer prefix of a formula ("" for none) and
// the formula without it.
func splitIsomer(formula string) (prefix, bare string) {
	for _, p := range isomerPrefixes {
		if rest, ok := strings.CutPrefix(formula, p); ok {
			return p, rest
		}
	}
	return "", formula
}

// Isomers returns the species of c whose formula without its isomer
// prefix is key, case-insensitively, in catalogue order: "C4H10" gives
// n-C4H10 and i-C4H10. A bare formula never names one of them by itself,
// even when the catalogue holds only one: C4F8 is also the formula of
// perfluorobutenes, one of which (perfluoroisobutene) is far more toxic
// than the ring.
func (c *Catalogue) Isomers(key string) []*Species {
	key = strings.TrimSpace(key)
	if p, _ := splitIsomer(key); p != "" || key == "" {
		return nil
	}
	var out []*Species
	for _, sp := range c.species {
		if p, bare := splitIsomer(sp.Formula); p != "" && strings.EqualFold(bare, key) {
			out = append(out, sp)
		}
	}
	return out
}

// IsomerHint says, for a bare formula that only isomers of the catalogue
// carry, which prefixed names are accepted: `"C4H10" is the formula of
// more than one isomer; write n-C4H10 (n-butane) or i-C4H10 (isobutane)`.
// ok is false when key is not such a formula.
func (c *Catalogue) IsomerHint(key string) (hint string, ok bool) {
	isos := c.Isomers(key)
	if len(isos) == 0 {
		return "", false
	}
	names := make([]string, len(isos))
	for i, sp := range isos {
		names[i] = Printable(sp.Formula) + " (" + Printable(sp.Name) + ")"
	}
	what := "more than one isomer; write " + strings.Join(names, " or ")
	if len(isos) == 1 {
		what = "more than one isomer; write " + names[0] + " for the one in the catalogue"
	}
	return Quote(key) + " is the formula of " + what, true
}
