// Package templates holds the memo's fixed wording — section introductions
// and safety cautions — as embedded text files, so the wording can be
// reviewed and edited without touching code. Each file is a text/template
// executed with the data the caller passes.
package templates

import (
	"embed"
	"fmt"
	"strings"
	"text/template"
)

//go:embed *.txt
var files embed.FS

var all = template.Must(template.New("").Option("missingkey=error").ParseFS(files, "*.txt"))

// Text executes the named template (a file name without .txt) with data and
// returns its text with surrounding white space trimmed and line breaks
// inside paragraphs folded to spaces. Paragraphs are separated by blank
// lines in the file and returned separated by "\n\n".
func Text(name string, data any) string {
	var b strings.Builder
	if err := all.ExecuteTemplate(&b, name+".txt", data); err != nil {
		// The templates are embedded and tested; a failure here is a bug.
		panic(fmt.Sprintf("templates: %s: %v", name, err))
	}
	paras := strings.Split(strings.TrimSpace(b.String()), "\n\n")
	for i, p := range paras {
		paras[i] = strings.Join(strings.Fields(p), " ")
	}
	return strings.Join(paras, "\n\n")
}

// Paragraphs is Text split into its paragraphs.
func Paragraphs(name string, data any) []string {
	return strings.Split(Text(name, data), "\n\n")
}
