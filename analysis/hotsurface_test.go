package analysis

import (
	"math"
	"os"
	"strings"
	"testing"

	"coilmemo/calc"
)

// hotSurfaceFinding is coil block i's hot-surface finding, or nil.
func hotSurfaceFinding(st *Study, i int) *Finding {
	for k, f := range st.Safety.Findings {
		if f.Kind == HotSurfaceFound && f.Coil == i {
			return &st.Safety.Findings[k]
		}
	}
	return nil
}

// The surface where the coil works is judged on the hottest corner of the
// tolerances. The torque coil's surface stays below 60 °C at nominal and
// passes it at the hot ambient of its orbit: each corner evaluated here in
// full (calc.Evaluate, not the corners' quick evaluation), its steady
// surface and the peak surface of its on/off cycle, gives the figure and
// the corner the in-service finding carries (people handle the coil on
// the ground, where it stays below 60 °C: TestHandlingAmbientVacuum).
func TestHotSurfaceAtWorstCorner(t *testing.T) {
	st := exampleStudy(t, "torque-coil.md")
	d, tol := st.Spec.Design, st.Spec.Tolerances
	nominal := st.Coils[0].Heat.SurfaceMax
	if !(nominal < HotSurface) {
		t.Fatalf("nominal surface %.2f °C: no test", calc.KelvinToCelsius(nominal))
	}
	worst, at := nominal, -1
	for h := range 1 << len(tol.Items) {
		heat := calc.Evaluate(CornerDesign(d, tol, uint32(h))).Coils[0].Heat
		ts := math.Max(heat.Steady.Surface, heat.Cycle.PeakSurface)
		if ts > worst {
			worst, at = ts, h
		}
	}
	var f *Finding
	for k, x := range st.Safety.Findings {
		if x.Kind == HotInService && x.Coil == 0 {
			f = &st.Safety.Findings[k]
		}
	}
	if f == nil {
		t.Fatalf("no in-service hot-surface finding; hottest corner %s at %.2f °C", st.WorstCase.CornerName(at), calc.KelvinToCelsius(worst))
	}
	if f.ServiceCorner != at || math.Abs(f.Service-worst) > 1e-9*worst || !(f.Service > HotSurface) {
		t.Errorf("finding %+v; want %.4f °C at corner %s", *f, calc.KelvinToCelsius(worst), st.WorstCase.CornerName(at))
	}
	if ts, h := st.HottestSurface(0); h != at || ts != f.Service {
		t.Errorf("HottestSurface %.4f K at %d; the finding %.4f K at %d", ts, h, f.Service, f.ServiceCorner)
	}
}

// On a duty cycle whose on-time is comparable with the winding's internal
// time constant the surface runs hotter than the duty-averaged steady
// state: the valve coil on for 200 s of every 800 s. The caution gives the
// periodic state's hottest surface, which lies between the duty-averaged
// steady surface, about which the cycle swings, and the continuously
// energised steady mean.
func TestHotSurfaceOfTheCycle(t *testing.T) {
	src, err := os.ReadFile("../examples/valve-actuator.md")
	if err != nil {
		t.Fatal(err)
	}
	st := studyOf(t, strings.Replace(string(src), "on-time              = 2 s", "on-time              = 200 s", 1))
	h := st.Results.Coils[0].Heat
	cont := st.Coils[0].Heat.Continuous
	f := hotSurfaceFinding(st, 0)
	if f == nil || !f.Cycle || f.AtCorner || f.Value != h.Cycle.PeakSurface {
		t.Fatalf("finding %+v; cycle's peak surface %.3f °C", f, calc.KelvinToCelsius(h.Cycle.PeakSurface))
	}
	if !(f.Value > h.Steady.Surface+5 && f.Value < cont.Mean) {
		t.Errorf("peak surface %.3f °C; duty-averaged steady surface %.3f °C, continuous mean %.3f °C",
			calc.KelvinToCelsius(f.Value), calc.KelvinToCelsius(h.Steady.Surface), calc.KelvinToCelsius(cont.Mean))
	}
}
