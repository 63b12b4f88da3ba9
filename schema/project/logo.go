package project

import (
	"bytes"
	"fmt"
	"image"
	_ "image/jpeg" // logos may be JPEG
	_ "image/png"  // or PNG
	"os"

	"github.com/tremie-dev/tremie/schema"
)

// Logo limits: a title-block logo is printed a few centimetres wide, so
// a larger file only slows every sheet down (common practice).
const (
	MaxLogoBytes  = 1 << 20 // 1 MiB
	MaxLogoPixels = 2048    // per side
	MinLogoPixels = 16      // per side
)

// LoadLogo reads and checks a logo image: PNG or JPEG, at most
// MaxLogoBytes, each side between MinLogoPixels and MaxLogoPixels.
func LoadLogo(path string) (*Logo, error) {
	st, err := os.Stat(path)
	if err != nil {
		return nil, fmt.Errorf("logo %s: %w", path, err)
	}
	if st.IsDir() {
		return nil, fmt.Errorf("logo %s is a directory, not an image", path)
	}
	if st.Size() > MaxLogoBytes {
		return nil, fmt.Errorf("logo %s is %d bytes; the limit is %d (1 MiB): export it smaller", path, st.Size(), MaxLogoBytes)
	}
	data, err := schema.ReadInput(path, MaxLogoBytes)
	if err != nil {
		return nil, fmt.Errorf("logo %s: %w", path, err)
	}
	return CheckLogo(path, data)
}

// CheckLogo checks logo bytes (name is for messages).
func CheckLogo(name string, data []byte) (*Logo, error) {
	if len(data) > MaxLogoBytes {
		return nil, fmt.Errorf("logo %s is %d bytes; the limit is %d (1 MiB): export it smaller", name, len(data), MaxLogoBytes)
	}
	cfg, format, err := image.DecodeConfig(bytes.NewReader(data))
	if err != nil {
		return nil, fmt.Errorf("logo %s is not a PNG or JPEG image: %w", name, err)
	}
	if format != "png" && format != "jpeg" {
		return nil, fmt.Errorf("logo %s is %s; use PNG or JPEG", name, format)
	}
	if cfg.Width > MaxLogoPixels || cfg.Height > MaxLogoPixels {
		return nil, fmt.Errorf("logo %s is %d×%d pixels; the limit is %d on each side", name, cfg.Width, cfg.Height, MaxLogoPixels)
	}
	if cfg.Width < MinLogoPixels || cfg.Height < MinLogoPixels {
		return nil, fmt.Errorf("logo %s is %d×%d pixels; it needs at least %d on each side", name, cfg.Width, cfg.Height, MinLogoPixels)
	}
	// Decode the whole image (bounded by the checks above), so that a
	// truncated file is caught here rather than on every sheet.
	if _, _, err := image.Decode(bytes.NewReader(data)); err != nil {
		return nil, fmt.Errorf("logo %s is damaged: %w", name, err)
	}
	return &Logo{Data: data, Format: format, Width: cfg.Width, Height: cfg.Height}, nil
}
