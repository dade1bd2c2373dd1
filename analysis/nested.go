package analysis

import (
	"math"

	"coilmemo/calc"
)

// Nesting is a coil block whose winding lies in the bore of another
// block's winding: Inner's outer surface faces Outer's bore across
// enclosed air, so neither sheds its heat as the heat balance of each
// assumes (calc.ThermalFor treats every winding alone in the stated
// cooling), and both temperatures are understated, Inner's most. Whole is
// set when the whole length of Inner's outer surface lies in that bore,
// unset when Inner runs through it and out (the bore covers its middle).
type Nesting struct {
	Inner, Outer int
	Whole        bool
}

// nestings are the nested windings of design d: a winding (any placement
// of a circular block; not a rectangle, not a rod's core, which sits in
// its own winding by design) one of whose placements has the middle of its
// outer surface, at eight azimuths, in the bore of a placement of another
// block's winding. One entry per pair of blocks, in spec order.
func nestings(d calc.Design, coils []CoilStudy) []Nesting {
	os := outlines(d, coils)
	var out []Nesting
	seen := map[[2]int]int{}
	for _, a := range os {
		if a.rect || a.core {
			continue
		}
		for _, b := range os {
			if b.coil == a.coil || b.rect || b.core || !(b.r0 > 0) {
				continue
			}
			in := func(z float64) bool {
				for k := range 8 {
					phi := 2 * math.Pi * float64(k) / 8
					e := a.fr.E1.Scale(math.Cos(phi)).Add(a.fr.E2.Scale(math.Sin(phi)))
					p := a.centre.Add(e.Scale(a.r1)).Add(a.fr.U.Scale(z))
					if _, bore := b.distance(p); !bore {
						return false
					}
				}
				return true
			}
			if !in((a.z0 + a.z1) / 2) {
				continue
			}
			// the ends taken a hair inside, so that equal lengths count as whole
			inset := 1e-6 * (a.z1 - a.z0)
			whole := in(a.z0+inset) && in(a.z1-inset)
			key := [2]int{a.coil, b.coil}
			if k, ok := seen[key]; ok {
				out[k].Whole = out[k].Whole || whole
				continue
			}
			seen[key] = len(out)
			out = append(out, Nesting{Inner: a.coil, Outer: b.coil, Whole: whole})
		}
	}
	return out
}
