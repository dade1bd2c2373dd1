package calc

import (
	"math"
	"testing"
)

func TestFilamentMutualCoaxialIsMaxwell(t *testing.T) {
	// Coaxial limit: the single-integral Neumann sum equals Maxwell's
	// closed form (MutualInductance), also with the second filament's axis
	// reversed (M changes sign).
	for _, c := range [][3]float64{{0.1, 0.05, 0.02}, {0.1, 0.1, 0.001}, {0.05, 0.2, 0.3}, {0.1, 0.1, 5}} {
		a, b, d := c[0], c[1], c[2]
		f1 := Filament{Axis: Vec{0, 0, 1}, Radius: a}
		f2 := Filament{Centre: Vec{0, 0, d}, Axis: Vec{0, 0, 1}, Radius: b}
		checkRel(t, "coaxial M", FilamentMutual(f1, f2), MutualInductance(a, b, d), 1e-9)
		f2.Axis = Vec{0, 0, -1}
		checkRel(t, "reversed M", FilamentMutual(f1, f2), -MutualInductance(a, b, d), 1e-9)
		// Along another axis, the same.
		g1 := Filament{Axis: Vec{1, 0, 0}, Radius: a}
		g2 := Filament{Centre: Vec{d, 0, 0}, Axis: Vec{1, 0, 0}, Radius: b}
		checkRel(t, "coaxial M along x", FilamentMutual(g1, g2), MutualInductance(a, b, d), 1e-9)
		// Axial force: F = I₁ I₂ ∂M/∂d (MutualInductanceGradient).
		F := FilamentForce(f1, 2, Filament{Centre: Vec{0, 0, d}, Axis: Vec{0, 0, 1}, Radius: b}, 3)
		checkRel(t, "coaxial axial force", F[2], 6*MutualInductanceGradient(a, b, d), 1e-8)
		if math.Hypot(F[0], F[1]) > 1e-9*math.Abs(F[2]) {
			t.Errorf("coaxial force has a transverse part %v", F)
		}
	}
}

func TestFilamentMutualDipoleLimit(t *testing.T) {
	// Far apart, two filaments couple as point dipoles of moment πa²:
	// M = μ0 π a² π b² / (4π r³) · (3 (n₁·r̂)(n₂·r̂) − n₁·n₂) (Jackson,
	// Classical Electrodynamics, 3rd ed., eq. 5.56 for the dipole field),
	// with corrections O((a/r)²).
	a, b := 0.01, 0.02
	n1 := Vec{0, 0, 1}
	n2 := Vec{1, 0.5, 2}.Unit()
	for _, r := range []float64{2, 5} {
		d := Vec{0.3, -0.4, 1}.Unit().Scale(r)
		f1 := Filament{Axis: n1, Radius: a}
		f2 := Filament{Centre: d, Axis: n2, Radius: b}
		u := d.Unit()
		want := Mu0 * math.Pi * a * a * math.Pi * b * b / (4 * math.Pi * r * r * r) * (3*n1.Dot(u)*n2.Dot(u) - n1.Dot(n2))
		checkRel(t, "dipole limit", FilamentMutual(f1, f2), want, 3*(b/r)*(b/r)*10)
		// Reciprocity: M₁₂ = M₂₁.
		checkRel(t, "reciprocity", FilamentMutual(f2, f1), FilamentMutual(f1, f2), 1e-10)
	}
}

func TestFilamentForceIsEnergyGradient(t *testing.T) {
	// Inclined, offset filaments at moderate distance: the Lorentz force on
	// the second equals I₁ I₂ ∇M with respect to its position (co-energy at
	// constant currents; Jackson §5.16), by central differences of M.
	f1 := Filament{Axis: Vec{0, 0, 1}, Radius: 0.05}
	f2 := Filament{Centre: Vec{0.03, 0.02, 0.04}, Axis: Vec{0.3, 0.2, 1}.Unit(), Radius: 0.03}
	I1, I2 := 1.5, -2.0
	F := FilamentForce(f1, I1, f2, I2)
	h := 1e-6
	var G Vec
	for i := range 3 {
		var e Vec
		e[i] = h
		p, m := f2, f2
		p.Centre, m.Centre = f2.Centre.Add(e), f2.Centre.Sub(e)
		G[i] = I1 * I2 * (FilamentMutual(f1, p) - FilamentMutual(f1, m)) / (2 * h)
	}
	if e := vecRelErr(F, G); e > 1e-6 {
		t.Errorf("Lorentz force %v, energy gradient %v (rel %g)", F, G, e)
	}
	// Touching filaments: no finite answer, no panic.
	if m := FilamentMutual(f1, f1); !math.IsNaN(m) {
		t.Errorf("coincident filaments: M = %g", m)
	}
	if m := FilamentMutual(Filament{}, f2); !math.IsNaN(m) {
		t.Errorf("zero radius: M = %g", m)
	}
}
