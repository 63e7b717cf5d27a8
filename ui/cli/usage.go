package cli

import (
	"io"
	"strings"

	"zmix/mixtures"
	"zmix/mixtures/report"
	"zmix/model"
)

// The help of each command, written out so that it can carry examples and
// the accepted forms; the flag package's generated text has neither.

// sharedFlagsHelp ends every command's flag list: the flags
// globalOpts.register adds to each.
const sharedFlagsHelp = `  --species FILE   merge a species file over the catalogue (repeatable)
  --ascii          plain ASCII text (also ZMIX_ASCII=1)
`

// unitsHelp lists the units from the engine's own lists, so that help
// cannot fall behind what the parser accepts.
var unitsHelp = "Units:\n" +
	"  temperature  " + mixtures.TemperatureUnits + ": 300K, 25C, 77 F, 540 R\n" +
	"  pressure     " + strings.Join(report.Wrap(mixtures.PressureUnits, 64), "\n               ") + "\n" +
	"               e.g. 1atm, 14.7 psia, 2 barg (or bar(g), bar g); a gauge\n" +
	"               pressure is read as 101325 Pa above the value and flagged\n" +
	"               as gauge in the output\n"

const blendHelp = `Blend text: "SPECIES AMOUNT" items separated by , ; or new lines. An amount is
  a mole fraction (0.21), mol % (21% or 21 mol%), ppm or ppb by moles, a mass
  fraction (0.3 kg/kg), mass % (30 wt% or 30 mass%), a partial pressure
  (0.2 bar), a dew point (dew -40C: the partial pressure that condenses
  there, over ice below 0 C for water), or bal for the one balance species;
  a species alone, as the whole blend, is the pure gas. Isomers, which share
  a formula, take a prefix: ` + model.IsomerPrefixes + `, as in n-C4H10.
  air is one item standing for dry air (N2, O2, Ar, CO2): CH4 2.5%, air bal.
  --blend @FILE reads a saved blend file; its temperature, pressure and
  standard pressure are then the defaults of --temp, --pres and --std.
`

func usageState(w io.Writer) {
	io.WriteString(w, `Usage: zmix state --blend SPEC --temp T --pres P [--std 1bar|1atm] [--json | --csv] [--anatomy]

Prints the full readout of a blend at one temperature and pressure: molar
mass, density, Cp, Cv, γ, speed of sound, H, U, S, G and A per mole and per
kg, the mixing entropy, each species' fractions, partial pressure, μ, S and
Cp with its share, the validity notes and the safety cautions.

Flags:
  --blend SPEC     the blend, as text or @FILE (required)
  --temp T         temperature with a unit (required unless the file has one)
  --pres P         total pressure with a unit; may be left out when every
                   amount is a partial pressure (the total is their sum)
  --std P°         standard pressure of μ°: 1bar (default) or 1atm
  --json           one JSON object (keys in the README), with the cautions
  --csv            a header row and one row; cautions go to stderr
  --all-notes      list every validity figure, not only the cautions
  --anatomy        take each species apart: the S and Cp of translation,
                   rotation, vibration and electronic levels, their treatment
                   and the characteristic temperatures (the Anatomy pane)
`+sharedFlagsHelp+`
`+unitsHelp+"\n"+blendHelp+`
Examples:
  zmix state --blend "N2 78.08%, O2 20.95%, Ar 0.93%, CO2 0.04%" --temp 25C --pres 1atm
  zmix state --blend "SiH4 2%, H2 500ppm, N2 bal" --temp 300K --pres 2barg
  zmix state --blend "N2 0.79, O2 0.21" --temp 77F --pres 14.7psia --json
  zmix state --blend "Ar 0.8 bar, He 0.2 bar" --temp 300K
  zmix state --blend @line3-nitride.json --csv
`)
}

func usageSweep(w io.Writer) {
	io.WriteString(w, `Usage: zmix sweep --blend SPEC (--temp A..B --pres P | --pres A..B --temp T)
                  [--steps N] [--log] [--std 1bar|1atm] [--json | --csv]

Computes the blend at N points of a temperature or pressure range, end
points included, and prints one row per point: T, P, ρ, Cp, γ, c, H, S, G and
each species' μ. Temperature sweeps are evenly spaced in T, or in ln T with
--log; pressure sweeps are always evenly spaced in ln P. Exactly one of
--temp and --pres is a range; the other is held fixed.

Flags:
  --blend SPEC     the blend, as text or @FILE (required)
  --temp A..B|T    the temperature range, or the fixed temperature
  --pres A..B|P    the pressure range, or the fixed pressure
  --steps N        number of points, end points included (default 11); a
                   step typed here (50K) is answered with the count it means
  --log            evenly spaced in ln T
  --std P°         standard pressure of μ°: 1bar (default) or 1atm
  --json           a JSON list of state objects, one per point
  --csv            a header row, then one row per point; cautions go to stderr
`+sharedFlagsHelp+`
A unit written only after the end applies to the start too: 300..1500K,
1..50 bar. Both ends of a pressure range are gauge or both absolute.

`+unitsHelp+"\n"+blendHelp+`
Examples:
  zmix sweep --blend "N2 78.08%, O2 20.95%, Ar 0.93%, CO2 0.04%" --temp 300..1500K --pres 1atm
  zmix sweep --blend "SiH4 2%, H2 500ppm, N2 bal" --pres 1..50bar --temp 25C --steps 8
  zmix sweep --blend "CH4 0.9, C2H6 0.1" --temp 200..2000K --log --steps 5 --pres 5barg --csv
`)
}

func usageCatalog(w io.Writer) {
	io.WriteString(w, `Usage: zmix catalog [FORMULA] [--std 1bar|1atm] [--temps LIST] [--json | --csv] [--species FILE]

Without FORMULA, lists every species: formula, name, molar mass, rotor kind
and hazard classes. With FORMULA, shows that species' data with its sources,
its characteristic temperatures, and a table of Cp°, S°, −[G°−H°(298.15 K)]/T
and H°−H°(298.15 K) in the columns of the published thermochemical tables.

Flags:
  --std P°         standard pressure of the table: 1bar (default) or 1atm
  --temps LIST     the table's temperatures, e.g. "300, 600, 900 K"
                   (default 100, 200, 298.15, 500, 1000, 1500, 2000, 3000 K)
  --json           the list, or the species' data, sources and table, as JSON
  --csv            the list, or the species' table, as CSV
`+sharedFlagsHelp+`
Species are addressed by formula (CO2); a name (carbon dioxide) or another
letter case also finds them.

Examples:
  zmix catalog
  zmix catalog CO2
  zmix catalog H2 --std 1atm --temps "20, 50, 100, 298.15 K"
  zmix catalog --species my-gases.cat
`)
}
