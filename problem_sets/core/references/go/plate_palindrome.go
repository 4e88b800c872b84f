kept := []byte{}
for i := 0; i < len(plate); i++ {
	c := plate[i]
	switch {
	case c >= 'A' && c <= 'Z':
		kept = append(kept, c-'A'+'a')
	case c >= 'a' && c <= 'z', c >= '0' && c <= '9':
		kept = append(kept, c)
	}
}
for i, j := 0, len(kept)-1; i < j; i, j = i+1, j-1 {
	if kept[i] != kept[j] {
		return false
	}
}
return true
}
