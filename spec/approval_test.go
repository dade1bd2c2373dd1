package spec

import (
	"strings"
	"testing"
)

// The approval keys: a name, a date per role, and the previous revision.
func TestApprovalKeys(t *testing.T) {
	src := fenced("memo", "author = A. Author\nchecker = C. Checker\napprover = P. Approver\nprepared-date = 2026-11-28\nchecked-date = 2026-11-29\napproved-date = 2026-11-30\nprevious = rev-a.md\n") + fenced("coil", coilBody)
	s, ds := Parse("t.md", []byte(src))
	if len(ds) > 0 {
		t.Fatal(ds)
	}
	m := s.Memo
	if m.Approver != "P. Approver" || m.PreparedDate != "2026-11-28" || m.CheckedDate != "2026-11-29" || m.ApprovedDate != "2026-11-30" {
		t.Errorf("memo %+v", m)
	}
	if m.Previous != "rev-a.md" || m.PreviousLine != 8 {
		t.Errorf("previous %q at line %d, want rev-a.md at 8", m.Previous, m.PreviousLine)
	}
}

func TestApprovalKeysBroken(t *testing.T) {
	for _, c := range []struct {
		src  string
		line int
		msg  string
	}{
		{fenced("memo", "checked-date = 29.11.2026\n"), 2, `checked-date: "29.11.2026" is not an ISO 8601 date`},
		{fenced("memo", "approved-date = soon\n"), 2, `approved-date: "soon" is not an ISO 8601 date`},
		{fenced("memo", "previous = git:\n"), 2, `previous: name the previous revision's spec`},
		{fenced("memo", "aprover = X\n"), 2, `did you mean "approver"?`},
	} {
		_, ds := Parse("t.md", []byte(c.src+fenced("coil", coilBody)))
		found := false
		for _, d := range ds {
			if d.Line == c.line && strings.Contains(d.Msg, c.msg) {
				found = true
			}
		}
		if !found {
			t.Errorf("want line %d: %q; got\n%s", c.line, c.msg, ds.Error())
		}
	}
}

// An approval record that does not hold together is accepted with a
// positioned warning, not silently: an issued memo with no approver, and a
// role's date after the memo's date. A consistent record warns of nothing.
func TestApprovalWarnings(t *testing.T) {
	for _, c := range []struct {
		memo string
		line int
		msg  string
	}{
		{"date = 2026-11-30\nstatus = issued\n", 3, "status = issued but no approver is named"},
		{"date = 2026-11-30\nchecked-date = 2026-12-02\nstatus = draft\n", 3, "checked-date 2026-12-02 is later than the memo's date 2026-11-30"},
		{"date = 2026-11-30\napprover = P. Approver\napproved-date = 2026-12-01\nstatus = Issued\n", 4, "approved-date 2026-12-01 is later than the memo's date"},
		{"date = 2026-11-30\napprover = P. Approver\nchecked-date = 2026-11-30\nstatus = issued\n", 0, ""},
		{"status = draft\nchecked-date = 2026-12-02\n", 0, ""}, // no memo date to compare with
	} {
		s, ds := Parse("t.md", []byte(fenced("memo", c.memo)+fenced("coil", coilBody)))
		if len(ds) > 0 {
			t.Fatal(ds)
		}
		if c.msg == "" {
			if len(s.Warnings) > 0 {
				t.Errorf("%q: unexpected warnings %v", c.memo, s.Warnings)
			}
			continue
		}
		if len(s.Warnings) != 1 || s.Warnings[0].Line != c.line || !strings.Contains(s.Warnings[0].Msg, c.msg) {
			t.Errorf("%q: want line %d: %q; got %v", c.memo, c.line, c.msg, s.Warnings)
		}
	}
}
