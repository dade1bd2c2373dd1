package analysis

import (
	"math"
	"os"
	"testing"

	"coilmemo/calc"
)

// The torque rod's near field one core diameter beyond its end, found
// again by a separate route: the slice model's pole charges taken as
// uniformly charged discs of the core's cross-section (magnetic charge
// σ = M below − M above), whose on-axis field is H = σ/2 (sgn u −
// u/√(u² + a²)), the field of a uniformly charged disc on its axis
// (Griffiths, Introduction to Electrodynamics, 4th ed., ch. 2; recalled
// from memory), in place of calc's elliptic integrals off the axis; plus
// the winding's turns as circular loops, B = μ0 I R²/(2 (R² + u²)^{3/2})
// on the axis (Griffiths, ch. 5, the field on the axis of a loop). The two point poles
// of the same pole strength and separation give the core's moment but a
// weaker field there: they sit inside the rod, not spread to its end.
func TestRodEndFieldBySlices(t *testing.T) {
	src, err := os.ReadFile("../examples/torque-rod.md")
	if err != nil {
		t.Fatal(err)
	}
	st := studyOf(t, string(src))
	c, cr := st.Spec.Design.Coils[0], st.Results.Coils[0]
	k := st.Coils[0].Kinds
	core := k.Core
	if core == nil {
		t.Fatal("no core")
	}
	x := c.Core.Length/2 + RodEndPoint*c.Core.Diameter // local z of the point
	a := c.Core.Diameter / 2
	area := math.Pi * a * a
	var hz float64
	for i, q := range core.Charge {
		u := x - core.Z[i]
		hz += q / area / 2 * (math.Copysign(1, u) - u/math.Hypot(u, a))
	}
	bCore := calc.Mu0 * hz
	var bw float64
	for _, l := range cr.Winding.Layers {
		for _, z := range l.Z {
			u := x - z
			bw += calc.Mu0 * cr.Current * l.Radius * l.Radius / (2 * math.Pow(l.Radius*l.Radius+u*u, 1.5))
		}
	}
	rel := func(a, b float64) float64 { return math.Abs(a-b) / math.Abs(b) }
	if rel(k.EndFieldCore, bCore) > 1e-6 || rel(k.EndFieldWinding, bw) > 1e-3 || rel(k.EndField, bCore+bw) > 1e-3 {
		t.Errorf("end field: core %g (discs %g), winding %g (loops %g), total %g (%g)", k.EndFieldCore, bCore, k.EndFieldWinding, bw, k.EndField, bCore+bw)
	}
	// two point charges ±Q at ±s/2: μ0 Q/(4π) (1/(x − s/2)² − 1/(x + s/2)²)
	q, s := core.PoleStrength, core.PoleSeparation
	b2 := calc.Mu0 * q / (4 * math.Pi) * (1/((x-s/2)*(x-s/2)) - 1/((x+s/2)*(x+s/2)))
	if rel(k.EndFieldTwoPole, b2) > 1e-9 || rel(q*s, core.CoreMoment) > 1e-9 {
		t.Errorf("two poles: %g (closed form %g); Q s = %g, core moment %g", k.EndFieldTwoPole, b2, q*s, core.CoreMoment)
	}
	if !(k.EndFieldTwoPole < 0.7*k.EndFieldCore) {
		t.Errorf("the point pair gives %g, the spread poles %g: expected the pair well below", k.EndFieldTwoPole, k.EndFieldCore)
	}
	t.Logf("core %.4g T, winding %.4g T, total %.4g T; two poles %.4g T; Q %.4g A·m, s %.4g m", bCore, bw, k.EndField, b2, q, s)
}
