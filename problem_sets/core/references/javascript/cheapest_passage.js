if (start === goal) return 0n;
const graph = new Map();
const link = (from, to, cost) => {
  if (!graph.has(from)) graph.set(from, []);
  graph.get(from).push([to, cost]);
};
for (const [a, b, cost] of routes) {
  link(a, b, cost);
  link(b, a, cost);
}
// Dijkstra without a heap: the islands are few.
const best = new Map([[start, 0n]]);
const settled = new Set();
for (;;) {
  let island = null;
  for (const [name, dist] of best) {
    if (!settled.has(name) && (island === null || dist < best.get(island))) island = name;
  }
  if (island === null) return null;
  if (island === goal) return best.get(island);
  settled.add(island);
  for (const [next, cost] of graph.get(island) ?? []) {
    const dist = best.get(island) + cost;
    if (!best.has(next) || dist < best.get(next)) best.set(next, dist);
  }
}
}
