package main

import (
	"bytes"
	"strings"
	"testing"

	"coilmemo/spec"
)

// The edit distance against textbook cases (recalled from memory): the
// Levenshtein distance kitten → sitting is 3; a swap of two adjacent
// letters costs one; "ca" → "abc" is 3 under optimal string alignment
// (2 under unrestricted Damerau–Levenshtein, which may edit a swapped
// pair again).
func TestEditDistance(t *testing.T) {
	for _, c := range []struct {
		a, b string
		d    int
	}{
		{"kitten", "sitting", 3}, {"", "abc", 3}, {"build", "build", 0}, {"bulid", "build", 1},
		{"ca", "abc", 3}, {"jsn", "json", 1}, {"µT", "uT", 1},
	} {
		if got := spec.EditDistance(c.a, c.b); got != c.d {
			t.Errorf("EditDistance(%q, %q) = %d, want %d", c.a, c.b, got, c.d)
		}
		if got := spec.EditDistance(c.b, c.a); got != c.d {
			t.Errorf("EditDistance(%q, %q) = %d, want %d (symmetry)", c.b, c.a, got, c.d)
		}
	}
	names := []string{"build", "calc", "diff", "watch", "new", "help", "version"}
	for in, want := range map[string]string{"bild": "build", "BUILD": "build", "clac": "calc", "wtch": "watch",
		"nwe": "new", "x": "", "frobnicate": "", "bd": "", "dif": "diff"} {
		if got := nearest(in, names); got != want {
			t.Errorf("nearest(%q) = %q, want %q", in, got, want)
		}
	}
}

// After "--" every argument is a file, even one that starts with a dash.
func TestDoubleDash(t *testing.T) {
	var o, e bytes.Buffer
	err := run([]string{"calc", "--", "-x.md"}, &o, &e)
	if code(err) != 2 || !strings.Contains(err.Error(), "stat -x.md: no such file or directory") {
		t.Errorf("exit %d: %v", code(err), err)
	}
}
