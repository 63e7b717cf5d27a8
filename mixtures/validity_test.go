package mixtures

import (
	"strings"
	"testing"

	"zmix/model"
)

func TestNotes(t *testing.T) {
	cases := []struct {
		name          string
		blend         string
		tempK, presPa float64
		// want lists "SPECIES:severity" for every note above Info; a blank
		// species is the blend as a whole.
		want []string
	}{
		{"air at room conditions", dryAir, 298.15, atmPa, nil},
		// Air at 20 bar and 25 °C has Z ≈ 0.994 (B ≈ −7.5 cm³/mol,
		// Dymond & Smith, from memory): within 1 %, so no caution, where
		// the flat 10 bar rule cautioned.
		{"air at 20 bar", dryAir, 298.15, 20e5, nil},
		// CH4 at 300 K and 50 bar has Z ≈ 0.92 (NIST WebBook, from
		// memory): the ideal-gas density is 8 % off.
		{"methane at 50 bar", "CH4 100%", 300, 50e5, []string{":caution"}},
		// N2 at 1 GPa is as dense as a liquid: past every model here.
		// Supercritical N2 does not condense at any pressure; its n/nQ is no
		// longer ≪ 1.
		{"nitrogen at 1 GPa", "N2 100%", 300, 1e9, []string{":outside model", "N2:caution"}},
		// Supercritical N2 and H2 at 300 K, 200 bar: Z ≈ 1.04 and 1.11
		// (NIST WebBook, from memory), no condensation note.
		{"supercritical N2 and H2", "N2 50%, H2 50%", 300, 200e5, []string{":caution"}},
		// CO2 at 300 K and 60 bar: Z ≈ 0.57, below its vapour pressure of
		// about 67 bar (NIST WebBook, from memory): near, not condensing.
		{"CO2 at 60 bar", "CO2 100%", 300, 60e5, []string{":caution", "CO2:caution"}},
		// 5 % water in N2 at 25 °C and 1 atm: 5.07 kPa against a
		// saturation pressure of 3.17 kPa (IAPWS): it condenses.
		{"wet nitrogen", "H2O 5%, N2 bal", 298.15, atmPa, []string{"H2O:outside model"}},
		// Normal boiling point of CO2 (sublimation), 194.7 K, from memory.
		{"CO2 below its sublimation point", "CO2 10%, N2 bal", 150, atmPa, []string{"CO2:outside model"}},
		// At 250 K, 10 kPa of CO2 is far from its vapour pressure (about
		// 18 bar, from memory) and nearly ideal; 0.9 bar of it is 5 % of
		// it, still far, but the blend at 9 bar is 1.4 % off ideal.
		{"dilute CO2 near its sublimation point", "CO2 10%, N2 bal", 250, atmPa, nil},
		{"CO2 near its sublimation point", "CO2 10%, N2 bal", 250, 9e5, []string{":caution"}},
		// Helium at 2 K and 20 bar: n/nQ is far from small, and T is below
		// the boiling point (4.22 K, from memory).
		{"cold dense helium", "He 100%", 2, 20e5, []string{":outside model", "He:outside model", "He:outside model"}},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			s := mustState(t, mustMixture(t, c.blend, c.presPa), c.tempK, c.presPa)
			var got []string
			for _, n := range Notes(&s, false) {
				if n.Severity == model.Info {
					t.Errorf("info note %q shown without all", n.Text)
				}
				got = append(got, n.Species+":"+n.Severity.String())
			}
			if strings.Join(got, " ") != strings.Join(c.want, " ") {
				t.Errorf("notes %q, want %q", got, c.want)
			}
			all := Notes(&s, true)
			if len(all) < len(got) || len(all) == 0 {
				t.Errorf("Notes(all) gave %d notes, want every note (%d above info, and the info ones)", len(all), len(got))
			}
		})
	}
}
