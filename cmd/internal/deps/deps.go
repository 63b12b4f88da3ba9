// Package deps pins the project's third-party modules in go.mod while the
// packages that use them are being written. Remove an import once a real
// package imports that module.
package deps

import (
	_ "github.com/BurntSushi/toml"
	_ "github.com/go-pdf/fpdf"
	_ "github.com/pdfcpu/pdfcpu/pkg/api"
	_ "github.com/schollz/progressbar/v3"
	_ "github.com/tdewolff/canvas"
	_ "github.com/tdewolff/canvas/renderers/pdf"
	_ "github.com/tdewolff/canvas/renderers/rasterizer"
	_ "github.com/tdewolff/canvas/renderers/svg"
	_ "github.com/xuri/excelize/v2"
	_ "golang.org/x/image/font/gofont/goregular"
	_ "golang.org/x/sync/errgroup"
	_ "golang.org/x/term"
)
