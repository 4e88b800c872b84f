waits := make([]int64, 0, len(arrivals))
t := interval
for i := 0; i < len(arrivals); t += interval {
	if arrivals[i] > t {
		// Nobody is waiting: skip to the first departure at or after the next arrival.
		t = (arrivals[i] + interval - 1) / interval * interval
	}
	for boarded := int64(0); i < len(arrivals) && boarded < capacity && arrivals[i] <= t; boarded++ {
		waits = append(waits, t-arrivals[i])
		i++
	}
}
return waits
}
