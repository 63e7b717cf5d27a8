package report

import (
	"bytes"
	"context"
	"encoding/csv"
	"encoding/json"
	"math"
	"slices"
	"strconv"
	"strings"
	"testing"

	"zmix/mixtures"
	"zmix/model"
)

// The keys the issue requires of every exported state.
var (
	requiredKeys = []string{
		"temperature_K", "pressure_Pa", "molar_mass_kg_mol", "density_kg_m3",
		"cp_J_molK", "cv_J_molK", "gamma", "sound_speed_m_s",
		"h_J_mol", "s_J_molK", "g_J_mol", "s_mix_J_molK", "species",
	}
	requiredSpeciesKeys = []string{"name", "x", "partial_pressure_Pa", "mu_J_mol", "s_J_molK", "cp_J_molK"}
)

func mustMixture(t *testing.T, text string, presPa float64) *mixtures.Mixture {
	t.Helper()
	b, err := mixtures.ParseBlend(text)
	if err != nil {
		t.Fatal(err)
	}
	m, err := b.Resolve(model.Builtin(), presPa)
	if err != nil {
		t.Fatal(err)
	}
	return m
}

func TestWriteStateJSONKeys(t *testing.T) {
	m := mustMixture(t, "SiH4 2%, H2 500ppm, N2 bal", 1.4e5)
	s, err := m.State(295.15, 1.4e5, mixtures.Options{})
	if err != nil {
		t.Fatal(err)
	}
	var buf bytes.Buffer
	if err := WriteStateJSON(&buf, &StateReport{State: &s, Gauge: true}); err != nil {
		t.Fatal(err)
	}
	var obj map[string]any
	if err := json.Unmarshal(buf.Bytes(), &obj); err != nil {
		t.Fatalf("output is not JSON: %v\n%s", err, buf.Bytes())
	}
	for _, k := range requiredKeys {
		if _, ok := obj[k]; !ok {
			t.Errorf("JSON lacks %q", k)
		}
	}
	checks := map[string]float64{
		"temperature_K": 295.15, "pressure_Pa": 1.4e5, "gamma": s.Gamma, "s_mix_J_molK": s.SMixJPerMolK,
		"h_J_mol": s.HJPerMol, "cp_J_kgK": s.CpJPerMolK / s.MolarMassKgPerMol,
	}
	for k, want := range checks {
		if got, _ := obj[k].(float64); got != want {
			t.Errorf("%s = %v, want %v", k, obj[k], want)
		}
	}
	if obj["pressure_given_as_gauge"] != true {
		t.Errorf("pressure_given_as_gauge = %v, want true", obj["pressure_given_as_gauge"])
	}
	species, _ := obj["species"].([]any)
	if len(species) != 3 {
		t.Fatalf("species = %v, want 3 entries", obj["species"])
	}
	for i, e := range species {
		sp, _ := e.(map[string]any)
		for _, k := range requiredSpeciesKeys {
			if _, ok := sp[k]; !ok {
				t.Errorf("species %d lacks %q", i, k)
			}
		}
		if sp["name"] != s.Species[i].Species.Formula || sp["x"] != s.Species[i].X {
			t.Errorf("species %d = %v, want %s x=%g", i, sp, s.Species[i].Species.Formula, s.Species[i].X)
		}
	}
}

func TestWriteSweepCSVAndJSON(t *testing.T) {
	m := mustMixture(t, "N2 78.08%, O2 20.95%, Ar 0.93%, CO2 0.04%", 1e5)
	sw := mixtures.Sweep{Var: mixtures.SweepTemperature, From: 300, To: 1500, Steps: 7}
	points := &SweepSource{Mix: m, Sweep: sw, FixedPresPa: 1e5}
	var buf bytes.Buffer
	if err := WriteSweepCSV(&buf, false, points); err != nil {
		t.Fatal(err)
	}
	rows, err := csv.NewReader(&buf).ReadAll()
	if err != nil {
		t.Fatal(err)
	}
	if len(rows) != 1+7 {
		t.Fatalf("%d rows, want a header and 7", len(rows))
	}
	header := rows[0]
	for _, k := range requiredKeys {
		if k == "species" {
			continue
		}
		if !slices.Contains(header, k) {
			t.Errorf("CSV header lacks %q", k)
		}
	}
	for _, c := range m.Components {
		for _, k := range requiredSpeciesKeys[1:] {
			if col := c.Species.Formula + "." + k; !slices.Contains(header, col) {
				t.Errorf("CSV header lacks %q", col)
			}
		}
	}

	// The CSV columns carry the JSON names: every scalar JSON key is a
	// column, and every species key is a FORMULA.key column.
	var recs []map[string]any
	buf.Reset()
	if err := WriteSweepJSON(&buf, false, points); err != nil {
		t.Fatal(err)
	}
	if err := json.Unmarshal(buf.Bytes(), &recs); err != nil || len(recs) != 7 {
		t.Fatalf("sweep JSON: %v, %d records; want a list of 7", err, len(recs))
	}
	var jsonCols []string
	for k := range recs[0] {
		if k != "species" {
			jsonCols = append(jsonCols, k)
		}
	}
	for _, e := range recs[0]["species"].([]any) {
		sp := e.(map[string]any)
		for k := range sp {
			if k != "name" {
				jsonCols = append(jsonCols, sp["name"].(string)+"."+k)
			}
		}
	}
	slices.Sort(jsonCols)
	csvCols := slices.Clone(header)
	slices.Sort(csvCols)
	if !slices.Equal(jsonCols, csvCols) {
		t.Errorf("CSV columns %q\ndiffer from JSON keys %q", csvCols, jsonCols)
	}

	// Every cell is a finite number (or the gauge flag), and each row
	// matches its JSON record.
	for i, row := range rows[1:] {
		for j, cell := range row {
			if header[j] == "pressure_given_as_gauge" {
				if cell != "false" {
					t.Errorf("row %d gauge flag %q", i, cell)
				}
				continue
			}
			x, err := strconv.ParseFloat(cell, 64)
			if err != nil || math.IsNaN(x) || math.IsInf(x, 0) {
				t.Errorf("row %d, %s = %q: not a finite number", i, header[j], cell)
			}
			if k := header[j]; !strings.Contains(k, ".") && recs[i][k] != x {
				t.Errorf("row %d, %s: CSV %v, JSON %v", i, k, x, recs[i][k])
			}
		}
	}
	if rows[1][slices.Index(header, "temperature_K")] != "300" || rows[7][slices.Index(header, "temperature_K")] != "1500" {
		t.Errorf("sweep ends in CSV: %q and %q, want 300 and 1500", rows[1][1], rows[7][1])
	}
}

// Chunks formatted on several cores come out in grid order, exactly as a
// one-core pass writes them.
func TestSweepChunksInOrder(t *testing.T) {
	m := mustMixture(t, "N2 78.08%, O2 20.95%, Ar 0.93%, CO2 0.04%", 1e5)
	src := &SweepSource{Mix: m, Sweep: mixtures.Sweep{Var: mixtures.SweepTemperature, From: 200, To: 2500, Steps: 3*chunkPoints + 5}, FixedPresPa: 1e5}
	var got bytes.Buffer
	if err := WriteSweepCSV(&got, false, src); err != nil {
		t.Fatal(err)
	}
	var want []byte
	err := src.Each(context.Background(), func(i int, s *mixtures.State) error {
		if i == 0 {
			var hb bytes.Buffer
			cw := csv.NewWriter(&hb)
			cw.Write(CSVHeader(nil, s))
			cw.Flush()
			want = append(want, hb.Bytes()...)
		}
		want = appendCSVRow(want, s, false)
		return nil
	})
	if err != nil {
		t.Fatal(err)
	}
	if !bytes.Equal(got.Bytes(), want) {
		t.Errorf("chunked CSV (%d bytes) differs from the one-core pass (%d bytes)", got.Len(), len(want))
	}
}

// A sweep the model cannot compute at some point is refused before a
// byte is written.
func TestSweepRefusedUpFront(t *testing.T) {
	m := mustMixture(t, "N2 1", 1e5)
	src := &SweepSource{Mix: m, Sweep: mixtures.Sweep{Var: mixtures.SweepTemperature, From: 300, To: 2e6, Steps: 2000}, FixedPresPa: 1e5}
	var b bytes.Buffer
	if err := WriteSweepJSON(&b, false, src); err == nil || b.Len() != 0 {
		t.Errorf("err %v after %d bytes, want an error and nothing written", err, b.Len())
	}
}

// The text table's widths come from each column's extremes, not from
// every cell: over a wide sweep, where figures change sign and magnitude,
// every row still lines up, and no column is wider than its widest cell.
func TestSweepTextAligned(t *testing.T) {
	m := mustMixture(t, "N2 bal, O2 10%, H2O 2%, NH3 500ppm, CO2 4%", 1e5)
	for _, sw := range []mixtures.Sweep{
		{Var: mixtures.SweepTemperature, From: 20, To: 3000, Steps: 1537, Log: true},
		{Var: mixtures.SweepPressure, From: 1e-3, To: 1e8, Steps: 1201},
	} {
		src := &SweepSource{Mix: m, Sweep: sw, FixedTempK: 300, FixedPresPa: 1e5}
		rep := &SweepReport{Label: "test", Mix: m, Sweep: sw, FixedTempK: 300, FixedPresPa: 1e5}
		var b bytes.Buffer
		if err := WriteSweepText(&b, rep, src); err != nil {
			t.Fatal(err)
		}
		lines := strings.Split(b.String(), "\n")
		var table []string
		for _, l := range lines[5:] {
			if l == "" {
				break
			}
			table = append(table, l)
		}
		if len(table) != sw.Steps+2 {
			t.Fatalf("%d table lines, want %d", len(table), sw.Steps+2)
		}
		n := Width(table[0])
		for i, l := range table {
			if Width(l) != n {
				t.Fatalf("%v sweep: line %d is %d cells, the header %d:\n%s\n%s", sw.Var, i, Width(l), n, table[0], l)
			}
		}
		// Some data row starts its first cell in the first column after
		// the indent: no column is padded past its widest cell.
		for k := 2; k < len(table); k++ {
			if table[k][2] != ' ' {
				break
			}
			if k == len(table)-1 {
				t.Errorf("%v sweep: the first column is padded past its widest cell", sw.Var)
			}
		}
	}
}
