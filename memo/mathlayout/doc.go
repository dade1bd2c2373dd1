// Package mathlayout typesets the memo's mathematics: it reads a compact,
// TeX-like notation and lays it out as a box (width, ascent above the
// baseline, descent below) holding positioned glyph runs, rules and vector
// paths, ready for a backend to draw. It knows nothing of PDF; memo/pdf
// draws the boxes, and measures them with the same font files.
//
// # Notation
//
// Letters are variables, set in italic (DejaVu Serif Italic); digits,
// operators, brackets and upper-case Greek are upright. Spaces are
// ignored: spacing comes from the class of each atom (ordinary, operator,
// binary, relation, opening, closing, punctuation), as in hand-set
// mathematics.
//
//	x^{2}  x^2  R_{20}  R_w        superscripts and subscripts (a single
//	                                token, or a {group})
//	10⁻⁸  R₂₀                       Unicode super/subscript digits work too
//	\frac{a}{b}                     fraction (\dfrac, \tfrac force the size)
//	\sqrt{x}  \sqrt[3]{x}           roots
//	\alpha … \omega, \Gamma … \Omega   Greek by name (or typed: α, Ω)
//	\vec{m}  \hat{r}  \bar{D}  \dot{x}  \tilde{x}   accents
//	\cdot \times \pm \le \ge \approx \ne \to \propto \equiv \sim \infty
//	\partial \nabla \ell \deg       signs (or typed: ·, ×, ≤, °)
//	\left( … \right)               brackets that grow with their content;
//	                                ( ) [ ] \{ \} | \| \lfloor \rfloor
//	                                \lceil \rceil and "." for none
//	\sum_{i}^{N}  \prod  \int       big operators (limits above and below
//	                                in displayed equations)
//	\ln \log \exp \sin \cos \tan \max \min   upright function names
//	\text{over every turn}          upright words, spaces kept
//	\unit{mA·m^2}  \mathrm{max}     upright letters: units, labels
//	\mathbf{B}                      bold upright
//	\, \: \; \! \quad \qquad ~      explicit spaces (thin, medium, thick,
//	                                negative thin, 1 em, 2 em, word space)
//
// A number is a run of digits with at most one decimal point. A minus sign
// is "-" or "−". Primes are written x'.
//
// # Failure
//
// Layout never panics. Notation it cannot read gives an Error naming the
// byte offset and a box that shows the source as plain upright text, so a
// memo with a typing mistake in an equation still builds; tests flag the
// mistake (memo's tests parse every equation the memo composes).
//
// # Layout rules
//
// The rules follow the conventions of mathematical typesetting as set out
// in Knuth, The TeXbook (1984), Appendix G, with parameters of our own
// chosen for DejaVu Serif: script size 70 % and second-level script size
// 50 % of the base size; a superscript's baseline raised 0.41 em in
// displayed style, 0.36 em in text style and 0.29 em when cramped (under a
// fraction bar or root); a subscript lowered 0.15 em alone and 0.25 em
// beneath a superscript; fraction bars and the stems of drawn signs on the
// math axis (the height of the minus sign's centre), 0.06 em thick.
package mathlayout
