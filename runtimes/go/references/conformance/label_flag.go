state := ":off"
if entry.Second {
	state = ":on"
}
label := entry.First + state
if suffix != nil {
	label += *suffix
}
return label
}
