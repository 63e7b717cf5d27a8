package mixtures

import (
	"errors"
	"fmt"
	"os"
	"path/filepath"
	"reflect"
	"strings"
	"testing"
)

// sampleFile is a blend file with every field set, amounts typed with
// uneven spacing and case, as a user would leave them.
func sampleFile() *BlendFile {
	return &BlendFile{
		Format: BlendFormat,
		Name:   "Kestrel Ridge pilot plant, purge gas <B-2> & spare",
		Note:   "Invented scenario for tests.\nSecond line of the note.",
		Components: []FileComponent{
			{Species: "CO2", Amount: "2.50 wt%"},
			{Species: "Ar", Amount: "1.0 %"},
			{Species: "H2", Amount: "500 PPM"},
			{Species: "O2", Amount: "0.0100"},
			{Species: "N2", Amount: "bal"},
		},
		Temperature:      "-5.0 °C",
		Pressure:         "2.5 barg",
		StandardPressure: "1 atm",
	}
}

func TestBlendFileRoundTrip(t *testing.T) {
	dir := t.TempDir()
	path := filepath.Join(dir, "purge.json")
	want := sampleFile()
	if err := want.Save(path); err != nil {
		t.Fatal(err)
	}
	got, err := LoadBlendFile(path)
	if err != nil {
		t.Fatal(err)
	}
	if !reflect.DeepEqual(got, want) {
		t.Errorf("loaded %+v\nwant   %+v", got, want)
	}
	// Saving what was loaded writes the same bytes.
	first, _ := os.ReadFile(path)
	if err := got.Save(path); err != nil {
		t.Fatal(err)
	}
	second, _ := os.ReadFile(path)
	if string(first) != string(second) {
		t.Errorf("second save differs:\n%s\n---\n%s", first, second)
	}
	// The file is meant to be read and edited by hand.
	for _, s := range []string{`"amount": "500 PPM"`, `<B-2> & spare`, `"temperature": "-5.0 °C"`} {
		if !strings.Contains(string(first), s) {
			t.Errorf("file does not hold %s as typed:\n%s", s, first)
		}
	}
	if m, err := got.Parse(); err != nil || len(m.Items) != 5 {
		t.Errorf("Parse of the loaded file: %v", err)
	}
}

// FileFromBlend keeps species and amounts as typed in blend text.
func TestFileFromBlend(t *testing.T) {
	b, err := ParseBlend("SiH4 2%, H2 500ppm, n2 bal")
	if err != nil {
		t.Fatal(err)
	}
	f := FileFromBlend(b)
	want := []FileComponent{{"SiH4", "2%"}, {"H2", "500ppm"}, {"n2", "bal"}}
	if f.Format != BlendFormat || !reflect.DeepEqual(f.Components, want) {
		t.Errorf("FileFromBlend = %+v, want components %+v", f, want)
	}
	if f.BlendText() != "SiH4 2%, H2 500ppm, n2 bal" {
		t.Errorf("BlendText = %q", f.BlendText())
	}
}

// Saves go through a temporary file and a rename: nothing is left behind,
// and an existing file is replaced whole.
func TestSaveIsAtomic(t *testing.T) {
	dir := t.TempDir()
	path := filepath.Join(dir, "blend.json")
	long := strings.Repeat("old content that is much longer than the new file\n", 200)
	if err := os.WriteFile(path, []byte(long), 0o644); err != nil {
		t.Fatal(err)
	}
	f := &BlendFile{Components: []FileComponent{{"N2", "bal"}}}
	if err := f.Save(path); err != nil {
		t.Fatal(err)
	}
	data, err := os.ReadFile(path)
	if err != nil {
		t.Fatal(err)
	}
	if strings.Contains(string(data), "old content") || !strings.HasSuffix(string(data), "}\n") {
		t.Errorf("file not replaced whole:\n%s", data)
	}
	if _, err := LoadBlendFile(path); err != nil {
		t.Errorf("reload: %v", err)
	}
	assertOnlyFiles(t, dir, "blend.json")
}

// A save that fails leaves what was there untouched, and no temporary
// file behind.
func TestFailedSaveKeepsOldFile(t *testing.T) {
	dir := t.TempDir()
	path := filepath.Join(dir, "blend.json")
	old := sampleFile()
	if err := old.Save(path); err != nil {
		t.Fatal(err)
	}
	oldData, _ := os.ReadFile(path)

	// Into a directory that does not exist.
	missing := filepath.Join(dir, "no-such-dir", "blend.json")
	err := sampleFile().Save(missing)
	if err == nil || !strings.Contains(err.Error(), missing) {
		t.Errorf("save into a missing directory: error %v, want one naming %s", err, missing)
	}

	// Over a directory: the temporary file is written, the rename fails.
	busy := filepath.Join(dir, "busy")
	if err := os.MkdirAll(filepath.Join(busy, "inside"), 0o755); err != nil {
		t.Fatal(err)
	}
	if err := sampleFile().Save(busy); err == nil {
		t.Error("save over a directory: no error")
	}
	if _, err := os.Stat(filepath.Join(busy, "inside")); err != nil {
		t.Errorf("directory harmed by a failed save: %v", err)
	}

	// A blend that could not be loaded again is refused before writing.
	bad := sampleFile()
	bad.Components[1].Amount = "lots"
	if err := bad.Save(path); err == nil || !strings.Contains(err.Error(), "lots") {
		t.Errorf("save of an unreadable blend: error %v, want one naming the amount", err)
	}
	bad = sampleFile()
	bad.Temperature = "-300 C"
	if err := bad.Save(path); err == nil {
		t.Error("save of a temperature below 0 K: no error")
	}

	if data, _ := os.ReadFile(path); string(data) != string(oldData) {
		t.Errorf("old file changed by failed saves:\n%s", data)
	}
	assertOnlyFiles(t, dir, "blend.json", "busy")
}

func assertOnlyFiles(t *testing.T, dir string, names ...string) {
	t.Helper()
	entries, err := os.ReadDir(dir)
	if err != nil {
		t.Fatal(err)
	}
	var got []string
	for _, e := range entries {
		got = append(got, e.Name())
	}
	if !reflect.DeepEqual(got, names) {
		t.Errorf("directory holds %q, want %q", got, names)
	}
}

// A corrupt file gives an error that names the file and the line, on one
// line.
func TestLoadBlendFileErrors(t *testing.T) {
	good := "{\n" + // 1
		"  \"format\": \"zmix-blend/1\",\n" + // 2
		"  \"components\": [\n" + // 3
		"    {\"species\": \"N2\", \"amount\": \"bal\"},\n" + // 4
		"    {\"species\": \"O2\", \"amount\": \"21%\"}\n" + // 5
		"  ],\n" + // 6
		"  \"temperature\": \"25 C\",\n" + // 7
		"  \"pressure\": \"1 atm\"\n" + // 8
		"}\n" // 9
	if _, err := LoadBlendFile(writeTemp(t, good)); err != nil {
		t.Fatalf("good file: %v", err)
	}
	cases := []struct {
		name     string
		text     string
		line     int // 0 if the error has no line (the whole file)
		mentions string
	}{
		{"syntax error", strings.Replace(good, `"amount": "21%"}`, `"amount": 21%}`, 1), 5, ""},
		{"missing comma", strings.Replace(good, `"bal"},`, `"bal"}`, 1), 5, ""},
		{"cut short", good[:len(good)/2], 1 + strings.Count(strings.TrimRight(good[:len(good)/2], " \n"), "\n"), "cut short"},
		{"unknown field", strings.Replace(good, `"temperature"`, `"temprature"`, 1), 7, "temprature"},
		{"unknown component field", strings.Replace(good, `"amount": "21%"`, `"amont": "21%"`, 1), 5, "amont"},
		{"wrong type", strings.Replace(good, `"pressure": "1 atm"`, `"pressure": 101325`, 1), 8, "pressure"},
		{"trailing data", good + "{\"format\": \"zmix-blend/1\"}\n", 10, "after"},
		{"wrong format", strings.Replace(good, "zmix-blend/1", "zmix-blend/9", 1), 2, "zmix-blend/9"},
		{"no components", strings.Replace(good, "    {\"species\": \"N2\", \"amount\": \"bal\"},\n    {\"species\": \"O2\", \"amount\": \"21%\"}\n", "", 1), 3, "no components"},
		{"bad amount", strings.Replace(good, `"21%"`, `"21 furlongs"`, 1), 5, "furlongs"},
		{"separator in an amount", strings.Replace(good, `"21%"`, `"0,21"`, 1), 5, "0,21"},
		{"species with a space", strings.Replace(good, `"O2"`, `"O2 21%, Ar"`, 1), 5, "O2 21%, Ar"},
		{"two balances", strings.Replace(good, `"21%"`, `"bal"`, 1), 5, "balance"},
		{"bad temperature", strings.Replace(good, `"25 C"`, `"-300 C"`, 1), 7, "-300 C"},
		{"bad pressure", strings.Replace(good, `"1 atm"`, `"1 furlong"`, 1), 8, "furlong"},
		{"bad standard pressure", strings.Replace(good, `"pressure": "1 atm"`, `"pressure": "1 atm", "standard_pressure": "2 bar"`, 1), 8, "2 bar"},
		{"empty file", "", 0, "empty"},
		{"not JSON", "N2 79%, O2 21%\n", 1, ""},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			path := writeTemp(t, c.text)
			_, err := LoadBlendFile(path)
			if err == nil {
				t.Fatal("no error")
			}
			msg := err.Error()
			if !strings.Contains(msg, path) {
				t.Errorf("error %q does not name the file", msg)
			}
			if at := fmt.Sprintf("%s:%d:", path, c.line); c.line > 0 && !strings.Contains(msg, at) {
				t.Errorf("error %q does not point at %s", msg, at)
			}
			if !strings.Contains(msg, c.mentions) {
				t.Errorf("error %q does not mention %q", msg, c.mentions)
			}
			if strings.Contains(msg, "\n") {
				t.Errorf("error %q spans lines", msg)
			}
		})
	}
	missing := filepath.Join(t.TempDir(), "none.json")
	if _, err := LoadBlendFile(missing); err == nil || !strings.Contains(err.Error(), missing) || !errors.Is(err, os.ErrNotExist) {
		t.Errorf("missing file: error %v, want one naming %s and wrapping ErrNotExist", err, missing)
	}
}

func writeTemp(t *testing.T, text string) string {
	t.Helper()
	path := filepath.Join(t.TempDir(), "blend.json")
	if err := os.WriteFile(path, []byte(text), 0o644); err != nil {
		t.Fatal(err)
	}
	return path
}

// The demo file is a valid blend file that survives a save and load.
func TestDemoFileRoundTrip(t *testing.T) {
	path := filepath.Join(t.TempDir(), "demo.json")
	if err := DemoFile().Save(path); err != nil {
		t.Fatal(err)
	}
	got, err := LoadBlendFile(path)
	if err != nil {
		t.Fatal(err)
	}
	if !reflect.DeepEqual(got, DemoFile()) {
		t.Errorf("demo file changed in a round trip: %+v", got)
	}
}
