package analysis

import (
	"math"
	"os"
	"strings"
	"testing"

	"coilmemo/calc"
)

// A torquer works in vacuum and is touched on the ground: its hot surface
// is judged in a room at 25 °C, the ambient tolerance (its orbit's range)
// not applied. The handling figure is found again by calc.Evaluate in
// full on the corner's design with the ambient replaced; it lies below the
// service worst corner (60 °C ambient) and its rise above the ambient
// stays close to the nominal design's rise at 20 °C.
func TestHandlingAmbientVacuum(t *testing.T) {
	st := exampleStudy(t, "torque-coil.md")
	hd := st.Safety.Handling
	if hd.Service || hd.Stated || !hd.AmbientHeld || math.Abs(calc.KelvinToCelsius(hd.Ambient)-25) > 1e-9 {
		t.Fatalf("handling %+v: want a room at 25 °C, the ambient tolerance held", hd)
	}
	ws := hd.Surface[0]
	if ws.Corner < 0 {
		t.Fatalf("no corner gives the hottest handling surface: %+v", ws)
	}
	d := st.WorstCase.Corners[ws.Corner].Design
	d.Conditions.Ambient = hd.Ambient
	r := calc.Evaluate(d)
	want, _ := surfaceMaxOf(r.Coils[0].Heat)
	if math.Abs(ws.Max-want) > 0.01 {
		t.Errorf("handling surface %.4g K, calc.Evaluate at the corner %.4g K", ws.Max, want)
	}
	service, _ := st.HottestSurface(0)
	if !(ws.Max < service) {
		t.Errorf("handling %.4g K not below the service worst %.4g K", ws.Max, service)
	}
	nominal := st.Coils[0].Heat.SurfaceMax
	rise20, rise25 := nominal-st.Spec.Design.Conditions.Ambient, hd.Nominal[0]-hd.Ambient
	if math.Abs(rise25-rise20) > 0.15*rise20 {
		t.Errorf("rise above ambient %.3g K at 25 °C against %.3g K at 20 °C", rise25, rise20)
	}
	for _, f := range st.Safety.Findings {
		if f.Kind == HotSurfaceFound {
			t.Errorf("hot-surface caution at %.4g K, though the handling surface stays below 60 °C", f.Value)
		}
	}
	found := false
	for _, f := range st.Safety.Findings {
		found = found || (f.Kind == HotInService && f.Service == service)
	}
	if !found {
		t.Errorf("no note of the %.4g K surface in service", service)
	}
}

// A stated handling-ambient is used as given; a coil in air without one is
// judged where it works (the results as computed).
func TestHandlingAmbientStated(t *testing.T) {
	src, err := os.ReadFile("../examples/valve-actuator.md")
	if err != nil {
		t.Fatal(err)
	}
	st := studyOf(t, string(src))
	hd := st.Safety.Handling
	if !hd.Service || hd.Ambient != st.Spec.Design.Conditions.Ambient || hd.Nominal[0] != st.Coils[0].Heat.SurfaceMax {
		t.Errorf("valve: handling %+v, want the working environment's results", hd)
	}
	hot := strings.Replace(string(src), "orientation = horizontal", "orientation = horizontal\nhandling-ambient = 20 degC", 1)
	st2 := studyOf(t, hot)
	hd2 := st2.Safety.Handling
	if !hd2.Stated || hd2.Service || math.Abs(calc.KelvinToCelsius(hd2.Ambient)-20) > 1e-9 {
		t.Fatalf("stated: handling %+v", hd2)
	}
	// 20 K cooler surroundings: the surface is cooler, by less than the
	// 20 K (the resistance falls with it, so under voltage drive the power
	// and the rise above the ambient grow a little) and by more than half
	// of it
	drop := hd.Nominal[0] - hd2.Nominal[0]
	if !(drop > 10 && drop < 20*1.05) {
		t.Errorf("surface %.4g K at 40 °C, %.4g K at 20 °C: drop %.3g K", hd.Nominal[0], hd2.Nominal[0], drop)
	}
}
