package analysis

import (
	"math"
	"testing"

	"coilmemo/calc"
	"coilmemo/calc/biotsavart"
)

// Near a coil, on its axis, the point dipole overstates the field of a
// loop and understates that of a long solenoid, whose ends act as poles
// nearer than its centre. Checked against the closed forms on the axis —
// the filament loop μ0 I a²/(2 (a² + z²)^{3/2}) and the current sheet
// μ0 n I/2 · [(z + L/2)/√((z + L/2)² + a²) − (z − L/2)/√((z − L/2)² + a²)]
// (the Biot–Savart law for a circular loop and its integral over the
// length; e.g. Jackson, Classical Electrodynamics, 3rd ed., §5.5 — recalled
// from memory) — against the dipole's μ0 m/(2π z³), m = N I π a², at every
// profile point nearer than the 1 % distance where the dipole is drawn.
func TestDipoleNearTheWinding(t *testing.T) {
	for _, c := range []struct {
		src      string
		a, L, NI float64
	}{
		{"```coil\nname = loop\nform = loop\nmean-diameter = 60 mm\nturns = 1\nwire = AWG 10\ncurrent = 40 A\n```\n", 0.030, 0, 40},
		{"```coil\nname = s\nform = solenoid\nmean-diameter = 60.5 mm\nlength = 300 mm\nturns = 500\nwire = 0.5 mm\nwire-outer-diameter = 0.56 mm\ncurrent = 250 mA\n```\n", 0.03025, 0.300, 125},
	} {
		st := studyOf(t, c.src)
		p := st.Coils[0].Axis
		exact := func(z float64) float64 {
			if c.L == 0 {
				return calc.Mu0 * c.NI * c.a * c.a / (2 * math.Pow(c.a*c.a+z*z, 1.5))
			}
			n := c.NI / c.L
			return calc.Mu0 * n / 2 * ((z+c.L/2)/math.Hypot(z+c.L/2, c.a) - (z-c.L/2)/math.Hypot(z-c.L/2, c.a))
		}
		m := c.NI * math.Pi * c.a * c.a
		above, below := 0, 0
		for i, z := range p.Z {
			if math.IsNaN(p.Dipole[i]) || math.Abs(z) >= p.Dipole1pc {
				continue
			}
			z = math.Abs(z)
			if calc.Mu0*m/(2*math.Pi*z*z*z) > exact(z) {
				above++
			} else {
				below++
			}
		}
		want := 0
		if above > 0 && below == 0 {
			want = 1
		} else if below > 0 && above == 0 {
			want = -1
		}
		if want == 0 || p.DipoleNear != want {
			t.Errorf("L = %g m: dipole near the winding %d, the closed forms give %d (%d above, %d below)", c.L, p.DipoleNear, want, above, below)
		}
	}
}

// A coil's map names its strongest node and where it lies. For a
// single-layer solenoid the field, summed turn by turn by the numerical
// Biot–Savart integral (calc/biotsavart, each turn a circle at the mean
// radius, the turns evenly pitched over the length), agrees with the map
// at its peak node to 0.1 %, exceeds it at none of a sample of the other
// nodes by more than 0.1 %, and is larger there than at the centre: the
// strongest point lies in the bore next to the winding, not at the centre,
// and not outside the winding.
func TestMapPeakOfASolenoid(t *testing.T) {
	st := studyOf(t, "```coil\nname = s\nform = solenoid\nmean-diameter = 60.5 mm\nlength = 300 mm\nturns = 500\nwire = 0.5 mm\nwire-outer-diameter = 0.56 mm\ncurrent = 250 mA\n```\n")
	m := st.Coils[0].Map
	if m == nil {
		t.Fatal("no map")
	}
	a, L, N, I := 0.03025, 0.300, 500, 0.25
	B := func(rho, z float64) float64 {
		var br, bz float64
		for k := range N {
			zk := -L/2 + (float64(k)+0.5)*L/float64(N)
			x, y := biotsavart.CircleLocal(a, I, math.Abs(rho), z-zk, 64, 16)
			br, bz = br+x, bz+y
		}
		return math.Hypot(br, bz)
	}
	if b := B(m.PeakX, m.PeakZ); math.Abs(b/m.Peak-1) > 1e-3 {
		t.Errorf("peak %g T at (%g, %g) m, Biot–Savart %g T", m.Peak, m.PeakX, m.PeakZ, b)
	}
	if !(m.Peak > B(0, 0)) || !m.PeakBore || !m.PeakNear {
		t.Errorf("peak %g T at (%g, %g) m (bore %v, near %v), centre %g T", m.Peak, m.PeakX, m.PeakZ, m.PeakBore, m.PeakNear, B(0, 0))
	}
	nz := len(m.Z)
	for ix := 0; ix < len(m.X); ix += 7 {
		for iz := 0; iz < nz; iz += 7 {
			if v := m.B[ix*nz+iz]; !math.IsNaN(v) {
				if b := B(m.X[ix], m.Z[iz]); b > m.Peak*(1+1e-3) {
					t.Errorf("node (%g, %g) m: Biot–Savart %g T above the peak %g T", m.X[ix], m.Z[iz], b, m.Peak)
				}
			}
		}
	}
}

// A circle of radius a centred on the origin with unit axis u meets the
// xz-plane where the coil's plane does, along u × ŷ; its tangent there
// lies along u × (u × ŷ), at asin(√(1 − u_y²)) to the plane (0 when u is
// ŷ and the circle lies in the plane). Lifted off the plane by more than
// its radius it does not meet it.
func TestPlaneCrossing(t *testing.T) {
	for _, u := range []calc.Vec{{1, 0, 1}, {1, 1, 0}, {1, 2, 3}, {0, 0, 1}, {0, 1, 0}} {
		u = u.Unit()
		co := calc.Coil{Form: calc.Loop, MeanDiameter: 0.08, Axis: u}
		want := math.Asin(math.Sqrt(1 - u[1]*u[1]))
		if got := planeCrossing(co); math.Abs(got-want) > 1e-3 {
			t.Errorf("axis %v: crossing at %g rad, want %g rad", u, got, want)
		}
	}
	lifted := calc.Coil{Form: calc.Loop, MeanDiameter: 0.08, Axis: calc.Vec{1, 0, 1}, Centre: calc.Vec{0, 0.05, 0}}
	if got := planeCrossing(lifted); !math.IsNaN(got) {
		t.Errorf("lifted circle crosses at %g rad", got)
	}
	// A rectangle on the z axis: its sides along y cross at right angles.
	rect := calc.Coil{Form: calc.Rectangle, Width: 0.2, Height: 0.1, Axis: calc.Vec{0, 0, 1}}
	if got := planeCrossing(rect); math.Abs(got-math.Pi/2) > 1e-3 {
		t.Errorf("rectangle crosses at %g rad, want π/2", got)
	}
}
