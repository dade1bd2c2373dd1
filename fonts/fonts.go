// Package fonts holds the typefaces the memo is set in, embedded in the
// binary so that a memo never depends on what happens to be installed on
// the machine that builds it.
//
// The family is DejaVu: Sans in four styles for text, Sans Mono (regular
// and bold) for code and Serif in four styles for mathematics (italic
// variables, upright numbers and operators). It was chosen for its glyph
// coverage: an engineering memo needs Greek letters (α … ω, Φ, Ω), the
// micro sign µ, the degree sign °, superscript digits ² and ³, the middle
// dot ·, ≤, ≥, ≈, ±, √, ×, −, the arrows, and the check and cross marks,
// and DejaVu has all of them in every weight we use, with tabular digits so
// that columns of numbers line up.
//
// Mathematics (memo/mathlayout) is set in DejaVu Serif: italic variables
// from Serif Italic, digits, operators, units and upper-case Greek upright,
// as in print. Serif was chosen over Sans for it because its italic is a
// true italic with distinct letter shapes (v and ν, l and 1 apart) and it
// carries the Greek alphabet in both styles. The few signs Serif lacks
// (ℓ, ≪, ≫, ⋯) are taken from DejaVu Sans, which the typesetter measures
// and the PDF embeds like any other face.
//
// No separate mathematics font is embedded. DejaVu Math TeX Gyre (in the
// same Go module) was considered: its extra value lies in the larger
// variants of radicals, brackets and big operators, which are reachable
// only by glyph number through its OpenType MATH table, not by Unicode
// character, and so not through the PDF writer's text strings. The
// typesetter instead draws radicals and growing brackets as vector paths
// sized to their content and scales ∑, ∏ and ∫, which keeps every memo to
// one family and its files small.
//
// The same bytes feed three consumers: the PDF writer embeds them (as
// subsets: only the glyphs a memo uses, so a memo stays around a hundred
// kilobytes), the math typesetter measures formulas with their advances and
// ink bounds, and gonum/plot measures and draws figure text with a
// font.Collection built from them, so every layout is computed with exactly
// the metrics of the glyphs that end up in the file.
package fonts

import (
	"fmt"
	"sync"

	"github.com/go-fonts/dejavu/dejavusans"
	"github.com/go-fonts/dejavu/dejavusansbold"
	"github.com/go-fonts/dejavu/dejavusansboldoblique"
	"github.com/go-fonts/dejavu/dejavusansmono"
	"github.com/go-fonts/dejavu/dejavusansmonobold"
	"github.com/go-fonts/dejavu/dejavusansoblique"
	"github.com/go-fonts/dejavu/dejavuserif"
	"github.com/go-fonts/dejavu/dejavuserifbold"
	"github.com/go-fonts/dejavu/dejavuserifbolditalic"
	"github.com/go-fonts/dejavu/dejavuserifitalic"
	stdfont "golang.org/x/image/font"
	"golang.org/x/image/font/opentype"

	"gonum.org/v1/plot/font"
	"gonum.org/v1/plot/text"
)

// Typeface is the gonum/plot typeface name of the embedded family.
const Typeface font.Typeface = "DejaVu"

// Variants of the family in the plot collection.
const (
	Sans  font.Variant = "Sans"
	Mono  font.Variant = "Mono"
	Serif font.Variant = "Serif"
)

// Style is one embedded font file.
type Style struct {
	// Family and Style are the names under which the PDF writer registers
	// the font ("sans" and "serif" with "", "B", "I", "BI"; "mono" with
	// "" and "B").
	Family string
	Style  string
	// Font is the gonum/plot descriptor (size zero).
	Font font.Font
	// TTF is the TrueType file.
	TTF []byte
}

// All lists every embedded font, in a fixed order.
func All() []Style {
	return []Style{
		{"sans", "", font.Font{Typeface: Typeface, Variant: Sans}, dejavusans.TTF},
		{"sans", "B", font.Font{Typeface: Typeface, Variant: Sans, Weight: stdfont.WeightBold}, dejavusansbold.TTF},
		{"sans", "I", font.Font{Typeface: Typeface, Variant: Sans, Style: stdfont.StyleItalic}, dejavusansoblique.TTF},
		{"sans", "BI", font.Font{Typeface: Typeface, Variant: Sans, Weight: stdfont.WeightBold, Style: stdfont.StyleItalic}, dejavusansboldoblique.TTF},
		{"mono", "", font.Font{Typeface: Typeface, Variant: Mono}, dejavusansmono.TTF},
		{"mono", "B", font.Font{Typeface: Typeface, Variant: Mono, Weight: stdfont.WeightBold}, dejavusansmonobold.TTF},
		{"serif", "", font.Font{Typeface: Typeface, Variant: Serif}, dejavuserif.TTF},
		{"serif", "B", font.Font{Typeface: Typeface, Variant: Serif, Weight: stdfont.WeightBold}, dejavuserifbold.TTF},
		{"serif", "I", font.Font{Typeface: Typeface, Variant: Serif, Style: stdfont.StyleItalic}, dejavuserifitalic.TTF},
		{"serif", "BI", font.Font{Typeface: Typeface, Variant: Serif, Weight: stdfont.WeightBold, Style: stdfont.StyleItalic}, dejavuserifbolditalic.TTF},
	}
}

// Lookup returns the embedded font for a PDF family and style, or nil.
func Lookup(family, style string) *Style {
	for _, s := range All() {
		if s.Family == family && s.Style == style {
			return &s
		}
	}
	return nil
}

// ForFace maps a gonum/plot font descriptor to the PDF family and style
// that renders it. Any typeface maps onto the embedded family: a variant
// of "Mono" goes to the mono faces, "Serif" to the serif faces and
// everything else to the sans faces, with matching weight and slant.
func ForFace(f font.Font) (family, style string) {
	bold := f.Weight >= stdfont.WeightSemiBold
	slanted := f.Style == stdfont.StyleItalic || f.Style == stdfont.StyleOblique
	if bold {
		style += "B"
	}
	switch f.Variant {
	case Mono:
		return "mono", style
	case Serif:
		family = "serif"
	default:
		family = "sans"
	}
	if slanted {
		style += "I"
	}
	return family, style
}

// ForOpentype returns the PDF family and style of a parsed face from
// Collection, identified by identity; ok is false for any other face.
// Text handlers that pass glyph faces separately from their descriptors
// (the LaTeX handler does) are mapped with it.
func ForOpentype(f *opentype.Font) (family, style string, ok bool) {
	if f == nil {
		return "", "", false
	}
	c := Collection()
	for i, face := range c {
		if face.Face == f {
			s := All()[i]
			return s.Family, s.Style, true
		}
	}
	return "", "", false
}

var (
	once  sync.Once
	coll  font.Collection
	cache *font.Cache
	err   error
)

func load() {
	for _, s := range All() {
		var f *opentype.Font
		f, err = opentype.Parse(s.TTF)
		if err != nil {
			err = fmt.Errorf("fonts: parse %s %s: %w", s.Family, s.Style, err)
			return
		}
		coll = append(coll, font.Face{Font: s.Font, Face: f})
	}
	coll = coll[:len(coll):len(coll)]
	cache = font.NewCache(coll)
}

// Collection returns the embedded family as a gonum/plot font collection.
// The first face is DejaVu Sans, which the cache uses as its default.
func Collection() font.Collection {
	once.Do(load)
	if err != nil {
		panic(err)
	}
	return coll
}

// Cache returns a gonum/plot font cache holding only the embedded faces.
func Cache() *font.Cache {
	once.Do(load)
	if err != nil {
		panic(err)
	}
	return cache
}

// Handler returns a plain-text handler for gonum/plot text styles that
// measures with the embedded faces.
func Handler() text.Handler {
	return text.Plain{Fonts: Cache()}
}

// Face returns a sized plot font of the embedded family.
func Face(v font.Variant, bold, italic bool, size font.Length) font.Font {
	f := font.Font{Typeface: Typeface, Variant: v, Size: size}
	if bold {
		f.Weight = stdfont.WeightBold
	}
	if italic {
		f.Style = stdfont.StyleItalic
	}
	return f
}
