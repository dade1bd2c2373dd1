package pdf

import (
	"fmt"

	"coilmemo/doc"
)

// contents sets the table of contents: an unnumbered title set like a
// level-1 heading, then one line per heading, indented by level, with a
// dotted leader to its page number. The numbers are set when the whole
// layout is known (lateNum, finishPages), each the page of the heading it
// lists; the entries are the headings in order, the same headings
// that become the bookmarks, so the contents and the outline agree. The
// contents' own height does not depend on the page numbers, so both
// passes lay it out alike.
func (r *renderer) contents(c doc.Contents) {
	hs := headingStyleFor(1)
	title := c.Title
	if title == "" {
		title = "Contents"
	}
	lines := layoutSpans(plainSpans(title), hs.st, r.w, r.w)
	h := float64(len(lines))*hs.st.lead + headingRuleGap
	if !r.fresh && h+hs.after+2*leadBody > r.room(hs.before) {
		r.newPage()
	}
	r.need(hs.before, h)
	r.place("heading", r.y, r.y+h)
	r.bookmark(title, 0)
	y := r.y
	for _, l := range lines {
		r.drawLine(l, r.x, y+baselineOffset(hs.st.size, hs.st.lead))
		y += hs.st.lead
	}
	r.rule(r.x, y+1.5, r.x+r.w, 0.5, colRule)
	r.y = y + headingRuleGap
	r.after(hs.after)

	pageW := textWidthOf("sans", "", sizeBody, "000")
	for i, e := range c.Entries {
		st := styBody
		gap := 0.0
		if e.Level <= 1 {
			st.bold = true
			gap = 3
		}
		r.need(gap, leadBody)
		base := r.y + baselineOffset(st.size, leadBody)
		indent := 28.0 * float64(max(e.Level-1, 0))
		x := r.x + indent
		if e.Number != "" {
			r.simpleText(e.Number, st, x, base)
		}
		x += 20
		page := ""
		if !r.late && i < len(r.headPages) {
			page = fmt.Sprint(r.headPages[i]) // a heading set before the contents
		}
		room := r.x + r.w - pageW - 8 - x
		text := fit(e.Text, st, room)
		r.simpleText(text, st, x, base)
		fam, sty := st.face()
		end := x + textWidthOf(fam, sty, st.size, text) + 4
		dots := textStyle{size: st.size, lead: leadBody, color: colMuted}
		dw := textWidthOf("sans", "", st.size, ". ")
		if dw > 0 && !r.dry {
			n := int((r.x + r.w - pageW - 4 - end) / dw)
			if n > 0 {
				leader := ""
				for range n {
					leader += ". "
				}
				lw := textWidthOf("sans", "", st.size, leader)
				r.simpleText(leader, dots, r.x+r.w-pageW-4-lw, base)
			}
		}
		if r.late {
			r.lateNums = append(r.lateNums, lateNum{index: i, page: r.pdf.PageNo(), st: st, right: r.x + r.w, base: base})
		} else if page != "" {
			pw := textWidthOf(fam, sty, st.size, page)
			r.simpleText(page, st, r.x+r.w-pw, base)
		}
		r.y += leadBody
	}
	r.after(14)
}

// lateNum is a contents entry's page number left to finishPages: the
// entry (index into the headings) and where its number goes, right-aligned
// at right on the baseline base of page page.
type lateNum struct {
	index, page int
	st          textStyle
	right, base float64
}
