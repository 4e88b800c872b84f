// Sorted by code point, which the default string order (UTF-16 units) is not.
const byCodePoint = (x: string, y: string): number => {
  const p = [...x];
  const q = [...y];
  for (let i = 0; i < p.length && i < q.length; i++) {
    const d = p[i].codePointAt(0)! - q[i].codePointAt(0)!;
    if (d !== 0) return d;
  }
  return p.length - q.length;
};
return Object.keys(tally)
  .filter((name) => tally[name] === target)
  .sort(byCodePoint);
}
