package analysis

import (
	"math"
	"testing"

	"coilmemo/calc"
	"coilmemo/calc/biotsavart"
)

// panelSpec is a 300 × 200 mm rectangle of 40 turns at 1 A with probes in
// the plane 50 mm above it, one off it.
func panelSpec(probes string) string {
	return "```coil\nname = panel\nform = rectangle\nwidth = 300 mm\nheight = 200 mm\nturns = 40\nwire = AWG 22\ncurrent = 1 A\n```\n" +
		"```probes\n" + probes + "```\n"
}

// rectangleOnAxis is the axial flux density at height z on the axis of a
// rectangular filament of half-sides a × b carrying NI ampere-turns:
//
//	B = μ0 NI a b / (π √(a² + b² + z²)) · (1/(a² + z²) + 1/(b² + z²)),
//
// the four sides' fields by the finite straight wire's Biot–Savart result
// B = μ0 I/(4π s) (sin θ₂ − sin θ₁) (Griffiths, Introduction to
// Electrodynamics, 4th ed., Example 5.5), projected on the axis and
// summed; at z = 0 for a square of side s it reduces to 2√2 μ0 I/(π s)
// (Griffiths, Problem 5.8).
func rectangleOnAxis(a, b, z, NI float64) float64 {
	return calc.Mu0 * NI * a * b / (math.Pi * math.Sqrt(a*a+b*b+z*z)) * (1/(a*a+z*z) + 1/(b*b+z*z))
}

func TestPlaneMapCentreAgainstClosedForm(t *testing.T) {
	j := evaluateSpec(t, panelSpec("centre = (0, 0, 50) mm\neast = (60 mm, 0 mm, 50 mm)\n"))
	pm := j.Design.Planes[0]
	if pm == nil {
		t.Fatal("no plane map for a rectangle with its probes in one plane")
	}
	if pm.Dist != 0.05 || !pm.AllInIt || len(pm.Probes) != 2 {
		t.Fatalf("plane at %g m, all %v, %d probes; want 0.05 m, true, 2", pm.Dist, pm.AllInIt, len(pm.Probes))
	}
	want := rectangleOnAxis(0.15, 0.1, 0.05, 40)
	if d := math.Abs(pm.Centre/want - 1); d > 1e-12 {
		t.Errorf("centre Bz %g T, closed form %g T (rel %g)", pm.Centre, want, d)
	}
	// The centre node of the grid is the same point.
	nu := len(pm.U)
	if c := pm.Bn[(len(pm.V)/2)*nu+nu/2]; math.Abs(c/want-1) > 1e-12 {
		t.Errorf("centre node %g T, want %g T", c, want)
	}
}

// square is the mean turn of the panel as a polygon, counter-clockwise
// about +z.
var square = []biotsavart.Vec{{-0.15, -0.1, 0}, {0.15, -0.1, 0}, {0.15, 0.1, 0}, {-0.15, 0.1, 0}}

func TestPlaneMapNodesAgainstQuadrature(t *testing.T) {
	j := evaluateSpec(t, panelSpec("a = (0, 0, 50) mm\nb = (100 mm, 70 mm, 50 mm)\n"))
	pm := j.Design.Planes[0]
	nu := len(pm.U)
	// Independent: Gauss–Legendre quadrature of the Biot–Savart integral
	// round the polygon.
	for _, k := range [][2]int{{0, 0}, {nu / 3, len(pm.V) / 4}, {nu - 5, len(pm.V) - 3}, {nu / 2, 2}} {
		iu, iv := k[0], k[1]
		p := biotsavart.Vec{pm.U[iu], pm.V[iv], pm.Dist}
		want := biotsavart.Polygon(square, 40, p, 8, 12)[2]
		got := pm.Bn[iv*nu+iu]
		if math.Abs(got-want) > 1e-9*math.Abs(pm.Centre) {
			t.Errorf("Bn at (%g, %g) m: %g T, quadrature %g T", p[0], p[1], got, want)
		}
	}
	// Probe b's value is the field at the probe.
	pb := pm.Probes[1]
	want := biotsavart.Polygon(square, 40, biotsavart.Vec{0.1, 0.07, 0.05}, 8, 12)[2]
	if pb.Name != "b" || math.Abs(pb.Bn/want-1) > 1e-9 {
		t.Errorf("probe %q Bn %g T, quadrature %g T", pb.Name, pb.Bn, want)
	}
}

func TestPlaneMapUniformRegions(t *testing.T) {
	j := evaluateSpec(t, panelSpec("a = (0, 0, 50) mm\n"))
	pm := j.Design.Planes[0]
	if len(pm.Within) != len(PlaneTolerances) {
		t.Fatalf("%d regions, want %d", len(pm.Within), len(PlaneTolerances))
	}
	// worst is the largest departure from the centre value over the
	// perimeter of the rectangle of half-sides u × v, by quadrature, 400
	// points round it.
	worst := func(u, v float64) float64 {
		w := 0.0
		for k := range 100 {
			t := -1 + 2*float64(k)/100
			for _, q := range [][2]float64{{t * u, -v}, {u, t * v}, {-t * u, v}, {-u, -t * v}} {
				b := biotsavart.Polygon(square, 40, biotsavart.Vec{q[0], q[1], 0.05}, 8, 12)[2]
				w = math.Max(w, math.Abs(b/pm.Centre-1))
			}
		}
		return w
	}
	for _, r := range pm.Within {
		if r.Full || !(r.U > 0) {
			t.Fatalf("region ±%g: %+v; want a finite rectangle", r.Tol, r)
		}
		if math.Abs(r.U/r.V-1.5) > 1e-9 {
			t.Errorf("region ±%g: %g × %g m is not in the coil's proportions", r.Tol, r.U, r.V)
		}
		// On its perimeter the field holds the band (to the 160-point
		// sampling of the search) and 2 % further out it does not.
		if w := worst(r.U, r.V); w > r.Tol*1.02 {
			t.Errorf("region ±%g: departure %g on its perimeter", r.Tol, w)
		}
		if w := worst(1.02*r.U, 1.02*r.V); !(w > r.Tol) {
			t.Errorf("region ±%g: still %g at 1.02 times its size; the region is too small", r.Tol, w)
		}
	}
	if !(pm.Within[1].U > pm.Within[0].U) {
		t.Errorf("the ±5 %% region %g m is not larger than the ±1 %% one %g m", pm.Within[1].U, pm.Within[0].U)
	}
}

func TestPlaneOfInterestRules(t *testing.T) {
	rect := calc.Coil{Form: calc.Rectangle, Width: 0.3, Height: 0.2, Axis: calc.Vec{0, 0, 1}}
	p := func(z ...float64) []calc.Probe {
		var ps []calc.Probe
		for k, v := range z {
			ps = append(ps, calc.Probe{Name: string(rune('a' + k)), At: calc.Vec{0.01 * float64(k), 0, v}})
		}
		return ps
	}
	if _, _, ok := PlaneOfInterest(rect, nil); ok {
		t.Error("a plane without probes")
	}
	if d, all, ok := PlaneOfInterest(rect, p(0.04, 0.04, 0.04)); !ok || !all || d != 0.04 {
		t.Errorf("probes in one plane: %g, %v, %v", d, all, ok)
	}
	if d, all, ok := PlaneOfInterest(rect, p(0.03, 0.05)); !ok || all || d != 0.03 {
		t.Errorf("probes in two planes: %g, %v, %v; want the first probe's plane", d, all, ok)
	}
	// An x-axis rectangle measures the distance along x.
	rx := rect
	rx.Axis = calc.Vec{1, 0, 0}
	if d, _, ok := PlaneOfInterest(rx, []calc.Probe{{At: calc.Vec{0.07, 0.02, 0.01}}}); !ok || math.Abs(d-0.07) > 1e-15 {
		t.Errorf("x-axis rectangle: plane at %g, want 0.07", d)
	}
	loop := calc.Coil{Form: calc.Loop, MeanDiameter: 0.2}
	if _, _, ok := PlaneOfInterest(loop, p(0.04)); ok {
		t.Error("a loop got a plane of interest; the rule is for rectangles")
	}
	// A rectangle without probes gets no map.
	j := evaluateSpec(t, "```coil\nname = r\nform = rectangle\nwidth = 300 mm\nheight = 200 mm\nturns = 40\nwire = AWG 22\ncurrent = 1 A\n```\n")
	if j.Design.Planes[0] != nil {
		t.Error("a plane map without probes")
	}
	// A test plane named in the spec is the plane, with or without probes;
	// probes elsewhere do not move it.
	tp := rect
	tp.TestPlane, tp.HasTestPlane = 0.08, true
	if d, all, ok := PlaneOfInterest(tp, nil); !ok || !all || d != 0.08 {
		t.Errorf("test plane without probes: %g, %v, %v", d, all, ok)
	}
	if d, all, ok := PlaneOfInterest(tp, p(0.03, 0.08)); !ok || all || d != 0.08 {
		t.Errorf("test plane with a probe off it: %g, %v, %v; want 0.08, not all", d, all, ok)
	}
	j = evaluateSpec(t, "```coil\nname = r\nform = rectangle\nwidth = 300 mm\nheight = 200 mm\nturns = 40\nwire = AWG 22\ncurrent = 1 A\ntest-plane = -60 mm\n```\n")
	pm := j.Design.Planes[0]
	if pm == nil || pm.Dist != -0.06 || pm.InPlane != 0 {
		t.Fatalf("map over the named test plane: %+v", pm)
	}
	// The centre value against the closed form of a rectangular filament of
	// half-sides a, b at distance d on its axis (the Biot–Savart law summed
	// over the four straight sides):
	//	Bz = μ0 N I a b / (π √(a² + b² + d²)) · (1/(a² + d²) + 1/(b² + d²))
	// within 10⁻³ (the winding's bundle, which the filament ignores).
	a, b, d := 0.15, 0.1, 0.06
	want := calc.Mu0 * 40 * 1 * a * b / (math.Pi * math.Sqrt(a*a+b*b+d*d)) * (1/(a*a+d*d) + 1/(b*b+d*d))
	if math.Abs(pm.Centre/want-1) > 1e-3 {
		t.Errorf("Bn at the axis of the test plane %g T, want %g T", pm.Centre, want)
	}
}

// A probe in the plane far off the coil is counted but not mapped: the map
// stays at the coil's scale (1.5 times its sides).
func TestPlaneMapFarProbe(t *testing.T) {
	j := evaluateSpec(t, panelSpec("a = (0, 0, 50) mm\nfar = (900 m, 0 mm, 50 mm)\nnear = (250 mm, 0 mm, 50 mm)\n"))
	pm := j.Design.Planes[0]
	if pm.InPlane != 3 || len(pm.Probes) != 2 || pm.Probes[1].Name != "near" {
		t.Fatalf("%d in the plane, %d mapped (%+v); want 3 and 2", pm.InPlane, len(pm.Probes), pm.Probes)
	}
	// The near probe at 250 mm widens the map to 1.15 × 250 mm; the far
	// one does not.
	if math.Abs(pm.UHalf-1.15*0.25) > 1e-12 || math.Abs(pm.VHalf-0.15) > 1e-12 {
		t.Errorf("map half-sides %g × %g m, want 0.2875 × 0.15", pm.UHalf, pm.VHalf)
	}
}
