package out

import (
	"compress/zlib"
	"io"
	"sync"
)

// zlibPools keeps zlib compressors between streams, one pool per level:
// making one allocates and clears about a megabyte of tables, more work
// than compressing a pattern tile's or a small page's content. A
// compressor that is Reset writes exactly what a new one would.
var zlibPools sync.Map // level -> *sync.Pool of *zlib.Writer

// deflate writes data to w as one zlib stream at level (a zlib level
// constant).
func deflate(w io.Writer, data []byte, level int) error {
	p, _ := zlibPools.LoadOrStore(level, &sync.Pool{})
	pool := p.(*sync.Pool)
	zw, _ := pool.Get().(*zlib.Writer)
	if zw == nil {
		var err error
		if zw, err = zlib.NewWriterLevel(w, level); err != nil {
			return err
		}
	} else {
		zw.Reset(w)
	}
	if _, err := zw.Write(data); err != nil {
		return err
	}
	if err := zw.Close(); err != nil {
		return err
	}
	pool.Put(zw)
	return nil
}
