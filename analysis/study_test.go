package analysis

import (
	"os"
	"testing"
	"time"

	"coilmemo/calc"
)

// The build date is the one the caller passes (from SOURCE_DATE_EPOCH),
// else the spec's own date.
func TestBuildDate(t *testing.T) {
	src, err := os.ReadFile("../examples/torque-coil.md")
	if err != nil {
		t.Fatal(err)
	}
	st, diags := Run("torque-coil.md", src, Options{})
	if len(diags) > 0 {
		t.Fatal(diags)
	}
	if got := st.Created.Format("2006-01-02"); got != "2026-11-30" || !st.Dated || st.DateSource != "memo date" {
		t.Errorf("build date from the spec = %s, %v, %q; want 2026-11-30 from the memo block", got, st.Dated, st.DateSource)
	}
	st, _ = Run("torque-coil.md", src, Options{Date: time.Unix(1780000000, 0)})
	if got := st.Created.Unix(); got != 1780000000 || st.DateSource != "SOURCE_DATE_EPOCH" {
		t.Errorf("build date given = %d (%s)", got, st.DateSource)
	}
}

// A point inside an oblique winding is blanked on the all-coils map, the
// coil's centre is not.
func TestNearWinding(t *testing.T) {
	wire := calc.Wire{Bare: 0.5e-3, Outer: 0.55e-3, Material: calc.Copper()}
	o := calc.Coil{Form: calc.Solenoid, MeanDiameter: 0.04, Length: 0.02, RadialBuild: 4e-3, Turns: 100, Wire: wire, Axis: calc.Vec{1, 0, 1}}
	e := calc.WindingEnvelope(o, calc.LayOut(o))
	p := calc.Vec{0, 0, 0}.Add(calc.CoilFrame(o.Axis).E1.Scale(0.02))
	if !nearWinding(o, e, p, 1e-3) {
		t.Error("a point in the oblique winding is not blanked")
	}
	if nearWinding(o, e, calc.Vec{}, 1e-3) {
		t.Error("the centre of the oblique coil is blanked")
	}
	if DrawnInXZ(o) {
		t.Error("an oblique coil reported drawable in the xz-plane")
	}
}
