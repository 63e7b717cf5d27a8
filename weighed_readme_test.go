package main

import (
	"os"
	"strings"
	"testing"
)

// The README's worked example of a composition from weighed masses is
// run, and every line it shows must be in what the command prints now.
func TestReadmeWeighedExample(t *testing.T) {
	data, err := os.ReadFile("README.md")
	if err != nil {
		t.Fatal(err)
	}
	_, section, ok := strings.Cut(string(data), "### Composition from weighed masses\n")
	if !ok {
		t.Fatal("README has no section on the composition from weighed masses")
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
		cmd, _, _ = strings.Cut(cmd, " | ") // the shown part is filtered by sed
		code, stdout, stderr := zmix(t, splitShell(cmd)...)
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
	if n == 0 {
		t.Error("no example found in the section")
	}
}
