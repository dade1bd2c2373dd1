package mathlayout

// class is an atom's spacing class.
type class int

const (
	ord class = iota
	opc
	bin
	rel
	open
	close
	punct
	inner
)

// spacing between adjacent atoms, in eighteenths of an em, indexed by the
// left and the right atom's class; a negative entry applies only in
// displayed and text style (not in scripts).
var spacing = [8][8]int{
	//       ord  op  bin  rel open close punct inner
	/*ord*/ {0, 3, -4, -5, 0, 0, 0, -3},
	/*op */ {3, 3, 0, -5, 0, 0, 0, -3},
	/*bin*/ {-4, -4, 0, 0, -4, 0, 0, -4},
	/*rel*/ {-5, -5, 0, 0, -5, 0, 0, -5},
	/*opn*/ {0, 0, 0, 0, 0, 0, 0, 0},
	/*cls*/ {0, 3, -4, -5, 0, 0, 0, -3},
	/*pun*/ {-3, -3, 0, -3, -3, -3, -3, -3},
	/*inn*/ {-3, 3, -4, -5, -3, 0, -3, -3},
}

// greek maps names to letters. Lower-case letters are variables (italic);
// upper-case Greek is upright, as usual in physics.
var greek = map[string]rune{
	"alpha": 'α', "beta": 'β', "gamma": 'γ', "delta": 'δ', "epsilon": 'ϵ',
	"varepsilon": 'ε', "zeta": 'ζ', "eta": 'η', "theta": 'θ', "vartheta": 'ϑ',
	"iota": 'ι', "kappa": 'κ', "lambda": 'λ', "mu": 'μ', "nu": 'ν', "xi": 'ξ',
	"pi": 'π', "varpi": 'ϖ', "rho": 'ρ', "varrho": 'ϱ', "sigma": 'σ',
	"varsigma": 'ς', "tau": 'τ', "upsilon": 'υ', "phi": 'ϕ', "varphi": 'φ',
	"chi": 'χ', "psi": 'ψ', "omega": 'ω',
	"Gamma": 'Γ', "Delta": 'Δ', "Theta": 'Θ', "Lambda": 'Λ', "Xi": 'Ξ',
	"Pi": 'Π', "Sigma": 'Σ', "Upsilon": 'Υ', "Phi": 'Φ', "Psi": 'Ψ', "Omega": 'Ω',
}

// symbolCmds are commands that stand for one sign, with its class and
// whether it is set in italic.
var symbolCmds = map[string]struct {
	r      rune
	cls    class
	italic bool
}{
	"cdot": {'·', bin, false}, "times": {'×', bin, false}, "pm": {'±', bin, false},
	"mp": {'∓', bin, false}, "div": {'÷', bin, false}, "ast": {'∗', bin, false},
	"le": {'≤', rel, false}, "leq": {'≤', rel, false}, "ge": {'≥', rel, false},
	"geq": {'≥', rel, false}, "approx": {'≈', rel, false}, "ne": {'≠', rel, false},
	"neq": {'≠', rel, false}, "to": {'→', rel, false}, "rightarrow": {'→', rel, false},
	"leftarrow": {'←', rel, false}, "Rightarrow": {'⇒', rel, false}, "implies": {'⇒', rel, false}, "propto": {'∝', rel, false}, "equiv": {'≡', rel, false},
	"sim": {'∼', rel, false}, "simeq": {'≃', rel, false}, "ll": {'≪', rel, false},
	"gg": {'≫', rel, false}, "parallel": {'∥', rel, false}, "perp": {'⊥', rel, false},
	"infty": {'∞', ord, false}, "partial": {'∂', ord, true}, "nabla": {'∇', ord, false},
	"ell": {'ℓ', ord, true}, "hbar": {'ħ', ord, true}, "deg": {'°', ord, false},
	"degree": {'°', ord, false}, "prime": {'′', ord, false}, "ldots": {'…', inner, false},
	"cdots": {'⋯', inner, false}, "circ": {'∘', bin, false}, "angle": {'∠', ord, false},
	"percent": {'%', ord, false}, "%": {'%', ord, false}, "#": {'#', ord, false},
	"&": {'&', ord, false}, "_": {'_', ord, false}, "$": {'$', ord, false},
	"lbrace": {'{', open, false}, "rbrace": {'}', close, false},
	"{": {'{', open, false}, "}": {'}', close, false},
	"lfloor": {'⌊', open, false}, "rfloor": {'⌋', close, false},
	"lceil": {'⌈', open, false}, "rceil": {'⌉', close, false},
	"langle": {'⟨', open, false}, "rangle": {'⟩', close, false},
	"|": {'‖', ord, false}, "Vert": {'‖', ord, false}, "vert": {'|', ord, false},
	"backslash": {'\\', ord, false},
}

// functionCmds are upright operator names.
var functionCmds = map[string]string{
	"ln": "ln", "log": "log", "exp": "exp", "sin": "sin", "cos": "cos",
	"tan": "tan", "sinh": "sinh", "cosh": "cosh", "tanh": "tanh",
	"arctan": "arctan", "arcsin": "arcsin", "arccos": "arccos", "max": "max",
	"min": "min", "det": "det", "sgn": "sgn", "Re": "Re", "Im": "Im",
}

// bigOps are operators set larger in displayed equations.
var bigOps = map[string]rune{"sum": '∑', "prod": '∏', "int": '∫', "oint": '∮'}

// spaceCmds are explicit spaces in eighteenths of an em.
var spaceCmds = map[string]float64{
	",": 3, ":": 4, ">": 4, ";": 5, "!": -3, "quad": 18, "qquad": 36, " ": 6,
	"thinspace": 3, "enspace": 9,
}

// accentCmds are the accents.
var accentCmds = map[string]bool{"vec": true, "hat": true, "bar": true, "overline": true, "dot": true, "ddot": true, "tilde": true, "widehat": true}

// delimiter names after \left and \right.
var delimNames = map[string]string{
	"(": "(", ")": ")", "[": "[", "]": "]", "\\{": "{", "\\}": "}", "\\lbrace": "{",
	"\\rbrace": "}", "|": "|", "\\|": "‖", "\\Vert": "‖", "\\vert": "|", ".": "",
	"\\lfloor": "⌊", "\\rfloor": "⌋", "\\lceil": "⌈", "\\rceil": "⌉",
	"\\langle": "⟨", "\\rangle": "⟩", "⟨": "⟨", "⟩": "⟩", "⌊": "⌊", "⌋": "⌋",
	"⌈": "⌈", "⌉": "⌉", "‖": "‖",
}

// runeClass gives the class and italic flag of a typed character.
func runeClass(r rune) (class, bool) {
	switch {
	case r >= 'a' && r <= 'z', r >= 'A' && r <= 'Z':
		return ord, true
	case r >= 'α' && r <= 'ω', r == 'ϵ', r == 'ϑ', r == 'ϕ', r == 'ϖ', r == 'ϱ', r == 'ℓ', r == '∂', r == 'ħ':
		return ord, true
	}
	switch r {
	case '+', '−', '-', '·', '×', '±', '∓', '÷', '∗', '*', '∘', '⋅':
		return bin, false
	case '=', '<', '>', '≤', '≥', '≈', '≠', '→', '←', '∝', '≡', '∼', '≃', '≪', '≫', ':', '∥', '⊥', '↦', '⇒':
		return rel, false
	case '(', '[', '⌊', '⌈', '⟨':
		return open, false
	case ')', ']', '⌋', '⌉', '⟩', '!', '?':
		return close, false
	case ',', ';':
		return punct, false
	case '∑', '∏', '∫', '∮':
		return opc, false
	case '…', '⋯':
		return inner, false
	}
	return ord, false
}

// normalise maps typed ASCII stand-ins to the signs they mean.
func normalise(r rune) rune {
	switch r {
	case '-':
		return '−'
	case '*', '⋅':
		return '·'
	case '\'':
		return '′'
	}
	return r
}

// superscripts and subscripts typed as Unicode characters.
var (
	supRunes = map[rune]rune{'⁰': '0', '¹': '1', '²': '2', '³': '3', '⁴': '4', '⁵': '5', '⁶': '6', '⁷': '7',
		'⁸': '8', '⁹': '9', '⁻': '−', '⁺': '+', 'ⁿ': 'n', 'ⁱ': 'i'}
	subRunes = map[rune]rune{'₀': '0', '₁': '1', '₂': '2', '₃': '3', '₄': '4', '₅': '5', '₆': '6', '₇': '7',
		'₈': '8', '₉': '9', '₋': '−', '₊': '+', 'ₐ': 'a', 'ₑ': 'e', 'ₒ': 'o', 'ₓ': 'x', 'ₕ': 'h', 'ₖ': 'k',
		'ₗ': 'l', 'ₘ': 'm', 'ₙ': 'n', 'ₚ': 'p', 'ₛ': 's', 'ₜ': 't', 'ᵢ': 'i', 'ⱼ': 'j', 'ᵣ': 'r'}
)

// combining accents typed after a letter.
var combining = map[rune]string{'\u0304': "bar", '\u0305': "bar", '\u0302': "hat", '\u20d7': "vec", '\u0307': "dot", '\u0303': "tilde"}
