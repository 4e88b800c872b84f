// Levenshtein distance over code points, keeping one row of the table at a time.
source, target := []rune(a), []rune(b)
prev := make([]int64, len(target)+1)
for j := range prev {
	prev[j] = int64(j)
}
for i, ca := range source {
	cur := make([]int64, len(target)+1)
	cur[0] = int64(i + 1)
	for j, cb := range target {
		cost := prev[j]
		if ca != cb {
			cost++
		}
		if prev[j+1]+1 < cost {
			cost = prev[j+1] + 1
		}
		if cur[j]+1 < cost {
			cost = cur[j] + 1
		}
		cur[j+1] = cost
	}
	prev = cur
}
return prev[len(target)]
}
