let total = 0n;
let missing = 0n;
for (const reading of readings) {
  if (reading === null) {
    missing += 1n;
  } else {
    total += reading;
  }
}
return [total, missing];
}
