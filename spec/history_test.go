package spec

import (
	"strings"
	"testing"
)

func TestHistory(t *testing.T) {
	src := fenced("memo", "title = T\nrevision = B\n"+
		"history = A | 2026-10-02 | R. Okonkwo | first issue\n"+
		"history = B | 2026-11-30 | R. Okonkwo | raised the moment to 0.15 A m2; vacuum cooling\n") +
		fenced("coil", coilBody)
	s, ds := Parse("h.md", []byte(src))
	if len(ds) > 0 {
		t.Fatal(ds)
	}
	h := s.Memo.History
	if len(h) != 2 {
		t.Fatalf("history %+v", h)
	}
	if h[1].Revision != "B" || h[1].Date != "2026-11-30" || h[1].DateValue.Format("2006-01-02") != "2026-11-30" ||
		h[1].Author != "R. Okonkwo" || h[1].Change != "raised the moment to 0.15 A m2; vacuum cooling" || h[1].Line != 5 {
		t.Errorf("revision B read as %+v", h[1])
	}
	n := 0
	for _, e := range s.Entries {
		if e.Key == "history" {
			n++
			if !strings.HasPrefix(e.SI, "A | 2026-10-02") && !strings.HasPrefix(e.SI, "B | 2026-11-30") {
				t.Errorf("inputs entry %+v", e)
			}
		}
	}
	if n != 2 {
		t.Errorf("%d history entries in the inputs", n)
	}
}

func TestHistoryBroken(t *testing.T) {
	memo := func(body string) string { return fenced("memo", body) + fenced("coil", coilBody) }
	cases := []struct {
		name string
		src  string
		line int
		msg  string
	}{
		{"three fields", memo("history = A | 2026-10-02 | first issue\n"), 2,
			`history: 3 field(s) separated by "|", want 4; write history = <revision> | <YYYY-MM-DD> | <author> | <what changed>`},
		{"bad date", memo("history = A | 2/10/2026 | R. O. | first issue\n"), 2,
			`history: date "2/10/2026" is not an ISO 8601 date`},
		{"empty author", memo("history = A | 2026-10-02 |  | first issue\n"), 2,
			`history: the author field is empty`},
		{"repeated revision", memo("history = A | 2026-10-02 | R. O. | first\nhistory = A | 2026-10-03 | R. O. | again\n"), 3,
			`history: revision "A" is already listed on line 2`},
		{"out of order", memo("history = A | 2026-10-02 | R. O. | first\nhistory = B | 2026-09-01 | R. O. | second\n"), 3,
			`history: revision B (2026-09-01) is dated before revision A (2026-10-02) on line 2; list revisions oldest first`},
		{"current revision missing", memo("revision = C\nhistory = A | 2026-10-02 | R. O. | first\n"), 2,
			`revision "C" has no history line; add history = C | <YYYY-MM-DD> | <author> | <what changed>`},
		{"history in coil block", fenced("coil", coilBody+"history = A | 2026-10-02 | R. O. | x\n"), 6,
			`key "history" belongs in the memo block, not the coil block`},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			_, ds := Parse("t.md", []byte(c.src))
			for _, d := range ds {
				if d.Line == c.line && strings.Contains(d.Msg, c.msg) {
					return
				}
			}
			t.Errorf("want line %d: %q; got\n%s", c.line, c.msg, ds.Error())
		})
	}
}
