package analysis

import (
	"math"
	"strings"
	"testing"

	"coilmemo/calc"
)

// Maxwell's formula for unequal circles: equal circles give the
// equal-radius form, and a small circle of radius a at the centre of a
// large one of radius ρ links μ0 π a²/(2ρ) per ampere (the large loop's
// centre field times the small one's area), to relative order (a/ρ)².
func TestRingMutualAB(t *testing.T) {
	for _, u := range []float64{1e-4, 0.01, 0.3} {
		if got, want := ringMutualAB(0.05, 0.05, u), ringMutual(0.05, u); math.Abs(got-want) > 1e-12*want {
			t.Errorf("u = %g: unequal-radius form %g, equal-radius form %g", u, got, want)
		}
	}
	a, rho := 0.01, 10.0
	want := calc.Mu0 * math.Pi * a * a / (2 * rho)
	if got := ringMutualAB(a, rho, 0); math.Abs(got/want-1) > 2*(a/rho)*(a/rho) {
		t.Errorf("small loop in a large one: M = %g, want %g", got, want)
	}
}

// The search coil's verification: the long rod's row is a bracket of its
// three factors, there is no reciprocity row (one expression of the slice
// model read twice), and the receiver has its sensitivity, self-resonance
// and band-noise rows, each against a method named in its row.
func TestSearchCoilChecks(t *testing.T) {
	st := exampleStudy(t, "search-coil.md")
	seen := map[string]bool{}
	for _, k := range st.Checks {
		switch {
		case strings.Contains(k.Name, "reciprocity"):
			t.Errorf("a reciprocity row: %+v", k)
		case strings.Contains(k.Name, "long rod"):
			seen["bracket"] = true
			if !k.Bracket || !(k.Low < k.High) || k.Pass != (k.Low < k.Expected && k.Expected < k.High) {
				t.Errorf("long-rod row not a bracket: %+v", k)
			}
		case strings.HasPrefix(k.Name, "sensitivity"), strings.HasPrefix(k.Name, "self-resonance"), strings.HasPrefix(k.Name, "band noise"):
			seen[strings.Fields(k.Name)[0]] = true
			if !k.Pass || k.Reference == "" || k.Reference == k.Method {
				t.Errorf("%s: %+v", k.Name, k)
			}
		}
	}
	for _, w := range []string{"bracket", "sensitivity", "self-resonance", "band"} {
		if !seen[w] {
			t.Errorf("no %s row among %d checks", w, len(st.Checks))
		}
	}
}

// A check that has lost its independence fails: the zero-phase search of
// the self-resonance finds a wrong capacitance's frequency, the loop's
// flux linkage a wrong area's.
func TestReceiverChecksCatchAWrongFigure(t *testing.T) {
	st := exampleStudy(t, "search-coil.md")
	d := st.Spec.Design
	air := calc.Evaluate(d)
	kinds := studyKinds(d, air)
	for i, k := range kinds {
		if k.Receiver == nil {
			continue
		}
		rec := *k.Receiver
		rec.SelfResonance *= 1.001
		rec.BandNoiseField *= 1.001
		k.Receiver = &rec
		cr := air.Coils[i]
		cr.Winding.AreaSum *= 1.001
		for _, ch := range receiverChecks(d.Coils[i], cr, k) {
			if ch.Pass {
				t.Errorf("%s passes a figure 0.1 %% off: diff %g, tol %g", ch.Name, ch.RelDiff, ch.Tolerance)
			}
		}
	}
}
