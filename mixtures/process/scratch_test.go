package process

import "testing"

func TestScratch(t *testing.T) {
	r, err := Compression{Mixture: mixOf(t, dryAir), InletTempK: 300, InletPresPa: 1e5, OutletPresPa: 1e6}.Solve()
	if err != nil {
		t.Fatal(err)
	}
	t.Logf("%+v", r.Stages)
	r, err = Compression{Mixture: mixOf(t, dryAir), InletTempK: 300, InletPresPa: 1e5, OutletPresPa: 1e6, Efficiency: 0.8, Stages: 3, RateMolPerSec: 1}.Solve()
	if err != nil {
		t.Fatal(err)
	}
	t.Logf("%+v", r.Stages)
	f, err := Flow{Mixture: mixOf(t, "Ar 1"), Rate: Rate{Value: 1, Unit: rateUnits["slpm"]}}.Solve()
	t.Logf("%+v %v", f, err)
	for _, s := range []string{"N2 1", "Ar 1", "He 1", "CO2 1", "CH4 1", "H2 1", "O2 1", "SF6 1", "NH3 1", "C3H8 1"} {
		g, _ := GasCorrectionFactor(nil, mixOf(t, s))
		t.Logf("%s %.4f", s, g)
	}
}
