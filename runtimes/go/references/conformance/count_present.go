var sum, missing int64
for _, reading := range readings {
	if reading == nil {
		missing++
	} else {
		sum += *reading
	}
}
return Pair[int64, int64]{sum, missing}
}
