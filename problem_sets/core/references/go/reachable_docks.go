seen := map[string]bool{start: true}
stack := []string{start}
for len(stack) > 0 {
	dock := stack[len(stack)-1]
	stack = stack[:len(stack)-1]
	for _, next := range adj[dock] {
		if !seen[next] {
			seen[next] = true
			stack = append(stack, next)
		}
	}
}
docks := make([]string, 0, len(seen))
for dock := range seen {
	docks = append(docks, dock)
}
// Go compares strings byte by byte, which for UTF-8 text is the order of code points.
sort.Strings(docks)
return docks
}
