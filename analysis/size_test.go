package analysis

import (
	"fmt"
	"math"
	"strings"
	"testing"

	"coilmemo/calc"
	"coilmemo/spec"
)

// sizeSpec is a multilayer torque coil on a bobbin of fixed outside and
// depth, its turns, wire and radial build left free.
func sizeSpec(size, limits string) string {
	return "# T\n\n```coil\nname = t\nform = solenoid\nouter-diameter = 60 mm\nlength = 8 mm\n" +
		"insulation-class = 155 degC\nvoltage = 5 V\n```\n\n```size\n" + size + "\n```\n\n" +
		"```conditions\nambient = 20 degC\ncooling = vacuum\nmount-resistance = 40 K/W\n```\n\n```limits\n" + limits + "\n```\n"
}

// bruteForce evaluates every (turns, wire) choice of a size block in full,
// as the memo would evaluate that design, and returns for each objective
// the best one that meets every limit and physical constraint: no cheap
// figures, no ordering, no early stop.
func bruteForce(t *testing.T, s *spec.Spec) map[spec.Objective]bruteChoice {
	t.Helper()
	sz := s.Size
	out := map[spec.Objective]bruteChoice{}
	for _, w := range sz.Wires {
		for n := sz.TurnsLo; n <= sz.TurnsHi; n++ {
			d := s.Design
			d.Coils = append([]calc.Coil(nil), s.Design.Coils...)
			c := &d.Coils[0]
			c.Turns = n
			c.Wire.Gauge, c.Wire.Bare = w.Gauge, w.Bare
			c.Wire.Outer = calc.HeavyBuildOuter(w.Bare)
			fits := true
			for _, r := range sz.Ranges {
				if r.Key == "radial-build" {
					// the depth the turns need, to the micrometre above
					tpl := int(math.Floor(c.Length/c.Wire.Outer + 1e-9))
					layers := (n + tpl - 1) / tpl
					rb := math.Ceil(float64(layers)*c.Wire.Outer*1e6-1e-6) / 1e6
					fits = rb <= r.Hi
					spec.SetCoilKey(c, "radial-build", math.Max(rb, r.Lo))
				}
			}
			if !fits || calc.LayOut(*c).Overfull || spec.BuildProblem(*c) != "" {
				continue
			}
			r, ls := evaluateDesign(d)
			ok := !r.Coils[0].Runaway && !math.IsNaN(r.Coils[0].Temperature)
			for _, l := range ls {
				ok = ok && l.Pass
			}
			if !ok {
				continue
			}
			cr := r.Coils[0]
			for o, v := range map[spec.Objective]float64{
				spec.MinimumPower: cr.Power, spec.MinimumMass: cr.Mass,
				spec.MaximumMoment: -r.Moment.Norm(), spec.MaximumMomentPerPower: -r.Moment.Norm() / cr.PowerOn,
			} {
				if b, seen := out[o]; !seen || v < b.score {
					out[o] = bruteChoice{turns: n, wire: w, score: v}
				}
			}
		}
	}
	return out
}

type bruteChoice struct {
	turns int
	wire  spec.WireChoice
	score float64 // the objective, negated for a maximum
}

func runSize(t *testing.T, src string) *Study {
	t.Helper()
	st, diags := Run("s.md", []byte(src), Options{})
	if len(diags) > 0 {
		t.Fatalf("diagnostics: %v", diags)
	}
	if st.Sizing == nil {
		t.Fatal("no sizing")
	}
	return st
}

// The search's choice is the brute-force optimum for every objective, on a
// grid small enough to evaluate every choice in full.
func TestSizeMatchesBruteForce(t *testing.T) {
	limits := "moment >= 0.15 A m2\npower <= 3 W\nmass <= 20 g\ntemperature <= 120 degC"
	grid := "turns = 150 .. 330\nwire = AWG 27 .. AWG 32\nradial-build = 0 .. 10 mm\n"
	s, diags := spec.Parse("s.md", []byte(sizeSpec(grid+"objective = minimum power", limits)))
	if len(diags) > 0 {
		t.Fatal(diags)
	}
	brute := bruteForce(t, s)
	for o, name := range map[spec.Objective]string{spec.MinimumPower: "minimum power", spec.MinimumMass: "minimum mass",
		spec.MaximumMoment: "maximum moment", spec.MaximumMomentPerPower: "maximum moment per power"} {
		t.Run(name, func(t *testing.T) {
			st := runSize(t, sizeSpec(grid+"objective = "+name, limits))
			b, ok := brute[o]
			if !ok {
				t.Fatal("brute force found no feasible choice")
			}
			ch := st.Sizing.Chosen
			if ch.Turns != b.turns || ch.Wire != b.wire {
				t.Fatalf("search chose %s × %d (objective %g), brute force %s × %d (%g)", ch.Wire.Name(), ch.Turns, ch.Objective, b.wire.Name(), b.turns, b.score)
			}
			if v := math.Abs(b.score); math.Abs(ch.Objective-v) > 1e-9*v {
				t.Errorf("objective %g, brute force %g", ch.Objective, v)
			}
			// the rest of the study is the chosen design's
			if got := st.Spec.Design.Coils[0].Turns; got != b.turns {
				t.Errorf("study's coil has %d turns, chosen %d", got, b.turns)
			}
			if f, _ := st.Failed(); f != 0 {
				t.Errorf("%d limits fail at the choice", f)
			}
			if st.Sizing.Discrete != 181*6 || st.Sizing.Feasible == 0 || st.Sizing.Full < 1 {
				t.Errorf("counts: %d choices, %d feasible, %d full", st.Sizing.Discrete, st.Sizing.Feasible, st.Sizing.Full)
			}
		})
	}
}

// When the unconstrained best wire lies outside the range, the choice sits
// on the range's end gauge, and still agrees with brute force.
func TestSizeGaugeBoundary(t *testing.T) {
	limits := "moment >= 0.15 A m2\npower <= 3 W\nmass <= 20 g"
	grid := "turns = 150 .. 330\nradial-build = 0 .. 10 mm\nobjective = minimum power\nwire = "
	full := runSize(t, sizeSpec(grid+"AWG 24 .. AWG 34", limits))
	g := full.Sizing.Chosen.Wire.Gauge
	// a range that stops one gauge short of the free optimum, on its thick side
	rng := fmt.Sprintf("AWG %d .. AWG %d", g-3, g-1)
	src := sizeSpec(grid+rng, limits)
	s, _ := spec.Parse("s.md", []byte(src))
	b := bruteForce(t, s)[spec.MinimumPower]
	st := runSize(t, src)
	ch := st.Sizing.Chosen
	if ch.Wire.Gauge != g-1 {
		t.Errorf("free optimum AWG %d; with %s the choice is %s, want the boundary AWG %d", g, rng, ch.Wire.Name(), g-1)
	}
	if ch.Turns != b.turns || ch.Wire != b.wire {
		t.Errorf("search chose %s × %d, brute force %s × %d", ch.Wire.Name(), ch.Turns, b.wire.Name(), b.turns)
	}
	if !(ch.Objective > full.Sizing.Chosen.Objective) {
		t.Errorf("a narrower range cannot do better: %g vs %g", ch.Objective, full.Sizing.Chosen.Objective)
	}
}

// The spec written back builds, meets every limit, and sizes to the same
// choice again.
func TestSizeWrittenSpecBuilds(t *testing.T) {
	src := sizeSpec("turns = 50 .. 1500\nwire = AWG 24 .. AWG 40\nradial-build = 0 .. 10 mm\nobjective = minimum power",
		"moment >= 0.1 A m2\npower <= 1 W\nmass <= 30 g\ntemperature <= 120 degC")
	st := runSize(t, src)
	orig, _ := spec.Parse("s.md", []byte(src))
	co := st.Spec.Design.Coils[0]
	vals := map[string]string{"turns": SpecText(co, "turns"), "wire": SpecText(co, "wire"), "radial-build": SpecText(co, "radial-build")}
	out := spec.WriteChoice([]byte(src), orig, map[string]map[string]string{"t": vals}, "test")
	if !strings.Contains(string(out), "# chosen: test") {
		t.Fatalf("no comment line in\n%s", out)
	}
	// the written spec without its size block is a fixed design
	fixed := strings.Replace(string(out), "```size", "```text", 1)
	st2, diags := Run("s2.md", []byte(fixed), Options{})
	if len(diags) > 0 {
		t.Fatalf("written spec: %v\n%s", diags, fixed)
	}
	if f, c := st2.Failed(); f != 0 || c != 0 {
		t.Errorf("written spec: %d limits and %d checks fail", f, c)
	}
	if got, want := st2.Results.Coils[0].Power, st.Results.Coils[0].Power; math.Abs(got-want) > 1e-12*want {
		t.Errorf("written spec's power %g, the choice's %g", got, want)
	}
	st3 := runSize(t, string(out))
	if a, b := st3.Sizing.Chosen, st.Sizing.Chosen; a.Turns != b.Turns || a.Wire != b.Wire {
		t.Errorf("resizing the written spec chose %s × %d, first %s × %d", a.Wire.Name(), a.Turns, b.Wire.Name(), b.Turns)
	}
}

// Problems are positioned at the size block's lines.
func TestSizeDiagnostics(t *testing.T) {
	lim := "moment >= 0.1 A m2\npower <= 1 W"
	free := "wire = AWG 26 .. AWG 32\nradial-build = 0 .. 10 mm\n"
	for _, tc := range []struct{ size, limits, want string }{
		{free + "turns = 50 .. 40\nobjective = minimum power", lim, "is empty"},
		{free + "turns = 50 .. 400\nwidth = 10 .. 20 mm\nobjective = minimum power", lim, "is not a rectangle"},
		{free + "turns = 50 .. 400\ncurrent = 1 .. 2 A\nobjective = minimum power", lim, "driven by voltage"},
		{free + "turns = 50 .. 400\nmean-diameter = 20 .. 50 mm\nobjective = minimum power", lim, "does not state mean-diameter"},
		{free + "turns = 50 .. 400\nobjective = minimum power", "power <= 1 W", "delivers nothing"},
		{free + "turns = 50 .. 400\nobjective = minmum power", lim, "did you mean"},
		{free + "turns = 50 .. 400", lim, "no objective"},
		{"wire = AWG 30\nturns = 50 .. 400\nradial-build = 0 .. 10 mm\nobjective = minimum power", lim, "one wire is no choice"},
		{"wire = AWG 26 .. AWG 32\nturns = 50 .. 400\nradial-build = 3 .. 1 mm\nobjective = minimum power", lim, "reversed or empty"},
		{free + "turns = 1 .. 2000000\nobjective = minimum power", lim, "more than"},
		{free + "turns = 50 .. 400\nduty = 10 .. 50 %\nobjective = minimum power", lim, "cannot be left free"},
		// no feasible design: the moment cannot be reached from 5 V in this space
		{free + "turns = 50 .. 400\nobjective = minimum power", "moment >= 20 A m2", "moment >= 20.0 A·m² excludes the most"},
	} {
		src := sizeSpec(tc.size, tc.limits)
		_, diags := Run("s.md", []byte(src), Options{})
		found := false
		for _, d := range diags {
			if strings.Contains(d.Msg, tc.want) {
				found = true
				if d.Line < 10 {
					t.Errorf("%q: %v is not at the size block (lines 10 on)", tc.size, d)
				}
			}
		}
		if !found {
			t.Errorf("%q: %v, want %q", tc.size, diags, tc.want)
		}
	}
}

// The no-choice diagnostic says how near the best comes.
func TestSizeNoChoiceNearest(t *testing.T) {
	src := sizeSpec("turns = 50 .. 400\nwire = AWG 26 .. AWG 32\nradial-build = 0 .. 10 mm\nobjective = minimum power", "moment >= 20 A m2")
	_, diags := Run("s.md", []byte(src), Options{})
	if len(diags) != 1 || !strings.Contains(diags[0].Msg, "the nearest reaches") || !strings.Contains(diags[0].Msg, "short") {
		t.Fatalf("%v", diags)
	}
}

// A free numeric key other than the radial build is searched by golden
// section: the mean diameter of a thin loop of fixed turns and wire under
// a mass limit. The moment at fixed current grows with the diameter and so
// does the mass, so the best moment sits where the mass limit binds; the
// search must land there to the stated tolerance.
func TestSizeGoldenSection(t *testing.T) {
	src := "# T\n\n```coil\nname = t\nmean-diameter = 50 mm\nturns = 100\nwire = AWG 30\ncurrent = 0.1 A\n```\n\n" +
		"```size\nmean-diameter = 20 .. 200 mm\nobjective = maximum moment\n```\n\n```limits\nmass <= 5 g\n```\n"
	st := runSize(t, src)
	D := st.Spec.Design.Coils[0].MeanDiameter
	// the mass of 100 turns of AWG 30 copper is ρm (π d²/4) N π D: the
	// diameter at 5 g
	d := calc.AWGDiameter(30)
	want := 0.005 / (calc.Copper().Density * math.Pi * d * d / 4 * 100 * math.Pi)
	if D > want*(1+1e-9) || D < want-1e-4*(0.2-0.02)-1e-12 {
		t.Errorf("mean diameter %.6g m, want the mass limit's %.6g m (within 1e-4 of the range below it)", D, want)
	}
}

// An a.c. voltage drive needs every choice's inductance: a search that
// would take too long is refused at once, at the size block.
func TestSizeACWorkBound(t *testing.T) {
	src := strings.Replace(sizeSpec("turns = 100 .. 3000\nwire = AWG 20 .. AWG 36\nradial-build = 0 .. 10 mm\nobjective = minimum power", "moment >= 0.1 A m2"),
		"voltage = 5 V\n", "voltage = 5 V\nfrequency = 50 Hz\n", 1)
	_, diags := Run("s.md", []byte(src), Options{})
	if len(diags) != 1 || !strings.Contains(diags[0].Msg, "a.c. voltage") || diags[0].Line != 13 {
		t.Fatalf("%v", diags)
	}
}

// A cored coil is refused at the size block, at once.
func TestSizeCoredRefused(t *testing.T) {
	src := strings.Replace(sizeSpec("turns = 100 .. 3000\nwire = AWG 20 .. AWG 36\nradial-build = 0 .. 10 mm\nobjective = minimum power", "moment >= 0.1 A m2"),
		"voltage = 5 V\n", "voltage = 5 V\ncore-permeability = 5000\ncore-saturation = 0.75 T\ncore-length = 70 mm\ncore-diameter = 6 mm\n", 1)
	_, diags := Run("s.md", []byte(src), Options{})
	if !strings.Contains(diags.Error(), "has a core") {
		t.Fatalf("%v", diags)
	}
}
