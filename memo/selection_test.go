package memo

import (
	"strings"
	"testing"

	"coilmemo/analysis"
	"coilmemo/spec"
)

// A choice at the end of a free range is pointed out; one inside is not.
func TestEdgeText(t *testing.T) {
	s := &spec.Size{TurnsLo: 20, TurnsHi: 400, TurnsLine: 3, WireLine: 4,
		Wires:  []spec.WireChoice{{Gauge: 20}, {Gauge: 25}, {Gauge: 30}},
		Ranges: []spec.FreeRange{{Key: "radial-build", Lo: 0, Hi: 0.01}}}
	sz := &analysis.Sizing{Size: s, Chosen: analysis.Candidate{Turns: 400, WireIndex: 1, Values: []float64{0.004}}}
	if got := edgeText(sz); !strings.Contains(got, "the most turns allowed (400)") || strings.Contains(got, "wire") {
		t.Errorf("at the top of the turns: %q", got)
	}
	sz.Chosen = analysis.Candidate{Turns: 200, WireIndex: 2, Wire: spec.WireChoice{Gauge: 30}, Values: []float64{0.01}}
	if got := edgeText(sz); !strings.Contains(got, "the thinnest wire listed (AWG 30)") || !strings.Contains(got, "top of the radial build range") {
		t.Errorf("thinnest wire, full depth: %q", got)
	}
	sz.Chosen = analysis.Candidate{Turns: 200, WireIndex: 1, Values: []float64{0.004}}
	if got := edgeText(sz); got != "" {
		t.Errorf("inside every range: %q", got)
	}
}
