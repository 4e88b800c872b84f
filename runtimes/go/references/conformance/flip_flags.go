flipped := make([]bool, len(flags))
for i, flag := range flags {
	flipped[i] = !flag
}
return flipped
}
