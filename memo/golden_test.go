package memo

import (
	"bytes"
	"encoding/json"
	"flag"
	"fmt"
	"math"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"golang.org/x/tools/txtar"

	"coilmemo/analysis"
	"coilmemo/analysis/report"
	"coilmemo/doc"
)

var update = flag.Bool("update", false, "rewrite the golden files in testdata/golden")

// TestGolden builds each testdata/golden/*.txtar archive's spec.md into the
// memo's text rendering and its JSON report. The JSON is compared with the
// archive's calc.json (as data, numbers to 1e-12); the text section by
// section (Sections) with testdata/golden/sections/<section>/<case>.txt,
// byte for byte, so a change of wording in one section rewrites that
// section's files only. Run with -update to accept changes after reviewing
// the diff.
func TestGolden(t *testing.T) {
	files, err := filepath.Glob("../testdata/golden/*.txtar")
	if err != nil || len(files) == 0 {
		t.Fatalf("no golden files: %v", err)
	}
	for _, file := range files {
		name := strings.TrimSuffix(filepath.Base(file), ".txtar")
		t.Run(name, func(t *testing.T) {
			ar, err := txtar.ParseFile(file)
			if err != nil {
				t.Fatal(err)
			}
			var specSrc, wantJSON []byte
			for _, f := range ar.Files {
				switch f.Name {
				case "spec.md":
					specSrc = f.Data
				case "calc.json":
					wantJSON = f.Data
				}
			}
			if specSrc == nil {
				t.Fatal("archive has no spec.md")
			}
			j, diags := evaluate("spec.md", specSrc)
			if len(diags) > 0 {
				t.Fatalf("spec problems:\n%v", diags)
			}
			texts, err := sectionTexts(j)
			if err != nil {
				t.Fatal(err)
			}
			js, err := report.JSON(j)
			if err != nil {
				t.Fatal(err)
			}
			if *update {
				out := &txtar.Archive{Comment: ar.Comment, Files: []txtar.File{{Name: "spec.md", Data: specSrc}, {Name: "calc.json", Data: js}}}
				if err := os.WriteFile(file, txtar.Format(out), 0o644); err != nil {
					t.Fatal(err)
				}
			} else if msg := jsonDiff(wantJSON, js); wantJSON == nil || msg != "" {
				// Numbers may move in their last bits when a formula is
				// rearranged: the JSON is compared as data.
				t.Errorf("calc.json differs from the golden file; run go test ./memo -run TestGolden -update and review the diff\n%s", msg)
			}
			for i, sec := range Sections {
				path := filepath.Join("../testdata/golden/sections", sec.Name(), name+".txt")
				if *update {
					if texts[i] == "" {
						os.Remove(path)
						continue
					}
					if err := os.MkdirAll(filepath.Dir(path), 0o755); err != nil {
						t.Fatal(err)
					}
					if err := os.WriteFile(path, []byte(texts[i]), 0o644); err != nil {
						t.Fatal(err)
					}
					continue
				}
				want, err := os.ReadFile(path)
				if err != nil && texts[i] == "" {
					continue
				}
				if string(want) != texts[i] {
					t.Errorf("section %s differs from %s; run go test ./memo -run TestGolden -update and review the diff\n%s",
						sec.Name(), path, unifiedDiff(string(want), texts[i]))
				}
			}
		})
	}
}

// sectionTexts renders the memo as text and cuts it at the start of each
// of Sections: the text of the blocks before a section is a prefix of the
// whole, since blocks are written in order.
func sectionTexts(j *analysis.Study) ([]string, error) {
	d, parts := ComposeSections(j)
	var whole bytes.Buffer
	if err := doc.WriteText(&whole, d); err != nil {
		return nil, err
	}
	cuts := make([]int, len(parts)+1)
	n := 0
	for i, p := range parts {
		var b bytes.Buffer
		if err := doc.WriteText(&b, &doc.Document{Meta: d.Meta, Blocks: d.Blocks[:n]}); err != nil {
			return nil, err
		}
		cuts[i] = b.Len()
		if i == 0 {
			cuts[i] = 0 // the title lines belong to page 1
		}
		n += len(p)
	}
	cuts[len(parts)] = whole.Len()
	out := make([]string, len(parts))
	for i := range parts {
		out[i] = whole.String()[cuts[i]:cuts[i+1]]
	}
	return out, nil
}

// unifiedDiff shows the lines that differ between two texts with two
// lines of context, as "-" (golden) and "+" (got) lines, by the longest
// common subsequence of lines.
func unifiedDiff(want, got string) string {
	a, b := strings.Split(want, "\n"), strings.Split(got, "\n")
	// lcs[i][j] is the LCS length of a[i:] and b[j:].
	lcs := make([][]int, len(a)+1)
	for i := range lcs {
		lcs[i] = make([]int, len(b)+1)
	}
	for i := len(a) - 1; i >= 0; i-- {
		for j := len(b) - 1; j >= 0; j-- {
			if a[i] == b[j] {
				lcs[i][j] = lcs[i+1][j+1] + 1
			} else {
				lcs[i][j] = max(lcs[i+1][j], lcs[i][j+1])
			}
		}
	}
	type line struct {
		op   byte
		text string
		at   int // line number in the golden text
	}
	var ops []line
	i, j := 0, 0
	for i < len(a) || j < len(b) {
		switch {
		case i < len(a) && j < len(b) && a[i] == b[j]:
			ops = append(ops, line{' ', a[i], i + 1})
			i, j = i+1, j+1
		case j < len(b) && (i == len(a) || lcs[i][j+1] >= lcs[i+1][j]):
			ops = append(ops, line{'+', b[j], i + 1})
			j++
		default:
			ops = append(ops, line{'-', a[i], i + 1})
			i++
		}
	}
	var out strings.Builder
	last := -10
	for k, o := range ops {
		near := false
		for d := -2; d <= 2; d++ {
			if k+d >= 0 && k+d < len(ops) && ops[k+d].op != ' ' {
				near = true
			}
		}
		if !near {
			continue
		}
		if k != last+1 {
			fmt.Fprintf(&out, "@@ line %d @@\n", o.at)
		}
		fmt.Fprintf(&out, "%c %s\n", o.op, o.text)
		last = k
	}
	return out.String()
}

// jsonDiff compares two JSON documents as data, numbers within 1e-12
// relative (relative differences within 1e-12 absolute), and describes the
// first difference.
func jsonDiff(want, got []byte) string {
	var w, g any
	if err := json.Unmarshal(want, &w); err != nil {
		return "golden calc.json: " + err.Error()
	}
	if err := json.Unmarshal(got, &g); err != nil {
		return "calc.json: " + err.Error()
	}
	return valueDiff("", w, g)
}

func valueDiff(path string, w, g any) string {
	switch wv := w.(type) {
	case map[string]any:
		gv, ok := g.(map[string]any)
		if !ok {
			return fmt.Sprintf("%s: want an object, got %v", path, g)
		}
		for k := range wv {
			if _, ok := gv[k]; !ok {
				return fmt.Sprintf("%s.%s: missing", path, k)
			}
		}
		for k := range gv {
			if _, ok := wv[k]; !ok {
				return fmt.Sprintf("%s.%s: not in the golden file", path, k)
			}
			if d := valueDiff(path+"."+k, wv[k], gv[k]); d != "" {
				return d
			}
		}
	case []any:
		gv, ok := g.([]any)
		if !ok || len(gv) != len(wv) {
			return fmt.Sprintf("%s: want %d elements, got %v", path, len(wv), g)
		}
		for i := range wv {
			if d := valueDiff(fmt.Sprintf("%s[%d]", path, i), wv[i], gv[i]); d != "" {
				return d
			}
		}
	case float64:
		gv, ok := g.(float64)
		tol := 1e-12*math.Max(math.Abs(wv), math.Abs(gv)) + 1e-300
		if strings.HasSuffix(path, ".rel_diff") {
			// A difference of nearly equal numbers: its own noise is
			// absolute, of the order of the inputs' last bits.
			tol = 1e-12
		}
		if !ok || math.Abs(gv-wv) > tol {
			return fmt.Sprintf("%s: want %v, got %v", path, wv, g)
		}
	default:
		if fmt.Sprint(w) != fmt.Sprint(g) {
			return fmt.Sprintf("%s: want %v, got %v", path, w, g)
		}
	}
	return ""
}
