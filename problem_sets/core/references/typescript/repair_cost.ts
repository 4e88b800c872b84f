// Levenshtein distance over code points, one row of the table at a time.
const source = [...a];
const target = [...b];
let prev = Array.from({ length: target.length + 1 }, (_, j) => j);
source.forEach((ca, i) => {
  const cur = [i + 1];
  target.forEach((cb, j) => {
    cur.push(Math.min(prev[j + 1] + 1, cur[j] + 1, prev[j] + (ca === cb ? 0 : 1)));
  });
  prev = cur;
});
return BigInt(prev[target.length]);
}
