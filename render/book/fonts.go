package book

import (
	"github.com/go-pdf/fpdf"
	"golang.org/x/image/font/gofont/gobold"
	"golang.org/x/image/font/gofont/goitalic"
	"golang.org/x/image/font/gofont/goregular"
)

// family is the embedded UTF-8 face: the Go fonts cover Latin-1 and more,
// so °, ±, µ, – and accented names print as written.
const family = "go"

// newDoc starts an fpdf document in millimetres with the Go fonts and
// the fixed metadata that keeps its bytes repeatable.
func newDoc(in Input, landscape bool) *fpdf.Fpdf {
	w, h := in.PageWidth*25.4/72, in.PageHeight*25.4/72
	orient := "P"
	if landscape {
		orient = "L"
	}
	f := fpdf.NewCustom(&fpdf.InitType{OrientationStr: orient, UnitStr: "mm", Size: fpdf.SizeType{Wd: w, Ht: h}})
	f.AddUTF8FontFromBytes(family, "", goregular.TTF)
	f.AddUTF8FontFromBytes(family, "B", gobold.TTF)
	f.AddUTF8FontFromBytes(family, "I", goitalic.TTF)
	f.SetCreationDate(in.Date)
	f.SetModificationDate(in.Date)
	f.SetCatalogSort(true)
	f.SetCompression(true)
	f.SetProducer("tremie", true)
	f.SetCreator("tremie", true)
	f.SetTitle(in.Project.Name, true)
	f.SetMargins(14, 14, 14)
	f.SetAutoPageBreak(false, 14)
	return f
}
