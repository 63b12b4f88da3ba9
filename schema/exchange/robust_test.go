package exchange

import (
	"os"
	"path/filepath"
	"testing"
)

// No input crashes the importer: odd CSVs each give errors or wells, and
// never a panic or a file from a row with a problem.
func TestOddInputsNeverPanic(t *testing.T) {
	dir := t.TempDir()
	cases := map[string]string{
		"empty.csv":       "",
		"header-only.csv": "well_id,purpose,depth_unit,total_depth\n",
		"long-rows.csv":   "well_id,purpose\nX-1,monitoring,extra,cells,here\n",
		"no-id.csv":       "purpose,depth_unit\nmonitoring,ft\n",
		"huge.csv":        "well_id,purpose,depth_unit,total_depth\nX-1,monitoring,ft,1e400\n",
		"nan.csv":         "well_id,purpose,depth_unit,total_depth\nX-1,monitoring,ft,NaN\n",
		"quotes.csv":      "well_id,purpose,depth_unit,total_depth,notes\n\"X \"\"1\"\"\",monitoring,ft,10,\"a\\b \"\"c\"\"\n=cmd()\"\n",
		"bad-date.csv":    "well_id,purpose,depth_unit,total_depth,drilled\nX-1,monitoring,ft,10,0000-00-00\n",
		"ragged.csv":      "well_id,\"purpose\nX-1",
		"dotted.csv":      "well_id,purpose,depth_unit,total_depth,surface.lock,nonsense.key\nX-1,monitoring,ft,10,padlock,1\n",
		"bom.csv":         "\xef\xbb\xbfwell_id,purpose,depth_unit,total_depth\nX-1,monitoring,ft,10\n",
		"unicode-id.csv":  "well_id,purpose,depth_unit,total_depth\nПУ-1/Ø,monitoring,ft,10\n",
		"not-a-book.xlsx": "PK\x03\x04 not really a zip",
		"other.txt":       "hello",
	}
	for name, body := range cases {
		p := filepath.Join(dir, name)
		os.WriteFile(p, []byte(body), 0o644)
		func() {
			defer func() {
				if r := recover(); r != nil {
					t.Errorf("%s: panic %v", name, r)
				}
			}()
			files, errs := Import(p)
			if len(errs) == 0 && len(files) == 0 {
				t.Errorf("%s: neither wells nor errors", name)
			}
			if len(errs) > 0 && len(files) > 0 {
				t.Errorf("%s: files made despite %v", name, errs)
			}
		}()
	}
}
