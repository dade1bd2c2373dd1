package analysis

import (
	"math"
	"os"
	"path/filepath"
	"testing"

	"coilmemo/calc"
)

func threeAxisSet(t *testing.T) *Study {
	t.Helper()
	src, err := os.ReadFile(filepath.Join("..", "testdata", "figures", "three-axis-set.md"))
	if err != nil {
		t.Fatal(err)
	}
	return evaluateSpec(t, string(src))
}

// TestAxisSetMoments checks each coil's moment vector against N·I·A
// along its axis (a thin loop: all turns on the mean circle, A = π R²;
// the definition of the magnetic moment of a plane current loop, Jackson,
// Classical Electrodynamics, 3rd ed., eq. 5.57).
func TestAxisSetMoments(t *testing.T) {
	j := threeAxisSet(t)
	as := j.Design.Axes
	if as == nil || len(as.Coils) != 3 {
		t.Fatalf("axis set %+v; want three coils", as)
	}
	axes := []calc.Vec{{1, 0, 0}, {0, 1, 0}, {0, 0, 1}}
	for k, i := range as.Coils {
		co, cr := j.Spec.Design.Coils[i], j.Results.Coils[i]
		want := axes[k].Scale(float64(co.Turns) * cr.Current * math.Pi * co.MeanDiameter * co.MeanDiameter / 4)
		if d := as.Moments[k].Sub(want).Norm(); d > 1e-12*want.Norm() {
			t.Errorf("coil %q: moment %v, N·I·A %v", co.Name, as.Moments[k], want)
		}
		for b := range as.Coils {
			if b != k && math.Abs(as.Skew[k][b]-90) > 1e-9 {
				t.Errorf("angle between moments %d and %d: %g°, want 90°", k, b, as.Skew[k][b])
			}
		}
	}
}

// neumannCircles is the mutual inductance of two circular filaments by
// Neumann's formula M = μ0/(4π) ∮∮ dl₁·dl₂ / |r₁ − r₂| (Jackson, 3rd ed.,
// eq. 5.154 with the vector potential of a filament), summed by the
// midpoint rule over n segments of each.
func neumannCircles(c1, u1 calc.Vec, r1 float64, c2, u2 calc.Vec, r2 float64, n int) float64 {
	frame := func(u calc.Vec) (calc.Vec, calc.Vec) {
		e := calc.Vec{1, 0, 0}
		if math.Abs(u[0]) > 0.9 {
			e = calc.Vec{0, 1, 0}
		}
		e1 := e.Sub(u.Scale(e.Dot(u))).Unit()
		return e1, u.Cross(e1)
	}
	a1, b1 := frame(u1)
	a2, b2 := frame(u2)
	pts := func(c, a, b calc.Vec, r float64) (p, dl []calc.Vec) {
		h := 2 * math.Pi / float64(n)
		for k := range n {
			f := (float64(k) + 0.5) * h
			p = append(p, c.Add(a.Scale(r*math.Cos(f))).Add(b.Scale(r*math.Sin(f))))
			dl = append(dl, a.Scale(-r*math.Sin(f)*h).Add(b.Scale(r*math.Cos(f)*h)))
		}
		return p, dl
	}
	p1, d1 := pts(c1, a1, b1, r1)
	p2, d2 := pts(c2, a2, b2, r2)
	s := 0.0
	for i := range p1 {
		for k := range p2 {
			s += d1[i].Dot(d2[k]) / p1[i].Sub(p2[k]).Norm()
		}
	}
	return calc.Mu0 / (4 * math.Pi) * s
}

func TestAxisSetCouplingAgainstNeumannSum(t *testing.T) {
	j := threeAxisSet(t)
	as := j.Design.Axes
	d := j.Spec.Design
	checked := 0
	for a := range as.Coils {
		for b := a + 1; b < len(as.Coils); b++ {
			ca, cb := d.Coils[as.Coils[a]], d.Coils[as.Coils[b]]
			if as.K[a][b] != as.K[b][a] {
				t.Errorf("k not symmetric: %g, %g", as.K[a][b], as.K[b][a])
			}
			M := float64(ca.Turns*cb.Turns) * neumannCircles(ca.Centre, ca.Axis.Unit(), ca.MeanDiameter/2, cb.Centre, cb.Axis.Unit(), cb.MeanDiameter/2, 720)
			La, Lb := j.Results.Coils[as.Coils[a]].Inductance, j.Results.Coils[as.Coils[b]].Inductance
			want := M / math.Sqrt(La*Lb)
			// Thin coils: the analysis' filaments lie on the mean circle
			// too, so the two agree to the midpoint rule's accuracy
			// (seen: six figures); 10⁻⁴ leaves room for it.
			if got := as.K[a][b]; math.IsNaN(got) || math.Abs(got-want) > 1e-4*math.Abs(want) {
				t.Errorf("k(%q, %q) = %g, Neumann sum of filaments %g", ca.Name, cb.Name, got, want)
			}
			t.Logf("k(%q, %q) = %.6g, filament sum %.6g", ca.Name, cb.Name, as.K[a][b], want)
			checked++
		}
	}
	if checked != 3 {
		t.Fatalf("%d couplings checked, want 3", checked)
	}
	if want := math.Max(math.Abs(as.K[0][1]), math.Max(math.Abs(as.K[0][2]), math.Abs(as.K[1][2]))); as.Cross != want {
		t.Errorf("Cross %g, largest |k| %g", as.Cross, want)
	}
}

func TestAxisSetOnlyForSkewAxes(t *testing.T) {
	// Two coaxial coils along z: no axis set.
	two := "```coil\nname = a\nmean-diameter = 100 mm\nturns = 20\nwire = AWG 26\ncurrent = 0.1 A\n```\n" +
		"```coil\nname = b\nmean-diameter = 100 mm\nturns = 20\nwire = AWG 26\ncurrent = 0.1 A\ncentre = (0, 0, 80) mm\naxis = -z\n```\n"
	if as := evaluateSpec(t, two).Design.Axes; as != nil {
		t.Errorf("parallel (opposite) axes got an axis set: %+v", as)
	}
	if as := evaluateSpec(t, shortSolenoid).Design.Axes; as != nil {
		t.Errorf("one coil got an axis set: %+v", as)
	}
	// A driven coil along z and a pick-up coil along x: one driven coil.
	rx := "```coil\nname = a\nmean-diameter = 100 mm\nturns = 20\nwire = AWG 26\ncurrent = 0.1 A\n```\n" +
		"```coil\nname = p\nmean-diameter = 30 mm\nturns = 200\nwire = AWG 36\naxis = x\ncentre = (200, 0, 0) mm\nfrequency = 1 kHz\n```\n"
	if as := evaluateSpec(t, rx).Design.Axes; as != nil {
		t.Errorf("a pick-up coil counted in the set: %+v", as)
	}
}
