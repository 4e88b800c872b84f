groups := map[string][]string{}
for _, word := range words {
	if word == "" {
		continue
	}
	_, size := utf8.DecodeRuneInString(word)
	initial := word[:size]
	groups[initial] = append(groups[initial], word)
}
return groups
}
