package memo

import (
	"bytes"
	"regexp"
	"strconv"
	"strings"
	"testing"

	"coilmemo/doc"
)

// Like coils share one part of each section (method, field, inductance
// and switching, heating) under a heading naming them all; coils that
// differ anywhere keep parts of their own. Equation and figure numbers
// run on without gaps either way.
func TestLikeCoilsShareTheirParts(t *testing.T) {
	centres := map[string]string{"x": "(45, 0, 0) mm", "y": "(0, 45, 0) mm", "z": "(0, 0, -40) mm"}
	coil := func(name, axis, current string) string {
		return "```coil\nname = " + name + "\nform = loop\nmean-diameter = 70 mm\nturns = 150\nwire = AWG 32\ncurrent = " + current +
			"\naxis = " + axis + "\ncentre = " + centres[axis] + "\n```\n\n"
	}
	text := func(src string) string {
		var buf bytes.Buffer
		if err := doc.WriteText(&buf, Document(mustEvaluate(t, src))); err != nil {
			t.Fatal(err)
		}
		return buf.String()
	}
	checkNumbers := func(name, s string) {
		t.Helper()
		fig := 0
		for _, m := range regexp.MustCompile(`\[Figure (\d+):`).FindAllStringSubmatch(s, -1) {
			fig++
			if m[1] != strconvI(fig) {
				t.Errorf("%s: figure %s where %d was due", name, m[1], fig)
			}
		}
		last := map[string]int{}
		eqs := regexp.MustCompile(`(?m)^\((\d+)\.(\d+)\) `).FindAllStringSubmatch(s, -1)
		if len(eqs) < 20 || fig < 3 {
			t.Errorf("%s: %d equations and %d figures found: the text is not what the test reads", name, len(eqs), fig)
		}
		for _, m := range eqs {
			if n := atoiT(m[2]); n != last[m[1]]+1 {
				t.Errorf("%s: equation (%s.%s) after (%s.%d)", name, m[1], m[2], m[1], last[m[1]])
			}
			last[m[1]] = atoiT(m[2])
		}
	}
	like := text("# Set\n\n" + coil("X coil", "x", "60 mA") + coil("Y coil", "y", "60 mA") + coil("Z coil", "z", "60 mA"))
	checkNumbers("like", like)
	heads := strings.Count(like, `### Coils "X coil", "Y coil" and "Z coil"`)
	if heads != 3 { // method, inductance and switching, heating
		t.Errorf("%d shared part headings, want 3:\n%s", heads, like)
	}
	if !strings.Contains(like, `### Field of coils "X coil", "Y coil" and "Z coil"`) {
		t.Error("no shared field part")
	}
	if strings.Contains(like, `### Coil "Y coil"`) || strings.Contains(like, `### Field of coil "Z coil"`) {
		t.Error("a like coil still has a part of its own")
	}
	if n := strings.Count(like, "holds unchanged for coils \"Y coil\" and \"Z coil\""); n != 4 {
		t.Errorf("%d notes on the shared parts, want 4", n)
	}

	unlike := text("# Set\n\n" + coil("X coil", "x", "60 mA") + coil("Y coil", "y", "50 mA") + coil("Z coil", "z", "60 mA"))
	checkNumbers("unlike", unlike)
	if !strings.Contains(unlike, `### Coil "Y coil"`) || !strings.Contains(unlike, `### Field of coil "Y coil"`) {
		t.Error("the coil at another current lost its own parts")
	}
	if !strings.Contains(unlike, `### Coils "X coil" and "Z coil"`) {
		t.Error("the like coils on either side of an unlike one are not shared")
	}
}

func strconvI(n int) string { return strconv.Itoa(n) }

func atoiT(s string) int { n, _ := strconv.Atoi(s); return n }
