package report

import (
	"bytes"
	"encoding/json"
	"strings"
	"testing"

	"zmix/mixtures"
	"zmix/model"
)

func realGasState(t *testing.T, cat *model.Catalogue, blend string, tempK, presPa float64) *mixtures.State {
	t.Helper()
	b, err := mixtures.ParseBlend(blend)
	if err != nil {
		t.Fatal(err)
	}
	m, err := b.Resolve(cat, presPa)
	if err != nil {
		t.Fatal(err)
	}
	s, err := m.State(tempK, presPa, mixtures.Options{})
	if err != nil {
		t.Fatal(err)
	}
	return &s
}

// The state JSON carries the object real_gas with the keys the issue
// names, in SI units, and null when no species has critical constants.
func TestRealGasJSON(t *testing.T) {
	st := realGasState(t, model.Builtin(), "H2 100%", 300, 200e5)
	var buf bytes.Buffer
	if err := WriteStateJSON(&buf, &StateReport{Label: "H2", State: st}); err != nil {
		t.Fatal(err)
	}
	var obj map[string]any
	if err := json.Unmarshal(buf.Bytes(), &obj); err != nil {
		t.Fatalf("state JSON does not parse: %v\n%s", err, buf.String())
	}
	rg, ok := obj["real_gas"].(map[string]any)
	if !ok {
		t.Fatalf("real_gas = %v, want an object", obj["real_gas"])
	}
	for _, k := range []string{"z", "density_kg_m3", "h_residual_J_mol", "s_residual_J_molK", "jt_K_per_Pa", "model"} {
		if _, ok := rg[k]; !ok {
			t.Errorf("real_gas lacks %q", k)
		}
	}
	if rg["z"] != st.RealGas.Z || rg["model"] != st.RealGas.Model.String() || obj["z"] != st.RealGas.Z {
		t.Errorf("real_gas z %v model %v, top-level z %v; want %v, %v", rg["z"], rg["model"], obj["z"], st.RealGas.Z, st.RealGas.Model)
	}

	// A species file without critical constants: not known, null.
	radical := realGasState(t, model.Builtin(), "OH 100%", 3000, 1e5)
	buf.Reset()
	if err := WriteStateJSON(&buf, &StateReport{Label: "OH", State: radical}); err != nil {
		t.Fatalf("a state without real-gas figures is refused: %v", err)
	}
	obj = nil
	if err := json.Unmarshal(buf.Bytes(), &obj); err != nil {
		t.Fatalf("state JSON does not parse: %v", err)
	}
	if v, ok := obj["real_gas"]; !ok || v != nil {
		t.Errorf("real_gas = %v, want null", v)
	}
	if v, ok := obj["z"]; !ok || v != nil {
		t.Errorf("z = %v, want null", v)
	}
	buf.Reset()
	if err := WriteStateText(&buf, &StateReport{Label: "OH", State: radical}); err != nil {
		t.Fatal(err)
	}
	if !strings.Contains(buf.String(), "not known") {
		t.Errorf("text readout does not say the real-gas figures are not known:\n%s", buf.String())
	}
	buf.Reset()
	if err := WriteStateCSV(&buf, &StateReport{Label: "OH", State: radical}); err != nil {
		t.Fatal(err)
	}
	if strings.Contains(buf.String(), "NaN") {
		t.Errorf("CSV holds NaN:\n%s", buf.String())
	}
}

// Past every model, the text says so in words.
func TestRealGasOutsideText(t *testing.T) {
	st := realGasState(t, model.Builtin(), "N2 100%", 300, 1e9)
	var buf bytes.Buffer
	if err := WriteStateText(&buf, &StateReport{Label: "N2", State: st}); err != nil {
		t.Fatal(err)
	}
	if !strings.Contains(buf.String(), "outside every model here") {
		t.Errorf("N2 at 1 GPa: no 'outside every model here':\n%s", buf.String())
	}
}
