package report

import (
	"bytes"
	"encoding/csv"
	"reflect"
	"testing"
)

// Every scalar of the JSON is one row, in order, with its section, row
// and dotted name; null is an empty cell; numbers keep the JSON's digits.
func TestWriteFlatCSV(t *testing.T) {
	js := `{
  "process": "compress",
  "power_W": 51877.1,
  "flag": true,
  "missing": null,
  "stages": [
    {"stage": 1, "t2_K": 392.465},
    {"stage": 2, "t2_K": 405.499, "z": {"in": 1.01, "out": 1.02}}
  ],
  "outlet": {"temperature_K": 300, "x": [0.5, 0.5]},
  "cautions": ["hot gas", "with, a comma"]
}`
	want := [][]string{
		{"section", "row", "name", "value"},
		{"", "", "process", "compress"},
		{"", "", "power_W", "51877.1"},
		{"", "", "flag", "true"},
		{"", "", "missing", ""},
		{"stages", "1", "stage", "1"},
		{"stages", "1", "t2_K", "392.465"},
		{"stages", "2", "stage", "2"},
		{"stages", "2", "t2_K", "405.499"},
		{"stages", "2", "z.in", "1.01"},
		{"stages", "2", "z.out", "1.02"},
		{"outlet", "", "temperature_K", "300"},
		{"outlet", "", "x.1", "0.5"},
		{"outlet", "", "x.2", "0.5"},
		{"cautions", "1", "", "hot gas"},
		{"cautions", "2", "", "with, a comma"},
	}
	var b bytes.Buffer
	if err := WriteFlatCSV(&b, []byte(js)); err != nil {
		t.Fatal(err)
	}
	got, err := csv.NewReader(&b).ReadAll()
	if err != nil {
		t.Fatalf("the output is not CSV: %v", err)
	}
	if !reflect.DeepEqual(got, want) {
		t.Errorf("got\n%q\nwant\n%q", got, want)
	}
}

func TestWriteFlatCSVRefusesNonObject(t *testing.T) {
	for _, js := range []string{`[1, 2]`, `3`, `{"a": 1`} {
		if err := WriteFlatCSV(&bytes.Buffer{}, []byte(js)); err == nil {
			t.Errorf("%s: no error", js)
		}
	}
}
