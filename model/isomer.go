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
