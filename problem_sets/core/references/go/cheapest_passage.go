if start == goal {
	return ptr[int64](0)
}
type leg struct {
	to   string
	cost int64
}
graph := map[string][]leg{}
for _, r := range routes {
	graph[r.First] = append(graph[r.First], leg{r.Second, r.Third})
	graph[r.Second] = append(graph[r.Second], leg{r.First, r.Third})
}
// Dijkstra without a heap: settle the closest unsettled island each round.
best := map[string]int64{start: 0}
settled := map[string]bool{}
for {
	island, found := "", false
	for name, dist := range best {
		if !settled[name] && (!found || dist < best[island]) {
			island, found = name, true
		}
	}
	if !found {
		return nil
	}
	if island == goal {
		dist := best[island]
		return &dist
	}
	settled[island] = true
	for _, l := range graph[island] {
		dist := best[island] + l.cost
		if old, ok := best[l.to]; !ok || dist < old {
			best[l.to] = dist
		}
	}
}
}
