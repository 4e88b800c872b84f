parent := make(map[string]string, len(docks))
for _, dock := range docks {
	parent[dock] = dock
}
find := func(x string) string {
	for parent[x] != x {
		parent[x] = parent[parent[x]]
		x = parent[x]
	}
	return x
}
// Kruskal: take the cheapest cables first, skipping any that would close a loop.
byCost := append([]Triple[string, string, int64](nil), cables...)
sort.SliceStable(byCost, func(i, j int) bool { return byCost[i].Third < byCost[j].Third })
var total int64
joined := 0
for _, c := range byCost {
	ra, rb := find(c.First), find(c.Second)
	if ra != rb {
		parent[ra] = rb
		total += c.Third
		joined++
	}
}
if len(docks) > 1 && joined != len(docks)-1 {
	return nil
}
return &total
}
