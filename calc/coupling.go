package calc

import "math"

// Coupling between the coil blocks of a design: their mutual inductance and
// the force between them, and the force on a coil's moment in a stated
// field gradient.
//
// Coaxial circular coils (axes parallel or opposite, centres on one axis
// line) are summed exactly over every pair of turn filaments: M by
// Maxwell's formula (MutualInductance) and the axial force
// F = I₁ I₂ ∂M/∂z by its derivative (MutualInductanceGradient) — the
// derivative at constant currents of the magnetic co-energy
// W = ½ L₁ I₁² + ½ L₂ I₂² + M I₁ I₂ (Jackson, Classical Electrodynamics,
// 3rd ed., §5.16). Maxwell's formula is for coaxial circles only; for
// other arrangements no mutual inductance is given and the force is that on
// the second coil's moment in the first one's field, F = ∇(m·B) (DipoleForce),
// good when the coils are far apart compared with their size.

// Coupling is the interaction of two coil blocks A and B of a design.
type Coupling struct {
	A, B     int     // indexes of the coil blocks
	Coaxial  bool    // circular, axes parallel or opposite, centres on a common axis
	Distance float64 // m, between the centres
	Mutual   float64 // H, NaN when a rectangle is involved or the windings overlap
	K        float64 // coupling coefficient M/√(L_A L_B), NaN when M is
	Force    Vec     // N, on B from A
	// Exact is set when Force is the exact coaxial sum or the Lorentz
	// integral over filaments; otherwise it is the dipole approximation
	// (and NaN when that has no meaning, e.g. zero distance).
	Exact bool
	// Dipole is the point-dipole force on B, N, the cross-check of an exact
	// non-coaxial force (NaN vector for coaxial blocks).
	Dipole Vec
	// Overlap is set when turns of the two blocks coincide, which has no
	// finite mutual inductance.
	Overlap bool
}

// subCoil is one coil of a block: its winding centre and current sense.
type subCoil struct {
	centre Vec
	sign   float64
}

func subCoils(c Coil) []subCoil {
	if c.Form != Pair {
		return []subCoil{{c.Centre, 1}}
	}
	u := CoilFrame(c.Axis).U
	s := u.Scale(c.Spacing / 2)
	sign2 := 1.0
	if c.Opposing {
		sign2 = -1
	}
	return []subCoil{{c.Centre.Sub(s), 1}, {c.Centre.Add(s), sign2}}
}

// coaxial reports whether circular coils a and b share an axis line, and
// the sign (+1 parallel, −1 opposite) of b's axis along a's.
func coaxial(a, b Coil) (bool, float64) {
	if a.Form == Rectangle || b.Form == Rectangle {
		return false, 0
	}
	ua, ub := CoilFrame(a.Axis).U, CoilFrame(b.Axis).U
	dot := ua.Dot(ub)
	if math.Abs(math.Abs(dot)-1) > 1e-9 {
		return false, 0
	}
	d := b.Centre.Sub(a.Centre)
	off := d.Sub(ua.Scale(d.Dot(ua))).Norm()
	scale := math.Max(a.MeanDiameter, b.MeanDiameter)
	if off > 1e-9*math.Max(scale, 1e-3) {
		return false, 0
	}
	return true, math.Copysign(1, dot)
}

// windingSum sums kernel over all pairs of turns of w1 and w2 (w2 displaced
// by dz along the common axis), turn by turn when that costs at most
// turnSumBudget evaluations, else over cells of g × g turns (see cells.go)
// with d1, d2 the outer wire diameters.
//
// Windings whose turns lie in spherical shells that do not meet are summed
// instead over the discrete Gauss rules of both cross-sections (ruleNodes,
// neumannrule.go) when that is cheaper: the same sum to within about
// ruleEps (TestCoaxialRulesMatchTurnSum), at a cost that falls with the
// distance.
func windingSum(co1 Coil, w1 Winding, d1 float64, co2 Coil, w2 Winding, d2, dz float64, kernel func(a, b, d float64) float64) float64 {
	r1, r2 := rowsOf(w1), rowsOf(w2)
	cost := rowPairCost(r1, r2, false)
	if l1, l2 := latticesOf(co1, w1), latticesOf(co2, w2); len(l1) > 0 && len(l2) > 0 {
		lo1, hi1 := shell(l1)
		lo2, hi2 := shell(l2)
		if g := shellGap(Vec{}, lo1, hi1, Vec{0, 0, dz}, lo2, hi2); g > 0 {
			var c1, c2 []cell
			for _, l := range l1 {
				c1 = ruleNodes(l.root, g, c1)
			}
			for _, l := range l2 {
				c2 = ruleNodes(l.root, g, c2)
			}
			if float64(len(c1)*len(c2)) < math.Min(cost, turnSumBudget) {
				s := 0.0
				for _, a := range c1 {
					for _, b := range c2 {
						s += a.n * b.n * kernel(a.r, b.r, b.z+dz-a.z)
					}
				}
				return s
			}
		}
	}
	if cost <= turnSumBudget {
		s := 0.0
		for _, p := range r1 {
			for _, q := range r2 {
				s += rowSum(p, q, dz, kernel)
			}
		}
		return s
	}
	c1 := cellRows(cellsOf(w1, d1, cellSize(w1.TurnCount())))
	c2 := cellRows(cellsOf(w2, d2, cellSize(w2.TurnCount())))
	s := 0.0
	for _, p := range c1 {
		for _, q := range c2 {
			s += rowSum(p, q, dz, kernel)
		}
	}
	return s
}

func outerOf(c Coil) float64 {
	if c.Wire.Outer > 0 {
		return c.Wire.Outer
	}
	return c.Wire.Bare
}

// CoaxialMutual returns the mutual inductance, H, of coaxial coil blocks a
// and b with windings wa, wb (both pair coils of a Pair, with their
// senses), and whether their turns overlap (then M is NaN). NaN when the
// blocks are not coaxial.
func CoaxialMutual(a Coil, wa Winding, b Coil, wb Winding) (M float64, overlap bool) {
	ok, sense := coaxial(a, b)
	if !ok {
		return math.NaN(), false
	}
	u := CoilFrame(a.Axis).U
	for _, sa := range subCoils(a) {
		for _, sb := range subCoils(b) {
			dz := sb.centre.Sub(sa.centre).Dot(u)
			m := windingSum(a, wa, outerOf(a), b, wb, outerOf(b), dz, MutualInductance)
			M += sa.sign * sb.sign * sense * m
		}
	}
	if math.IsInf(M, 0) || math.IsNaN(M) {
		return math.NaN(), true
	}
	return M, false
}

// CoaxialForceBetween returns the force, N, on coaxial block b (current Ib)
// from block a (current Ia): I_a I_b ∂M/∂z along a's axis, summed over
// every pair of turns (see MutualInductanceGradient). NaN vector when the
// blocks are not coaxial or their turns coincide.
func CoaxialForceBetween(a Coil, wa Winding, Ia float64, b Coil, wb Winding, Ib float64) Vec {
	ok, sense := coaxial(a, b)
	if !ok {
		return nanVec()
	}
	u := CoilFrame(a.Axis).U
	F := 0.0
	for _, sa := range subCoils(a) {
		for _, sb := range subCoils(b) {
			dz := sb.centre.Sub(sa.centre).Dot(u)
			g := windingSum(a, wa, outerOf(a), b, wb, outerOf(b), dz, MutualInductanceGradient)
			F += sa.sign * sb.sign * sense * g
		}
	}
	return u.Scale(Ia * Ib * F)
}

// Couplings returns the Coupling of every pair of coil blocks i < j of a
// design, given their windings, operating currents and self-inductances.
func Couplings(coils []Coil, ws []Winding, currents, selfL []float64) []Coupling {
	var out []Coupling
	for i := range coils {
		for j := i + 1; j < len(coils); j++ {
			out = append(out, Coupling{A: i, B: j})
		}
	}
	// Each pair is independent: computed on every core, each into its own
	// slot, so the result does not depend on the scheduling.
	ParallelBlocks(len(out), 1, func(k int) {
		out[k] = coupling(coils, ws, currents, selfL, out[k].A, out[k].B)
	})
	return out
}

// coupling returns the Coupling of coil blocks i and j.
func coupling(coils []Coil, ws []Winding, currents, selfL []float64, i, j int) Coupling {
	a, b := coils[i], coils[j]
	cp := Coupling{A: i, B: j, Distance: b.Centre.Sub(a.Centre).Norm(), Mutual: math.NaN(), K: math.NaN(), Dipole: nanVec()}
	if ok, _ := coaxial(a, b); ok {
		cp.Coaxial = true
		cp.Mutual, cp.Overlap = CoaxialMutual(a, ws[i], b, ws[j])
		if !cp.Overlap {
			cp.Force = CoaxialForceBetween(a, ws[i], currents[i], b, ws[j], currents[j])
			cp.Exact = true
			if selfL[i] > 0 && selfL[j] > 0 {
				cp.K = cp.Mutual / math.Sqrt(selfL[i]*selfL[j])
			}
		} else {
			cp.Force = nanVec()
		}
		return cp
	}
	cp.Dipole = DipoleForceBetween(a, ws[i], currents[i], b, ws[j], currents[j])
	cp.Force = cp.Dipole
	M, F, ok := seriesCoupling(a, ws[i], currents[i], b, ws[j], currents[j])
	if !ok {
		// the force on b from a is minus that on a from b (closed circuits)
		M, F, ok = seriesCoupling(b, ws[j], currents[j], a, ws[i], currents[i])
		F = F.Scale(-1)
	}
	if ok {
		cp.Mutual, cp.Force, cp.Exact = M, F, true
		if selfL[i] > 0 && selfL[j] > 0 {
			cp.K = cp.Mutual / math.Sqrt(selfL[i]*selfL[j])
		}
		return cp
	}
	if M := NeumannMutual(a, ws[i], b, ws[j]); !math.IsNaN(M) {
		cp.Mutual = M
		cp.Force = LorentzForceBetween(a, ws[i], currents[i], b, ws[j], currents[j])
		cp.Exact = true
		if selfL[i] > 0 && selfL[j] > 0 {
			cp.K = cp.Mutual / math.Sqrt(selfL[i]*selfL[j])
		}
	} else if a.Form != Rectangle && b.Form != Rectangle {
		cp.Overlap = true
		cp.Force = nanVec()
	}
	return cp
}

// DipoleForceBetween returns the force, N, on the moment of block b
// (current Ib) in the field of block a (current Ia), F = ∇(m_b·B_a) at b's
// centre (DipoleForce, central differences of a thousandth of the
// distance). NaN vector when the centres coincide.
func DipoleForceBetween(a Coil, wa Winding, Ia float64, b Coil, wb Winding, Ib float64) Vec {
	d := b.Centre.Sub(a.Centre).Norm()
	if !(d > 0) {
		return nanVec()
	}
	m := MagneticMoment(b, wb, Ib)
	return DipoleForce(m, func(p Vec) Vec { return CoilField(a, wa, Ia, p) }, b.Centre, 1e-3*d)
}

// GradientForce returns the force, N, on a moment of magnitude m (A·m²) in
// a background field whose component along the moment changes by G (T/m)
// per metre along the moment: F = m G, from F = ∇(m·B) (Jackson, Classical
// Electrodynamics, 3rd ed., eq. 5.69). NaN when no gradient is stated.
func GradientForce(m, G float64) float64 {
	if !(G > 0) {
		return math.NaN()
	}
	return m * G
}
