if len(values) == 0 {
	return nil
}
span := Pair[int64, int64]{values[0], values[0]}
for _, value := range values[1:] {
	if value < span.First {
		span.First = value
	}
	if value > span.Second {
		span.Second = value
	}
}
return &span
}
