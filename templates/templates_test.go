package templates

import (
	"os"
	"path/filepath"
	"regexp"
	"strings"
	"testing"
)

// Paragraph breaks survive; line breaks inside a paragraph fold to spaces.
func TestTextFoldsParagraphs(t *testing.T) {
	got := Paragraphs("caution-general", map[string]string{"Coil": "coil", "Is": "is", "Its": "its"})
	if len(got) != 2 {
		t.Fatalf("caution-general has %d paragraphs, want 2", len(got))
	}
	for _, p := range got {
		if strings.Contains(p, "\n") || strings.Contains(p, "  ") {
			t.Errorf("paragraph not folded: %q", p)
		}
	}
}

// A template asked for with data missing a field fails loudly rather
// than printing "<no value>" into a memo.
func TestMissingFieldPanics(t *testing.T) {
	defer func() {
		if recover() == nil {
			t.Error("caution-hot without its Temperature did not fail")
		}
	}()
	Text("caution-hot", map[string]string{})
}

// Every template is used by the memo composer: no dead wording.
func TestEveryTemplateUsed(t *testing.T) {
	names, _ := filepath.Glob("*.txt")
	srcs, _ := filepath.Glob("../memo/*.go")
	var all strings.Builder
	for _, s := range srcs {
		if strings.HasSuffix(s, "_test.go") {
			continue
		}
		b, _ := os.ReadFile(s)
		all.Write(b)
	}
	for _, n := range names {
		name := strings.TrimSuffix(n, ".txt")
		if !regexp.MustCompile(`"` + regexp.QuoteMeta(name) + `"`).MatchString(all.String()) {
			t.Errorf("template %s is not used by package memo", name)
		}
	}
}
