var onBoard, refused int64
for _, stop := range stops {
	alighting, boarding := stop.First, stop.Second
	if alighting > onBoard {
		alighting = onBoard
	}
	onBoard -= alighting
	taken := boarding
	if room := capacity - onBoard; taken > room {
		taken = room
	}
	onBoard += taken
	refused += boarding - taken
}
return Pair[int64, int64]{onBoard, refused}
}
