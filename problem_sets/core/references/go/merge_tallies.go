merged := make(map[string]int64, len(a)+len(b))
for ship, count := range a {
	merged[ship] += count
}
for ship, count := range b {
	merged[ship] += count
}
return merged
}
