package spec

import (
	"fmt"
	"math"

	"coilmemo/calc"
	"coilmemo/format"
)

// ThinBundleFraction is the largest round-bundle diameter, as a fraction
// of the mean diameter, that a thin coil (no length, no radial build) may
// have. The thin-coil inductance μ0 N² a [ln(8a/r_b) − 7/4] neglects
// terms of order (r_b/a)² ln(8a/r_b) (Rosa & Grover, Bull. Bureau of
// Standards 8 (1912), formula (70) and its correction series); at a
// bundle of a fifth of the diameter they are about 1 %, at a third 3.5 %.
// Beyond it the winding must be described by its length and radial build.
const ThinBundleFraction = 0.2

// checkBuildable refuses geometry that cannot be wound or that the models
// do not describe: a thin coil's bundle larger than its bore or than
// ThinBundleFraction of its diameter, a single layer of wire thicker than
// the coil, a rectangle's bundle that fills its opening, length or radial
// build on a rectangle, the two coils of a pair overlapping, and windings
// of different coil blocks that intersect (nested coils that do not touch
// stay legal). Each problem is reported at the line of the key that makes
// it.
func (p *parser) checkBuildable(coils []*coilIn) {
	ok := true
	for _, ci := range coils {
		if !ci.formOK || len(ci.bad) > 0 {
			ok = false
			continue
		}
		if ci.sized {
			// the search keeps to buildable windings (BuildProblem); its
			// choice is checked against the other coils (WindingsIntersect)
			continue
		}
		if !p.checkOneBuildable(ci) {
			ok = false
		}
	}
	if !ok {
		return // intersections of coils that are wrong already would only add noise
	}
	for i := range coils {
		for j := i + 1; j < len(coils); j++ {
			a, b := coils[i], coils[j]
			if a.sized || b.sized {
				continue
			}
			if windingsIntersect(a.c, b.c) {
				p.errf(max(a.fence, b.fence), "the windings of coil %q and coil %q intersect: move one (centre), turn it (axis) or change its size; coils nested inside each other must not touch",
					a.c.Name, b.c.Name)
			}
		}
	}
}

func (p *parser) checkOneBuildable(ci *coilIn) bool {
	stated := func(k string) bool { _, ok := ci.lines[k]; return ok }
	probs := buildProblems(ci.c, stated)
	for _, pr := range probs {
		line := ci.fence
		for _, k := range pr.keys {
			if l, ok := ci.lines[k]; ok {
				line = l
				break
			}
		}
		p.errf(line, "%s", pr.msg)
	}
	return len(probs) == 0
}

// buildProblem is one reason a coil cannot be wound or lies outside the
// models: the message, and the keys at whose line it is reported (the
// first the coil block states).
type buildProblem struct {
	keys []string
	msg  string
}

// BuildProblem says why coil c cannot be wound or lies outside the models
// (the first reason checkBuildable would give for it alone), or "". The
// size search keeps to coils without one.
func BuildProblem(c calc.Coil) string {
	stated := func(k string) bool {
		return (k == "length" && c.Length > 0) || (k == "radial-build" && c.RadialBuild > 0)
	}
	if ps := buildProblems(c, stated); len(ps) > 0 {
		return ps[0].msg
	}
	return ""
}

// WindingsIntersect reports whether the windings of two coil blocks share
// space (see windingsIntersect).
func WindingsIntersect(a, b calc.Coil) bool { return windingsIntersect(a, b) }

func buildProblems(c calc.Coil, stated func(string) bool) []buildProblem {
	var out []buildProblem
	add := func(msg string, keys ...string) { out = append(out, buildProblem{keys: keys, msg: msg}) }
	length := func(v float64) string { return format.Eng(v, "m", 3) }
	outer := calc.WireOuter(c)
	if !(outer > 0) || c.Turns <= 0 {
		return nil
	}
	bundle := calc.BundleDiameter(outer, c.Turns)
	where := fmt.Sprintf("coil %q", c.Name)
	if c.Form == calc.Rectangle {
		for _, k := range []string{"length", "radial-build"} {
			if stated(k) {
				add(fmt.Sprintf("%s: %s does not apply to form = rectangle: its turns are laid out as one round bundle round the rectangle (give width, height, turns and wire)", where, k), k)
			}
		}
		if side := math.Min(c.Width, c.Height); side > 0 && bundle >= side {
			add(fmt.Sprintf("%s: the round bundle of %d turns is %s across, no less than the rectangle's shorter side %s: it cannot be wound",
				where, c.Turns, length(bundle), length(side)), "wire", "turns")
		}
		return out
	}
	D := c.MeanDiameter
	if !(D > 0) {
		return nil
	}
	thin := c.Length == 0 && c.RadialBuild == 0
	switch {
	case thin && bundle >= D:
		add(fmt.Sprintf("%s: the round bundle of %d turns is %s across, no less than the mean diameter %s: the coil cannot be wound; give length and radial-build for a thick winding",
			where, c.Turns, length(bundle), length(D)), "wire", "turns")
	case thin && bundle > ThinBundleFraction*D:
		add(fmt.Sprintf("%s: the round bundle of %d turns is %s across, more than a fifth of the mean diameter %s, where the thin-coil model fails (its inductance is off by more than 1 %%); give length and radial-build to describe the winding",
			where, c.Turns, length(bundle), length(D)), "wire", "turns")
	case c.RadialBuild == 0 && outer >= D:
		add(fmt.Sprintf("%s: a wire %s thick cannot be wound in one layer on a mean diameter of %s", where, length(outer), length(D)), "wire", "mean-diameter")
	}
	if c.Form == calc.Pair && len(out) == 0 {
		e := calc.WindingEnvelope(c, calc.LayOut(c))
		if axial := e.Z1 - e.Z0; math.Abs(c.Spacing) < axial {
			add(fmt.Sprintf("%s: the two coils of the pair overlap: their centres are %s apart, less than the winding's axial length %s",
				where, length(math.Abs(c.Spacing)), length(axial)), "spacing")
		}
	}
	return out
}

// windingsIntersect reports whether the windings of two coil blocks share
// space: points over the cross-section of each (a 3 × 3 grid across the
// section, every 2° round the axis; along each side of a rectangle) are
// tested against the other's envelope.
func windingsIntersect(a, b calc.Coil) bool {
	if b.Centre.Sub(a.Centre).Norm() > 1.01*(roughRadius(a)+roughRadius(b)) {
		return false // apart: no layout needed
	}
	return pointsInside(a, b) || pointsInside(b, a)
}

// roughRadius bounds from above the distance from a coil block's centre
// to any point of its winding, from its stated dimensions (a wire or
// bundle diameter of room on every side).
func roughRadius(c calc.Coil) float64 {
	d := calc.WireOuter(c)
	pad := math.Max(d, calc.BundleDiameter(d, c.Turns))
	if c.Form == calc.Rectangle {
		return math.Hypot(c.Width/2, c.Height/2) + pad
	}
	r := math.Max(c.MeanDiameter/2+c.RadialBuild/2, c.OuterDiameter/2) + pad
	z := c.Length/2 + math.Abs(c.Spacing)/2 + pad
	return math.Hypot(r, z)
}

// pointsInside reports whether a sample point of a's winding lies inside
// b's winding.
func pointsInside(a, b calc.Coil) bool {
	fa, fb := calc.CoilFrame(a.Axis), calc.CoilFrame(b.Axis)
	wa, wb := calc.LayOut(a), calc.LayOut(b)
	ea, eb := calc.WindingEnvelope(a, wa), calc.WindingEnvelope(b, wb)
	inside := func(p calc.Vec) bool {
		for _, z0 := range calc.Placements(b) {
			l := fb.ToLocal(p.Sub(b.Centre))
			if b.Form == calc.Rectangle {
				if inRectangleBundle(b, eb, l) {
					return true
				}
				continue
			}
			rho, z := math.Hypot(l[0], l[1]), l[2]-z0
			if rho > eb.R0 && rho < eb.R1 && z > eb.Z0 && z < eb.Z1 {
				return true
			}
		}
		return false
	}
	const steps = 180
	fractions := []float64{0.02, 0.5, 0.98}
	for _, z0 := range calc.Placements(a) {
		for _, fr := range fractions {
			for _, fz := range fractions {
				for k := range steps {
					phi := 2 * math.Pi * float64(k) / steps
					var l calc.Vec
					if a.Form == calc.Rectangle {
						l = rectanglePoint(a, ea, phi, fr, fz)
					} else {
						rho := ea.R0 + fr*(ea.R1-ea.R0)
						l = calc.Vec{rho * math.Cos(phi), rho * math.Sin(phi), z0 + ea.Z0 + fz*(ea.Z1-ea.Z0)}
					}
					if inside(a.Centre.Add(fa.ToGlobal(l))) {
						return true
					}
				}
			}
		}
	}
	return false
}

// rectanglePoint is a point of a rectangle's bundle in its own frame: the
// parameter phi runs once round the mean turn, fr and fz place the point
// across the bundle's section.
func rectanglePoint(c calc.Coil, e calc.Envelope, phi, fr, fz float64) calc.Vec {
	W, H := c.Width, c.Height
	b := e.R1 - e.R0
	s := phi / (2 * math.Pi) * 2 * (W + H) // arc length round the mean turn
	off := (fr - 0.5) * b                  // outward across the bundle
	z := (fz - 0.5) * b
	switch {
	case s < W:
		return calc.Vec{-W/2 + s, -H/2 - off, z}
	case s < W+H:
		return calc.Vec{W/2 + off, -H/2 + (s - W), z}
	case s < 2*W+H:
		return calc.Vec{W/2 - (s - W - H), H/2 + off, z}
	}
	return calc.Vec{-W/2 - off, H/2 - (s - 2*W - H), z}
}

// inRectangleBundle reports whether the point l (in the rectangle's frame)
// lies inside its round bundle of wire along the four sides.
func inRectangleBundle(c calc.Coil, e calc.Envelope, l calc.Vec) bool {
	W, H := c.Width, c.Height
	r := (e.R1 - e.R0) / 2
	// distance from the mean turn's outline in its plane
	dx := math.Max(math.Abs(l[0])-W/2, 0)
	dy := math.Max(math.Abs(l[1])-H/2, 0)
	var d float64
	if dx > 0 || dy > 0 {
		d = math.Hypot(dx, dy)
	} else {
		d = math.Min(W/2-math.Abs(l[0]), H/2-math.Abs(l[1]))
	}
	return math.Hypot(d, l[2]) < r
}
