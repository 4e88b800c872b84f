let total = 0;
for (const items of Object.values(crates)) {
  for (const weight of Object.values(items)) total += weight;
}
return total;
}
