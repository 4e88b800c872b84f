counts := map[string]int64{}
for _, r := range text {
	counts[string(r)]++
}
return counts
}
