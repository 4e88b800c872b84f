// Tarjan's algorithm: every strongly connected component is a candidate loop.
index := map[string]int{}
low := map[string]int{}
onStack := map[string]bool{}
var stack []string
var loops int64
var visit func(node string)
visit = func(node string) {
	index[node] = len(index)
	low[node] = index[node]
	stack = append(stack, node)
	onStack[node] = true
	selfLink := false
	for _, next := range adj[node] {
		if next == node {
			selfLink = true
		}
		if _, seen := index[next]; !seen {
			visit(next)
			if low[next] < low[node] {
				low[node] = low[next]
			}
		} else if onStack[next] && index[next] < low[node] {
			low[node] = index[next]
		}
	}
	if low[node] != index[node] {
		return
	}
	size := 0
	for {
		top := stack[len(stack)-1]
		stack = stack[:len(stack)-1]
		onStack[top] = false
		size++
		if top == node {
			break
		}
	}
	if size > 1 || selfLink {
		loops++
	}
}
for node := range adj {
	if _, seen := index[node]; !seen {
		visit(node)
	}
}
return loops
}
