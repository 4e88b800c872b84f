names := []string{}
for name, count := range tally {
	if count == target {
		names = append(names, name)
	}
}
// Go compares strings byte by byte, which for UTF-8 text is the order of code points.
sort.Strings(names)
return names
}
