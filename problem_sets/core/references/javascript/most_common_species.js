// Ties go to the smallest name by code point, which the default string order is not.
const byCodePoint = (x, y) => {
  const p = [...x];
  const q = [...y];
  for (let i = 0; i < p.length && i < q.length; i++) {
    const d = p[i].codePointAt(0) - q[i].codePointAt(0);
    if (d !== 0) return d;
  }
  return p.length - q.length;
};
const counts = new Map();
for (const name of species) counts.set(name, (counts.get(name) ?? 0) + 1);
let best = null;
for (const [name, count] of counts) {
  const top = best === null ? 0 : counts.get(best);
  if (best === null || count > top || (count === top && byCodePoint(name, best) < 0)) best = name;
}
return best;
}
