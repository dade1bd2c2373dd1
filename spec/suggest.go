package spec

import "strings"

// EditDistance is the optimal-string-alignment edit distance between a
// and b: insertions, deletions, substitutions and swaps of two adjacent
// characters each cost one. The spec reader's and the command line's
// suggestions both rank by it.
func EditDistance(a, b string) int {
	ra, rb := []rune(a), []rune(b)
	if len(ra) > 64 || len(rb) > 64 {
		// long garbage is never a misspelt key
		return len(ra) + len(rb)
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

// nearest returns the candidate closest to s when it is close enough to be
// a plausible misspelling (at most 2 edits, and at most a third of the
// word), or "".
func nearest(s string, candidates []string) string {
	s = strings.ToLower(s)
	best, bestD := "", 1<<30
	for _, c := range candidates {
		if d := EditDistance(s, c); d < bestD {
			best, bestD = c, d
		}
	}
	limit := 2
	if n := len([]rune(s)); n < 6 {
		limit = max(1, n/3)
	}
	if bestD > limit {
		return ""
	}
	return best
}
