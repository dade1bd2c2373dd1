package main

import (
	"sort"
	"strings"

	"coilmemo/spec"
)

// nearest returns the candidate closest to s (ties to the alphabetically
// first) when it is close enough to be a plausible misspelling: at most 2
// edits, and fewer than half the letters of s; otherwise "".
func nearest(s string, candidates []string) string {
	s = strings.ToLower(s)
	c := append([]string(nil), candidates...)
	sort.Strings(c)
	best, bestD := "", 1<<30
	for _, name := range c {
		if d := spec.EditDistance(s, name); d < bestD {
			best, bestD = name, d
		}
	}
	if bestD > 2 || 2*bestD >= len([]rune(s)) {
		return ""
	}
	return best
}
