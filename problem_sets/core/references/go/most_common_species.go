if len(species) == 0 {
	return nil
}
counts := map[string]int{}
for _, name := range species {
	counts[name]++
}
best := species[0]
for name, count := range counts {
	// Go compares strings byte by byte, which for UTF-8 text is the order of code points.
	if count > counts[best] || (count == counts[best] && name < best) {
		best = name
	}
}
return &best
}
