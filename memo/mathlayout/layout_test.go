package mathlayout

import (
	"math"
	"strings"
	"testing"
)

const size = 10.0

func lay(t *testing.T, src string, display bool) Box {
	t.Helper()
	b, err := Layout(src, Options{Size: size, Display: display})
	if err != nil {
		t.Fatalf("%q: %v", src, err)
	}
	return b
}

func near(a, b float64) bool { return math.Abs(a-b) < 1e-9 }

// glyphs returns the glyph items whose text is s.
func glyphs(b Box, s string) []Item {
	var out []Item
	for _, it := range b.Items {
		if it.Kind == Glyphs && it.Text == s {
			out = append(out, it)
		}
	}
	return out
}

func rules(b Box) []Item {
	var out []Item
	for _, it := range b.Items {
		if it.Kind == Rule {
			out = append(out, it)
		}
	}
	return out
}

// pathBounds returns the vertical extent of every path point.
func pathBounds(b Box) (lo, hi float64) {
	lo, hi = math.Inf(1), math.Inf(-1)
	for _, it := range b.Items {
		if it.Kind != Path {
			continue
		}
		for _, s := range it.Segs {
			if s.Op == 'Z' {
				continue
			}
			lo, hi = math.Min(lo, s.Y), math.Max(hi, s.Y)
		}
	}
	return
}

func TestFractionOnTheAxis(t *testing.T) {
	for _, display := range []bool{true, false} {
		num := lay(t, "a", false)
		f := lay(t, `\frac{a}{b}`, display)
		rs := rules(f)
		if len(rs) != 1 {
			t.Fatalf("display=%v: %d rules, want the fraction bar", display, len(rs))
		}
		bar := rs[0]
		// The bar is centred on the math axis, RuleThickness thick.
		if c := bar.Y + bar.H/2; !near(c, AxisHeight()*size) {
			t.Errorf("display=%v: bar centre at %.4f pt, math axis at %.4f pt", display, c, AxisHeight()*size)
		}
		if !near(bar.H, RuleThickness*size) {
			t.Errorf("bar %.3f pt thick, want %.3f", bar.H, RuleThickness*size)
		}
		// The box reaches above the numerator's own height and below the
		// baseline, and the bar spans both parts.
		if !(f.Ascent > num.Ascent) {
			t.Errorf("display=%v: fraction ascent %.3f not above the numerator's height %.3f", display, f.Ascent, num.Ascent)
		}
		if !(f.Descent > 0) {
			t.Errorf("display=%v: fraction has no descent", display)
		}
		a, b := glyphs(f, "a"), glyphs(f, "b")
		if len(a) != 1 || len(b) != 1 {
			t.Fatalf("numerator or denominator missing: %+v", f.Items)
		}
		if !(a[0].Y > bar.Y+bar.H) || !(b[0].Y < bar.Y) {
			t.Errorf("numerator baseline %.3f / denominator %.3f not either side of the bar %.3f", a[0].Y, b[0].Y, bar.Y)
		}
		if bar.X > a[0].X || bar.X+bar.W < a[0].X+TextWidth(a[0].Face, a[0].Size, "a") {
			t.Error("the bar does not span the numerator")
		}
		// Displayed fractions set their parts at full size, text-style
		// fractions at script size.
		want := size
		if !display {
			want = size * ScriptScale
		}
		if !near(a[0].Size, want) {
			t.Errorf("display=%v: numerator at %.2f pt, want %.2f", display, a[0].Size, want)
		}
	}
	// A displayed fraction is taller than an inline one.
	if d, i := lay(t, `\frac{a}{b}`, true), lay(t, `\frac{a}{b}`, false); !(d.Ascent > i.Ascent && d.Descent > i.Descent) {
		t.Error("displayed fraction not taller than inline")
	}
}

func TestScripts(t *testing.T) {
	cases := []struct {
		src     string
		display bool
		glyph   string
		y       float64
	}{
		{"x^2", false, "2", SupRaiseText * size},
		{"x^2", true, "2", SupRaiseDisplay * size},
		{"x_w", false, "w", -SubDropAlone * size},
		{"10⁻⁸", false, "8", SupRaiseText * size},
		{"R₂₀", false, "20", -SubDropAlone * size},
	}
	for _, c := range cases {
		b := lay(t, c.src, c.display)
		g := glyphs(b, c.glyph)
		if len(g) != 1 {
			t.Errorf("%q: no glyph %q: %+v", c.src, c.glyph, b.Items)
			continue
		}
		if !near(g[0].Y, c.y) {
			t.Errorf("%q (display %v): script baseline at %.4f pt, want %.4f pt (%.2f em)", c.src, c.display, g[0].Y, c.y, c.y/size)
		}
		if !near(g[0].Size, ScriptScale*size) {
			t.Errorf("%q: script set at %.2f pt, want %.2f", c.src, g[0].Size, ScriptScale*size)
		}
	}
	// Under a fraction bar (cramped) a superscript sits lower.
	b := lay(t, `\frac{1}{x^2}`, true)
	g := glyphs(b, "2")
	x := glyphs(b, "x")
	if len(g) != 1 || len(x) != 1 || !near(g[0].Y-x[0].Y, SupRaiseCramped*size) {
		t.Errorf("cramped superscript: %+v", b.Items)
	}
	// Both scripts: the subscript drops further and they do not collide.
	b = lay(t, "T_a^4", false)
	sup, sub := glyphs(b, "4"), glyphs(b, "a")
	if len(sup) != 1 || len(sub) != 1 {
		t.Fatalf("T_a^4: %+v", b.Items)
	}
	if sub[0].Y > -SubDropAlone*size {
		t.Errorf("subscript with a superscript at %.3f, want below %.3f", sub[0].Y, -SubDropAlone*size)
	}
	supBox, subBox := lay(t, "4", false), lay(t, "a", false)
	gap := (sup[0].Y - supBox.Descent*ScriptScale) - (sub[0].Y + subBox.Ascent*ScriptScale)
	if gap < 4*RuleThickness*size-1e-9 {
		t.Errorf("scripts %.3f pt apart, want at least %.3f", gap, 4*RuleThickness*size)
	}
	// Scripts of scripts are smaller again.
	b = lay(t, "e^{x^2}", false)
	if g := glyphs(b, "2"); len(g) != 1 || !near(g[0].Size, ScriptScriptScale*size) {
		t.Errorf("second-level script: %+v", b.Items)
	}
}

func TestBaselineAndItalics(t *testing.T) {
	b := lay(t, `R_{20} = 4.039\,\unit{Ω}`, true)
	r := glyphs(b, "R")
	if len(r) != 1 || r[0].Y != 0 || r[0].Face != (Face{"serif", "I"}) {
		t.Errorf("variable R not italic on the baseline: %+v", r)
	}
	if n := glyphs(b, "4.039"); len(n) != 1 || n[0].Face != (Face{"serif", ""}) || n[0].Y != 0 {
		t.Errorf("number not one upright run on the baseline: %+v", b.Items)
	}
	if u := glyphs(b, "Ω"); len(u) != 1 || u[0].Face.Style != "" {
		t.Errorf("unit not upright: %+v", u)
	}
	eq := glyphs(b, "=")
	if len(eq) != 1 || !near(b.Align, eq[0].X) {
		t.Errorf("Align %.3f is not the x of \"=\" (%+v)", b.Align, eq)
	}
	// Relation signs get a thick space each side, binary signs a medium one.
	rel := lay(t, "a=b", false)
	bin := lay(t, "a+b", false)
	gap := func(b Box, sign string) float64 {
		s := glyphs(b, sign)[0]
		return s.X - TextWidth(Face{"serif", "I"}, size, "a")
	}
	if !near(gap(rel, "="), 5.0/18*size) || !near(gap(bin, "+"), 4.0/18*size) {
		t.Errorf("spacing: rel %.3f, bin %.3f", gap(rel, "="), gap(bin, "+"))
	}
	// A leading minus is unary: no space after it.
	neg := lay(t, "-a", false)
	if a := glyphs(neg, "a"); len(a) != 1 || !near(a[0].X, TextWidth(Face{"serif", ""}, size, "−")) {
		t.Errorf("unary minus spaced: %+v", neg.Items)
	}
	// Lower-case Greek is italic, upper-case upright; ℓ comes from the
	// sans face that has it.
	g := lay(t, `\rho \Omega \ell`, false)
	if len(glyphs(g, "ρ")) != 1 || glyphs(g, "ρ")[0].Face.Style != "I" || glyphs(g, "Ω")[0].Face.Style != "" {
		t.Errorf("Greek faces: %+v", g.Items)
	}
	if l := glyphs(g, "ℓ"); len(l) != 1 || l[0].Face.Family != "sans" {
		t.Errorf("ℓ: %+v", l)
	}
}

func TestRootCoversRadicand(t *testing.T) {
	for _, src := range []string{`\sqrt{x+y}`, `\sqrt{\frac{4ar}{(a+r)^2+z^2}}`, `\sqrt[3]{x}`} {
		b := lay(t, src, true)
		inner, _ := Layout(strings.TrimSuffix(strings.SplitN(src, "{", 2)[1], "}"), Options{Size: size, Display: true})
		var bar Item
		for _, r := range rules(b) {
			if r.W > bar.W {
				bar = r
			}
		}
		// The overbar lies above the radicand's ink and spans all of it.
		lo, hi := math.Inf(1), math.Inf(-1)
		for _, it := range b.Items {
			if it.Kind == Glyphs && it.Size == size {
				lo = math.Min(lo, it.X)
				hi = math.Max(hi, it.X+TextWidth(it.Face, it.Size, it.Text))
			}
		}
		top := inner.Ascent
		if !(bar.Y > top) {
			t.Errorf("%s: overbar at %.3f, radicand reaches %.3f", src, bar.Y, top)
		}
		if !(bar.X <= lo && bar.X+bar.W >= hi) {
			t.Errorf("%s: overbar [%.2f, %.2f] does not cover the radicand [%.2f, %.2f]", src, bar.X, bar.X+bar.W, lo, hi)
		}
		// The sign reaches from the overbar down below the radicand.
		plo, phi := pathBounds(b)
		if !(phi >= bar.Y) || !(plo < -inner.Descent) {
			t.Errorf("%s: sign spans %.2f…%.2f, radicand %.2f…%.2f", src, plo, phi, -inner.Descent, inner.Ascent)
		}
		if !(b.Ascent >= bar.Y+bar.H) || !(b.Width > inner.Width) {
			t.Errorf("%s: box %.2f × %.2f does not hold the root", src, b.Width, b.Ascent)
		}
	}
}

func TestBracketsGrow(t *testing.T) {
	plain := lay(t, "(x)", true)
	paren := glyphs(plain, "(")
	if len(paren) != 1 {
		t.Fatalf("plain bracket is not the font's glyph: %+v", plain.Items)
	}
	small := lay(t, `\left( x \right)`, true)
	if len(glyphs(small, "(")) != 1 {
		t.Errorf("a bracket round one letter should be the font's glyph: %+v", small.Items)
	}
	grown := lay(t, `\left( \frac{a}{b} \right)`, true)
	if len(glyphs(grown, "(")) != 0 {
		t.Fatal("a bracket round a fraction did not grow")
	}
	lo, hi := pathBounds(grown)
	if !(hi-lo > plain.Ascent+plain.Descent) {
		t.Errorf("grown bracket %.2f pt high, plain bracket %.2f pt", hi-lo, plain.Ascent+plain.Descent)
	}
	// centred on the math axis and covering most of the fraction
	if c := (hi + lo) / 2; !near(c, AxisHeight()*size) {
		t.Errorf("grown bracket centred at %.3f, axis %.3f", c, AxisHeight()*size)
	}
	frac := lay(t, `\frac{a}{b}`, true)
	if hi-lo < delimFactor*(frac.Ascent+frac.Descent)-1e-9 {
		t.Errorf("grown bracket %.2f pt, fraction %.2f pt", hi-lo, frac.Ascent+frac.Descent)
	}
	for _, d := range []string{`\left[ \frac{a}{b} \right]`, `\left| \frac{a}{b} \right|`, `\left\{ \frac{a}{b} \right\}`, `\left\lfloor \frac{a}{b} \right\rfloor`, `\left. \frac{a}{b} \right)`} {
		b := lay(t, d, true)
		if !(b.Ascent >= frac.Ascent && b.Width > frac.Width) {
			t.Errorf("%s: %.2f × %.2f", d, b.Width, b.Ascent)
		}
	}
	// A big operator is larger in display than in text style.
	ds, ts := lay(t, `\sum_{i=1}^{N} x_i`, true), lay(t, `\sum_{i=1}^{N} x_i`, false)
	if !(ds.Ascent > ts.Ascent) || glyphs(ds, "∑")[0].Size <= glyphs(ts, "∑")[0].Size {
		t.Error("∑ not larger in display style")
	}
}

func TestAccents(t *testing.T) {
	m := lay(t, "m", true)
	for _, src := range []string{`\vec{m}`, `\hat{r}`, `\bar{D}`, `\dot{x}`, `\tilde{x}`, "D̄"} {
		b := lay(t, src, true)
		if len(b.Items) < 2 {
			t.Errorf("%s: no accent drawn: %+v", src, b.Items)
		}
		if !(b.Ascent > m.Ascent) {
			t.Errorf("%s: ascent %.2f not above the letter", src, b.Ascent)
		}
	}
}

func TestBadNotationFallsBack(t *testing.T) {
	for _, src := range []string{
		`\frac{1}{`, `x^`, `\unknown{x}`, `x^2^3`, `}`, `\left( x`, `x \right)`, `\sqrt[3{x}`,
		`\left< x \right>`, "\u0304x", `\text{open`, `a & b`, strings.Repeat("{", 60) + strings.Repeat("}", 60),
	} {
		b, err := Layout(src, Options{Size: size})
		if err == nil {
			t.Errorf("%q: no error", src)
			continue
		}
		e, ok := err.(*Error)
		if !ok || e.Pos < 0 || e.Pos > len(src) {
			t.Errorf("%q: error %v has no position in the source", src, err)
		}
		if len(b.Items) == 0 || !(b.Width > 0) {
			t.Errorf("%q: no fallback text", src)
		}
		var text strings.Builder
		for _, it := range b.Items {
			text.WriteString(it.Text)
		}
		if text.String() != src {
			t.Errorf("%q: fallback shows %q", src, text.String())
		}
	}
}

func TestLinesBreakBeforeSigns(t *testing.T) {
	src := `P = a + b + c + d + e + f + g + h + i + j + k`
	whole := lay(t, src, true)
	lines, err := Lines(src, Options{Size: size, Display: true}, whole.Width/2)
	if err != nil {
		t.Fatal(err)
	}
	if len(lines) < 2 {
		t.Fatalf("not broken: %d line", len(lines))
	}
	for i, l := range lines {
		if l.Width > whole.Width/2+1e-9 {
			t.Errorf("line %d is %.1f pt wide, more than %.1f", i, l.Width, whole.Width/2)
		}
		if i > 0 {
			first := l.Items[0]
			if first.Text != "+" {
				t.Errorf("line %d starts with %q, want the sign", i, first.Text)
			}
		}
	}
}

func TestMetricsAreTheFontsAdvances(t *testing.T) {
	// DejaVu Serif: "x" advances 0.564 em, the minus 0.838 em.
	if w := TextWidth(Face{"serif", ""}, 1000, "x−"); !near(w, 564+838) {
		t.Errorf("advances %.3f, want 1402 thousandths", w)
	}
	if a := AxisHeight(); a < 0.28 || a > 0.34 {
		t.Errorf("math axis %.3f em", a)
	}
}

func FuzzLayout(f *testing.F) {
	for _, s := range []string{`\frac{a}{b}`, `x^{2}_{i}`, `\left( \sqrt[3]{x} \right)`, `\unit{A·m^2}`, `\sum_{i}^{N} \vec{m}`, "10⁻⁸ R₂₀", `\text{a {b} c}`} {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, s string) {
		b, _ := Layout(s, Options{Size: 9, Display: len(s)%2 == 0})
		if math.IsNaN(b.Width) || math.IsNaN(b.Ascent) || math.IsNaN(b.Descent) {
			t.Fatalf("%q: NaN box", s)
		}
		_, _ = Lines(s, Options{Size: 9}, 40)
	})
}
