// Ties go to the smallest name by code point, which the default string order is not.
const byCodePoint = (x: string, y: string): number => {
  const p = [...x];
  const q = [...y];
  for (let i = 0; i < p.length && i < q.length; i++) {
    const d = p[i].codePointAt(0)! - q[i].codePointAt(0)!;
    if (d !== 0) return d;
  }
  return p.length - q.length;
};
const counts = new Map<string, number>();
for (const name of species) counts.set(name, (counts.get(name) ?? 0) + 1);
let best: string | null = null;
let bestCount = 0;
for (const [name, count] of counts) {
  if (best === null || count > bestCount || (count === bestCount && byCodePoint(name, best) < 0)) {
    best = name;
    bestCount = count;
  }
}
return best;
}
