row := []int64{1}
for i := int64(0); i < n; i++ {
	next := make([]int64, len(row)+1)
	next[0], next[len(row)] = 1, 1
	for k := 1; k < len(row); k++ {
		next[k] = row[k-1] + row[k]
	}
	row = next
}
return row
}
