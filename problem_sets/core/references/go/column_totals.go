totals := []int64{}
for _, row := range grid {
	for j, v := range row {
		if j == len(totals) {
			totals = append(totals, 0)
		}
		totals[j] += v
	}
}
return totals
}
