package memo

import (
	"fmt"
	"math"
	"strings"

	"coilmemo/doc"
)

// Derivations. Every section that derives results (method, electrical,
// thermal, field) shows each one the same way, as a numbered equation:
// the relation in symbols, the same relation with this design's numbers
// and units put in, and the result with its unit.
//
//	c.derive(Step{
//		What:     "Resistance at 20 °C",
//		Symbolic: `R_{20} = \frac{\rho_{20}\,\ell_w}{A}`,
//		Numbers:  fmt.Sprintf(`\frac{%s \cdot %s}{%s}`, Q(rho, "Ω·m", 5), Q(lw, "m", 4), Q(A, "m²", 4)),
//		Result:   Q(r20, "Ω", 4),
//	})
//
// The notation is memo/mathlayout's (documented there); Q and Num write a
// quantity or a number in it.

// Step is one result of a derivation.
type Step struct {
	// What says in plain words what the equation gives, with the source
	// of the relation where it is a published one.
	What string
	// Symbolic is the relation in symbols, e.g. `m = I \sum_i \pi r_i^2`.
	Symbolic string
	// Numbers is the right-hand side with the numbers put in ("= " is put
	// before it), or "" when there is nothing to substitute.
	Numbers string
	// Result is the value of the right-hand side with its unit (from Q),
	// or "" for a relation that is not evaluated here.
	Result string
	// Solve, when set, names the unknown of an implicit relation (a heat
	// balance): Numbers is then the whole relation with numbers, and the
	// last line reads "⇒ Solve = Result".
	Solve string
}

// derive adds steps as equations numbered within the current section
// ("5.1", "5.2", …).
func (c *composer) derive(steps ...Step) {
	for _, s := range steps {
		c.add(c.equation(s))
	}
}

// equation turns a step into a numbered equation block.
func (c *composer) equation(s Step) doc.Equation {
	sec, n := 0, 0
	for _, b := range c.blocks {
		switch b := b.(type) {
		case doc.Heading:
			if b.Level == 1 {
				sec++
				n = 0
			}
		case doc.Equation:
			if b.Label != "" {
				n++
			}
		}
	}
	e := doc.Equation{Label: fmt.Sprintf("%d.%d", sec, n+1), Description: s.What}
	e.Lines = append(e.Lines, s.Symbolic)
	switch {
	case s.Solve != "":
		if s.Numbers != "" {
			e.Lines = append(e.Lines, s.Numbers)
		}
		if s.Result != "" {
			e.Lines = append(e.Lines, `\Rightarrow `+s.Solve+` = `+s.Result)
			e.Result = true
		}
	default:
		if s.Numbers != "" {
			e.Lines = append(e.Lines, "= "+s.Numbers)
		}
		if s.Result != "" {
			e.Lines = append(e.Lines, "= "+s.Result)
			e.Result = true
		}
	}
	return e
}

// Q writes a quantity in the notation: the number in engineering notation
// to sig significant figures and the unit upright, Q(0.00319, "T", 4) =
// `3.190\,\unit{mT}` (see Eng for the units it prefixes).
func Q(v float64, unit string, sig int) string {
	if math.IsNaN(v) {
		return `\text{n/a}`
	}
	s := Eng(v, unit, sig)
	num, u, ok := strings.Cut(s, " ")
	if !ok {
		// "90°", "100%": the sign follows the number without a space
		for _, sign := range []string{"%", "°"} {
			if strings.HasSuffix(s, sign) {
				num, u = strings.TrimSuffix(s, sign), sign
			}
		}
	}
	if u == "" {
		return numeral(num)
	}
	sep := `\,`
	if u == "°" {
		sep = ""
	}
	return numeral(num) + sep + `\unit{` + unitNotation(u) + `}`
}

// numeral writes a number as Sig formats it (with a true minus sign and
// "×10⁻⁸" exponents) in the notation.
func numeral(s string) string {
	switch s {
	case "n/a", "":
		return `\text{n/a}`
	}
	return strings.ReplaceAll(s, "∞", `\infty `)
}

// N writes v to sig significant figures in the notation.
func N(v float64, sig int) string {
	if math.IsNaN(v) {
		return `\text{n/a}`
	}
	return numeral(Sig(v, sig))
}

// unitNotation escapes a unit for \unit{…}: the characters the notation
// reads as commands are written as text.
func unitNotation(u string) string {
	r := strings.NewReplacer(`%`, `\%`, `\`, `\backslash `, `{`, `\{`, `}`, `\}`, `_`, `\_`, `^`, "", `&`, `\&`, `#`, `\#`, `~`, "")
	return r.Replace(u)
}

// Words escapes plain words for \text{…}.
func Words(s string) string {
	r := strings.NewReplacer(`\`, "", `{`, `\{`, `}`, `\}`)
	return `\text{` + r.Replace(s) + `}`
}

// Paren puts a quantity in brackets, e.g. before an exponent: (404.9 µm)².
func Paren(q string) string { return `\left(` + q + `\right)` }
