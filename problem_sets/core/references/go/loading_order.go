// Kahn's algorithm, always loading the smallest ready item. Go compares strings byte by byte,
// which for UTF-8 text is the order of code points.
needs := map[string]map[string]bool{}
users := map[string][]string{}
note := func(item string) {
	if needs[item] == nil {
		needs[item] = map[string]bool{}
	}
}
for item, before := range deps {
	note(item)
	for _, other := range before {
		note(other)
		if !needs[item][other] {
			needs[item][other] = true
			users[other] = append(users[other], item)
		}
	}
}
remaining := map[string]int{}
ready := []string{}
for item, prereqs := range needs {
	remaining[item] = len(prereqs)
	if len(prereqs) == 0 {
		ready = append(ready, item)
	}
}
order := []string{}
for len(ready) > 0 {
	sort.Strings(ready)
	item := ready[0]
	ready = ready[1:]
	order = append(order, item)
	for _, user := range users[item] {
		remaining[user]--
		if remaining[user] == 0 {
			ready = append(ready, user)
		}
	}
}
if len(order) != len(needs) {
	return nil
}
return &order
}
