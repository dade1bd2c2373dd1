package spec

import (
	"fmt"
	"strings"
)

// historyLine reads one `history` line of the memo block,
//
//	history = <revision> | <date> | <author> | <what changed>
//
// with an ISO 8601 date, and returns the value for the inputs table ("" if
// the line is rejected). The key may be repeated, one line a revision,
// oldest first.
func (p *parser) historyLine(e kv) string {
	const want = "write history = <revision> | <YYYY-MM-DD> | <author> | <what changed>, e.g. history = B | 2026-11-30 | R. Okonkwo | raised the moment to 0.15 A m2"
	fields := strings.Split(e.value, "|")
	if len(fields) != 4 {
		p.errf(e.line, "history: %d field(s) separated by \"|\", want 4; %s", len(fields), want)
		return ""
	}
	for i := range fields {
		fields[i] = strings.TrimSpace(fields[i])
	}
	r := Revision{Revision: fields[0], Date: fields[1], Author: fields[2], Change: fields[3], Line: e.line}
	ok := true
	for i, name := range []string{"revision", "date", "author", "what changed"} {
		if fields[i] == "" {
			p.errf(e.line, "history: the %s field is empty; %s", name, want)
			ok = false
		}
	}
	if r.Date != "" {
		t, err := parseDate(r.Date)
		if err != nil {
			p.errf(e.line, "history: date %q is not an ISO 8601 date; write YYYY-MM-DD, e.g. 2026-11-30", r.Date)
			ok = false
		}
		r.DateValue = t
	}
	m := &p.spec.Memo
	for _, prev := range m.History {
		if r.Revision != "" && prev.Revision == r.Revision {
			p.errf(e.line, "history: revision %q is already listed on line %d; give each revision one line", r.Revision, prev.Line)
			ok = false
		}
	}
	if n := len(m.History); ok && n > 0 && r.DateValue.Before(m.History[n-1].DateValue) {
		prev := m.History[n-1]
		p.errf(e.line, "history: revision %s (%s) is dated before revision %s (%s) on line %d; list revisions oldest first",
			r.Revision, r.Date, prev.Revision, prev.Date, prev.Line)
		ok = false
	}
	if !ok {
		return ""
	}
	m.History = append(m.History, r)
	return fmt.Sprintf("%s | %s | %s | %s", r.Revision, r.DateValue.Format("2006-01-02"), r.Author, r.Change)
}

// checkHistory reports a memo revision that the history does not list:
// the archive would not say what the current revision changed.
func (p *parser) checkHistory() {
	m := &p.spec.Memo
	if len(m.History) == 0 || m.Revision == "" {
		return
	}
	for _, r := range m.History {
		if r.Revision == m.Revision {
			return
		}
	}
	line := m.History[len(m.History)-1].Line
	for _, e := range p.spec.Entries {
		if e.Block == blockMemo && e.Key == "revision" {
			line = e.Line
		}
	}
	p.errf(line, "revision %q has no history line; add history = %s | <YYYY-MM-DD> | <author> | <what changed> to the memo block", m.Revision, m.Revision)
}
