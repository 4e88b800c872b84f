gaps := []int64{}
for i := 1; i < len(positions); i++ {
	gaps = append(gaps, positions[i]-positions[i-1])
}
return gaps
}
