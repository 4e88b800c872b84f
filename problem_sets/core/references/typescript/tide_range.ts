if (readings.length === 0) return 0n;
let low = readings[0];
let high = readings[0];
for (const reading of readings) {
  if (reading < low) low = reading;
  if (reading > high) high = reading;
}
return high - low;
}
