package main

import "io"

func usageHazard(w io.Writer) {
	io.WriteString(w, `Usage: zmix hazard --blend SPEC [--pres P] [--json]

Classifies a blend's fire and toxic hazards by published methods, each
named beside its result:
  flammable limits   the blend's LFL and UFL in air by Le Chatelier's rule
                     over its flammable components (inert components are
                     counted by ISO 10156 below, not here); whether the
                     blend as stored is inside its range; how many volumes
                     of air bring a release to its LFL
  ISO 10156          flammable in air when the sum of A'i/Tci exceeds 1
                     (inert gases as nitrogen equivalents, Ki); more
                     oxidizing than air when the sum of xi*Ci exceeds 0.235
  GHS additivity     the blend's 4 h LC50, 100/LC50 = sum of Ci/LC50i, and
                     its acute inhalation category (1: <= 100 ppm, 2: <= 500,
                     3: <= 2500, 4: <= 20000); 1 h LC50s are halved, and said
  flags              pyrophoric and corrosive components
A figure the catalogue lacks is reported as not known, never guessed; the
sources list says which figures were recalled rather than read. These are
screening calculations: they do not replace the safety data sheet, the
applicable codes, gas-detection design or a qualified assessment.

Flags:
  --blend SPEC     the blend, as text or @FILE (required)
  --pres P         total pressure, only to turn partial pressures into
                   fractions (default: their sum, else 1 atm)
  --json           one JSON object: lfl_percent, ufl_percent,
                   flammable_in_air, flammability_sum, oxidizing,
                   oxidizing_sum, lc50_ppm, ghs_inhalation_category,
                   sources and more (null: does not apply, or not known)
  --species FILE   merge a species file over the catalogue (repeatable)
  --ascii          plain ASCII text (also ZMIX_ASCII=1)

`+blendHelp+`
Examples:
  zmix hazard --blend "H2 10%, N2 bal"
  zmix hazard --blend "CH4 85%, C2H6 10%, C3H8 5%"
  zmix hazard --blend "PH3 1%, HCl 5%, N2 bal" --json
  zmix hazard --blend "O2 30%, N2 bal"
`)
}
