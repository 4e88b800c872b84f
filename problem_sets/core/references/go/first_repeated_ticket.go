seen := map[string]bool{}
for _, code := range tickets {
	if seen[code] {
		return &code
	}
	seen[code] = true
}
return nil
}
