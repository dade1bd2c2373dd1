package memo_test

import (
	"go/ast"
	"go/types"
	"slices"
	"strings"
	"testing"

	"golang.org/x/tools/go/packages"
)

// pureCalc are the calc functions and methods the memo may call: vector
// arithmetic, counting and naming helpers — nothing that computes physics.
// Everything else the memo shows comes from the analysis stage.
var pureCalc = []string{
	"Vec.Add", "Vec.Sub", "Vec.Scale", "Vec.Dot", "Vec.Cross", "Vec.Norm", "Vec.Unit", "Vec.IsNaN",
	"Winding.TurnCount", "Former.Capacity", "Severity.String",
}

// The pipeline runs one way: the memo writes up a Study and computes no
// physics itself; calc and figures know nothing of the memo.
func TestLayering(t *testing.T) {
	if testing.Short() {
		t.Skip("loads the packages' types")
	}
	cfg := &packages.Config{Mode: packages.NeedName | packages.NeedImports | packages.NeedDeps |
		packages.NeedTypes | packages.NeedSyntax | packages.NeedTypesInfo, Dir: ".."}
	pkgs, err := packages.Load(cfg, "./memo/...", "./calc/...", "./figures/...", "./doc/...", "./fonts/...")
	if err != nil {
		t.Fatal(err)
	}
	if packages.PrintErrors(pkgs) > 0 {
		t.Fatal("packages did not load")
	}
	for _, p := range pkgs {
		leaf := strings.HasPrefix(p.PkgPath, "coilmemo/calc") || strings.HasPrefix(p.PkgPath, "coilmemo/figures") ||
			p.PkgPath == "coilmemo/doc" || p.PkgPath == "coilmemo/fonts"
		for imp := range p.Imports {
			if leaf && (strings.HasPrefix(imp, "coilmemo/memo") || strings.HasPrefix(imp, "coilmemo/analysis")) {
				t.Errorf("%s imports %s: the pipeline runs one way", p.PkgPath, imp)
			}
		}
		if !strings.HasPrefix(p.PkgPath, "coilmemo/memo") {
			continue
		}
		for _, f := range p.Syntax {
			ast.Inspect(f, func(n ast.Node) bool {
				call, ok := n.(*ast.CallExpr)
				if !ok {
					return true
				}
				var id *ast.Ident
				switch fn := call.Fun.(type) {
				case *ast.SelectorExpr:
					id = fn.Sel
				case *ast.Ident:
					id = fn
				default:
					return true
				}
				fn, ok := p.TypesInfo.Uses[id].(*types.Func)
				if !ok || fn.Pkg() == nil || fn.Pkg().Path() != "coilmemo/calc" {
					return true
				}
				name := fn.Name()
				if recv := fn.Type().(*types.Signature).Recv(); recv != nil {
					rt := recv.Type()
					if ptr, ok := rt.(*types.Pointer); ok {
						rt = ptr.Elem()
					}
					if named, ok := rt.(*types.Named); ok {
						name = named.Obj().Name() + "." + name
					}
				}
				if !slices.Contains(pureCalc, name) {
					t.Errorf("%s: the memo calls calc.%s; compute it in the analysis stage", p.Fset.Position(call.Pos()), name)
				}
				return true
			})
		}
	}
}
