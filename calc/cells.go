package calc

import "math"

// Coarse-grained inductance for windings too large to sum turn by turn.
// The winding's cross-section is divided into square cells of g × g turns
// (g layers by g turns along the axis); each cell is replaced by a filament
// at its centroid carrying its n turns. The mutual inductance of two cells
// is n n' M(r, r', Δz) (Maxwell's formula between the centroids; the error
// is of the order of (cell size / distance)², largest for neighbours), and a
// cell's own inductance is that of a thin coil of square section of side s,
// n² μ0 r (ln(8r/g_s) − 2) with g_s = 0.44705 s the geometric mean distance
// of a square from itself (Maxwell, Treatise, 1873, §692; Grover,
// Inductance Calculations, 1946, ch. 13), s = d √n for n turns of outer
// diameter d. On a 60 × 60-turn test coil it agrees with the exact sum to
// 5×10⁻⁵ (2 × 2 cells) … 5×10⁻⁴ (10 × 10 cells).

// turnSumBudget is the largest number of Maxwell evaluations spent on an
// exact turn-by-turn sum; above it the cell method is used.
const turnSumBudget = 4_000_000

// maxCells bounds the number of cells of the coarse method.
const maxCells = 2000

type cell struct{ r, z, n float64 }

// rowPairCost estimates the Maxwell evaluations of summing rows rs against
// rows qs (all pairs when same is false; p ≤ q when true).
func rowPairCost(rs, qs []row, same bool) float64 {
	c := 0.0
	for i, p := range rs {
		j0 := 0
		if same {
			j0 = i
		}
		for _, q := range qs[j0:] {
			if p.n == 1 || q.n == 1 || math.Abs(p.s-q.s) <= 1e-12*math.Max(math.Abs(p.s), math.Abs(q.s)) {
				c += float64(p.n + q.n)
			} else {
				c += float64(p.n * q.n)
			}
		}
	}
	return c
}

// cellSize returns g for a winding of n turns so that there are at most
// maxCells cells (at least 2).
func cellSize(n int) int {
	return max(2, int(math.Ceil(math.Sqrt(float64(n)/maxCells))))
}

// cellsOf groups the turns of w into cells of g layers by g turns of pitch
// d, returning their centroids and turn counts.
func cellsOf(w Winding, d float64, g int) []cell {
	var out []cell
	for k0 := 0; k0 < len(w.Layers); k0 += g {
		group := w.Layers[k0:min(k0+g, len(w.Layers))]
		zmin := math.Inf(1)
		for _, l := range group {
			for _, z := range l.Z {
				zmin = math.Min(zmin, z)
			}
		}
		var acc []cell
		for _, l := range group {
			for _, z := range l.Z {
				b := int(math.Floor((z - zmin) / (float64(g) * d) * (1 - 1e-12)))
				for len(acc) <= b {
					acc = append(acc, cell{})
				}
				acc[b].r += l.Radius
				acc[b].z += z
				acc[b].n++
			}
		}
		for _, c := range acc {
			if c.n > 0 {
				out = append(out, cell{r: c.r / c.n, z: c.z / c.n, n: c.n})
			}
		}
	}
	return out
}

// cellRows groups consecutive cells (in cellsOf's order) of equal radius
// and turn count whose centroids step evenly along the axis into rows (a
// row of cells holding mult = n turns each), so that the sums over pairs
// of cells cost O(n) per pair of rows as the turn sums do (rowSum).
func cellRows(cs []cell) []row {
	var out []row
	for i := 0; i < len(cs); {
		j := i + 1
		for j < len(cs) && cs[j].r == cs[i].r && cs[j].n == cs[i].n {
			if j >= i+2 {
				s := cs[i+1].z - cs[i].z
				if math.Abs(cs[j].z-cs[i].z-float64(j-i)*s) > 1e-9*math.Abs(s)*float64(j-i) {
					break
				}
			} else if cs[j].z == cs[i].z {
				break
			}
			j++
		}
		r := row{r: cs[i].r, z0: cs[i].z, n: j - i, mult: int(cs[i].n)}
		if j-i > 1 {
			r.s = cs[i+1].z - cs[i].z
		}
		out = append(out, r)
		i = j
	}
	return out
}

// CellInductance returns the self-inductance, H, of winding w (outer wire
// diameter d) by the cell method above with g × g turns per cell.
func CellInductance(w Winding, d float64, g int) float64 {
	rs := cellRows(cellsOf(w, d, g))
	L := 0.0
	for i, p := range rs {
		// A cell's own inductance in place of its coincident "pairs";
		// rowSum multiplies the kernel by n².
		self := func(a, b, dz float64) float64 {
			if dz == 0 && a == b {
				return Mu0 * a * (math.Log(8*a/(0.44705*d*math.Sqrt(float64(p.mult)))) - 2)
			}
			return MutualInductance(a, b, dz)
		}
		L += rowSum(p, p, 0, self)
		for _, q := range rs[i+1:] {
			L += 2 * rowSum(p, q, 0, MutualInductance)
		}
	}
	return L
}

// CellMutual returns the mutual inductance, H, of winding w and a copy of it
// displaced by dz along the axis, by the cell method (filaments at the cell
// centroids).
func CellMutual(w Winding, d float64, g int, dz float64) float64 {
	rs := cellRows(cellsOf(w, d, g))
	M := 0.0
	for _, p := range rs {
		for _, q := range rs {
			M += rowSum(p, q, dz, MutualInductance)
		}
	}
	return M
}
