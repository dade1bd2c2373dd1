package calc

import "math"

// Coupling of separated circular blocks through the first one's exterior
// series (Multipole).
//
// Where the turns of block b lie outside the sphere that holds block a's
// filaments (their shells do not meet, as for the rules of
// neumannrule.go), a's field and vector potential there are its exterior
// series, and
//
//	M = Σ_g n_g ∮_g A_a · dl,      F = I_a I_b Σ_g n_g ∮_g dl × B_a
//
// at 1 A in a, over b's quadrature filaments g (ruleNodes, weights n_g in
// turns, for b's distance g from a's shell) and round each on
// rulePoints(ρ, g) trapezoidal points, exactly the sums of
// ruleMutual/ruleForce with a's turn sum replaced by its series. The series
// costs a few dozen terms a point where the rules sum every node of a's
// rule, and M and F come from one evaluation.
//
// Accuracy: the series is summed at every point to 10⁻¹² of the scale G·q³
// of its leading term (its bound, Multipole.At), far below ruleEps;
// against the turn-by-turn Neumann sum the relative error of M and F is
// below 10⁻⁸ on the arrangements of TestSeriesCouplingMatchesTurnSum, as
// for the rules. Not applicable (ok false) where a's series does not meet
// its tolerance at some point, a is a rectangle or either block carries no
// winding.
//
// Reference: F. E. Neumann's mutual-inductance integral
// M = ∮∮ μ0 dl₁·dl₂/(4π r) = ∮ A₁·dl₂ (E. B. Rosa and F. W. Grover,
// Formulas and Tables for the Calculation of Mutual and Self-Inductance,
// Bull. Bureau of Standards 8 (1912), §2); the Lorentz force
// F = I ∮ dl × B (Jackson, Classical Electrodynamics, 3rd ed., eq. 5.12).
func seriesCoupling(a Coil, wa Winding, Ia float64, b Coil, wb Winding, Ib float64) (M float64, F Vec, ok bool) {
	if a.Form == Rectangle || b.Form == Rectangle {
		return 0, Vec{}, false
	}
	la, lb := latticesOf(a, wa), latticesOf(b, wb)
	if len(la) == 0 || len(lb) == 0 {
		return 0, Vec{}, false
	}
	mps := NewCoilSource(a, wa, 1).Multipoles()
	if len(mps) == 0 {
		return 0, Vec{}, false
	}
	loA, hiA := shell(la)
	loB, hiB := shell(lb)
	ub := CoilFrame(b.Axis)
	var magM float64
	var magF Vec
	for _, sa := range subCoils(a) {
		for _, sb := range subCoils(b) {
			if !(shellGap(sa.centre, loA, hiA, sb.centre, loB, hiB) > 0) {
				return 0, Vec{}, false
			}
		}
	}
	for _, sb := range subCoils(b) {
		// the gap from every sub-coil of a sets b's rule
		g := math.Inf(1)
		for _, sa := range subCoils(a) {
			g = math.Min(g, shellGap(sa.centre, loA, hiA, sb.centre, loB, hiB))
		}
		var cb []cell
		for _, l := range lb {
			cb = ruleNodes(l.root, g, cb)
		}
		for _, c := range cb {
			f := Filament{Centre: sb.centre.Add(ub.U.Scale(c.z)), Axis: ub.U, Radius: c.r}
			trig := trigTable(rulePoints(c.r, g))
			h := 2 * math.Pi / float64(len(trig))
			w := sb.sign * c.n * h
			for _, cs := range trig {
				p, t := f.atTrig(ub, cs[0], cs[1])
				var A, B Vec
				for k := range mps {
					Bk, Ak, _, good := mps[k].sum(p, 0, 1e-12, true)
					if !good {
						return 0, Vec{}, false
					}
					A, B = A.Add(Ak), B.Add(Bk)
				}
				m := w * A.Dot(t)
				M += m
				magM += math.Abs(m)
				df := t.Cross(B).Scale(w)
				F = F.Add(df)
				magF = magF.Add(Vec{math.Abs(df[0]), math.Abs(df[1]), math.Abs(df[2])})
			}
		}
	}
	// As for the rules: a sum of terms that cancel is rounding below
	// roundingFloor of the terms' sizes.
	if math.Abs(M) <= roundingFloor*magM {
		M = 0
	}
	F = F.Scale(Ia * Ib)
	floor := roundingFloor * math.Abs(Ia*Ib) * math.Max(magF[0], math.Max(magF[1], magF[2]))
	for k := range F {
		if math.Abs(F[k]) <= floor {
			F[k] = 0
		}
	}
	return M, F, true
}
