step := rune((shift%26 + 26) % 26)
return strings.Map(func(r rune) rune {
	switch {
	case r >= 'a' && r <= 'z':
		return 'a' + (r-'a'+step)%26
	case r >= 'A' && r <= 'Z':
		return 'A' + (r-'A'+step)%26
	}
	return r
}, text)
}
