package section

import "sort"

// sortByX orders wells left to right by their chainage, then their drawn
// position, so ties keep a fixed order.
func sortByX(ws []*placed) {
	sort.SliceStable(ws, func(i, j int) bool {
		if ws[i].chainage != ws[j].chainage {
			return ws[i].chainage < ws[j].chainage
		}
		return ws[i].x < ws[j].x
	})
}
