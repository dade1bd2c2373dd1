package calc

import "math"

// Inductance by summation over turns: a winding's self-inductance is the
// sum of every turn's self-inductance and the mutual inductances of all
// pairs of turns (Grover, Inductance Calculations, 1946, ch. 1; Maxwell
// 1873),
//
//	L = Σᵢ Lᵢ + Σ_{i≠j} M(rᵢ, rⱼ, zᵢ − zⱼ),
//
// with Lᵢ from TurnSelfInductance and M from MutualInductance. It counts the
// current as concentrated on each wire's axis for the mutual terms, which is
// exact for round wires of uniform current (the mutual inductance of two
// such wires equals that of their axes to within terms of (r/d)²).
// Evaluation: turns of a layer that are equally spaced make M depend on the
// index difference only, so each pair of layers costs O(n) evaluations
// rather than O(n²).

// row is a layer seen as an arithmetic progression of positions z0 + i·s,
// i = 0…n−1, each holding mult coincident turns.
type row struct {
	r, z0, s float64
	n, mult  int
}

// rowsOf splits the layers of w into rows.
func rowsOf(w Winding) []row {
	var rs []row
	for _, l := range w.Layers {
		z := l.Z
		if len(z) == 0 {
			continue
		}
		if len(z) == 1 {
			rs = append(rs, row{r: l.Radius, z0: z[0], n: 1, mult: 1})
			continue
		}
		// Coincident turns (a thin coil).
		same := true
		for _, v := range z {
			if v != z[0] {
				same = false
				break
			}
		}
		if same {
			rs = append(rs, row{r: l.Radius, z0: z[0], n: 1, mult: len(z)})
			continue
		}
		s := z[1] - z[0]
		ap := true
		for i := 2; i < len(z); i++ {
			if math.Abs(z[i]-z[0]-float64(i)*s) > 1e-9*math.Abs(s)*float64(i) {
				ap = false
				break
			}
		}
		if ap {
			rs = append(rs, row{r: l.Radius, z0: z[0], s: s, n: len(z), mult: 1})
			continue
		}
		for _, v := range z {
			rs = append(rs, row{r: l.Radius, z0: v, n: 1, mult: 1})
		}
	}
	return rs
}

// rowSum sums kernel(r_p, r_q, Δz) over all turn pairs (i in p, j in q)
// with q displaced by dz, Δz = z_j + dz − z_i, grouping equal index
// differences as rowMutual does.
func rowSum(p, q row, dz float64, kernel func(a, b, d float64) float64) float64 {
	mult := float64(p.mult * q.mult)
	off := q.z0 + dz - p.z0
	sum := 0.0
	switch {
	case p.n == 1 || q.n == 1 || math.Abs(p.s-q.s) <= 1e-12*math.Max(math.Abs(p.s), math.Abs(q.s)):
		s := p.s
		if p.n == 1 {
			s = q.s
		}
		for d := -(p.n - 1); d < q.n; d++ {
			cnt := min(p.n, q.n-d) - max(0, -d)
			if cnt > 0 {
				sum += float64(cnt) * kernel(p.r, q.r, off+float64(d)*s)
			}
		}
	default:
		for i := range p.n {
			for j := range q.n {
				sum += kernel(p.r, q.r, off+float64(j)*q.s-float64(i)*p.s)
			}
		}
	}
	return mult * sum
}

// rowMutual sums M over all turn pairs (i in p, j in q) with q displaced by
// dz. With self set, p and q are the same row and the coincident pairs
// (i = j) take the turn self-inductance with wire radius wr.
func rowMutual(p, q row, dz float64, self bool, wr float64) float64 {
	if !self {
		return rowSum(p, q, dz, MutualInductance)
	}
	return rowSum(p, q, dz, func(a, b, d float64) float64 {
		if d == 0 && a == b {
			return TurnSelfInductance(a, wr)
		}
		return MutualInductance(a, b, d)
	})
}

// TurnSumInductance returns the self-inductance, H, of winding w of round
// wire of radius wr (bare diameter / 2) by summation over turns (see above).
// It is meant for windings whose turns are distinct (single- and
// multilayer); coincident turns of a thin coil are counted as if each were
// the same turn (their mutual taken as the turn self-inductance), which
// overestimates — use RingInductance for those.
func TurnSumInductance(w Winding, wr float64) float64 {
	rs := rowsOf(w)
	L := 0.0
	for i := range rs {
		L += rowMutual(rs[i], rs[i], 0, true, wr)
		for j := i + 1; j < len(rs); j++ {
			L += 2 * rowMutual(rs[i], rs[j], 0, false, wr)
		}
	}
	return L
}

// WindingMutual returns the mutual inductance, H, between winding w1 and
// winding w2 coaxial with it and displaced by dz along the axis, summed over
// all pairs of turns with MutualInductance.
func WindingMutual(w1, w2 Winding, dz float64) float64 {
	r1, r2 := rowsOf(w1), rowsOf(w2)
	M := 0.0
	for _, p := range r1 {
		for _, q := range r2 {
			M += rowMutual(p, q, dz, false, 0)
		}
	}
	return M
}

// CoilInductance returns the self-inductance, H, of a coil block with its
// winding w: a thin circular coil by RingInductance with the hexagonal
// bundle radius (BundleDiameter/2 of the overall wire diameter); a
// single-layer coil by RoundWireSolenoidInductance (current sheet, Nagaoka,
// with Rosa's round-wire correction); a
// multilayer coil by TurnSumInductance, or by CellInductance when the exact
// sum would need more than 4 million Maxwell evaluations. A Pair is its two coils in series,
// L = 2 L₁ ± 2 M with M the WindingMutual at the spacing (thin: N² times the
// filament mutual), minus when opposing. A Rectangle by RectangleInductance
// with the bundle radius. NaN wherever the method's data are missing.
func CoilInductance(c Coil, w Winding) float64 {
	n := w.TurnCount()
	if n == 0 {
		return 0
	}
	outer := c.Wire.Outer
	if !(outer > 0) {
		outer = c.Wire.Bare
	}
	if c.Form == Rectangle {
		return RectangleInductance(c.Width, c.Height, BundleDiameter(outer, n)/2, n)
	}
	rm := c.MeanDiameter / 2
	var L float64
	switch {
	case w.Thin:
		L = RingInductance(rm, BundleDiameter(outer, n)/2, n)
	case w.LayerCount <= 1 && c.RadialBuild <= 0:
		L = RoundWireSolenoidInductance(rm, c.Length, n, c.Wire.Bare)
	default:
		if rs := rowsOf(w); rowPairCost(rs, rs, true) <= turnSumBudget {
			L = TurnSumInductance(w, c.Wire.Bare/2)
		} else {
			L = CellInductance(w, outer, cellSize(n))
		}
	}
	if c.Form != Pair {
		return L
	}
	var M float64
	switch rs := rowsOf(w); {
	case w.Thin:
		M = float64(n) * float64(n) * MutualInductance(rm, rm, c.Spacing)
	case rowPairCost(rs, rs, false) <= turnSumBudget:
		M = WindingMutual(w, w, c.Spacing)
	default:
		M = CellMutual(w, outer, cellSize(n), c.Spacing)
	}
	if c.Opposing {
		return 2*L - 2*M
	}
	return 2*L + 2*M
}
