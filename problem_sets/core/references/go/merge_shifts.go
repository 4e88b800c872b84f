ordered := append([]Pair[int64, int64](nil), shifts...)
sort.Slice(ordered, func(i, j int) bool {
	if ordered[i].First != ordered[j].First {
		return ordered[i].First < ordered[j].First
	}
	return ordered[i].Second < ordered[j].Second
})
merged := []Pair[int64, int64]{}
for _, s := range ordered {
	if n := len(merged); n > 0 && s.First <= merged[n-1].Second+1 {
		if s.Second > merged[n-1].Second {
			merged[n-1].Second = s.Second
		}
	} else {
		merged = append(merged, s)
	}
}
return merged
}
