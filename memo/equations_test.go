package memo

import (
	"coilmemo/analysis"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"golang.org/x/tools/txtar"

	"coilmemo/doc"
	"coilmemo/memo/mathlayout"
)

// specsForTests returns every example spec and every golden archive's spec.
func specsForTests(t *testing.T) map[string][]byte {
	t.Helper()
	out := map[string][]byte{}
	ex, _ := filepath.Glob("../examples/*.md")
	for _, f := range ex {
		b, err := os.ReadFile(f)
		if err != nil {
			t.Fatal(err)
		}
		out[f] = b
	}
	gs, _ := filepath.Glob("../testdata/golden/*.txtar")
	for _, f := range gs {
		ar, err := txtar.ParseFile(f)
		if err != nil {
			t.Fatal(err)
		}
		for _, file := range ar.Files {
			if file.Name == "spec.md" {
				out[f] = file.Data
			}
		}
	}
	if len(out) == 0 {
		t.Fatal("no specs")
	}
	return out
}

// walkBlocks calls f on every block, list items included.
func walkBlocks(bs []doc.Block, f func(doc.Block)) {
	for _, b := range bs {
		f(b)
		if l, ok := b.(doc.List); ok {
			for _, item := range l.Items {
				walkBlocks(item, f)
			}
		}
	}
}

// Every equation and inline formula the memo composes is notation the
// typesetter reads: a mistake would show in the PDF as raw source.
func TestEquationsAreValidNotation(t *testing.T) {
	for name, src := range specsForTests(t) {
		j, diags := evaluate(filepath.Base(name), src)
		if len(diags) > 0 {
			t.Fatalf("%s: %v", name, diags)
		}
		d := Document(j)
		n := 0
		check := func(s string) {
			n++
			if _, err := mathlayout.Layout(s, mathlayout.Options{Size: 10}); err != nil {
				t.Errorf("%s: bad notation %q: %v", name, s, err)
			}
		}
		walkBlocks(d.Blocks, func(b doc.Block) {
			switch b := b.(type) {
			case doc.Equation:
				if b.Label == "" || b.Description == "" || len(b.Lines) == 0 {
					t.Errorf("%s: equation without number, description or lines: %+v", name, b)
				}
				for _, l := range b.Lines {
					check(l)
				}
			case doc.Paragraph:
				for _, sp := range b.Spans {
					if sp.Math {
						check(sp.Text)
					}
				}
			}
		})
		if n < 10 {
			t.Errorf("%s: only %d formulas in the memo", name, n)
		}
	}
}

func TestQuantityNotation(t *testing.T) {
	cases := []struct {
		v    float64
		unit string
		sig  int
		want string
	}{
		{0.00319, "T", 4, `3.190\,\unit{mT}`},
		{1.7241e-8, "Ω·m", 5, `1.7241×10⁻⁸\,\unit{Ω·m}`},
		{8890, "kg/m³", 4, `8890\,\unit{kg/m³}`},
		{56.8, "°C", 3, `56.8\,\unit{°C}`},
		{0.0143, "kg", 3, `14.3\,\unit{g}`},
		{90, "°", 3, `90.0\unit{°}`},
		{12.5, "%", 3, `12.5\,\unit{\%}`},
		{3, "", 2, `3.0`},
	}
	for _, c := range cases {
		got := Q(c.v, c.unit, c.sig)
		if got != c.want {
			t.Errorf("Q(%g, %q, %d) = %q, want %q", c.v, c.unit, c.sig, got, c.want)
		}
		if _, err := mathlayout.Layout(got, mathlayout.Options{Size: 10}); err != nil {
			t.Errorf("Q(%g, %q): %v", c.v, c.unit, err)
		}
	}
	if got := N(-2.5e-3, 2); got != "−0.0025" {
		t.Errorf("N = %q", got)
	}
}

// Equations are numbered within their section, and each step reads
// symbol → numbers → result.
func TestDeriveNumbersWithinSections(t *testing.T) {
	c := &composer{j: &analysis.Study{}}
	c.heading(1, "First")
	c.derive(Step{What: "a", Symbolic: "a = b", Numbers: "1 + 2", Result: `3\,\unit{m}`})
	c.heading(1, "Second")
	c.heading(2, "Sub")
	c.derive(Step{What: "x", Symbolic: "x = y"}, Step{What: "T", Symbolic: "P = h A (T - T_a)", Numbers: "5 = 2 (T - 20)", Solve: "T", Result: "22.5"})
	var eqs []doc.Equation
	for _, b := range c.blocks {
		if e, ok := b.(doc.Equation); ok {
			eqs = append(eqs, e)
		}
	}
	if len(eqs) != 3 || eqs[0].Label != "1.1" || eqs[1].Label != "2.1" || eqs[2].Label != "2.2" {
		t.Fatalf("numbering: %+v", eqs)
	}
	if got := strings.Join(eqs[0].Lines, " | "); got != `a = b | = 1 + 2 | = 3\,\unit{m}` || !eqs[0].Result {
		t.Errorf("lines %q", got)
	}
	if eqs[1].Result || len(eqs[1].Lines) != 1 {
		t.Errorf("a relation without a result: %+v", eqs[1])
	}
	if got := eqs[2].Lines[2]; got != `\Rightarrow T = 22.5` {
		t.Errorf("implicit result line %q", got)
	}
}
