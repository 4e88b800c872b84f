// best[r]: the largest worth of a load weighing at most r, over the crates seen so far.
const room = Number(capacity);
const best: bigint[] = new Array(room + 1).fill(0n);
weights.forEach((w, i) => {
  const weight = Number(w);
  for (let r = room; r >= weight; r--) {
    const loaded = best[r - weight] + values[i];
    if (loaded > best[r]) best[r] = loaded;
  }
});
return best[room];
}
