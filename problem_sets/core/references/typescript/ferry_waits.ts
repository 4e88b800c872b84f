const waits: bigint[] = [];
let departure = interval;
let i = 0;
while (i < arrivals.length) {
  // Skip departures that would leave with nobody waiting.
  if (arrivals[i] > departure) {
    departure = ((arrivals[i] + interval - 1n) / interval) * interval;
  }
  let boarded = 0n;
  while (i < arrivals.length && boarded < capacity && arrivals[i] <= departure) {
    waits.push(departure - arrivals[i]);
    boarded++;
    i++;
  }
  departure += interval;
}
return waits;
}
