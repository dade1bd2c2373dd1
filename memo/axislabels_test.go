package memo

import (
	"os"
	"path/filepath"
	"regexp"
	"strings"
	"testing"

	"gonum.org/v1/plot/vg/recorder"

	"coilmemo/doc"
)

// drawFigure draws fig at its size and returns the calls it made.
func drawFigure(fig doc.Figure) []recorder.Action {
	var c recorder.Canvas
	fig.Draw(&c, fig.Width, fig.Height)
	return c.Actions
}

// drawnTexts are the strings among a drawing's calls, in order.
func drawnTexts(actions []recorder.Action) []string {
	var texts []string
	for _, a := range actions {
		if fs, ok := a.(*recorder.FillString); ok {
			texts = append(texts, fs.String)
		}
	}
	return texts
}

// figureTexts draws every figure of the memo of each design and hands
// over the texts set in it.
func figureTexts(t *testing.T, files []string, each func(file, caption string, texts []string)) {
	t.Helper()
	for _, f := range files {
		j, _ := memoOf(t, f, false)
		if j == nil {
			continue
		}
		for _, b := range Compose(j).Blocks {
			fig, ok := b.(doc.Figure)
			if !ok {
				continue
			}
			each(filepath.Base(f), fig.Caption, drawnTexts(drawFigure(fig)))
		}
	}
}

// axisLabel is an axis label with its unit: "Position y along the height
// (mm)"; the unit's group ends the text.
var axisLabel = regexp.MustCompile(`^\S.* \(([^()]*)\)$`)

// No axis label on any figure of any design has a parenthesised group
// before its unit's ("Position y (along the height) (mm)"), no text on a
// figure two groups side by side, and no figure caption either ("over the
// meridian plane (through the axis) (coil frame; …)"). A function's
// argument, as in "B/B(0) − 1 (%)", is no such group.
func TestFigureTextsOneParenthesis(t *testing.T) {
	two := regexp.MustCompile(`\)\s*\(`)
	before := regexp.MustCompile(`(^|\s)\([^()]*\)[^()]* \([^()]*\)$`)
	n := 0
	figureTexts(t, designFiles(t), func(file, caption string, texts []string) {
		for _, s := range texts {
			if axisLabel.MatchString(s) {
				n++
				if before.MatchString(s) {
					t.Errorf("%s, %.50s…: axis label %q has a parenthesised group before its unit", file, caption, s)
				}
			}
			if two.MatchString(s) {
				t.Errorf("%s, %.50s…: %q has two parenthesised groups", file, caption, s)
			}
		}
		if two.MatchString(caption) {
			t.Errorf("%s: caption %q has two parenthesised groups", file, caption)
		}
	})
	if n < 20 {
		t.Errorf("only %d axis labels seen over all designs", n)
	}
}

// On a figure of a coil whose axis is x, y or tilted, no two axes carry
// the same coordinate letter (a rectangle along x once had "Position
// across the width x" against "Axial position along the coil's axis x").
// The letter is the first single-letter word of an axis label in a length
// unit: "Position u across the width (mm)" u, "Axial position w along the
// coil's axis x (mm)" w (x there names the direction).
func TestFigureAxesDistinctLetters(t *testing.T) {
	files, _ := filepath.Glob("../testdata/figures/*.md")
	var some []string
	for _, f := range files {
		for _, k := range []string{"x-axis-coil", "tilted-torquer", "three-axis-set", "torquer-set-full-page"} {
			if strings.Contains(f, k) {
				some = append(some, f)
			}
		}
	}
	// and the rectangles along x and along y of their own
	some = append(some, rectangleAlong(t, "x"), rectangleAlong(t, "y"))
	coord := regexp.MustCompile(`(?:^|\s)−?([xyzuvwρ])(?:\s|$)`)
	figs := 0
	figureTexts(t, some, func(file, caption string, texts []string) {
		letters := map[string]string{}
		for _, s := range texts {
			m := axisLabel.FindStringSubmatch(s)
			if m == nil || !strings.HasSuffix(m[1], "m") {
				continue
			}
			name := strings.TrimSuffix(s, " ("+m[1]+")")
			l := coord.FindStringSubmatch(name)
			if l == nil {
				t.Errorf("%s, %.50s…: axis %q names no coordinate", file, caption, s)
				continue
			}
			if prev, ok := letters[l[1]]; ok {
				t.Errorf("%s, %.50s…: axes %q and %q both %s", file, caption, prev, s, l[1])
			}
			letters[l[1]] = s
		}
		if len(letters) >= 2 {
			figs++
		}
	})
	if figs < 6 {
		t.Errorf("only %d figures with two position axes seen", figs)
	}
}

// rectangleAlong writes the figure-test rectangle turned to the given
// axis, with a test plane (so that it has a plane map too), and returns
// its file.
func rectangleAlong(t *testing.T, axis string) string {
	t.Helper()
	src, err := os.ReadFile("../testdata/figures/rectangle.md")
	if err != nil {
		t.Fatal(err)
	}
	s := strings.Replace(string(src), "form          = rectangle\n", "form          = rectangle\naxis          = "+axis+"\ntest-plane    = 40 mm\n", 1)
	if s == string(src) {
		t.Fatal("rectangle.md: no form line to turn")
	}
	f := filepath.Join(t.TempDir(), "rectangle-along-"+axis+".md")
	if err := os.WriteFile(f, []byte(s), 0o644); err != nil {
		t.Fatal(err)
	}
	return f
}
