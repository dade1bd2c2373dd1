package analysis

import (
	"os"
	"path/filepath"
	"strings"
	"testing"

	"golang.org/x/tools/txtar"

	"coilmemo/calc"
	"coilmemo/spec"
)

// Stage benchmarks of the analysis over every example in examples/, one
// sub-benchmark per example (per coil where the stage is per coil):
//
//	go test -run '^$' -bench 'Stage' ./analysis

type benchCase struct {
	name string
	s    *spec.Spec
	r    calc.Results // calc.Evaluate of the (sized) design
}

func benchCases(b *testing.B) []benchCase {
	b.Helper()
	files, err := filepath.Glob("../examples/*.md")
	if err != nil || len(files) == 0 {
		b.Fatalf("no examples: %v", err)
	}
	var out []benchCase
	for _, f := range files {
		src, err := os.ReadFile(f)
		if err != nil {
			b.Fatal(err)
		}
		out = append(out, benchSpec(b, strings.TrimSuffix(filepath.Base(f), ".md"), src))
	}
	return out
}

func benchSpec(b *testing.B, name string, src []byte) benchCase {
	b.Helper()
	s, diags := spec.Parse(name+".md", src)
	if len(diags) > 0 {
		b.Fatal(diags)
	}
	if s.Size != nil {
		if _, s, diags = SizeDesign(s); len(diags) > 0 {
			b.Fatal(diags)
		}
	}
	return benchCase{name, s, calc.Evaluate(s.Design)}
}

// goldenCase reads the spec of a golden case (testdata/golden/NAME.txtar).
func goldenCase(b *testing.B, name string) benchCase {
	b.Helper()
	a, err := txtar.ParseFile("../testdata/golden/" + name + ".txtar")
	if err != nil {
		b.Fatal(err)
	}
	for _, f := range a.Files {
		if f.Name == "spec.md" {
			return benchSpec(b, name, f.Data)
		}
	}
	b.Fatalf("%s: no spec.md", name)
	return benchCase{}
}

// BenchmarkStageAnalyse: the whole analysis of a parsed (and sized) spec.
func BenchmarkStageAnalyse(b *testing.B) {
	for _, c := range benchCases(b) {
		b.Run(c.name, func(b *testing.B) {
			for range b.N {
				Analyse(c.s, Options{})
			}
		})
	}
}

// BenchmarkStageEvaluate: calc.Evaluate over the design.
func BenchmarkStageEvaluate(b *testing.B) {
	for _, c := range benchCases(b) {
		b.Run(c.name, func(b *testing.B) {
			for range b.N {
				calc.Evaluate(c.s.Design)
			}
		})
	}
}

// BenchmarkStageVerify: the independent verification checks.
func BenchmarkStageVerify(b *testing.B) {
	for _, c := range benchCases(b) {
		b.Run(c.name, func(b *testing.B) {
			for range b.N {
				Verify(c.s.Design, c.r)
			}
		})
	}
}

// BenchmarkStageCoilMap: each coil's |B| map (grid, field, magnitudes).
func BenchmarkStageCoilMap(b *testing.B) {
	for _, c := range benchCases(b) {
		for i, co := range c.s.Design.Coils {
			cs := StudyCoil(co, c.r.Coils[i], c.s.Design.Conditions)
			b.Run(c.name+"/"+co.Name, func(b *testing.B) {
				for range b.N {
					coilMap(co, c.r.Coils[i], cs, 0)
				}
			})
		}
	}
}

// BenchmarkStageAllCoilsMap: the map of the whole set, for the examples of
// two or more coils and the golden case of three coupled coils.
func BenchmarkStageAllCoilsMap(b *testing.B) {
	for _, c := range append(benchCases(b), goldenCase(b, "coupled-coils")) {
		if len(c.s.Design.Coils) < 2 {
			continue
		}
		b.Run(c.name, func(b *testing.B) {
			for range b.N {
				allCoilsMap(c.s.Design, c.r, 0)
			}
		})
	}
}

// BenchmarkStageDipoleSearch: the distances beyond which the dipole
// approximation holds (calc.DipoleDistances), per coil.
func BenchmarkStageDipoleSearch(b *testing.B) {
	for _, c := range benchCases(b) {
		for i, co := range c.s.Design.Coils {
			cr := c.r.Coils[i]
			b.Run(c.name+"/"+co.Name, func(b *testing.B) {
				for range b.N {
					calc.DipoleDistances(co, cr.Winding, cr.Current)
				}
			})
		}
	}
}

// BenchmarkStageInductance: the coil's self-inductance
// (calc.CoilInductance), per coil.
func BenchmarkStageInductance(b *testing.B) {
	for _, c := range benchCases(b) {
		for i, co := range c.s.Design.Coils {
			w := c.r.Coils[i].Winding
			b.Run(c.name+"/"+co.Name, func(b *testing.B) {
				for range b.N {
					calc.CoilInductance(co, w)
				}
			})
		}
	}
}

// BenchmarkStageStudyCoil: the per-coil study (layout drawing data, axis
// profile, map, pair curves, derivation values, warm-up).
func BenchmarkStageStudyCoil(b *testing.B) {
	for _, c := range benchCases(b) {
		for i, co := range c.s.Design.Coils {
			b.Run(c.name+"/"+co.Name, func(b *testing.B) {
				for range b.N {
					StudyCoil(co, c.r.Coils[i], c.s.Design.Conditions)
				}
			})
		}
	}
}
