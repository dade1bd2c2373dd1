package spec

import (
	"strings"
)

// ChoiceMark begins the comment line the size command writes at the top
// of the size block; a later run replaces it.
const ChoiceMark = "# chosen:"

// WriteChoice returns the spec source src with the values of the free keys
// of the sized coils set, and a comment line naming the choice at the top
// of the size block. values maps a coil's name to its key → value text.
// A key the coil block states is set in place, its comment kept; a key it
// does not state is added after its last key. The rest of the source is
// unchanged, byte for byte.
func WriteChoice(src []byte, s *Spec, values map[string]map[string]string, comment string) []byte {
	text := string(src)
	nl := "\n"
	if strings.Contains(text, "\r\n") {
		nl = "\r\n"
	}
	lines := strings.SplitAfter(text, "\n")
	set := map[int]string{}     // line → new text
	after := map[int][]string{} // line → lines to add after it
	for ci, co := range s.Design.Coils {
		vals, ok := values[co.Name]
		if !ok {
			continue
		}
		last := 0
		if ci < len(s.CoilFences) {
			last = s.CoilFences[ci]
		}
		stated := map[string]int{}
		for _, e := range s.Entries {
			if e.Block == blockCoil && e.Coil == co.Name && !e.Default && e.Raw != "" && e.Line > 0 {
				stated[e.Key] = e.Line
				last = max(last, e.Line)
			}
		}
		for _, key := range sortedKeys(vals) {
			v := vals[key]
			if ln, ok := stated[key]; ok && ln <= len(lines) {
				set[ln] = setValue(lines[ln-1], v)
				continue
			}
			after[last] = append(after[last], key+" = "+v+nl)
		}
	}
	var b strings.Builder
	sizeLine := 0
	if s.Size != nil {
		sizeLine = s.Size.Line
	}
	for i, l := range lines {
		ln := i + 1
		if sizeLine > 0 && ln == sizeLine+1 && strings.HasPrefix(strings.TrimSpace(l), ChoiceMark) {
			continue // the previous run's comment, replaced below
		}
		if t, ok := set[ln]; ok {
			l = t
		}
		b.WriteString(l)
		if ln == sizeLine {
			if !strings.HasSuffix(l, "\n") {
				b.WriteString(nl)
			}
			b.WriteString(ChoiceMark + " " + comment + nl)
		}
		for _, a := range after[ln] {
			if !strings.HasSuffix(l, "\n") {
				b.WriteString(nl)
			}
			b.WriteString(a)
		}
	}
	return []byte(b.String())
}

// setValue replaces the value of a "key = value # comment" line, keeping
// the key, the spacing after "=", the comment and the line end.
func setValue(line, v string) string {
	i := strings.IndexByte(line, '=')
	if i < 0 {
		return line
	}
	body := line[i+1:]
	end := ""
	for _, e := range []string{"\r\n", "\n"} {
		if strings.HasSuffix(body, e) {
			body, end = strings.TrimSuffix(body, e), e
			break
		}
	}
	comment := ""
	if k, _ := commentStart(body); k < len(body) {
		comment, body = body[k:], body[:k]
	}
	lead := body[:len(body)-len(strings.TrimLeft(body, " \t"))]
	if lead == "" {
		lead = " "
	}
	out := line[:i+1] + lead + v
	if comment != "" {
		// keep the comment's column where the new value leaves room
		pad := len(body) - len(lead) - len(v)
		if pad < 1 {
			pad = 1
		}
		out += strings.Repeat(" ", pad) + comment
	}
	return out + end
}

func sortedKeys(m map[string]string) []string {
	order := []string{"turns", "wire"}
	var out []string
	for _, k := range order {
		if _, ok := m[k]; ok {
			out = append(out, k)
		}
	}
	for _, k := range coilKeys {
		if _, ok := m[k]; ok && k != "turns" && k != "wire" {
			out = append(out, k)
		}
	}
	return out
}
