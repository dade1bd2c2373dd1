package calc

import "math"

// Envelope is a winding's cross-section in its own frame: radii R0…R1 and
// axial extent Z0…Z1 about the centre of one coil, m; Round for a thin
// coil's round bundle (the rectangle R0…R1 × Z0…Z1 then bounds it).
type Envelope struct {
	R0, R1, Z0, Z1 float64
	Round          bool
}

// WireOuter is the wire's outer diameter as laid out: the stated or
// estimated one, else the bare diameter, m.
func WireOuter(c Coil) float64 {
	if c.Wire.Outer > 0 {
		return c.Wire.Outer
	}
	return c.Wire.Bare
}

// WindingEnvelope is the cross-section of one coil (one coil of a pair)
// with winding w: a thin coil's round bundle of all turns (BundleDiameter,
// hexagonal packing) on the mean radius; one layer of wire over the
// length; or the length × radial build from the bore outward. For a
// rectangle, R0…R1 spans the bundle about the half-width.
func WindingEnvelope(c Coil, w Winding) Envelope {
	outer := WireOuter(c)
	rm := c.MeanDiameter / 2
	if c.Form == Rectangle {
		b := BundleDiameter(outer, c.Turns)
		return Envelope{R0: c.Width/2 - b/2, R1: c.Width/2 + b/2, Z0: -b / 2, Z1: b / 2, Round: true}
	}
	switch {
	case w.Thin:
		b := BundleDiameter(outer, c.Turns)
		return Envelope{R0: rm - b/2, R1: rm + b/2, Z0: -b / 2, Z1: b / 2, Round: true}
	case c.RadialBuild <= 0:
		return Envelope{R0: rm - outer/2, R1: rm + outer/2, Z0: -c.Length / 2, Z1: c.Length / 2}
	}
	rin := rm - c.RadialBuild/2
	if c.InnerDiameter > 0 {
		rin = c.InnerDiameter / 2
	}
	L := c.Length
	if !(L > 0) {
		L = outer
	}
	return Envelope{R0: rin, R1: rin + c.RadialBuild, Z0: -L / 2, Z1: L / 2}
}

// LaidEnvelope is the cross-section the turns of w occupy as laid: for a
// multilayer winding the stated length from the bore outward over its
// layers, LayerCount × the wire's outer diameter — less than the stated
// radial build when the turns do not fill it; otherwise WindingEnvelope.
func LaidEnvelope(c Coil, w Winding) Envelope {
	e := WindingEnvelope(c, w)
	if c.Form == Rectangle || w.Thin || c.RadialBuild <= 0 || w.LayerCount <= 0 {
		return e
	}
	if d := float64(w.LayerCount) * WireOuter(c); d > 0 && d < e.R1-e.R0 {
		e.R1 = e.R0 + d
	}
	return e
}

// Placements are the axial positions of a coil block's coils in its own
// frame: ±spacing/2 for a pair, the centre otherwise, m.
func Placements(c Coil) []float64 {
	if c.Form == Pair {
		return []float64{-math.Abs(c.Spacing) / 2, math.Abs(c.Spacing) / 2}
	}
	return []float64{0}
}
