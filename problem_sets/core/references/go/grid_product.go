result := make([][]int64, len(a))
for i, row := range a {
	result[i] = make([]int64, len(b[0]))
	for j := range result[i] {
		for t, v := range row {
			result[i][j] += v * b[t][j]
		}
	}
}
return result
}
