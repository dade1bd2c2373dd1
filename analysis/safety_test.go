package analysis

import (
	"math"
	"strings"
	"testing"

	"coilmemo/calc"
)

// The 0.5 mT reach of a cored coil is searched in the field of winding and
// core together (the rod's pole model): it lies well beyond the same
// winding's in air, and at the reported distance the cored model — the
// winding summed turn by turn (calc.CoilField, not the quadrature the
// search uses) plus calc.CorePoleField — gives 0.5 mT to within 10⁻⁶,
// falling below it 0.1 % further out.
func TestCoredImplantReach(t *testing.T) {
	air := studyOf(t, "```coil\nname = rod\nform = solenoid\nmean-diameter = 12 mm\nlength = 120 mm\nturns = 400\nwire = AWG 30\ncurrent = 0.3 A\n```\n")
	st := studyOf(t, strings.Replace(rodSpec, "0.1 A", "0.3 A", 1)+"core-permeability = 1000\n```\n")
	c := st.Spec.Design.Coils[0]
	cr := st.Results.Coils[0]
	k := st.Coils[0].Kinds.Core
	if k == nil {
		t.Fatal("no core figures")
	}
	// As computed: on the axis 61 mm in air, 92 mm with the core; from the
	// winding's surface 0.8 mm and 31 mm.
	ai, ci := air.Safety.Implant, st.Safety.Implant
	if !(ai.Axial > 0) || !(ci.Axial > 1.4*ai.Axial) || !(ci.Windings[0].Distance > ai.Windings[0].Distance) {
		t.Errorf("cored reach %g m (from the surface %g m) not beyond the air coil's %g m (%g m)", ci.Axial, ci.Windings[0].Distance, ai.Axial, ai.Windings[0].Distance)
	}
	model := func(z float64) float64 {
		p := calc.Vec{0, 0, z}
		return calc.CoilField(c, cr.Winding, cr.Current, p).Add(calc.CorePoleField(c, *k, p)).Norm()
	}
	if b := model(ci.Axial); math.Abs(b/ImplantField-1) > 1e-6 {
		t.Errorf("cored |B| at the reported reach %g m: %g T, want %g T", ci.Axial, b, ImplantField)
	}
	if b := model(1.001 * ci.Axial); !(b < ImplantField) {
		t.Errorf("cored |B| 0.1 %% beyond the reach: %g T, not below %g T", b, ImplantField)
	}
	// The rod (140 mm) is longer than the winding (120 mm): the search
	// from the rod's end face along the axis reaches at least as far as
	// the axial search from the origin.
	if end := c.Core.Length / 2; !(ci.Windings[0].Distance >= ci.Axial-end-1e-9) {
		t.Errorf("reach from the surface %g m, short of the axial reach %g m less the rod's half-length %g m", ci.Windings[0].Distance, ci.Axial, end)
	}
}

// A coil off the origin with its axis along the diagonal of the xy plane:
// the axial and in-plane searches from the origin along x, y and z miss
// its axis, and the farthest reach lies along (1, 1, 0)/√2. At the reported
// distance the winding summed turn by turn (calc.CoilField, not the
// quadrature the search uses) gives 0.5 mT to within 10⁻⁶, and 0.1 %
// further out less.
func TestFarthestImplantReachOffTheAxes(t *testing.T) {
	st := studyOf(t, "```coil\nname = diag\nform = solenoid\nmean-diameter = 150 mm\nlength = 60 mm\nradial-build = 10 mm\nturns = 800\nwire = AWG 22\ncurrent = 2 A\ncentre = (200, 200, 0) mm\naxis = (1, 1, 0)\n```\n")
	ir := st.Safety.Implant
	u := calc.Vec{1, 1, 0}.Scale(1 / math.Sqrt2)
	if ir.Toward.Sub(u).Norm() > 1e-9 {
		t.Fatalf("farthest reach %g m toward %v, want toward %v", ir.Farthest, ir.Toward, u)
	}
	// The coil's axis passes through the origin: the reach is measured
	// along it, and the farthest search finds the same.
	if ir.Axis.Sub(u).Norm() > 1e-12 || math.Abs(ir.Axial/ir.Farthest-1) > 1e-9 || !(ir.Farthest > 0.2*math.Sqrt2+0.03) {
		t.Errorf("farthest %g m against %g m along %v", ir.Farthest, ir.Axial, ir.Axis)
	}
	c, cr := st.Spec.Design.Coils[0], st.Results.Coils[0]
	model := func(r float64) float64 { return calc.CoilField(c, cr.Winding, cr.Current, u.Scale(r)).Norm() }
	if b := model(ir.Farthest); math.Abs(b/ImplantField-1) > 1e-6 {
		t.Errorf("|B| at the reported reach %g m: %g T, want %g T", ir.Farthest, b, ImplantField)
	}
	if b := model(1.001 * ir.Farthest); !(b < ImplantField) {
		t.Errorf("|B| 0.1 %% beyond the reach: %g T, not below %g T", b, ImplantField)
	}
	// Lifted 40 mm off that line, the reach is measured along z and in
	// the xy plane, which miss the coil: the farthest search does not.
	st = studyOf(t, "```coil\nname = diag\nform = solenoid\nmean-diameter = 150 mm\nlength = 60 mm\nradial-build = 10 mm\nturns = 800\nwire = AWG 22\ncurrent = 2 A\ncentre = (200, 200, 40) mm\naxis = (1, 1, 0)\n```\n")
	ir = st.Safety.Implant
	if ir.Axis != (calc.Vec{0, 0, 1}) || !(ir.Farthest > 1.2*math.Max(ir.Axial, ir.Radial)) || !(ir.Farthest > 0.2*math.Sqrt2+0.03) {
		t.Errorf("lifted: farthest %g m toward %v against axial %g m and radial %g m along %v", ir.Farthest, ir.Toward, ir.Axial, ir.Radial, ir.Axis)
	}
	c, cr = st.Spec.Design.Coils[0], st.Results.Coils[0]
	if b := calc.CoilField(c, cr.Winding, cr.Current, ir.Toward.Scale(ir.Farthest)).Norm(); math.Abs(b/ImplantField-1) > 1e-6 {
		t.Errorf("lifted: |B| at the reported reach %g m: %g T, want %g T", ir.Farthest, b, ImplantField)
	}
}

// A single loop at the origin on an oblique axis: the implant reach is
// measured along its own axis and in its own plane. On the axis of a
// filament loop of radius a carrying NI, B = μ0 N I a² / (2 (a² + z²)^{3/2})
// (the Biot–Savart law for a circular loop, e.g. Jackson, Classical
// Electrodynamics, 3rd ed., §5.5 — recalled from memory), so the level
// B_L is reached out to z = a √((B0/B_L)^{2/3} − 1) with B0 = μ0 N I/(2a).
// One turn makes the winding a filament at the wire's centre.
func TestImplantReachAlongTheCoilsOwnAxis(t *testing.T) {
	st := studyOf(t, "```coil\nname = tilted\nform = loop\nmean-diameter = 60 mm\nturns = 1\nwire = AWG 10\ncurrent = 40 A\naxis = (1, 1, 0)\n```\n")
	ir := st.Safety.Implant
	u := calc.Vec{1, 1, 0}.Scale(1 / math.Sqrt2)
	if ir.Axis.Sub(u).Norm() > 1e-12 {
		t.Fatalf("reach measured along %v, want the coil's axis %v", ir.Axis, u)
	}
	a := 0.030
	b0 := calc.Mu0 * 40 / (2 * a)
	want := a * math.Sqrt(math.Pow(b0/ImplantField, 2.0/3)-1)
	if math.Abs(ir.Axial/want-1) > 1e-6 {
		t.Errorf("reach along the axis %g m, want %g m", ir.Axial, want)
	}
	// Off the origin the coil's axis no longer passes through it: z.
	off := studyOf(t, "```coil\nname = tilted\nform = loop\nmean-diameter = 60 mm\nturns = 1\nwire = AWG 10\ncurrent = 40 A\naxis = (1, 1, 0)\ncentre = (0, 0, 50) mm\n```\n")
	if z := off.Safety.Implant.Axis; z != (calc.Vec{0, 0, 1}) {
		t.Errorf("off-origin coil: reach measured along %v, want z", z)
	}
}
