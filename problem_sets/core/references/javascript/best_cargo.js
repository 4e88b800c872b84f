const room = Number(capacity);
const best = new Array(room + 1).fill(0n);
for (let i = 0; i < weights.length; i++) {
  const weight = Number(weights[i]);
  for (let r = room; r >= weight; r--) {
    const loaded = best[r - weight] + values[i];
    if (loaded > best[r]) best[r] = loaded;
  }
}
return best[room];
}
