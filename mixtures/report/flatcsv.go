package report

import (
	"bytes"
	"encoding/csv"
	"encoding/json"
	"fmt"
	"io"
	"strconv"
)

// The process, hazard and release results are nested: scalars, tables of
// rows (stages, fill steps, streams, species) and lists of lines (notes,
// cautions, sources). Their JSON writers are the one place that names
// every figure; the CSV of the same result is that JSON flattened into
// one long table, so the two can never disagree and nothing in the JSON
// is missing from the CSV.
//
// The table has four columns:
//
//	section  "" for a top-level figure, else the key of the table, object
//	         or list it sits in ("stages", "outlet", "cautions")
//	row      the 1-based row of a table or list, "" otherwise
//	name     the figure's JSON name (with its SI unit), dotted for deeper
//	         nesting; "" for an item of a list of lines
//	value    the number as the JSON has it, the text, true/false, or ""
//	         for null
//
// A spreadsheet filters it by section and name; a script picks a figure
// with one match on the name.

// FlatCSVHeader is the header row of a flattened result.
var FlatCSVHeader = []string{"section", "row", "name", "value"}

// WriteFlatCSV writes the JSON object js as the long CSV table above.
func WriteFlatCSV(w io.Writer, js []byte) error {
	dec := json.NewDecoder(bytes.NewReader(js))
	dec.UseNumber()
	f := flattener{cw: csv.NewWriter(w), dec: dec}
	if err := f.cw.Write(FlatCSVHeader); err != nil {
		return err
	}
	tok, err := dec.Token()
	if err != nil {
		return err
	}
	if d, ok := tok.(json.Delim); !ok || d != '{' {
		return fmt.Errorf("flat CSV: want a JSON object, got %v", tok)
	}
	for dec.More() {
		key, err := f.key()
		if err != nil {
			return err
		}
		if err := f.top(key); err != nil {
			return err
		}
	}
	if tok, err := dec.Token(); err != nil || tok != json.Delim('}') {
		return fmt.Errorf("flat CSV: the JSON object is not closed")
	}
	f.cw.Flush()
	return f.cw.Error()
}

type flattener struct {
	cw  *csv.Writer
	dec *json.Decoder
}

// key reads an object member's name.
func (f *flattener) key() (string, error) {
	tok, err := f.dec.Token()
	if err != nil {
		return "", err
	}
	k, ok := tok.(string)
	if !ok {
		return "", fmt.Errorf("flat CSV: want a member name, got %v", tok)
	}
	return k, nil
}

// top writes the value of a top-level member.
func (f *flattener) top(key string) error {
	tok, err := f.dec.Token()
	if err != nil {
		return err
	}
	d, ok := tok.(json.Delim)
	if !ok {
		return f.row("", "", key, tok)
	}
	switch d {
	case '{':
		return f.object(key, "", "")
	case '[':
		for i := 1; f.dec.More(); i++ {
			if err := f.value(key, strconv.Itoa(i), ""); err != nil {
				return err
			}
		}
		_, err := f.dec.Token() // ]
		return err
	}
	return fmt.Errorf("flat CSV: unexpected %v", d)
}

// value writes the next value, under section and row, named name.
func (f *flattener) value(section, row, name string) error {
	tok, err := f.dec.Token()
	if err != nil {
		return err
	}
	d, ok := tok.(json.Delim)
	if !ok {
		return f.row(section, row, name, tok)
	}
	switch d {
	case '{':
		return f.object(section, row, name)
	case '[':
		for i := 1; f.dec.More(); i++ {
			if err := f.value(section, row, join(name, strconv.Itoa(i))); err != nil {
				return err
			}
		}
		_, err := f.dec.Token() // ]
		return err
	}
	return fmt.Errorf("flat CSV: unexpected %v", d)
}

// object writes the members of an object whose '{' has been read.
func (f *flattener) object(section, row, prefix string) error {
	for f.dec.More() {
		k, err := f.key()
		if err != nil {
			return err
		}
		if err := f.value(section, row, join(prefix, k)); err != nil {
			return err
		}
	}
	_, err := f.dec.Token() // }
	return err
}

// row writes one scalar.
func (f *flattener) row(section, row, name string, tok json.Token) error {
	var v string
	switch x := tok.(type) {
	case nil:
		v = ""
	case bool:
		v = strconv.FormatBool(x)
	case json.Number:
		v = x.String()
	case string:
		v = x
	default:
		return fmt.Errorf("flat CSV: unexpected %v", tok)
	}
	return f.cw.Write([]string{section, row, name, v})
}

func join(prefix, name string) string {
	if prefix == "" {
		return name
	}
	return prefix + "." + name
}

// WriteProcessCSV writes a process result as the long CSV table of its
// JSON (see WriteFlatCSV).
func WriteProcessCSV(w io.Writer, r *ProcessReport) error {
	return flatFromJSON(w, func(b *bytes.Buffer) error { return WriteProcessJSON(b, r) })
}

// WriteHazardCSV writes a hazard classification as the long CSV table of
// its JSON.
func WriteHazardCSV(w io.Writer, r *HazardReport) error {
	return flatFromJSON(w, func(b *bytes.Buffer) error { return WriteHazardJSON(b, r) })
}

// WriteReleaseCSV writes a release into a room as the long CSV table of
// its JSON.
func WriteReleaseCSV(w io.Writer, r *ReleaseReport) error {
	return flatFromJSON(w, func(b *bytes.Buffer) error { return WriteReleaseJSON(b, r) })
}

func flatFromJSON(w io.Writer, writeJSON func(*bytes.Buffer) error) error {
	var b bytes.Buffer
	if err := writeJSON(&b); err != nil {
		return err
	}
	return WriteFlatCSV(w, b.Bytes())
}
