package analysis

import (
	"os"
	"testing"

	"coilmemo/spec"
)

func BenchmarkWorstCaseTorqueCoil(b *testing.B) {
	src, err := os.ReadFile("../examples/torque-coil.md")
	if err != nil {
		b.Fatal(err)
	}
	s, diags := spec.Parse("torque-coil.md", src)
	if len(diags) > 0 {
		b.Fatal(diags)
	}
	st := Analyse(s, Options{})
	b.ResetTimer()
	for range b.N {
		AnalyseWorstCase(s, st.Results, st.Limits)
	}
}
