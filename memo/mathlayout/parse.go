package mathlayout

import (
	"fmt"
	"strings"
	"unicode"
	"unicode/utf8"
)

// Error is notation that could not be read, at a byte offset of the source.
type Error struct {
	Pos int
	Msg string
}

func (e *Error) Error() string { return fmt.Sprintf("notation: at byte %d: %s", e.Pos, e.Msg) }

// ---- parse tree ----

// face of a symbol.
type faceKind int

const (
	italic faceKind = iota
	upright
	bold
)

// node is an element of a math list: *atom or *space.
type node interface{}

// mlist is a sequence of atoms and spaces.
type mlist struct{ items []node }

// atom is one nucleus with optional scripts.
type atom struct {
	cls      class
	nuc      node // *symbol, *mlist, *frac, *radical, *accent, *delimited, *textRun
	sup, sub *mlist
	limits   bool // big operator: limits above and below in display style
	big      bool // big operator: set larger in display style
}

// symbol is a run of characters in one face (a number, a letter, a sign,
// an operator name).
type symbol struct {
	text string
	face faceKind
}

// space is explicit horizontal space in eighteenths of an em.
type space struct{ mu float64 }

type frac struct {
	num, den *mlist
	force    int // 0 as the style says, 1 display, 2 text
}

type radical struct{ index, body *mlist }

type accent struct {
	kind string
	body *mlist
}

type delimited struct {
	left, right string // "" for none
	body        *mlist
}

// textRun is upright text with its spaces kept.
type textRun struct {
	text string
	face faceKind
}

// ---- parser ----

const maxDepth = 40

type parser struct {
	src   string
	pos   int
	depth int
	mode  faceKind // letters' face: italic in maths, upright in \unit and \mathrm
	unit  bool     // inside \unit: every atom ordinary, spaces thin
}

// parse reads a whole formula.
func parse(src string) (l *mlist, err error) {
	p := &parser{src: src, mode: italic}
	defer func() {
		if r := recover(); r != nil {
			if e, ok := r.(*Error); ok {
				l, err = nil, e
				return
			}
			panic(r)
		}
	}()
	l = p.list("")
	if p.pos < len(p.src) {
		p.fail("unexpected %q", p.peekToken())
	}
	return l, nil
}

func (p *parser) fail(format string, args ...any) {
	panic(&Error{Pos: p.pos, Msg: fmt.Sprintf(format, args...)})
}

func (p *parser) eof() bool { return p.pos >= len(p.src) }

func (p *parser) peek() rune {
	r, _ := utf8.DecodeRuneInString(p.src[p.pos:])
	return r
}

func (p *parser) next() rune {
	r, n := utf8.DecodeRuneInString(p.src[p.pos:])
	p.pos += n
	return r
}

func (p *parser) skipSpace() bool {
	skipped := false
	for !p.eof() && unicode.IsSpace(p.peek()) {
		p.next()
		skipped = true
	}
	return skipped
}

// peekToken returns the next token's text for messages.
func (p *parser) peekToken() string {
	if p.eof() {
		return "end"
	}
	if p.src[p.pos] == '\\' {
		save := p.pos
		name := p.command()
		p.pos = save
		return "\\" + name
	}
	return string(p.peek())
}

// command reads a command name after a backslash (the backslash included
// in the input, not the result).
func (p *parser) command() string {
	p.pos++ // backslash
	if p.eof() {
		p.fail("a backslash at the end")
	}
	start := p.pos
	r := p.next()
	if !isLetter(r) {
		return string(r)
	}
	for !p.eof() && isLetter(p.peek()) {
		p.next()
	}
	return p.src[start:p.pos]
}

func isLetter(r rune) bool { return r >= 'a' && r <= 'z' || r >= 'A' && r <= 'Z' }

// list reads atoms up to the terminator ("}" or "" for the end; "\right"
// ends a \left list).
func (p *parser) list(until string) *mlist {
	p.depth++
	if p.depth > maxDepth {
		p.fail("nested more than %d deep", maxDepth)
	}
	defer func() { p.depth-- }()
	l := &mlist{}
	for {
		if p.skipSpace() && p.unit && len(l.items) > 0 {
			l.items = append(l.items, &space{mu: 3})
		}
		if p.eof() {
			if until == "}" {
				p.fail("missing \"}\"")
			}
			if until == "right" {
				p.fail("\\left without \\right")
			}
			return l.trimmed(p.unit)
		}
		r := p.peek()
		switch {
		case r == '}':
			if until != "}" {
				p.fail("unexpected \"}\"")
			}
			return l.trimmed(p.unit)
		case r == '^' || r == '_':
			p.scripts(l, nil)
			continue
		case strings.HasPrefix(p.src[p.pos:], "\\right"):
			if until != "right" {
				p.fail("\\right without \\left")
			}
			return l.trimmed(p.unit)
		case r == '&':
			p.fail("alignment mark \"&\" is not supported; put each line in its own string")
		}
		n := p.item()
		if n == nil {
			continue
		}
		if a, ok := n.(*atom); ok {
			if p.unit {
				a.cls = ord
			}
			p.scripts(l, a)
			l.items = append(l.items, a)
		} else {
			l.items = append(l.items, n)
		}
	}
}

// trimmed drops a trailing space a \unit's spaces left.
func (l *mlist) trimmed(unit bool) *mlist {
	if n := len(l.items); unit && n > 0 {
		if _, ok := l.items[n-1].(*space); ok {
			l.items = l.items[:n-1]
		}
	}
	return l
}

// scripts reads ^ and _ (and Unicode super- and subscript runs) after an
// atom. With a nil atom (a script with nothing before it) an empty atom is
// added to l.
func (p *parser) scripts(l *mlist, a *atom) {
	for !p.eof() {
		save := p.pos
		p.skipSpace()
		if p.eof() {
			p.pos = save
			return
		}
		r := p.peek()
		var sup bool
		var arg *mlist
		switch {
		case r == '^' || r == '_':
			sup = r == '^'
			p.next()
			arg = p.argument()
		case r == '′' || r == '\'':
			// primes are superscripts
			sup = true
			var s strings.Builder
			for !p.eof() && (p.peek() == '\'' || p.peek() == '′') {
				p.next()
				s.WriteRune('′')
			}
			arg = &mlist{items: []node{&atom{cls: ord, nuc: &symbol{text: s.String(), face: upright}}}}
		case supRunes[r] != 0 || subRunes[r] != 0:
			sup = supRunes[r] != 0
			table := subRunes
			if sup {
				table = supRunes
			}
			var s strings.Builder
			for !p.eof() && table[p.peek()] != 0 {
				s.WriteRune(table[p.next()])
			}
			sub := &parser{src: s.String(), mode: p.mode, depth: p.depth}
			arg = sub.list("")
		default:
			p.pos = save
			return
		}
		if a == nil {
			a = &atom{cls: ord, nuc: &mlist{}}
			l.items = append(l.items, a)
		}
		if sup {
			if a.sup != nil {
				if r == '′' || r == '\'' {
					a.sup.items = append(a.sup.items, arg.items...)
					continue
				}
				p.pos = save
				p.fail("double superscript; group it: x^{ab}")
			}
			a.sup = arg
		} else {
			if a.sub != nil {
				p.pos = save
				p.fail("double subscript; group it: x_{ab}")
			}
			a.sub = arg
		}
	}
}

// argument reads a {group} or a single token as a list.
func (p *parser) argument() *mlist {
	p.skipSpace()
	if p.eof() {
		p.fail("missing argument")
	}
	if p.peek() == '{' {
		p.next()
		l := p.list("}")
		p.next() // }
		return l
	}
	switch p.peek() {
	case '}', '^', '_':
		p.fail("missing argument before %q", string(p.peek()))
	}
	n := p.single()
	if n == nil {
		return &mlist{}
	}
	if a, ok := n.(*atom); ok && p.unit {
		a.cls = ord
	}
	return &mlist{items: []node{n}}
}

// item reads one atom or space (with no scripts).
func (p *parser) item() node {
	r := p.peek()
	if r >= '0' && r <= '9' || r == '.' && p.pos+1 < len(p.src) && p.src[p.pos+1] >= '0' && p.src[p.pos+1] <= '9' {
		return p.number()
	}
	return p.single()
}

// number reads digits with at most one decimal point.
func (p *parser) number() node {
	start := p.pos
	dot := false
	for !p.eof() {
		c := p.src[p.pos]
		if c >= '0' && c <= '9' {
			p.pos++
			continue
		}
		if c == '.' && !dot && p.pos+1 < len(p.src) && p.src[p.pos+1] >= '0' && p.src[p.pos+1] <= '9' {
			dot = true
			p.pos++
			continue
		}
		break
	}
	return &atom{cls: ord, nuc: &symbol{text: p.src[start:p.pos], face: upright}}
}

// single reads one token: a character, a command with its arguments, or a
// group.
func (p *parser) single() node {
	r := p.peek()
	switch {
	case r == '{':
		p.next()
		l := p.list("}")
		p.next()
		return &atom{cls: ord, nuc: l}
	case r == '\\':
		return p.cmd()
	case r == '~':
		p.next()
		return &space{mu: 6}
	}
	if _, ok := combining[r]; ok {
		p.fail("accent mark %U with nothing before it", r)
	}
	p.next()
	r = normalise(r)
	cls, it := runeClass(r)
	face := upright
	if it && p.mode == italic {
		face = italic
	} else if p.mode == bold && isLetter(r) {
		face = bold
	}
	if r >= 'Α' && r <= 'Ω' {
		face = upright
	}
	a := &atom{cls: cls, nuc: &symbol{text: string(r), face: face}}
	if cls == opc {
		a.big, a.limits = true, r != '∫' && r != '∮'
	}
	// a combining accent typed after the character
	if !p.eof() {
		if kind, ok := combining[p.peek()]; ok {
			p.next()
			a.nuc = &accent{kind: kind, body: &mlist{items: []node{&atom{cls: ord, nuc: a.nuc}}}}
		}
	}
	return a
}

// cmd reads a command and its arguments.
func (p *parser) cmd() node {
	start := p.pos
	name := p.command()
	if r, ok := greek[name]; ok {
		face := italic
		if unicode.IsUpper(r) || p.mode != italic {
			face = upright
		}
		return &atom{cls: ord, nuc: &symbol{text: string(r), face: face}}
	}
	if s, ok := symbolCmds[name]; ok {
		face := upright
		if s.italic && p.mode == italic {
			face = italic
		}
		return &atom{cls: s.cls, nuc: &symbol{text: string(s.r), face: face}}
	}
	if mu, ok := spaceCmds[name]; ok {
		return &space{mu: mu}
	}
	if f, ok := functionCmds[name]; ok {
		return &atom{cls: opc, nuc: &symbol{text: f, face: upright}}
	}
	if r, ok := bigOps[name]; ok {
		return &atom{cls: opc, nuc: &symbol{text: string(r), face: upright}, big: true, limits: r != '∫' && r != '∮'}
	}
	if accentCmds[name] {
		return &atom{cls: ord, nuc: &accent{kind: name, body: p.argument()}}
	}
	switch name {
	case "frac", "dfrac", "tfrac":
		f := &frac{num: p.argument(), den: p.argument()}
		switch name {
		case "dfrac":
			f.force = 1
		case "tfrac":
			f.force = 2
		}
		return &atom{cls: inner, nuc: f}
	case "sqrt":
		rd := &radical{}
		p.skipSpace()
		if !p.eof() && p.peek() == '[' {
			p.next()
			end := strings.IndexByte(p.src[p.pos:], ']')
			if end < 0 {
				p.fail("missing \"]\" after \\sqrt[")
			}
			sub := &parser{src: p.src[p.pos : p.pos+end], mode: p.mode, depth: p.depth}
			func() {
				defer func() {
					if r := recover(); r != nil {
						if e, ok := r.(*Error); ok {
							e.Pos += p.pos
						}
						panic(r)
					}
				}()
				rd.index = sub.list("")
			}()
			p.pos += end + 1
		}
		rd.body = p.argument()
		return &atom{cls: ord, nuc: rd}
	case "left":
		left := p.delimiter()
		body := p.list("right")
		p.pos += len("\\right")
		right := p.delimiter()
		return &atom{cls: inner, nuc: &delimited{left: left, right: right, body: body}}
	case "right":
		p.pos = start
		p.fail("\\right without \\left")
	case "text", "textrm", "mbox":
		return &atom{cls: ord, nuc: &textRun{text: p.rawGroup(), face: upright}}
	case "unit", "mathrm", "rm", "operatorname", "mathbf":
		mode, unit := upright, name == "unit"
		if name == "mathbf" {
			mode = bold
		}
		saveMode, saveUnit := p.mode, p.unit
		p.mode, p.unit = mode, unit
		body := p.argument()
		p.mode, p.unit = saveMode, saveUnit
		cls := ord
		if name == "operatorname" {
			cls = opc
		}
		return &atom{cls: cls, nuc: body}
	case "displaystyle", "textstyle", "limits", "nolimits":
		return nil
	}
	p.pos = start
	p.fail("unknown command \\%s", name)
	return nil
}

// delimiter reads the delimiter after \left or \right.
func (p *parser) delimiter() string {
	p.skipSpace()
	if p.eof() {
		p.fail("missing delimiter after \\left or \\right")
	}
	start := p.pos
	var tok string
	if p.src[p.pos] == '\\' {
		tok = "\\" + p.command()
	} else {
		tok = string(p.next())
	}
	d, ok := delimNames[tok]
	if !ok {
		p.pos = start
		p.fail("%q is not a delimiter", tok)
	}
	return d
}

// rawGroup reads a {group} as plain text (braces must balance).
func (p *parser) rawGroup() string {
	p.skipSpace()
	if p.eof() || p.peek() != '{' {
		p.fail("missing {text} argument")
	}
	p.next()
	start, depth := p.pos, 1
	for !p.eof() {
		switch p.src[p.pos] {
		case '\\':
			p.pos += 2
			continue
		case '{':
			depth++
		case '}':
			depth--
			if depth == 0 {
				s := p.src[start:p.pos]
				p.pos++
				return unescapeText(s)
			}
		}
		p.pos++
	}
	p.fail("missing \"}\"")
	return ""
}

func unescapeText(s string) string {
	r := strings.NewReplacer(`\{`, "{", `\}`, "}", `\%`, "%", `\&`, "&", `\_`, "_", `\#`, "#", `\$`, "$", `\\`, "\\")
	return r.Replace(s)
}
