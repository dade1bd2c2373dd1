package memo

import (
	"coilmemo/analysis"
	"math"
	"testing"

	"coilmemo/calc"
)

// The plane sections of coils on the three axes sit where their windings
// cross the xz-plane; an oblique coil is not drawn.
func TestPlaneSections(t *testing.T) {
	wire := calc.Wire{Bare: 0.5e-3, Outer: 0.55e-3, Material: calc.Copper()}
	base := calc.Coil{Form: calc.Solenoid, MeanDiameter: 0.04, Length: 0.02, RadialBuild: 4e-3, Turns: 100, Wire: wire}

	z := base
	z.Axis = calc.Vec{0, 0, 1}
	s, ok := planeSections(z, studyOf(z))
	if !ok || len(s) != 2 {
		t.Fatalf("z-axis coil: %d sections, ok %v; want 2", len(s), ok)
	}
	for _, sec := range s {
		// Axial extent along the map's horizontal (z), radial along x.
		if math.Abs(sec.X1-sec.X0-0.02) > 1e-9 || math.Abs(math.Abs(sec.Y0+sec.Y1)/2-0.02) > 1e-9 {
			t.Errorf("z-axis section %+v: want 20 mm long at |x| = 20 mm", sec)
		}
	}

	x := base
	x.Axis = calc.Vec{1, 0, 0}
	s, _ = planeSections(x, studyOf(x))
	for _, sec := range s {
		if math.Abs(sec.Y1-sec.Y0-0.02) > 1e-9 || math.Abs(math.Abs(sec.X0+sec.X1)/2-0.02) > 1e-9 {
			t.Errorf("x-axis section %+v: want 20 mm long in x at |z| = 20 mm", sec)
		}
	}

	y := base
	y.Axis = calc.Vec{0, 1, 0}
	s, ok = planeSections(y, studyOf(y))
	if !ok || len(s) < 90 {
		t.Fatalf("y-axis coil: %d ring sections, ok %v", len(s), ok)
	}
	for _, sec := range s {
		r := math.Hypot((sec.X0+sec.X1)/2, (sec.Y0+sec.Y1)/2)
		if math.Abs(r-0.02) > 1e-9 {
			t.Fatalf("ring section at radius %g, want the mean radius 0.02", r)
		}
	}
	y.Centre = calc.Vec{0, 0.05, 0} // 50 mm off the plane: not cut
	if s, _ := planeSections(y, studyOf(y)); len(s) != 0 {
		t.Errorf("a y-axis coil 50 mm off the plane gave %d sections", len(s))
	}

	o := base
	o.Axis = calc.Vec{1, 0, 1}
	if _, ok := planeSections(o, studyOf(o)); ok {
		t.Error("an oblique coil reported drawable")
	}
}

// studyOf analyses one coil alone at 1 A.
func studyOf(co calc.Coil) *analysis.CoilStudy {
	co.Drive, co.Current = calc.CurrentDrive, 1
	d := calc.Design{Coils: []calc.Coil{co}}
	r := calc.Evaluate(d)
	cs := analysis.StudyCoil(co, r.Coils[0], d.Conditions)
	return &cs
}
