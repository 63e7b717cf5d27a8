package cli

import (
	"errors"
	"fmt"
	"io"
	"io/fs"
	"strings"

	"zmix/mixtures"
	"zmix/mixtures/process"
)

// streamsFlag is --stream, given once per inlet.
type streamsFlag []string

func (s *streamsFlag) String() string { return strings.Join(*s, " | ") }

func (s *streamsFlag) Set(v string) error {
	*s = append(*s, v)
	return nil
}

func (a *app) cmdMix(g *globalOpts, args []string) error {
	fset := newFlagSet("zmix mix")
	var streams streamsFlag
	var presText string
	var outFmt formatFlags
	fset.Var(&streams, "stream", "one inlet, `\"BLEND; T; RATE\"` (give two or more)")
	fset.StringVar(&presText, "pres", "", "the mixing pressure `P`")
	outFmt.register(fset)
	g.register(fset, false)
	rest, err := parseFlags(fset, args, true)
	if err != nil {
		return err
	}
	if err := noArgs("mix", rest); err != nil {
		return err
	}
	if len(streams) < 2 {
		return badInput("give two or more --stream %s", process.StreamForm)
	}
	if len(streams) > process.MaxStreams {
		return badInput("%d streams: want at most %d", len(streams), process.MaxStreams)
	}
	p, err := needPressure("--pres", presText)
	if err != nil {
		return err
	}
	cat, err := g.catalogue()
	if err != nil {
		return err
	}
	mx := process.Mixing{PresPa: p.Pa}
	labels := make([]string, len(streams))
	blends := make([]*mixtures.Blend, len(streams))
	for i, text := range streams {
		flag := fmt.Sprintf("--stream %d", i+1)
		spec, err := process.ParseStream(text)
		if err != nil {
			return badInput("%s: %v", flag, err)
		}
		b, err := streamBlend(flag, spec.BlendText)
		if err != nil {
			return err
		}
		mix, err := b.Resolve(cat, p.Pa)
		if err != nil {
			return badInput("%s: %v", flag, err)
		}
		n, err := spec.Rate.MolPerSec(process.Ideal{}.Gas(mix), process.Conditions{TempK: spec.TempK, PresPa: p.Pa})
		if err != nil {
			return badInput("%s: %v", flag, err)
		}
		labels[i], blends[i] = spec.BlendText, b
		mx.Streams = append(mx.Streams, process.Stream{Label: spec.BlendText, Mixture: mix, TempK: spec.TempK, RateMolPerSec: n})
	}
	res, err := mx.Solve()
	if err != nil {
		return processFailed(err)
	}
	return a.printProcess(strings.Join(labels, "  +  ")+namedNote(blends...), res, outFmt, g.ascii)
}

// streamBlend reads a stream's blend: text, or @FILE for a blend file.
func streamBlend(flag, text string) (*mixtures.Blend, error) {
	path, ok := strings.CutPrefix(text, "@")
	if !ok {
		b, err := mixtures.ParseBlend(text)
		if err != nil {
			return nil, badInput("%s: %v", flag, err)
		}
		return b, nil
	}
	_, b, err := mixtures.ReadBlendFile(path)
	if err != nil {
		var pe *fs.PathError
		if errors.As(err, &pe) {
			return nil, ioFailure(fmt.Errorf("%s: @%s: cannot read it: %v", flag, path, pe.Err))
		}
		return nil, badInput("%s: @%s: %v", flag, path, err)
	}
	return b, nil
}

func usageMix(w io.Writer) {
	io.WriteString(w, `Usage: zmix mix --stream "BLEND; T; RATE" --stream "BLEND; T; RATE" [...] --pres P [--json | --csv]

Joins two or more streams adiabatically at one pressure, each with its own
blend, temperature and flow. Gives the outlet composition, the outlet
temperature from the energy balance on the engine's common energy scale,
the outlet's state, and the entropy generated, mixing entropy included
(identical gases at one temperature generate none).

Flags:
  --stream S       one inlet: its blend (text or @FILE), temperature and
                   flow, separated by semicolons; give two or more
  --pres P         the mixing pressure (required)
  --json           one JSON object: outlet_temperature_K, rate_mol_s,
                   entropy_generation_W_K, species (as in state), outlet,
                   streams
  --csv            CSV: one row per figure (section, row, name, value), as in
                   the JSON
`+sharedFlagsHelp+`
An actual-volume flow is read at the stream's temperature and the mixing
pressure. To find the flow of a diluent for a target level, see zmix dilute.

`+unitsHelp+`
Examples:
  zmix mix --stream "N2 79%, O2 21%; 25C; 100 Nm3/h" --stream "CO2 1; 80C; 20 kg/h" --pres 1.2bar
  zmix mix --stream "CH4 1; 15C; 2 kmol/h" --stream "@line3-nitride.json; 30C; 500 SLPM" --pres 3barg --json
`)
}
