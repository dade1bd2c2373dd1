package memo

import (
	"fmt"
	"math"
	"strconv"
	"strings"

	"coilmemo/analysis"
	"coilmemo/calc"
	"coilmemo/spec"
)

// The figures a coil block gets are chosen from what the design is for.
// The rules, one place for all of them:
//
//   - Winding sketch: every coil but a thin circular coil on its own (a
//     loop's bundle is a dot at the coil's scale: a sentence says its
//     size instead). A rectangle is drawn in plan.
//   - Axis profile: a moment design (a requirement on the moment or the
//     torque, or a size block that seeks moment) is judged by its
//     far field, so it gets |B| on the axis with the point dipole beside
//     it, on a log axis when the field spans decades. An air-core coil
//     that is not a moment design is judged by its near field: Bz on
//     linear axes over the bore (a solenoid, out to about 1.5 lengths,
//     the ends marked), across the pair (the windings shaded) or out to
//     three sizes of a loop or rectangle (its plane marked). A cored coil
//     gets the far-field profile of winding and core.
//   - Pairs: an aiding pair its homogeneity (the field's departure from
//     its centre value against the distance from the centre, axially and
//     radially, with a uniform-radius requirement drawn); an opposing pair
//     its gradient against position on the axis, with a gradient
//     requirement drawn.
//   - Field map: every coil with an extent to map.
//   - Torque against angle: none. It is the sine m·B·sin θ whatever the
//     design, so the text gives its peak m·B at 90° and its value at the
//     design angle instead.
//   - Warm-up (memo/thermal.go): not drawn when the winding warms by less
//     than 1 K.
//   - Plane of interest: a rectangle (a panel coil) with probes gets Bn,
//     the flux density normal to it, mapped over the plane parallel to
//     it in which every probe lies or, when the probes are not in one
//     such plane, the plane through the first probe (the probes in it
//     marked); with the uniform regions (±1 %, ±5 % of the centre value)
//     in its text. A rectangle without probes gets none: its axis
//     profile and meridian map already show its near field, and no other
//     plane is named.
//   - Coil set: two or more driven coils whose axes are not all parallel
//     (a three-axis torquer set) get a bar chart of each coil's moment by
//     its components and a table of their coupling coefficients.

// profileKind is which on-axis figure a coil block gets.
type profileKind int

const (
	farProfile  profileKind = iota // |B| with the dipole beside it
	boreProfile                    // a solenoid's Bz over its bore, linear
	pairProfile                    // a pair's Bz across the pair, linear
	nearProfile                    // a loop's or rectangle's Bz near its plane, linear
)

// coilFigures is the choice of figures for one coil block.
type coilFigures struct {
	Sketch      bool // the winding's sketch (plan of a rectangle, section of the rest)
	Profile     profileKind
	Homogeneity bool // an aiding pair's departure from the centre field
	Gradient    bool // an opposing pair's gradient along the axis
}

// momentDesign reports whether the design is for its magnetic moment:
// a requirement on the moment or the torque, or a size block that seeks
// moment.
func momentDesign(j *analysis.Study) bool {
	for _, l := range j.Spec.Design.Limits {
		if l.Quantity == "moment" || l.Quantity == "torque" {
			return true
		}
	}
	if s := j.Spec.Size; s != nil && (s.Objective == spec.MaximumMoment || s.Objective == spec.MaximumMomentPerPower) {
		return true
	}
	return false
}

// figuresFor chooses the figures of coil block i (the rules above).
func figuresFor(j *analysis.Study, i int) coilFigures {
	co, cr, cs := j.Spec.Design.Coils[i], j.Results.Coils[i], j.Coils[i]
	f := coilFigures{Sketch: true}
	if co.Form != calc.Rectangle && co.Form != calc.Pair && cr.Winding.Thin {
		f.Sketch = false
	}
	switch {
	case momentDesign(j) || cs.Axis.Bore == nil:
		f.Profile = farProfile
	case co.Form == calc.Pair:
		f.Profile = pairProfile
	case co.Form == calc.Loop || co.Form == calc.Rectangle:
		f.Profile = nearProfile
	default:
		f.Profile = boreProfile
	}
	if co.Form == calc.Pair && cs.Pair != nil {
		f.Homogeneity = !co.Opposing
		f.Gradient = co.Opposing && cs.Axis.Bore != nil && cs.Axis.Bore.Gz != nil
	}
	return f
}

// planeShown is the plane map of coil block i, nil when it gets none
// (the rules above; analysis.PlaneOfInterest finds the plane).
func planeShown(j *analysis.Study, i int) *analysis.PlaneMap {
	if i < len(j.Design.Planes) {
		return j.Design.Planes[i]
	}
	return nil
}

// axisSetShown reports whether the design gets the coil set's moments and
// couplings: two or more driven coils whose axes are not all parallel.
func axisSetShown(j *analysis.Study) bool {
	as := j.Design.Axes
	return as != nil && len(as.Coils) >= 2
}

// axisName names a coil's axis for a figure's abscissa: "z", "x", "−y"
// for an axis along a coordinate, or its direction, e.g. "(0.71, 0.71,
// 0)", for a tilted one.
func axisName(co calc.Coil) string {
	u := co.Axis.Unit()
	if u == (calc.Vec{}) {
		return "z"
	}
	for k, n := range []string{"x", "y", "z"} {
		if math.Abs(u[k]) > 1-1e-12 {
			if u[k] < 0 {
				return "−" + n
			}
			return n
		}
	}
	var parts []string
	for _, v := range u {
		s := strconv.FormatFloat(math.Round(v*100)/100, 'f', -1, 64)
		if s == "-0" {
			s = "0"
		}
		parts = append(parts, strings.Replace(s, "-", "−", 1))
	}
	return fmt.Sprintf("(%s)", strings.Join(parts, ", "))
}

// frameNote is what a coil-frame figure's caption adds for a tilted
// coil, whose axis label (figures.AxialLabel) cannot name the direction:
// "; w: position along the coil's axis (0.71, 0.71, 0) from its centre".
func frameNote(co calc.Coil) string {
	if a := axisName(co); strings.HasPrefix(a, "(") {
		return "; w: position along the coil's axis " + a + " from its centre"
	}
	return ""
}

// uniformRequirement finds the uniform-radius requirement on coil block
// i: its required radius (m) and tolerance, ok false when there is none.
func uniformRequirement(j *analysis.Study, i int) (r, tol float64, ok bool) {
	for _, l := range j.Limits {
		if l.Limit.Quantity == "uniform-radius" && l.Coil == i {
			t := l.Limit.Tolerance
			if !(t > 0) {
				t = 0.01
			}
			return l.Limit.Required, t, true
		}
	}
	return 0, 0, false
}

// gradientRequirement finds the gradient requirement on coil block i
// (T/m, a magnitude), ok false when there is none.
func gradientRequirement(j *analysis.Study, i int) (g float64, rel calc.Relation, ok bool) {
	for _, l := range j.Limits {
		if l.Limit.Quantity == "gradient" && l.Coil == i {
			return l.Limit.Required, l.Limit.Relation, true
		}
	}
	return 0, 0, false
}

// axialSymbol is the symbol of the flux density's component along a
// coil's axis, and of the coordinate along it: Bz and z for a coil along
// z, Bx and x along x, By and y along y; for any other direction Ba and a
// (the component along the coil's own axis).
func axialSymbol(co calc.Coil) (b, a string) {
	switch axisName(co) {
	case "z":
		return "Bz", "z"
	case "x":
		return "Bx", "x"
	case "y":
		return "By", "y"
	}
	return "Ba", "a"
}

// unitVector is the unit vector along each coordinate axialSymbol names.
var unitVector = map[string]string{"x": "x̂", "y": "ŷ", "z": "ẑ", "a": "â"}

// gradientSymbol is the symbol of the axial gradient along a coil's axis,
// ∂Bz/∂z for a coil along z (axialSymbol).
func gradientSymbol(co calc.Coil) string {
	bs, as := axialSymbol(co)
	return "∂" + bs + "/∂" + as
}

// axialNote explains the symbol Ba where axialSymbol uses it.
func axialNote(co calc.Coil) string {
	if b, _ := axialSymbol(co); b == "Ba" {
		return fmt.Sprintf(" Ba is the component along the coil's axis, the direction %s.", axisName(co))
	}
	return ""
}
