package sheet

import (
	"fmt"

	"github.com/tremie-dev/tremie/schema"
)

// Economy says how a well's sheets were spent: the drawing sheets and
// their scale, and what still went on notes sheets, with the figures
// that explain it. The command prints it where --scale fit leaves notes
// sheets (see render/pipeline).
type Economy struct {
	Drawings    int
	Scale       Scale
	NotesSheets int
	// DescriptionNotes and OtherNotes count the notes on the notes
	// sheets: lithology description notes (Dn) and the rest (notes,
	// findings, component notes).
	DescriptionNotes, OtherNotes int
	// Need is the height, in points, of the notes sheets' notes in
	// columns ColW wide; Holds what the columns of one notes sheet hold.
	Need, Holds, ColW float64
}

// Plan lays a well out as Layout does, without drawing it, and says how
// its sheets were spent.
func Plan(w *schema.Well, in Inputs, opt Options) (Economy, error) {
	l, err := planned(w, in, opt)
	if err != nil {
		return Economy{}, err
	}
	return l.economy(), nil
}

// economy is the plan's Economy.
func (l *layout) economy() Economy {
	e := Economy{Drawings: len(l.sheets), Scale: l.scale, NotesSheets: len(l.notesPages), ColW: l.bandPlan.noteW}
	for _, page := range l.notesPages {
		for _, b := range page {
			for _, n := range b.notes {
				switch {
				case n.heading:
				case n.role == "description-note":
					e.DescriptionNotes++
				default:
					e.OtherNotes++
				}
			}
			e.Need += b.r.H
		}
	}
	a := l.notesArea()
	perPage := max(1, int((a.W+sheetColGap)/(e.ColW+sheetColGap)+1e-9))
	e.Holds = float64(perPage) * a.H
	return e
}

// String says it in a sentence: where notes sheets remain, how much
// text they carry against what one sheet holds, so that a reader sees
// whether any scale could have kept them on the drawing.
func (e Economy) String() string {
	s := fmt.Sprintf("drawn on %d %s at %v", e.Drawings, plural(e.Drawings, "sheet", "sheets"), e.Scale)
	if e.NotesSheets == 0 {
		return s
	}
	what := fmt.Sprintf("%d %s", e.DescriptionNotes, plural(e.DescriptionNotes, "description note", "description notes"))
	if e.OtherNotes > 0 {
		what += fmt.Sprintf(" and %d other %s", e.OtherNotes, plural(e.OtherNotes, "note", "notes"))
	}
	why := "more than the drawing leaves free"
	if e.Need > e.Holds {
		why = "more than a whole sheet holds, so no scale keeps them on the drawing's sheet at a legible size"
	}
	return fmt.Sprintf("%s, but %s continue on %d notes %s: they need %.0f pt of %.1f-pt text in %.0f-pt columns, and a sheet of such columns holds %.0f pt: %s",
		s, what, e.NotesSheets, plural(e.NotesSheets, "sheet", "sheets"), e.Need, sizeSmall, e.ColW, e.Holds, why)
}
