package mathlayout

import (
	"math"
	"strings"
	"unicode/utf8"
)

// Options set the size and style of a formula.
type Options struct {
	Size    float64 // font size in points; 10 if zero
	Display bool    // a displayed equation: full-size fractions, limits above and below big operators
}

// Layout parameters in ems of the current size (see the package comment).
const (
	ScriptScale       = 0.7  // script size / text size
	ScriptScriptScale = 0.5  // second-level script size / text size
	SupRaiseDisplay   = 0.41 // superscript baseline above the baseline, displayed style
	SupRaiseText      = 0.36 // text style
	SupRaiseCramped   = 0.29 // cramped (under a bar)
	SubDropAlone      = 0.15 // subscript baseline below the baseline
	SubDropWithSup    = 0.25 // when there is a superscript too
	RuleThickness     = 0.06 // fraction bars, overbars
	scriptSpace       = 0.05 // after a script
	fracNumDisplay    = 0.68 // numerator baseline above the baseline, displayed
	fracNumText       = 0.40
	fracDenDisplay    = 0.69 // denominator baseline below the baseline, displayed
	fracDenText       = 0.35
	fracPad           = 0.10 // clear space each side of a fraction
	bigOpScale        = 1.45 // a big operator in displayed style
	bigIntScale       = 1.6
	delimFactor       = 0.901 // a grown bracket covers this share of its content…
	delimShortfall    = 0.5   // …or all of it less this many ems
)

// style is a TeX-like style: display, text, script, scriptscript, each
// perhaps cramped (superscripts set lower).
type style struct {
	level   int // 0 display, 1 text, 2 script, 3 scriptscript
	cramped bool
	base    float64
}

func (s style) size() float64 {
	switch s.level {
	case 2:
		return s.base * ScriptScale
	case 3:
		return s.base * ScriptScriptScale
	}
	return s.base
}

func (s style) display() bool { return s.level == 0 }
func (s style) script() bool  { return s.level >= 2 }

func (s style) sup() style {
	t := s
	t.level = 3
	if s.level <= 1 {
		t.level = 2
	}
	return t
}

func (s style) sub() style { t := s.sup(); t.cramped = true; return t }

func (s style) num() style {
	t := s
	switch s.level {
	case 0:
		t.level = 1
	case 1:
		t.level = 2
	default:
		t.level = 3
	}
	return t
}

func (s style) den() style { t := s.num(); t.cramped = true; return t }

func (s style) crampedStyle() style { t := s; t.cramped = true; return t }

// Layout typesets notation. On an error it returns a box showing the
// source as plain upright text, together with the error.
func Layout(src string, o Options) (Box, error) {
	l, err := parse(src)
	if err != nil {
		return Plain(src, o.Size), err
	}
	return layoutList(l, o), nil
}

// Plain sets s as upright serif text: the fallback for notation that could
// not be read.
func Plain(s string, size float64) Box {
	if size <= 0 {
		size = 10
	}
	b := run(s, Face{"serif", ""}, size)
	return Box{Width: b.w, Ascent: b.h, Descent: b.d, Items: b.items, Align: -1}
}

func layoutList(l *mlist, o Options) Box {
	size := o.Size
	if size <= 0 {
		size = 10
	}
	st := style{level: 1, base: size}
	if o.Display {
		st.level = 0
	}
	var align float64
	b := hlist(l, st, &align)
	if b.w < 0 {
		b.w = 0
	}
	return Box{Width: b.w, Ascent: b.h, Descent: b.d, Items: b.items, Align: align}
}

// Lines typesets notation as one or more lines no wider than width
// (points), breaking before a relation or binary sign of the top level
// where it must; continuation lines start with that sign. A part too wide
// to break stays whole, wider than width.
func Lines(src string, o Options, width float64) ([]Box, error) {
	l, err := parse(src)
	if err != nil {
		return []Box{Plain(src, o.Size)}, err
	}
	whole := layoutList(l, o)
	if whole.Width <= width || width <= 0 {
		return []Box{whole}, nil
	}
	var out []Box
	items := l.items
	first := true
	for len(items) > 0 {
		// The longest prefix that fits and ends before a break point:
		// first before a relation or a plus or minus sign, else before
		// any binary sign (a product).
		best := -1
		for _, preferred := range []bool{true, false} {
			for i := 1; i <= len(items); i++ {
				if i < len(items) && !breakBefore(items[i], preferred) {
					continue
				}
				b := layoutList(&mlist{items: lead(items[:i], !first)}, o)
				if b.Width > width {
					break
				}
				best = i
			}
			if best > 0 {
				break
			}
		}
		if best < 0 {
			// nothing fits: break at the first place there is
			best = len(items)
			for i := 1; i < len(items); i++ {
				if breakBefore(items[i], false) {
					best = i
					break
				}
			}
		}
		out = append(out, layoutList(&mlist{items: lead(items[:best], !first)}, o))
		items = items[best:]
		first = false
	}
	return out, nil
}

// breakBefore reports whether a line may break before n: before a
// relation or a binary sign, or, if preferred, before a relation or a
// sign of addition only.
func breakBefore(n node, preferred bool) bool {
	a, ok := n.(*atom)
	if !ok {
		return false
	}
	if a.cls == rel {
		return true
	}
	if a.cls != bin {
		return false
	}
	if !preferred {
		return true
	}
	s, ok := a.nuc.(*symbol)
	return ok && (s.text == "+" || s.text == "−" || s.text == "±" || s.text == "∓")
}

// lead puts an empty ordinary atom before a continuation line's sign so
// that it keeps its spacing as a binary or relation sign.
func lead(items []node, cont bool) []node {
	if !cont {
		return items
	}
	return append([]node{&atom{cls: ord, nuc: &mlist{}}}, items...)
}

// hlist lays out a list left to right with the spacing of each pair of
// atoms. If align is not nil it receives the x of the first relation.
func hlist(l *mlist, st style, align *float64) box {
	if align != nil {
		*align = -1
	}
	var o box
	size := st.size()
	// Classes, with binary signs in a place where they cannot be binary
	// (at the start, after another sign or an opening bracket) made
	// ordinary.
	var atoms []*atom
	for _, n := range l.items {
		if a, ok := n.(*atom); ok {
			atoms = append(atoms, a)
		}
	}
	cls := map[*atom]class{}
	var prev *atom
	for _, a := range atoms {
		c := a.cls
		if c == bin {
			if prev == nil {
				c = ord
			} else {
				switch cls[prev] {
				case bin, opc, rel, open, punct:
					c = ord
				}
			}
		}
		if (c == rel || c == close || c == punct) && prev != nil && cls[prev] == bin {
			cls[prev] = ord
		}
		cls[a] = c
		prev = a
	}
	if prev != nil && cls[prev] == bin {
		cls[prev] = ord
	}
	x := 0.0
	var last *atom
	for _, n := range l.items {
		switch n := n.(type) {
		case *space:
			x += n.mu / 18 * size
		case *atom:
			c := cls[n]
			if last != nil {
				s := spacing[cls[last]][c]
				if s < 0 {
					if st.script() {
						s = 0
					} else {
						s = -s
					}
				}
				x += float64(s) / 18 * size
			}
			b := atomBox(n, st)
			if align != nil && *align < 0 && c == rel {
				*align = x
			}
			o.place(b, x, 0)
			o.h = math.Max(o.h, b.h)
			o.d = math.Max(o.d, b.d)
			x += b.w
			last = n
			if len(atoms) == 1 {
				o.ic, o.char, o.inkL, o.inkR, o.italic = b.ic, b.char, b.inkL, b.inkR, b.italic
			}
		}
	}
	o.w = x
	return o
}

// run sets text in one face (split into runs of the face that has each
// character).
func run(s string, fc Face, size float64) box {
	var o box
	x := 0.0
	var cur strings.Builder
	curFace := fc
	curX := 0.0
	flush := func() {
		if cur.Len() > 0 {
			o.items = append(o.items, Item{Kind: Glyphs, X: curX, Face: curFace, Size: size, Text: cur.String()})
			cur.Reset()
		}
	}
	n := utf8.RuneCountInString(s)
	i := 0
	for _, r := range s {
		f, g := resolve(fc, r)
		if f != curFace {
			flush()
			curFace = f
		}
		if cur.Len() == 0 {
			curX = x
		}
		cur.WriteRune(r)
		if !unicodeSpace(r) {
			o.h = math.Max(o.h, g.yMax*size)
			o.d = math.Max(o.d, -g.yMin*size)
		}
		if i == 0 {
			o.inkL = g.xMin * size
		}
		if i == n-1 {
			o.ic = math.Max(0, g.xMax-g.adv) * size
			o.inkR = x + g.xMax*size
		}
		x += g.adv * size
		i++
	}
	flush()
	o.w = x
	o.char = n == 1
	o.italic = fc.Style == "I" || fc.Style == "BI"
	if !o.italic {
		o.ic = 0
	}
	return o
}

func faceOf(k faceKind) Face {
	switch k {
	case italic:
		return Face{"serif", "I"}
	case bold:
		return Face{"serif", "B"}
	}
	return Face{"serif", ""}
}

// atomBox lays out an atom's nucleus and attaches its scripts.
func atomBox(a *atom, st style) box {
	size := st.size()
	var nuc box
	switch n := a.nuc.(type) {
	case *symbol:
		if a.big {
			nuc = bigOp(n, st)
		} else {
			nuc = run(n.text, faceOf(n.face), size)
		}
	case *textRun:
		nuc = run(n.text, faceOf(n.face), size)
	case *mlist:
		nuc = hlist(n, st, nil)
	case *frac:
		nuc = fraction(n, st)
	case *radical:
		nuc = root(n, st)
	case *accent:
		nuc = accented(n, st)
	case *delimited:
		nuc = leftRight(n, st)
	}
	if a.sup == nil && a.sub == nil {
		return nuc
	}
	if _, ok := a.nuc.(*symbol); ok && !a.big {
		nuc.char = true // scripts hang on a glyph run by the font's measures alone
	}
	if a.big && a.limits && st.display() {
		return limits(nuc, a, st)
	}
	return attachScripts(nuc, a, st)
}

// attachScripts sets superscript and subscript beside a nucleus.
func attachScripts(nuc box, a *atom, st style) box {
	size := st.size()
	xh := XHeight() * size
	θ := RuleThickness * size
	var sup, sub box
	u, v := 0.0, 0.0
	if !nuc.char {
		u = nuc.h - 0.39*st.sup().size()
		v = nuc.d + 0.05*st.sub().size()
	}
	o := box{}
	o.place(nuc, 0, 0)
	w := nuc.w
	if a.sup != nil {
		sup = hlist(a.sup, st.sup(), nil)
		p := SupRaiseText
		switch {
		case st.display() && !st.cramped:
			p = SupRaiseDisplay
		case st.cramped:
			p = SupRaiseCramped
		}
		u = math.Max(u, math.Max(p*size, sup.d+xh/4))
	}
	if a.sub != nil {
		sub = hlist(a.sub, st.sub(), nil)
		if a.sup == nil {
			v = math.Max(v, math.Max(SubDropAlone*size, sub.h-0.8*xh))
		} else {
			v = math.Max(v, SubDropWithSup*size)
			if gap := (u - sup.d) - (sub.h - v); gap < 4*θ {
				v += 4*θ - gap
				if psi := 0.8*xh - (u - sup.d); psi > 0 {
					u += psi
					v -= psi
				}
			}
		}
	}
	if a.sup != nil {
		o.place(sup, nuc.w+nuc.ic, u)
		w = math.Max(w, nuc.w+nuc.ic+sup.w)
		o.h = math.Max(nuc.h, u+sup.h)
	} else {
		o.h = nuc.h
	}
	o.d = nuc.d
	if a.sub != nil {
		o.place(sub, nuc.w, -v)
		w = math.Max(w, nuc.w+sub.w)
		o.d = math.Max(nuc.d, v+sub.d)
		o.h = math.Max(o.h, sub.h-v)
	}
	o.w = w + scriptSpace*size
	return o
}

// bigOp sets a big operator centred on the math axis, larger in display.
func bigOp(n *symbol, st style) box {
	size := st.size()
	scale := 1.0
	if st.display() {
		scale = bigOpScale
		if n.text == "∫" || n.text == "∮" {
			scale = bigIntScale
		}
	}
	b := run(n.text, faceOf(n.face), size*scale)
	shift := AxisHeight()*size - (b.h-b.d)/2
	o := box{w: b.w, h: b.h + shift, d: b.d - shift, ic: b.ic}
	o.place(b, 0, shift)
	return o
}

// limits sets a big operator's scripts above and below it.
func limits(nuc box, a *atom, st style) box {
	size := st.size()
	gap := 0.12 * size
	var sup, sub box
	w := nuc.w
	if a.sup != nil {
		sup = hlist(a.sup, st.sup(), nil)
		w = math.Max(w, sup.w)
	}
	if a.sub != nil {
		sub = hlist(a.sub, st.sub(), nil)
		w = math.Max(w, sub.w)
	}
	o := box{w: w, h: nuc.h, d: nuc.d}
	o.place(nuc, (w-nuc.w)/2, 0)
	if a.sup != nil {
		y := nuc.h + gap + sup.d
		o.place(sup, (w-sup.w)/2+nuc.ic/2, y)
		o.h = y + sup.h + 0.05*size
	}
	if a.sub != nil {
		y := -nuc.d - gap - sub.h
		o.place(sub, (w-sub.w)/2-nuc.ic/2, y)
		o.d = -y + sub.d + 0.05*size
	}
	return o
}

// fraction sets numerator over denominator with the bar on the math axis.
func fraction(f *frac, st style) box {
	s := st
	switch f.force {
	case 1:
		s.level = 0
	case 2:
		if s.level == 0 {
			s.level = 1
		}
	}
	size := s.size()
	θ := RuleThickness * size
	num := hlist(f.num, s.num(), nil)
	den := hlist(f.den, s.den(), nil)
	var u, v, φ float64
	if s.display() {
		u, v, φ = fracNumDisplay*size, fracDenDisplay*size, 3*θ
	} else {
		u, v, φ = fracNumText*size, fracDenText*size, θ
	}
	a := AxisHeight() * size
	if c := (u - num.d) - (a + θ/2); c < φ {
		u += φ - c
	}
	if c := (a - θ/2) - (den.h - v); c < φ {
		v += φ - c
	}
	pad := fracPad * size
	inner := math.Max(num.w, den.w)
	w := inner + 2*pad
	o := box{w: w, h: u + num.h, d: v + den.d}
	o.place(num, (w-num.w)/2, u)
	o.place(den, (w-den.w)/2, -v)
	o.items = append(o.items, Item{Kind: Rule, X: pad / 2, Y: a - θ/2, W: w - pad, H: θ})
	return o
}

// root draws a radical sign over its radicand.
func root(r *radical, st style) box {
	size := st.size()
	θ := RuleThickness * size
	body := hlist(r.body, st.crampedStyle(), nil)
	clear := θ + θ/4
	if st.display() {
		clear = θ + XHeight()*size/4
	}
	top := math.Max(body.h, XHeight()*size) + clear + θ/2 // centre of the overbar
	bottom := -math.Max(body.d+0.06*size, 0.16*size)
	H := top - bottom
	signW := 0.5*size + 0.06*math.Max(0, H-size)
	hook := bottom + math.Min(0.5*H, 0.5*size)
	// The sign: a short rising tick, a heavy stroke down to the foot, a
	// light stroke up to the overbar.
	ax, ay := 0.04*size, hook-0.03*size
	bx, by := 0.15*size, hook+0.05*size
	cx, cy := 0.34*size+0.03*math.Max(0, H-size), bottom
	dx, dy := signW, top
	var o box
	o.items = append(o.items,
		Item{Kind: Path, Stroke: 0.055 * size, Segs: []Seg{{Op: 'M', X: ax, Y: ay}, {Op: 'L', X: bx, Y: by}}},
		Item{Kind: Path, Stroke: 0.1 * size, Segs: []Seg{{Op: 'M', X: bx, Y: by}, {Op: 'L', X: cx, Y: cy + 0.03*size}}},
		Item{Kind: Path, Stroke: θ, Segs: []Seg{{Op: 'M', X: cx, Y: cy}, {Op: 'L', X: dx, Y: dy}}},
	)
	bodyX := signW + 0.06*size
	end := bodyX + body.w + 0.06*size
	o.items = append(o.items, Item{Kind: Rule, X: dx - θ*0.3, Y: top - θ/2, W: end - dx + θ*0.3, H: θ})
	o.place(body, bodyX, 0)
	o.w = end + 0.04*size
	o.h = top + θ/2 + 0.06*size
	o.d = -bottom + θ/2
	if r.index != nil {
		idx := hlist(r.index, style{level: 3, base: st.base}, nil)
		ix := 0.55*signW - idx.w
		iy := hook + 0.12*size + idx.d
		shift := 0.0
		if ix < 0 {
			shift = -ix
		}
		shifted := box{}
		shifted.place(o, shift, 0)
		shifted.place(idx, ix+shift, iy)
		shifted.w = o.w + shift
		shifted.h = math.Max(o.h, iy+idx.h)
		shifted.d = o.d
		o = shifted
	}
	return o
}

// leftRight sets a list between brackets that grow with it.
func leftRight(d *delimited, st style) box {
	size := st.size()
	body := hlist(d.body, st, nil)
	a := AxisHeight() * size
	δ := math.Max(body.h-a, body.d+a)
	want := math.Max(2*δ*delimFactor, 2*δ-delimShortfall*size)
	l := delimiter(d.left, want, st, true)
	r := delimiter(d.right, want, st, false)
	var o box
	o.place(l, 0, 0)
	o.place(body, l.w, 0)
	o.place(r, l.w+body.w, 0)
	o.w = l.w + body.w + r.w
	o.h = math.Max(body.h, math.Max(l.h, r.h))
	o.d = math.Max(body.d, math.Max(l.d, r.d))
	return o
}

// delimiter returns a bracket at least want high centred on the axis: the
// font's glyph when that is tall enough, else a drawn one.
func delimiter(kind string, want float64, st style, left bool) box {
	size := st.size()
	if kind == "" {
		return box{w: 0.12 * size}
	}
	g := run(kind, Face{"serif", ""}, size)
	if g.h+g.d >= want {
		return g
	}
	a := AxisHeight() * size
	H := want
	top, bot := a+H/2, a-H/2
	t := 0.07*size + 0.006*H // stem weight
	var o box
	o.h, o.d = top, -bot
	switch kind {
	case "(", ")":
		W := math.Min(0.3*size+0.04*H, 0.7*size)
		o.w = W + 0.08*size
		xe, xl := W, 0.1*size // ends and belly of "("
		tin := t * 1.15
		segs := []Seg{
			{Op: 'M', X: xe, Y: top},
			{Op: 'C', X1: xe - 0.55*(xe-xl), Y1: top - 0.1*H, X2: xl, Y2: a + 0.3*H, X: xl, Y: a},
			{Op: 'C', X1: xl, Y1: a - 0.3*H, X2: xe - 0.55*(xe-xl), Y2: bot + 0.1*H, X: xe, Y: bot},
			{Op: 'L', X: xe + 0.02*size, Y: bot + 0.01*size},
			{Op: 'C', X1: xe - 0.45*(xe-xl) + tin, Y1: bot + 0.12*H, X2: xl + tin, Y2: a - 0.28*H, X: xl + tin, Y: a},
			{Op: 'C', X1: xl + tin, Y1: a + 0.28*H, X2: xe - 0.45*(xe-xl) + tin, Y2: top - 0.12*H, X: xe + 0.02*size, Y: top - 0.01*size},
			{Op: 'Z'},
		}
		if kind == ")" {
			segs = mirror(segs, o.w)
		}
		o.items = append(o.items, Item{Kind: Path, Segs: segs})
	case "[", "]", "⌊", "⌋", "⌈", "⌉":
		o.w = 0.42 * size
		x0 := 0.12 * size
		arm := 0.24 * size
		items := []Item{{Kind: Rule, X: x0, Y: bot, W: t, H: H}}
		if kind == "[" || kind == "]" || kind == "⌈" || kind == "⌉" {
			items = append(items, Item{Kind: Rule, X: x0, Y: top - t*0.8, W: arm, H: t * 0.8})
		}
		if kind == "[" || kind == "]" || kind == "⌊" || kind == "⌋" {
			items = append(items, Item{Kind: Rule, X: x0, Y: bot, W: arm, H: t * 0.8})
		}
		if kind == "]" || kind == "⌋" || kind == "⌉" {
			for i := range items {
				items[i].X = o.w - items[i].X - items[i].W
			}
		}
		o.items = items
	case "|", "‖":
		o.w = 0.3 * size
		if kind == "|" {
			o.items = []Item{{Kind: Rule, X: 0.15*size - t*0.4, Y: bot, W: t * 0.8, H: H}}
		} else {
			o.w = 0.45 * size
			o.items = []Item{{Kind: Rule, X: 0.12 * size, Y: bot, W: t * 0.8, H: H}, {Kind: Rule, X: 0.27 * size, Y: bot, W: t * 0.8, H: H}}
		}
	case "{", "}":
		W := 0.45 * size
		o.w = W + 0.08*size
		xm, xs := 0.08*size, 0.25*size // tip and stem
		segs := []Seg{
			{Op: 'M', X: W, Y: top},
			{Op: 'C', X1: xs, Y1: top, X2: xs, Y2: top, X: xs, Y: top - 0.2*size},
			{Op: 'L', X: xs, Y: a + 0.2*size},
			{Op: 'C', X1: xs, Y1: a + 0.03*size, X2: xm, Y2: a, X: xm, Y: a},
			{Op: 'C', X1: xm, Y1: a, X2: xs, Y2: a - 0.03*size, X: xs, Y: a - 0.2*size},
			{Op: 'L', X: xs, Y: bot + 0.2*size},
			{Op: 'C', X1: xs, Y1: bot, X2: xs, Y2: bot, X: W, Y: bot},
		}
		if kind == "}" {
			segs = mirror(segs, o.w)
		}
		o.items = append(o.items, Item{Kind: Path, Stroke: t, Segs: segs})
	case "⟨", "⟩":
		W := 0.4*size + 0.05*H
		o.w = W + 0.1*size
		segs := []Seg{{Op: 'M', X: W, Y: top}, {Op: 'L', X: 0.1 * size, Y: a}, {Op: 'L', X: W, Y: bot}}
		if kind == "⟩" {
			segs = mirror(segs, o.w)
		}
		o.items = append(o.items, Item{Kind: Path, Stroke: t * 0.8, Segs: segs})
	default:
		return g
	}
	return o
}

// mirror reflects path segments about the vertical line x = w/2.
func mirror(segs []Seg, w float64) []Seg {
	out := make([]Seg, len(segs))
	for i, s := range segs {
		s.X, s.X1, s.X2 = w-s.X, w-s.X1, w-s.X2
		out[i] = s
	}
	return out
}

// accented sets an accent (arrow, hat, bar, dot, tilde) over a box.
func accented(ac *accent, st style) box {
	size := st.size()
	body := hlist(ac.body, st.crampedStyle(), nil)
	o := box{w: body.w, h: body.h, d: body.d, ic: body.ic, char: body.char, italic: body.italic}
	o.place(body, 0, 0)
	// Centre of the accent: over the ink of a single character, leaning
	// with an italic one; over the middle of anything wider.
	cx, aw := body.w/2, body.w
	if body.char {
		cx = (body.inkL + body.inkR) / 2
		aw = math.Max(body.inkR-body.inkL, 0.35*size)
		if body.italic {
			cx += 0.1 * body.h
		}
	}
	base := math.Max(body.h, XHeight()*size) + 0.08*size
	θ := RuleThickness * size
	top := base
	switch ac.kind {
	case "vec":
		w := math.Max(aw, 0.45*size)
		x0, x1 := cx-w/2, cx+w/2
		y := base + 0.1*size
		head, half := 0.21*size, 0.085*size
		o.items = append(o.items,
			Item{Kind: Path, Stroke: 0.05 * size, Segs: []Seg{{Op: 'M', X: x0, Y: y}, {Op: 'L', X: x1 - 0.5*head, Y: y}}},
			Item{Kind: Path, Segs: []Seg{{Op: 'M', X: x1 + 0.02*size, Y: y}, {Op: 'L', X: x1 - head, Y: y + half},
				{Op: 'L', X: x1 - 0.75*head, Y: y}, {Op: 'L', X: x1 - head, Y: y - half}, {Op: 'Z'}}})
		top = y + half
	case "hat", "widehat":
		w := 0.45 * size
		if !body.char {
			w = math.Max(w, 0.9*body.w)
		}
		hh := 0.15*size + 0.04*w
		o.items = append(o.items, Item{Kind: Path, Stroke: 0.055 * size, Segs: []Seg{
			{Op: 'M', X: cx - w/2, Y: base}, {Op: 'L', X: cx, Y: base + hh}, {Op: 'L', X: cx + w/2, Y: base}}})
		top = base + hh + 0.03*size
	case "bar", "overline":
		w := aw
		if body.char {
			w = math.Max(aw*0.9, 0.4*size)
		}
		o.items = append(o.items, Item{Kind: Rule, X: cx - w/2, Y: base, W: w, H: θ})
		top = base + θ
	case "dot", "ddot":
		r := 0.06 * size
		xs := []float64{cx}
		if ac.kind == "ddot" {
			xs = []float64{cx - 0.12*size, cx + 0.12*size}
		}
		for _, x := range xs {
			o.items = append(o.items, circle(x, base+r+0.02*size, r))
		}
		top = base + 2*r + 0.02*size
	case "tilde":
		w := math.Max(aw, 0.4*size)
		if body.char {
			w = 0.45 * size
		}
		y := base + 0.06*size
		hgt := 0.06 * size
		o.items = append(o.items, Item{Kind: Path, Stroke: 0.05 * size, Segs: []Seg{
			{Op: 'M', X: cx - w/2, Y: y - hgt/2},
			{Op: 'C', X1: cx - w/4, Y1: y + 1.6*hgt, X2: cx + w/4, Y2: y - 1.6*hgt, X: cx + w/2, Y: y + hgt/2}}})
		top = y + hgt
	}
	o.h = math.Max(o.h, top+0.03*size)
	return o
}

// circle is a filled disc drawn with four Bézier quarters.
func circle(x, y, r float64) Item {
	const k = 0.5523
	return Item{Kind: Path, Segs: []Seg{
		{Op: 'M', X: x + r, Y: y},
		{Op: 'C', X1: x + r, Y1: y + k*r, X2: x + k*r, Y2: y + r, X: x, Y: y + r},
		{Op: 'C', X1: x - k*r, Y1: y + r, X2: x - r, Y2: y + k*r, X: x - r, Y: y},
		{Op: 'C', X1: x - r, Y1: y - k*r, X2: x - k*r, Y2: y - r, X: x, Y: y - r},
		{Op: 'C', X1: x + k*r, Y1: y - r, X2: x + r, Y2: y - k*r, X: x + r, Y: y},
		{Op: 'Z'},
	}}
}
