package main

import (
	"sort"
	"strings"
)

// editDistance is the optimal-string-alignment distance between a and b:
// insertions, deletions, substitutions and swaps of two adjacent
// characters each cost one.
func editDistance(a, b string) int {
	ra, rb := []rune(a), []rune(b)
	if len(ra) > 64 || len(rb) > 64 {
		return len(ra) + len(rb) // long garbage is never a misspelt name
	}
	d := make([][]int, len(ra)+1)
	for i := range d {
		d[i] = make([]int, len(rb)+1)
		d[i][0] = i
	}
	for j := range d[0] {
		d[0][j] = j
	}
	for i := 1; i <= len(ra); i++ {
		for j := 1; j <= len(rb); j++ {
			cost := 1
			if ra[i-1] == rb[j-1] {
				cost = 0
			}
			d[i][j] = min(d[i-1][j]+1, d[i][j-1]+1, d[i-1][j-1]+cost)
			if i > 1 && j > 1 && ra[i-1] == rb[j-2] && ra[i-2] == rb[j-1] {
				d[i][j] = min(d[i][j], d[i-2][j-2]+1)
			}
		}
	}
	return d[len(ra)][len(rb)]
}

// nearest returns the candidate closest to s (ties to the alphabetically
// first) when it is close enough to be a plausible misspelling: at most 2
// edits, and fewer than half the letters of s; otherwise "".
func nearest(s string, candidates []string) string {
	s = strings.ToLower(s)
	c := append([]string(nil), candidates...)
	sort.Strings(c)
	best, bestD := "", 1<<30
	for _, name := range c {
		if d := editDistance(s, name); d < bestD {
			best, bestD = name, d
		}
	}
	if bestD > 2 || 2*bestD >= len([]rune(s)) {
		return ""
	}
	return best
}
