package steps

// distance is the edit distance between a and b counted in characters:
// insertions, deletions, substitutions and swaps of two neighbouring
// characters each cost one (the optimal string alignment distance).
func distance(a, b string) int {
	ra, rb := []rune(a), []rune(b)
	d := make([][]int, len(ra)+1)
	for i := range d {
		d[i] = make([]int, len(rb)+1)
		d[i][0] = i
	}
	for j := range d[0] {
		d[0][j] = j
	}
	for i := 1; i <= len(ra); i++ {
		for j := 1; j <= len(rb); j++ {
			cost := 1
			if ra[i-1] == rb[j-1] {
				cost = 0
			}
			d[i][j] = min(d[i-1][j]+1, d[i][j-1]+1, d[i-1][j-1]+cost)
			if i > 1 && j > 1 && ra[i-1] == rb[j-2] && ra[i-2] == rb[j-1] {
				d[i][j] = min(d[i][j], d[i-2][j-2]+1)
			}
		}
	}
	return d[len(ra)][len(rb)]
}

// closest returns the candidate nearest to word, or "" when none is close
// enough to be what was meant: at most one edit for short words, two for
// words of five characters or more, or a candidate that starts with word.
func closest(word string, candidates []string) string {
	if len(word) > 64 {
		return ""
	}
	best, bestD := "", 1<<30
	for _, c := range candidates {
		if d := distance(word, c); d < bestD {
			best, bestD = c, d
		}
	}
	limit := 1
	if len([]rune(word)) >= 5 {
		limit = 2
	}
	if bestD <= limit {
		return best
	}
	for _, c := range candidates {
		if len(word) >= 3 && len(c) > len(word) && c[:len(word)] == word {
			return c
		}
	}
	return ""
}

// didYouMean returns "; did you mean `x`?" or "".
func didYouMean(word string, candidates []string) string {
	if c := closest(word, candidates); c != "" {
		return "; did you mean " + quote(c) + "?"
	}
	return ""
}
