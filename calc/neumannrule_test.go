package calc

import (
	"math"
	"testing"
)

// turnFilaments lists every turn of block c (both coils of a pair, the
// second with its sense) as a filament with its sign.
func turnFilaments(c Coil, w Winding) (fs []Filament, sign []float64) {
	u := CoilFrame(c.Axis).U
	for _, sc := range subCoils(c) {
		for _, l := range w.Layers {
			for _, z := range l.Z {
				fs = append(fs, Filament{Centre: sc.centre.Add(u.Scale(z)), Axis: u, Radius: l.Radius})
				sign = append(sign, sc.sign)
			}
		}
	}
	return fs, sign
}

// separatedCase is a pair of coil blocks whose shells do not meet.
type separatedCase struct {
	name string
	a, b Coil
}

// separatedCases are the separated arrangements the coupling rules and
// series are checked on: side by side, inclined, nested, near and far,
// pairs of both senses.
func separatedCases() []separatedCase {
	wire := WireFromGauge(30, Copper())
	sol := func(d, l, rb float64, n int, axis, centre Vec) Coil {
		return Coil{Name: "s", Form: Solenoid, MeanDiameter: d, Length: l, RadialBuild: rb,
			Turns: n, Wire: wire, Axis: axis, Centre: centre}
	}
	pair := func(opp bool, axis, centre Vec) Coil {
		return Coil{Name: "p", Form: Pair, MeanDiameter: 0.05, Length: 0.004, RadialBuild: 0.002,
			Turns: 20, Wire: wire, Spacing: 0.025, Opposing: opp, Axis: axis, Centre: centre}
	}
	return []separatedCase{
		{"side by side, inclined 60°", sol(0.03, 0.008, 0.002, 60, Vec{0, 0, 1}, Vec{}),
			sol(0.025, 0.006, 0.001, 40, Vec{math.Sin(math.Pi / 3), 0, math.Cos(math.Pi / 3)}, Vec{0.045, 0.01, 0.01})},
		{"near: parallel axes, offset", sol(0.03, 0.008, 0.002, 60, Vec{0, 0, 1}, Vec{}),
			sol(0.03, 0.008, 0.002, 60, Vec{0, 0, 1}, Vec{0.0365, 0, 0.005})},
		{"nested: small coil across the hollow of a large one", sol(0.12, 0.02, 0.002, 60, Vec{0, 0, 1}, Vec{}),
			sol(0.02, 0.006, 0.001, 40, Vec{1, 0, 0}, Vec{0.01, 0, 0.005})},
		{"far: 0.6 m, skew", sol(0.03, 0.008, 0.002, 60, Vec{0, 1, 0}, Vec{}),
			sol(0.04, 0.01, 0.002, 60, Vec{0.6, 0, 0.8}, Vec{0.3, 0.4, 0.35})},
		{"aiding pair and a solenoid", pair(false, Vec{0, 0, 1}, Vec{}),
			sol(0.02, 0.006, 0.001, 40, Vec{0.3, 0.5, 0.8}, Vec{0.07, 0, 0.01})},
		{"opposing pair and a solenoid", pair(true, Vec{1, 0, 0}, Vec{}),
			sol(0.02, 0.006, 0.001, 40, Vec{0.5, 0.2, 0.8}, Vec{0.01, 0.075, 0.02})},
	}
}

// turnSumCoupling is Neumann's mutual inductance and the Lorentz force on
// b (currents 0.7 A in a, 0.3 A in b) summed over every pair of turns.
func turnSumCoupling(a Coil, wa Winding, b Coil, wb Winding) (ref float64, refF Vec) {
	fa, sa := turnFilaments(a, wa)
	fb, sb := turnFilaments(b, wb)
	for i, f := range fa {
		for j, g := range fb {
			ref += sa[i] * sb[j] * FilamentMutual(f, g)
			refF = refF.Add(FilamentForce(f, 0.7*sa[i], g, 0.3*sb[j]))
		}
	}
	return ref, refF
}

// TestRuleCouplingMatchesTurnSum checks the quadrature rules of
// neumannrule.go against the definition they shortcut: Neumann's mutual
// inductance and the Lorentz force summed over every pair of turns
// (FilamentMutual, FilamentForce on 256 points each), for separated
// blocks side by side, inclined, nested one inside the other's hollow,
// near (a 1.5 mm gap between the shells) and far, pairs of both senses.
func TestRuleCouplingMatchesTurnSum(t *testing.T) {
	for _, tc := range separatedCases() {
		t.Run(tc.name, func(t *testing.T) {
			wa, wb := LayOut(tc.a), LayOut(tc.b)
			if _, ok := rulePairs(tc.a, wa, tc.b, wb); !ok {
				t.Fatal("the rules do not apply to this separated arrangement")
			}
			ref, refF := turnSumCoupling(tc.a, wa, tc.b, wb)
			M, _ := ruleMutual(tc.a, wa, tc.b, wb)
			F, _ := ruleForce(tc.a, wa, 0.7, tc.b, wb, 0.3)
			t.Logf("M rel %.2g F rel %.2g", math.Abs(M-ref)/math.Abs(ref), F.Sub(refF).Norm()/refF.Norm())
			if e := math.Abs(M-ref) / math.Abs(ref); !(e < 1e-8) {
				t.Errorf("M = %.12g H, turn sum %.12g H: relative error %.2g", M, ref, e)
			}
			if e := F.Sub(refF).Norm() / refF.Norm(); !(e < 1e-8) {
				t.Errorf("F = %v N, turn sum %v N: relative error %.2g", F, refF, e)
			}
		})
	}
}

// TestRuleCouplingDipoleLimit: far apart, the mutual inductance of two
// coils tends to that of their point dipoles,
// M = μ0 m_a m_b /(4π r³) · [3 (â·r̂)(b̂·r̂) − â·b̂] per ampere (Jackson,
// Classical Electrodynamics, 3rd ed., eq. 5.72 for the energy of a dipole
// in a field), with m = Σ π r² over the turns; the relative departure
// falls as (size/r)².
func TestRuleCouplingDipoleLimit(t *testing.T) {
	wire := WireFromGauge(30, Copper())
	a := Coil{Form: Solenoid, MeanDiameter: 0.03, Length: 0.008, RadialBuild: 0.002, Turns: 60, Wire: wire, Axis: Vec{0, 0, 1}}
	b := a
	b.Axis = Vec{0, 0.6, 0.8}
	wa, wb := LayOut(a), LayOut(b)
	area := func(w Winding) float64 {
		s := 0.0
		for _, l := range w.Layers {
			s += float64(len(l.Z)) * math.Pi * l.Radius * l.Radius
		}
		return s
	}
	ma, mb := area(wa), area(wb)
	dir := Vec{1, 0.5, 0.3}.Scale(1 / Vec{1, 0.5, 0.3}.Norm())
	prev := math.Inf(1)
	for _, r := range []float64{0.3, 1, 3} {
		b.Centre = dir.Scale(r)
		M, ok := ruleMutual(a, wa, b, wb)
		if !ok {
			t.Fatal("rules not applied")
		}
		ua, ub := a.Axis, b.Axis.Scale(1/b.Axis.Norm())
		dip := Mu0 / (4 * math.Pi * r * r * r) * ma * mb * (3*ua.Dot(dir)*ub.Dot(dir) - ua.Dot(ub))
		e := math.Abs(M/dip - 1)
		if !(e < 0.05*(0.02/r)*(0.02/r)*100) || !(e < prev) {
			t.Errorf("r = %g m: M = %.6g H, dipole %.6g H, relative departure %.2g (previous %.2g)", r, M, dip, e, prev)
		}
		prev = e
	}
}

// TestCoaxialRulesMatchTurnSum: for coaxial windings apart, windingSum by
// the Gauss rules equals Maxwell's formula summed over every pair of turns
// (rowSum over the rows, the exact path) for the mutual inductance and its
// gradient.
func TestCoaxialRulesMatchTurnSum(t *testing.T) {
	wire := WireFromGauge(30, Copper())
	a := Coil{Form: Solenoid, MeanDiameter: 0.04, Length: 0.02, RadialBuild: 0.004, Turns: 600, Wire: wire}
	b := Coil{Form: Solenoid, MeanDiameter: 0.07, Length: 0.01, RadialBuild: 0.006, Turns: 500, Wire: wire}
	wa, wb := LayOut(a), LayOut(b)
	for _, dz := range []float64{0.035, 0.1, 1} {
		for _, k := range []struct {
			name   string
			kernel func(a, b, d float64) float64
		}{{"M", MutualInductance}, {"dM/dz", MutualInductanceGradient}} {
			got := windingSum(a, wa, outerOf(a), b, wb, outerOf(b), dz, k.kernel)
			ref := 0.0
			for _, p := range rowsOf(wa) {
				for _, q := range rowsOf(wb) {
					ref += rowSum(p, q, dz, k.kernel)
				}
			}
			if e := math.Abs(got-ref) / math.Abs(ref); !(e < 1e-8) {
				t.Errorf("dz = %g m, %s: rules %.12g, turn sum %.12g, relative error %.2g", dz, k.name, got, ref, e)
			}
		}
	}
}
