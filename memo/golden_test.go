package memo

import (
	"bytes"
	"coilmemo/analysis/report"
	"encoding/json"
	"flag"
	"fmt"
	"math"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"golang.org/x/tools/txtar"

	"coilmemo/doc"
)

var update = flag.Bool("update", false, "rewrite the golden files in testdata/golden")

// TestGolden builds each testdata/golden/*.txtar archive's spec.md into the
// memo's text rendering and its JSON report, and compares them with the
// archive's memo.txt and calc.json. Run with -update to accept changes
// after reviewing the diff.
func TestGolden(t *testing.T) {
	files, err := filepath.Glob("../testdata/golden/*.txtar")
	if err != nil || len(files) == 0 {
		t.Fatalf("no golden files: %v", err)
	}
	for _, file := range files {
		t.Run(filepath.Base(file), func(t *testing.T) {
			ar, err := txtar.ParseFile(file)
			if err != nil {
				t.Fatal(err)
			}
			var specSrc []byte
			for _, f := range ar.Files {
				if f.Name == "spec.md" {
					specSrc = f.Data
				}
			}
			if specSrc == nil {
				t.Fatal("archive has no spec.md")
			}
			j, diags := evaluate("spec.md", specSrc)
			if len(diags) > 0 {
				t.Fatalf("spec problems:\n%v", diags)
			}
			var text bytes.Buffer
			if err := doc.WriteText(&text, Document(j)); err != nil {
				t.Fatal(err)
			}
			js, err := report.JSON(j)
			if err != nil {
				t.Fatal(err)
			}
			got := map[string][]byte{"memo.txt": text.Bytes(), "calc.json": js}
			if *update {
				out := &txtar.Archive{Comment: ar.Comment}
				out.Files = append(out.Files, txtar.File{Name: "spec.md", Data: specSrc})
				for _, name := range []string{"memo.txt", "calc.json"} {
					out.Files = append(out.Files, txtar.File{Name: name, Data: got[name]})
				}
				if err := os.WriteFile(file, txtar.Format(out), 0o644); err != nil {
					t.Fatal(err)
				}
				return
			}
			for _, name := range []string{"memo.txt", "calc.json"} {
				var want []byte
				found := false
				for _, f := range ar.Files {
					if f.Name == name {
						want, found = f.Data, true
					}
				}
				if !found {
					t.Errorf("archive has no %s (run go test ./memo -update)", name)
					continue
				}
				if name == "calc.json" && !bytes.Equal(got[name], want) {
					// Numbers may move in their last bits when a formula is
					// rearranged; the JSON is compared as data, numbers to
					// 1e-12 relative. memo.txt is compared byte for byte.
					if msg := jsonDiff(want, got[name]); msg != "" {
						t.Errorf("calc.json differs from the golden file; run go test ./memo -run TestGolden -update and review the diff\n%s", msg)
					}
					continue
				}
				if !bytes.Equal(got[name], want) {
					t.Errorf("%s differs from the golden file; run go test ./memo -run TestGolden -update and review the diff\n%s",
						name, firstDiff(string(want), string(got[name])))
				}
			}
		})
	}
}

// firstDiff shows the first differing line of two texts.
func firstDiff(want, got string) string {
	wl := bytes.Split([]byte(want), []byte("\n"))
	gl := bytes.Split([]byte(got), []byte("\n"))
	for i := 0; i < len(wl) || i < len(gl); i++ {
		var w, g []byte
		if i < len(wl) {
			w = wl[i]
		}
		if i < len(gl) {
			g = gl[i]
		}
		if !bytes.Equal(w, g) {
			return fmt.Sprintf("line %d:\n  want: %s\n  got:  %s", i+1, w, g)
		}
	}
	return ""
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
