package safety

import "testing"

var (
	benchResult  Result
	benchRelease ReleaseResult
)

// BenchmarkClassify times the classification of a ten-species fab blend,
// which the workbench redoes on every recipe change.
func BenchmarkClassify(b *testing.B) {
	parts := blend(b, "SiH4", 0.02, "PH3", 0.001, "NH3", 0.05, "H2", 0.1, "CH4", 0.05,
		"HCl", 0.01, "Cl2", 0.001, "Ar", 0.2, "He", 0.1, "N2", 0.468)
	for b.Loop() {
		benchResult = Classify(parts)
	}
}

// BenchmarkReleaseSolve times a continuous release with its time course.
func BenchmarkReleaseSolve(b *testing.B) {
	r := Release{Parts: blend(b, "SiH4", 0.02, "PH3", 0.001, "N2", 0.979), RoomM3: 60, RateM3PerS: 1e-3, VentM3PerS: 0.1}
	for b.Loop() {
		benchRelease = r.Solve()
	}
}
