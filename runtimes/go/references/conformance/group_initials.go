groups := map[string][]string{}
for _, name := range names {
	if name == "" {
		continue
	}
	initial, _ := utf8.DecodeRuneInString(name)
	key := string(initial)
	groups[key] = append(groups[key], name)
}
return groups
}
