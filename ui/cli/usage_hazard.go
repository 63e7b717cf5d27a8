package cli

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
  --csv            every figure of the JSON in a long table of four
                   columns: section, row, name, value
`+sharedFlagsHelp+`
`+blendHelp+`
Examples:
  zmix hazard --blend "H2 10%, N2 bal"
  zmix hazard --blend "CH4 85%, C2H6 10%, C3H8 5%"
  zmix hazard --blend "PH3 1%, HCl 5%, N2 bal" --json
  zmix hazard --blend "O2 30%, N2 bal"
`)
}

func usageRelease(w io.Writer) {
	io.WriteString(w, `Usage: zmix release --blend SPEC (--amount Q | --cylinder V --fill P | --rate R)
                    --room V [--ach N | --vent FLOW] [--pres P] [--json]

What a release of the blend does to a room, by the well-mixed model
(common practice for oxygen-deficiency and gas-release assessments): the
gas is taken as spread through the room at once.
  --amount alone   released at once: the oxygen left by the two common
                   closed forms, a closed room (gas added, 20.9 % V/(V+Q))
                   and room air displaced (20.9 % exp(-Q/V)), and the lower
  --cylinder       a cylinder's contents released at once: what it holds at
                   --fill less what stays at 1 atm, with the real-gas Z
                   (as zmix cylinder); a liquefied gas goes by --amount
  --rate           a continuous release: the steady state with the
                   ventilation, the time constant V/(q+v), the time to
                   19.5 % O2 and the time course; with --amount too, the
                   release stops when that amount (or cylinder) is out
Each species' peak is given in ppm; a flammable one as % of its LFL,
against the alarm points of 10 % and 25 % LFL (common practice); a toxic
one against its 4 h LC50, GHS category and any exposure limit in the
catalogue. Volumes are gas at 20 °C and 1 atm. Screening calculations:
they do not replace the safety data sheet, the applicable codes,
gas-detection design or a qualified assessment.

Flags:
  --blend SPEC     the blend, as text or @FILE (required)
  --amount Q       mol, kmol; kg, g, lb; Nm3, SL (0 °C), Sm3 (15 °C),
                   scf (60 °F); m3 or L of gas at 20 °C and 1 atm
  --cylinder V     a cylinder's water volume: L, m3, ft3
  --fill P         its fill pressure with a unit: 150bar, 2200psig
  --fill-temp T    its temperature (default 20C, the room's)
  --rate R         a flow: mol/s, kg/h, Nm3/h, SLPM, sccm, SCFH, SCFM;
                   actual m3/h, L/min, ACFM taken at 20 °C and 1 atm
  --room V         room volume: m3, L, ft3, or its sides, "6 x 4 x 3 m"
                   (required)
  --ach N          ventilation, air changes per hour: 6, 6/h, 6 ACH
                   (default none)
  --vent FLOW      ventilation as a volume flow, e.g. 360 m3/h
  --pres P         total pressure, only to turn partial pressures into
                   fractions
  --json           one JSON object: o2_percent (the worst), species with
                   peak_ppm and percent_of_lfl, model, and more
  --csv            every figure of the JSON in a long table of four
                   columns: section, row, name, value
`+sharedFlagsHelp+`
Examples:
  zmix release --blend "N2 100%" --amount 10Nm3 --room "6 x 4 x 3 m"
  zmix release --blend "H2 5%, N2 bal" --rate 20SLPM --room 60m3 --ach 6
  zmix release --blend "PH3 1%, N2 bal" --amount 50SL --room 200m3 --json
  zmix release --blend "Ar 100%" --rate 30Nm3/h --amount 9Nm3 --room 25m3 --vent 100m3/h
  zmix release --blend "N2 100%" --cylinder 50L --fill 200bar --room 40m3
`)
}
