package sheet

// Ordered one-dimensional label placement.
//
// Labels stand in a column beside the well, each wanting its top at a
// target (so that it sits level with the depth it names). They must keep
// depth order and stay at least gap apart. Placing label i at top y_i, the
// constraints are y_{i+1} >= y_i + h_i + gap. Writing
// y_i = z_i + o_i with o_i the stacked heights and gaps of the labels above
// i, they become z_1 <= z_2 <= ... <= z_n, and minimising the total squared
// displacement sum (y_i - t_i)^2 is the isotonic regression of
// u_i = t_i - o_i, solved exactly in linear time by pooling adjacent
// violators. A common lower and upper bound on z (the column's top and
// bottom) is then met by clamping, which keeps the solution optimal for
// the bounded problem because the bounds are the same for every z_i.

// place returns the top of each label, in the given order (which is the
// order kept), minimising the squared distance to targets subject to the
// spacing and to lying within [lo, hi]. ok is false when the labels are
// taller than the column; they then start at lo and run past hi.
func place(targets, heights []float64, gap, lo, hi float64) (tops []float64, ok bool) {
	n := len(targets)
	if n == 0 {
		return nil, true
	}
	offset := make([]float64, n)
	for i := 1; i < n; i++ {
		offset[i] = offset[i-1] + heights[i-1] + gap
	}
	// Pool adjacent violators: blocks of consecutive labels that move as
	// one, each at the mean of its members' unconstrained positions.
	type block struct {
		sum   float64
		count int
	}
	blocks := make([]block, 0, n)
	for i := 0; i < n; i++ {
		blocks = append(blocks, block{sum: targets[i] - offset[i], count: 1})
		for len(blocks) > 1 {
			a, b := blocks[len(blocks)-2], blocks[len(blocks)-1]
			if a.sum/float64(a.count) <= b.sum/float64(b.count) {
				break
			}
			blocks = blocks[:len(blocks)-2]
			blocks = append(blocks, block{sum: a.sum + b.sum, count: a.count + b.count})
		}
	}
	zmax := hi - offset[n-1] - heights[n-1]
	ok = zmax >= lo
	tops = make([]float64, 0, n)
	for _, b := range blocks {
		z := b.sum / float64(b.count)
		if z > zmax {
			z = zmax
		}
		if z < lo {
			z = lo
		}
		for k := 0; k < b.count; k++ {
			tops = append(tops, z+offset[len(tops)])
		}
	}
	return tops, ok
}
