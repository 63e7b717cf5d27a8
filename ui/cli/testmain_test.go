package cli

import (
	"fmt"
	"os"
	"testing"
)

// TestMain runs the tests from the repository's root, so that the paths
// in the tests, in the golden files' arguments and in the README's
// examples read as a user types them in a checkout (testdata/...,
// README.md).
//
// A fuzzing worker is started from the directory its coordinator has
// moved to, the root already, and stays there.
func TestMain(m *testing.M) {
	if _, err := os.Stat("ui/cli"); err == nil {
		os.Exit(m.Run())
	}
	if err := os.Chdir("../.."); err != nil {
		fmt.Fprintln(os.Stderr, "cli tests: cannot go to the repository root:", err)
		os.Exit(1)
	}
	if _, err := os.Stat("go.mod"); err != nil {
		fmt.Fprintln(os.Stderr, "cli tests: ../.. is not the repository root (no go.mod)")
		os.Exit(1)
	}
	os.Exit(m.Run())
}
