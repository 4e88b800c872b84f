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
const seen = new Set<string>([start]);
const stack = [start];
while (stack.length > 0) {
  const dock = stack.pop()!;
  for (const next of Object.hasOwn(adj, dock) ? adj[dock] : []) {
    if (!seen.has(next)) {
      seen.add(next);
      stack.push(next);
    }
  }
}
return [...seen].sort(byCodePoint);
}
