totals := map[string]int64{}
for _, line := range strings.Split(text, "\n") {
	if strings.Trim(line, " \t") == "" {
		continue
	}
	name, quantity, _ := strings.Cut(line, ":")
	// ParseInt accepts an optional "+" or "-" sign.
	value, _ := strconv.ParseInt(strings.Trim(quantity, " \t"), 10, 64)
	totals[strings.Trim(name, " \t")] += value
}
return totals
}
