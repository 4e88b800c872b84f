const waits = [];
let t = interval;
let i = 0;
while (i < arrivals.length) {
  if (arrivals[i] > t) t = ((arrivals[i] + interval - 1n) / interval) * interval;
  let boarded = 0n;
  while (i < arrivals.length && boarded < capacity && arrivals[i] <= t) {
    waits.push(t - arrivals[i]);
    boarded++;
    i++;
  }
  t += interval;
}
return waits;
}
