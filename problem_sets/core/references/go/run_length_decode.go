var out strings.Builder
count := 0
for _, r := range code {
	if r >= '0' && r <= '9' {
		count = count*10 + int(r-'0')
	} else {
		out.WriteString(strings.Repeat(string(r), count))
		count = 0
	}
}
return out.String()
}
