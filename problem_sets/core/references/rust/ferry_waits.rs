let mut waits = Vec::with_capacity(arrivals.len());
let mut departure = interval;
let mut i = 0;
while i < arrivals.len() {
    if arrivals[i] > departure {
        // Nobody is waiting: jump to the first departure at or after the next arrival.
        departure = (arrivals[i] + interval - 1) / interval * interval;
    }
    let mut boarded = 0;
    while i < arrivals.len() && boarded < capacity && arrivals[i] <= departure {
        waits.push(departure - arrivals[i]);
        boarded += 1;
        i += 1;
    }
    departure += interval;
}
waits
}
