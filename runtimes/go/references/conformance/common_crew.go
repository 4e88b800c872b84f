both := make(map[string]struct{})
for name := range first {
	if _, ok := second[name]; ok {
		both[name] = struct{}{}
	}
}
return both
}
