if start == goal {
	return ptr[int64](0)
}
dist := map[string]int64{start: 0}
queue := []string{start}
for len(queue) > 0 {
	dock := queue[0]
	queue = queue[1:]
	for _, next := range adj[dock] {
		if _, seen := dist[next]; seen {
			continue
		}
		dist[next] = dist[dock] + 1
		if next == goal {
			hops := dist[next]
			return &hops
		}
		queue = append(queue, next)
	}
}
return nil
}
