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
groups := int64(len(docks))
for _, link := range links {
	ra, rb := find(link.First), find(link.Second)
	if ra != rb {
		parent[ra] = rb
		groups--
	}
}
return groups
}
