package ui

import (
	"math"
	"strings"
	"testing"

	"zmix/mixtures"
	"zmix/mixtures/report"
	"zmix/model"
)

func testProps(t *testing.T, w, h int) (*propertiesPane, *bench) {
	t.Helper()
	c := testPaneCommon(false)
	b := newBench(c.Catalogue)
	b.loadFile(mixtures.DemoFile())
	b.update()
	p := newPropertiesPane(c, b)
	p.SetSize(w, h)
	return p, b
}

// engineState computes the demo blend at (T, P) with mixtures alone.
func engineState(t *testing.T, blend string, tempK, presPa float64) mixtures.State {
	t.Helper()
	bl, err := mixtures.ParseBlend(blend)
	if err != nil {
		t.Fatal(err)
	}
	mix, err := bl.Resolve(model.Builtin(), presPa)
	if err != nil {
		t.Fatal(err)
	}
	st, err := mix.State(tempK, presPa, mixtures.Options{})
	if err != nil {
		t.Fatal(err)
	}
	return st
}

// wantReadout lists the figures the readout must show for st, formatted
// as the state command formats them.
func wantReadout(st *mixtures.State, perKg bool) []string {
	want := []string{
		report.Sig(1000*st.MolarMassKgPerMol, 6), report.Sig(st.DensityKgPerM3, 5), report.Sig(st.CpJPerMolK, 5), report.Sig(st.CvJPerMolK, 5),
		report.Sig(st.Gamma, 5), report.Sig(st.SoundSpeedMPerS, 5), report.Fixed(st.HJPerMol/1000, 3), report.Fixed(st.UJPerMol/1000, 3),
		report.Sig(st.SJPerMolK, 6), report.Fixed(st.GJPerMol/1000, 3), report.Fixed(st.AJPerMol/1000, 3), report.Sig(st.SMixJPerMolK, 5),
	}
	if perKg {
		want = append(want, report.Sig(st.PerKg(st.CpJPerMolK), 5), report.Fixed(st.PerKg(st.GJPerMol)/1000, 3))
	}
	for _, t := range st.Species {
		want = append(want, t.Species.Formula+" ", report.Sig(t.X, 4), report.Sig(t.PartialPresPa/1000, 4),
			report.Fixed(t.MuJPerMol/1000, 3), report.Sig(t.SJPerMolK, 5), report.Sig(t.CpJPerMolK, 4))
	}
	return want
}

func TestPropertiesShowsEngineValues(t *testing.T) {
	for _, size := range []struct {
		name  string
		w, h  int
		perKg bool
	}{
		{"roomy, per kg too", 90, 40, true},
		{"short, two columns", 78, 16, false},
		{"narrow", 62, 40, false},
	} {
		t.Run(size.name, func(t *testing.T) {
			p, _ := testProps(t, size.w, size.h)
			p.scroll.setHeight(1000) // the whole text, not only what fits
			v := p.View()
			st := engineState(t, mixtures.DemoFile().BlendText(), 295.15, 1.4e5)
			for _, w := range wantReadout(&st, size.perKg) {
				if !strings.Contains(v, w) {
					t.Errorf("readout lacks %q:\n%s", w, v)
				}
			}
			for _, l := range strings.Split(v, "\n") {
				if lw := len([]rune(l)); lw > size.w {
					t.Errorf("line wider (%d) than the pane (%d): %q", lw, size.w, l)
				}
			}
			if strings.Contains(v, "NaN") || strings.Contains(v, "Inf") {
				t.Errorf("non-finite value on screen:\n%s", v)
			}
		})
	}
}

func TestPropertiesScroll(t *testing.T) {
	p, _ := testProps(t, 70, 5)
	top := p.View()
	p.Update(testKey("down"))
	if p.View() == top {
		t.Errorf("down did not scroll")
	}
	p.Update(testKey("end"))
	if _, below := p.scroll.more(); below {
		t.Errorf("end did not reach the bottom")
	}
	p.Update(testKey("home"))
	if p.View() != top {
		t.Errorf("home did not go back to the top")
	}
}

// A state the model cannot compute shows an error, never a NaN.
func TestPropertiesNonFiniteIsAnError(t *testing.T) {
	p, b := testProps(t, 80, 30)
	b.state.CpJPerMolK = math.NaN()
	if name := nonFinite(&b.state); name != "Cp" {
		t.Fatalf("nonFinite = %q, want Cp", name)
	}
	b.derive() // from good inputs again: finite
	if b.stateErr != "" {
		t.Fatalf("stateErr = %q", b.stateErr)
	}
	b.stateErr = "the model gives no finite Cp"
	p.refresh()
	if v := p.View(); !strings.Contains(v, "no finite Cp") || strings.Contains(v, "NaN") {
		t.Errorf("view:\n%s", v)
	}
}

func TestPropertiesShowsStaleState(t *testing.T) {
	p, b := testProps(t, 80, 30)
	b.setTemp("hot")
	b.update()
	p.refresh()
	if !strings.Contains(p.View(), "last valid state") {
		t.Errorf("no notice that the readout is the last valid state:\n%s", p.View())
	}
}

// The pane gives the dew point at the line pressure and the water's
// relative humidity, the figures of zmix state's real-gas section, on one
// line where it fits; a blend that cannot condense has neither.
func TestPropertiesDewPointAndHumidity(t *testing.T) {
	p, b := testProps(t, 100, 40)
	b.loadFile(&mixtures.BlendFile{Format: mixtures.BlendFormat, Components: []mixtures.FileComponent{
		{Species: "H2O", Amount: "dew 10C"}, {Species: "air", Amount: "bal"}}, Temperature: "25 C", Pressure: "1 atm"})
	b.update()
	p.Sync()
	st := engineState(t, "H2O dew 10C, air bal", 298.15, 101325)
	dp := report.DewPointShort(&st, mixtures.DewPoint(&st))
	rh, _ := report.HumidityShort(mixtures.RelativeHumidity(&st))
	want := strings.Join(strings.Fields("dew point "+dp[1]+"; RH "+rh[1]), " ") // the pane wraps, one space between words
	if !strings.Contains(dp[1], "283.15 K") || !strings.Contains(rh[1], "38.74 % over water") || !strings.Contains(p.View(), want) {
		t.Fatalf("want %q in the pane:\n%s", want, p.View())
	}
	b.loadFile(&mixtures.BlendFile{Format: mixtures.BlendFormat, Components: []mixtures.FileComponent{
		{Species: "He", Amount: "bal"}}, Temperature: "25 C", Pressure: "1 atm"})
	b.update()
	p.Sync()
	if v := p.View(); strings.Contains(v, "dew point") || strings.Contains(v, "RH ") {
		t.Errorf("helium has a dew point line:\n%s", v)
	}
}
