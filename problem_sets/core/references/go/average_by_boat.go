sums := map[string]float64{}
counts := map[string]int{}
for _, c := range catches {
	sums[c.First] += c.Second
	counts[c.First]++
}
means := make(map[string]float64, len(sums))
for boat, sum := range sums {
	means[boat] = sum / float64(counts[boat])
}
return means
}
