package main

import (
	"os"
	"strings"
	"testing"
)

// The README's "Process calculations" examples are run, and every line
// they show must be in what the command prints now, so that the worked
// examples never drift from the program.
func TestReadmeProcessExamples(t *testing.T) {
	data, err := os.ReadFile("README.md")
	if err != nil {
		t.Fatal(err)
	}
	_, section, ok := strings.Cut(string(data), "## Process calculations\n")
	if !ok {
		t.Fatal("README has no Process calculations section")
	}
	section, _, _ = strings.Cut(section, "\n## ")
	blocks := strings.Split(section, "```\n")
	n := 0
	for i := 1; i < len(blocks); i += 2 {
		lines := strings.Split(strings.TrimRight(blocks[i], "\n"), "\n")
		cmd, ok := strings.CutPrefix(lines[0], "$ zmix ")
		if !ok {
			continue
		}
		cmd, _, _ = strings.Cut(cmd, " | ") // the shown part is filtered by sed or grep
		args := splitShell(cmd)
		code, stdout, stderr := zmix(t, args...)
		if code != 0 {
			t.Errorf("README example %q: exit %d: %s", lines[0], code, stderr)
			continue
		}
		for _, want := range lines[1:] {
			if strings.TrimSpace(want) != "" && !strings.Contains(stdout, want) {
				t.Errorf("README example %q shows %q, which the command no longer prints", lines[0], want)
			}
		}
		n++
	}
	if n < 7 {
		t.Errorf("checked %d README examples, want the 7 of the section", n)
	}
}
