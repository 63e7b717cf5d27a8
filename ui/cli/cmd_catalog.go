package cli

import (
	"bytes"
	"strconv"
	"strings"

	"zmix/mixtures"
	"zmix/mixtures/report"
	"zmix/model"
)

// defaultTableTempsK are the rows of a species' table when --temps is not
// given: the reference temperature and round values across the range the
// published tables cover.
var defaultTableTempsK = []float64{100, 200, model.RefTempK, 500, 1000, 1500, 2000, 3000}

func (a *app) cmdCatalog(g *globalOpts, args []string) error {
	fs := newFlagSet("zmix catalog")
	var stdText, tempsText string
	var asJSON, asCSV bool
	fs.StringVar(&stdText, "std", "", "standard pressure of the table: `1bar` (default) or 1atm")
	fs.StringVar(&tempsText, "temps", "", "temperatures of the table, comma-separated with a unit (`LIST`, e.g. \"300, 600, 900 K\")")
	fs.BoolVar(&asJSON, "json", false, "write JSON: the species list, or one species' data and table")
	fs.BoolVar(&asCSV, "csv", false, "write CSV: the species list, or one species' table")
	g.register(fs, false)
	rest, err := parseFlags(fs, args, true)
	if err != nil {
		return err
	}
	// Words may be one name typed without quotes (zmix catalog nitrous
	// oxide); if they are not, they are several species.
	several := len(rest) > 1
	if several {
		rest = []string{strings.Join(rest, " ")}
	}
	format, err := pickFormat(asJSON, asCSV)
	if err != nil {
		return err
	}
	std, err := parseStd(stdText)
	if err != nil {
		return err
	}
	temps := defaultTableTempsK
	if given := flagsGiven(fs); given["temps"] {
		if temps, err = parseTempList(tempsText); err != nil {
			return err
		}
	}
	cat, err := g.catalogue()
	if err != nil {
		return err
	}
	var out bytes.Buffer
	if len(rest) == 0 {
		switch format {
		case formatJSON:
			err = report.WriteCatalogJSON(&out, cat)
		case formatCSV:
			err = report.WriteCatalogCSV(&out, cat)
		default:
			report.WriteCatalogList(page(&out, g.ascii), cat)
		}
		if err != nil {
			return ioFailure(err)
		}
	} else {
		if m, named := mixtures.LookupNamedMixture(rest[0]); named {
			r, err := report.ResolveNamedMixture(cat, m)
			if err != nil {
				return badInput("%s: %s", model.Quote(rest[0]), model.UserMessage(err))
			}
			switch format {
			case formatJSON:
				err = report.WriteNamedMixtureJSON(&out, r)
			case formatCSV:
				err = report.WriteNamedMixtureCSV(&out, r)
			default:
				report.WriteNamedMixture(page(&out, g.ascii), r)
			}
			if err != nil {
				return ioFailure(err)
			}
			return a.emit(&out)
		}
		sp, ok := cat.Lookup(rest[0])
		if !ok && several {
			return badInput("one species at a time; got %s (zmix catalog lists them all)", rest[0])
		}
		if !ok {
			const more = "zmix catalog lists every species, and --species FILE adds others"
			hint := cat.UnknownHint(rest[0])
			switch {
			case hint == "":
				hint = more
			case strings.HasPrefix(hint, "did you mean"):
				hint += " (" + more + ")"
			}
			return badInput("unknown species %s; %s", model.Quote(rest[0]), hint)
		}
		builtin := report.BuiltinSpecies()[sp]
		switch format {
		case formatJSON:
			err = report.WriteSpeciesJSON(&out, sp, builtin, std.Pa(), temps)
		case formatCSV:
			err = report.WriteSpeciesCSV(&out, sp, std.Pa(), temps)
		default:
			err = report.WriteSpecies(page(&out, g.ascii), sp, builtin, std.Pa(), temps)
		}
		if err != nil {
			return badInput("%s", model.UserMessage(err))
		}
	}
	return a.emit(&out)
}

// parseTempList reads "300, 600, 900 K"; a unit written only on the last
// value applies to the bare numbers before it.
func parseTempList(text string) ([]float64, error) {
	items := strings.Split(text, ",")
	lastUnit := ""
	if last := strings.TrimSpace(items[len(items)-1]); last != "" {
		lastUnit = strings.TrimSpace(strings.TrimLeft(last, "0123456789.+-eE "))
	}
	var out []float64
	for _, item := range items {
		item = strings.TrimSpace(item)
		if item == "" {
			continue
		}
		withUnit := item
		if _, err := strconv.ParseFloat(item, 64); err == nil && lastUnit != "" {
			withUnit = item + " " + lastUnit // a bare number takes the list's unit
		}
		k, err := mixtures.ParseTemperature(withUnit)
		if err != nil {
			return nil, badInput("--temps %s: %s", model.Quote(item), model.UserMessage(err))
		}
		out = append(out, k)
	}
	if len(out) == 0 {
		return nil, badInput("--temps %s holds no temperature; want a list such as \"300, 600, 900 K\"", model.Quote(text))
	}
	return out, nil
}
