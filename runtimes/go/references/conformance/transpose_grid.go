if len(grid) == 0 || len(grid[0]) == 0 {
	return [][]int64{}
}
columns := make([][]int64, len(grid[0]))
for j := range columns {
	columns[j] = make([]int64, len(grid))
	for i, row := range grid {
		columns[j][i] = row[j]
	}
}
return columns
}
