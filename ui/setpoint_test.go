package ui

import (
	"math"
	"strings"
	"testing"

	"zmix/mixtures"
	"zmix/model"
)

func testSetpoint(t *testing.T) (*setpointPane, *bench) {
	t.Helper()
	c := testPaneCommon(false)
	b := newBench(c.Catalogue)
	b.loadFile(mixtures.DemoFile())
	b.update()
	p := newSetpointPane(c, b)
	p.SetSize(60, 8)
	return p, b
}

func setpointKeys(p *setpointPane, b *bench, keys ...string) {
	for _, k := range keys {
		p.Update(testKey(k))
		if b.changed {
			b.update()
			p.refresh()
		}
	}
}

func TestSetpointTemperatureLive(t *testing.T) {
	p, b := testSetpoint(t)
	setpointKeys(p, b, "t")
	if !p.Editing() {
		t.Fatal("t did not open the temperature")
	}
	setpointKeys(p, b, "ctrl+u", "77°F") // pasted in one go
	if want := 298.15; math.Abs(b.in.TempK-want) > 1e-9 {
		t.Errorf("TempK = %g, want %g", b.in.TempK, want)
	}
	setpointKeys(p, b, "enter")
	if p.Editing() || b.tempText != "77°F" {
		t.Errorf("enter: editing %v, text %q", p.Editing(), b.tempText)
	}
}

func TestSetpointInvalidKeepsLastValid(t *testing.T) {
	cases := []struct {
		name, key, text, wantErr string
	}{
		{"below absolute zero", "t", "-300 C", "absolute zero"},
		{"no unit", "t", "300", "no unit"},
		{"unknown temperature unit", "t", "300 kelvins", "unknown unit"},
		{"zero pressure", "p", "0 bar", "at or below zero"},
		{"vacuum gauge below zero absolute", "p", "-2 barg", "at or below zero"},
		{"not a number", "p", "lots", "no number"},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			p, b := testSetpoint(t)
			before := b.in
			setpointKeys(p, b, c.key, "ctrl+u", c.text, "enter")
			if b.in.TempK != before.TempK || b.in.PresPa != before.PresPa || b.in.Gen != before.Gen {
				t.Errorf("invalid %q changed the inputs", c.text)
			}
			v := p.View()
			if !strings.Contains(v, c.wantErr) || !strings.Contains(v, "still in force") {
				t.Errorf("view lacks %q and the value in force:\n%s", c.wantErr, v)
			}
			if !strings.Contains(v, c.text) {
				t.Errorf("view does not keep the typed %q:\n%s", c.text, v)
			}
		})
	}
}

func TestSetpointEscRestores(t *testing.T) {
	p, b := testSetpoint(t)
	setpointKeys(p, b, "p", "ctrl+u", "3 barg")
	if !b.in.Gauge || b.in.PresPa != 3e5+mixtures.AtmospherePa {
		t.Errorf("3 barg: %+v", b.in)
	}
	setpointKeys(p, b, "esc")
	if b.presText != "1.4 bar" || b.in.PresPa != 1.4e5 || b.in.Gauge {
		t.Errorf("esc left %q, %g Pa, gauge %v", b.presText, b.in.PresPa, b.in.Gauge)
	}
}

func TestSetpointToggles(t *testing.T) {
	p, b := testSetpoint(t)
	setpointKeys(p, b, "s")
	if b.in.Opts.Std.Pa() != model.StdPressureAtmPa || !strings.Contains(p.View(), "1 atm") {
		t.Errorf("s: P° = %g", b.in.Opts.Std.Pa())
	}
	setpointKeys(p, b, "up", "up", "down", "down", "enter") // the P° line again
	if b.in.Opts.Std.Pa() != model.StdPressureBarPa {
		t.Errorf("enter on P°: %g", b.in.Opts.Std.Pa())
	}
	gen := b.in.Gen
	setpointKeys(p, b, "g")
	if !b.showGauge || !strings.Contains(p.View(), "gauge") {
		t.Errorf("g did not switch to gauge")
	}
	if b.in.Gen != gen {
		t.Errorf("the pressure view changed the inputs")
	}
	// Gauge in the unit typed, bar, under its gauge name; the pressure
	// line reads the same way as every other pressure (issue 7, item 9).
	if got := b.presShown(1.4e5); got != "0.38675 barg" {
		t.Errorf("presShown = %q", got)
	}
	if v := p.View(); !strings.Contains(v, "0.38675 barg, entered as absolute") || strings.Contains(v, "bar abs") {
		t.Errorf("the pressure line does not follow the gauge view:\n%s", v)
	}
}
